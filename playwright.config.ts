import { defineConfig, devices } from "@playwright/test";

// Debian's Chromium, never a downloaded browser. These flags keep it off the network.
const chromium = {
  executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium",
  args: ["--headless", "--no-sandbox", "--disable-gpu", "--disable-quic", "--no-first-run", "--disable-background-networking", "--disable-component-update", "--disable-sync"],
};

export default defineConfig({
  testDir: "tests/e2e",
  globalSetup: "./tests/e2e/global-setup.ts",
  fullyParallel: false,
  workers: 1,
  retries: 0,
  timeout: 30_000,
  reporter: [["list"]],
  use: {
    // Set by the global setup, which starts the built app on a free port; workers inherit it.
    baseURL: process.env.E2E_BASE_URL,
    trace: "retain-on-failure",
    launchOptions: chromium,
  },
  projects: [
    { name: "desktop", use: { ...devices["Desktop Chrome"], viewport: { width: 1280, height: 800 }, launchOptions: chromium }, testIgnore: /-phone\.spec\.ts/ },
    { name: "phone", use: { viewport: { width: 360, height: 740 }, isMobile: true, hasTouch: true, launchOptions: chromium }, testMatch: /(shell|lessons-phone)\.spec\.ts/ },
  ],
});
