import fs from "node:fs";

// The browser tests never download a browser; they need Debian's Chromium.
const path = process.env.CHROMIUM_PATH ?? "/usr/bin/chromium";
if (!fs.existsSync(path)) {
  console.error(
    `End-to-end tests need Chromium at ${path}, and it is not there.\n` +
      "Install it with:  sudo apt-get update && sudo apt-get install -y chromium\n" +
      "(or set CHROMIUM_PATH to another Chromium binary). The e2e suite does not skip without it.",
  );
  process.exit(1);
}
