import { expect, type Page } from "@playwright/test";
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
