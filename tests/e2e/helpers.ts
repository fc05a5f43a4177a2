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
