import { startApp } from "../support/app-server";
import { startMailCatcher } from "../support/mail-catcher";

export default async function globalSetup() {
  const mail = await startMailCatcher();
  // A failed start must not leave the catcher running: there would be no teardown to stop it.
  const app = await startApp({ seed: true, env: { SMTP_URL: mail.smtpUrl } }).catch(async (error: unknown) => {
    await mail.stop();
    throw error;
  });
  process.env.E2E_BASE_URL = app.url;
  // Tests read what the app sent (invitations, resets) from maildev's HTTP API.
  process.env.E2E_MAIL_URL = mail.apiUrl;
  // Tests that must know a problem's answers pin its seed in this file.
  process.env.E2E_DATABASE_PATH = app.databasePath;
  return async () => {
    await app.stop();
    await mail.stop();
  };
}
