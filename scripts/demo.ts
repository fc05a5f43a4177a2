// `npm run demo`: one command from a fresh clone to a running app with demo data.
import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";

const root = process.cwd();
const envFile = path.join(root, ".env.local");

function ensureEnvFile() {
  if (fs.existsSync(envFile) && /^NEXTAUTH_SECRET=.{32,}/m.test(fs.readFileSync(envFile, "utf8"))) return;
  const secret = crypto.randomBytes(32).toString("base64url");
  const lines = [
    "# Written by `npm run demo`. Keep it out of version control.",
    `NEXTAUTH_SECRET=${secret}`,
    "NEXTAUTH_URL=http://localhost:3000",
    "DATABASE_PATH=data/sixteenths.sqlite",
    "SMTP_URL=smtp://127.0.0.1:1025",
  ];
  const existing = fs.existsSync(envFile) ? fs.readFileSync(envFile, "utf8").replace(/^NEXTAUTH_SECRET=.*$/m, "") : "";
  fs.writeFileSync(envFile, existing ? `${existing.trim()}\nNEXTAUTH_SECRET=${secret}\n` : `${lines.join("\n")}\n`);
  console.log("Wrote .env.local with a new random NEXTAUTH_SECRET.");
}

const SOURCE_DIRS = ["app", "components", "lib", "content", "models", "public"];
const SOURCE_FILES = ["next.config.ts", "tailwind.config.ts", "mdx-components.tsx", "proxy.ts", "package-lock.json"];

function newestSourceChange(): number {
  let newest = 0;
  const visit = (p: string) => {
    const stat = fs.statSync(p);
    if (stat.isDirectory()) for (const entry of fs.readdirSync(p)) visit(path.join(p, entry));
    else newest = Math.max(newest, stat.mtimeMs);
  };
  for (const dir of SOURCE_DIRS) if (fs.existsSync(dir)) visit(dir);
  for (const file of SOURCE_FILES) if (fs.existsSync(file)) visit(file);
  return newest;
}

function buildIfNeeded() {
  const buildId = path.join(root, ".next", "BUILD_ID");
  if (fs.existsSync(buildId) && fs.statSync(buildId).mtimeMs > newestSourceChange()) {
    console.log("The production build is up to date.");
    return;
  }
  console.log("Building the app (about half a minute)…");
  const result = spawnSync(process.execPath, ["node_modules/next/dist/bin/next", "build"], { stdio: "inherit" });
  if (result.status !== 0) process.exit(result.status ?? 1);
}

async function waitFor(url: string, child: ChildProcess, name: string) {
  for (let i = 0; i < 150; i++) {
    if (child.exitCode !== null) throw new Error(`${name} stopped while starting (exit code ${child.exitCode}). Is its port already in use?`);
    try {
      if ((await fetch(url)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`${name} did not start within 30 seconds.`);
}

async function main() {
  ensureEnvFile();
  await import("./load-env");
  const { env } = await import("@/lib/env");
  const { prepareDatabase } = await import("@/lib/setup");
  const { DEMO_PASSWORD } = await import("@/seeders/demo");

  const { DATABASE_PATH, BCRYPT_COST } = env();
  const { logins } = await prepareDatabase(DATABASE_PATH, { seed: true, bcryptCost: BCRYPT_COST });
  console.log(`Database ready: ${DATABASE_PATH} (migrated, demo data in place).`);
  buildIfNeeded();

  const port = process.env.PORT ?? "3000";
  const mailDir = path.join(path.dirname(path.resolve(DATABASE_PATH)), "mail");
  fs.mkdirSync(mailDir, { recursive: true });
  const mail = spawn(
    process.execPath,
    ["node_modules/maildev/dist/bin/maildev.js", "--ip", "127.0.0.1", "--web-ip", "127.0.0.1", "-s", "1025", "-w", "1080", "--mail-directory", mailDir, "--silent"],
    { stdio: ["ignore", "ignore", "inherit"] },
  );
  const app = spawn(process.execPath, ["node_modules/next/dist/bin/next", "start", "-p", port], { stdio: ["ignore", "inherit", "inherit"] });

  let stopping = false;
  const stop = (code = 0) => {
    if (stopping) return;
    stopping = true;
    for (const child of [app, mail]) if (child.exitCode === null) child.kill("SIGTERM");
    process.exit(code);
  };
  process.on("SIGINT", () => stop());
  process.on("SIGTERM", () => stop());
  app.on("exit", (code) => stop(code ?? 0));

  try {
    await Promise.all([waitFor(`http://127.0.0.1:${port}/api/health`, app, "The app"), waitFor("http://127.0.0.1:1080/api/healthz", mail, "The mail catcher")]);
  } catch (error) {
    console.error(error instanceof Error ? error.message : error);
    stop(1);
  }

  const width = Math.max(...logins.map((l) => l.email.length));
  console.log(`
Sixteenths is running.
  App:           http://localhost:${port}
  Caught e-mail: http://127.0.0.1:1080   (SMTP on 127.0.0.1:1025)

Demo logins — every account's password is: ${DEMO_PASSWORD}
${logins.map((l) => `  ${l.email.padEnd(width)}  ${l.note}`).join("\n")}

Press Ctrl-C to stop.`);
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
