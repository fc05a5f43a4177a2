import type { TestProject } from "vitest/node";
import { startApp } from "../support/app-server";

declare module "vitest" {
  export interface ProvidedContext {
    baseURL: string;
    secret: string;
    databasePath: string;
  }
}

export default async function setup(project: TestProject) {
  const app = await startApp({ seed: true });
  project.provide("baseURL", app.url);
  project.provide("secret", app.secret);
  project.provide("databasePath", app.databasePath);
  return () => app.stop();
}
