import { startApp } from "../support/app-server";

export default async function globalSetup() {
  const app = await startApp({ seed: true });
  process.env.E2E_BASE_URL = app.url;
  return async () => app.stop();
}
