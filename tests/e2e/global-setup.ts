import { startApp } from "../support/app-server";

export default async function globalSetup() {
  const app = await startApp({ seed: true });
  process.env.E2E_BASE_URL = app.url;
  // Tests that must know a problem's answers pin its seed in this file.
  process.env.E2E_DATABASE_PATH = app.databasePath;
  return async () => app.stop();
}
