import { expect, type Locator, type Page } from "@playwright/test";
import { DEMO_PASSWORD } from "@/seeders/demo";

export async function signIn(page: Page, email: string, password = DEMO_PASSWORD) {
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill(password);
  await page.getByRole("button", { name: "Sign in" }).click();
}

export async function expectSignedInAs(page: Page, name: string) {
  await expect(page.getByLabel(`Account menu for ${name}`)).toBeVisible();
}

/** Types each part's answer into its labelled box within one problem. */
export async function fillAnswers(problem: Locator, parts: { key: string; label: string }[], answers: Record<string, string>) {
  for (const part of parts) await problem.getByRole("textbox", { name: part.label }).fill(answers[part.key]);
}

/**
 * Holds every script of the page back until the returned function lets them through, so a test
 * can work on the server's HTML as a visitor on a slow phone does before the page hydrates.
 */
export async function holdScripts(page: Page): Promise<() => void> {
  let release!: () => void;
  const gate = new Promise<void>((resolve) => (release = resolve));
  await page.route(/\/_next\/static\/chunks\/.*\.js$/, async (route) => {
    await gate;
    await route.continue();
  });
  return release;
}
