import type { TestProject } from "vitest/node";
import { startApp } from "../support/app-server";
import { startMailCatcher } from "../support/mail-catcher";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    secret: string;
    databasePath: string;
    /** maildev's HTTP API: what the app has sent in this run. */
    mailURL: string;
  }
}

export default async function setup(project: TestProject) {
  const mail = await startMailCatcher();
  // A failed start must not leave the catcher running: there would be no teardown to stop it.
  const app = await startApp({ seed: true, env: { SMTP_URL: mail.smtpUrl } }).catch(async (error: unknown) => {
    await mail.stop();
    throw error;
  });
  project.provide("baseURL", app.url);
  project.provide("mailURL", mail.apiUrl);
  project.provide("secret", app.secret);
  project.provide("databasePath", app.databasePath);
  return async () => {
    await app.stop();
    await mail.stop();
  };
}
