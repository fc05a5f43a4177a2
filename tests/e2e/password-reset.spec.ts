import { randomBytes } from "node:crypto";
import { expect, test } from "@playwright/test";
import { linkIn, waitForMail } from "../support/mail-catcher";
import { expectSignedInAs } from "./helpers";

const mailURL = process.env.E2E_MAIL_URL!;

test("a user who forgot the password gets a link by e-mail, sets a new one and signs in with it", async ({ page, baseURL }) => {
  const name = "Morgan Kerf";
  const email = `morgan.${randomBytes(4).toString("hex")}@example.com`;
  const signUp = await page.request.post("/api/signup", { data: { name, email, password: "old pencil line" }, headers: { "x-forwarded-for": "192.0.2.61" } });
  expect(signUp.status()).toBe(201);

  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(email);
  await page.getByRole("link", { name: "Forgot your password?" }).click();
  await expect(page.getByRole("heading", { name: "Forgot your password?" })).toBeVisible();
  // The address typed on the sign-in form comes along.
  await expect(page.getByLabel("E-mail")).toHaveValue(email);
  await page.getByRole("button", { name: "Send me a link" }).click();
  await expect(page.getByRole("status")).toContainText("If an account uses that address");

  const mail = await waitForMail(mailURL, email, /new Sixteenths password/);
  const link = linkIn(mail, `${baseURL}/reset-password/`);
  await page.goto(link);
  await expect(page.getByRole("heading", { name: "Choose a new password" })).toBeVisible();
  await expect(page.getByText(email)).toBeVisible();

  await page.getByLabel("New password").fill("fresh chalk line");
  await page.getByLabel("Type it again").fill("fresh chalk lime");
  await page.getByRole("button", { name: "Save the new password" }).click();
  await expect(page.getByText("The two passwords differ")).toBeVisible();
  await page.getByLabel("Type it again").fill("fresh chalk line");
  await page.getByRole("button", { name: "Save the new password" }).click();
  await expect(page.getByRole("status")).toContainText("Your password is changed");

  await page.getByRole("main").getByRole("link", { name: "Sign in", exact: true }).click();
  await expect(page.getByLabel("E-mail")).toHaveValue(email);
  await page.getByLabel("Password", { exact: true }).fill("fresh chalk line");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expectSignedInAs(page, name);

  // The link is spent.
  await page.goto(link);
  await expect(page.getByRole("heading", { name: "This link has already been used" })).toBeVisible();
});
