import { expect, test } from "@playwright/test";
import { DEMO_INVITED, DEMO_STAFF, DEMO_STUDENTS } from "@/seeders/demo";
import { expectSignedInAs, signIn } from "./helpers";

const dana = DEMO_STAFF.find((s) => s.name === "Dana Whitlock")!;
const admin = DEMO_STAFF.find((s) => s.role === "admin")!;
const student = DEMO_STUDENTS[0];
const main = (page: import("@playwright/test").Page) => page.getByRole("navigation", { name: "Main" });

test("a student signs in and sees only the student's navigation", async ({ page }) => {
  await signIn(page, student.email);
  await expectSignedInAs(page, student.name);
  await expect(main(page).getByRole("link", { name: "My classes" })).toBeVisible();
  await expect(main(page).getByRole("link", { name: "Classes", exact: true })).toHaveCount(0);
  await main(page).getByRole("link", { name: "My classes" }).click();
  await expect(page.getByRole("heading", { name: "CARP 110 — Finish Carpentry I" })).toBeVisible();
});

test("a student who opens an instructor page gets a clear 403 page", async ({ page }) => {
  await signIn(page, student.email);
  await expectSignedInAs(page, student.name);
  const response = await page.goto("/classes");
  expect(response?.status()).toBe(403);
  await expect(page.getByRole("heading", { name: "This page is not open to your account." })).toBeVisible();
});

test("an instructor signs in, opens the class and searches the roster", async ({ page }) => {
  await signIn(page, dana.email);
  await expectSignedInAs(page, dana.name);
  await main(page).getByRole("link", { name: "Classes" }).click();
  await page.getByRole("link", { name: "CARP 110 — Finish Carpentry I" }).click();
  await expect(page.getByRole("table")).toContainText(student.name);
  await expect(page.getByRole("row")).toHaveCount(DEMO_STUDENTS.length + DEMO_INVITED.length + 1);
  await page.getByLabel("Search the roster by name or e-mail").fill("okafor");
  await page.getByRole("button", { name: "Search" }).click();
  await expect(page.getByText("No student matches “okafor”.")).toBeVisible();
  await page.getByLabel("Search the roster by name or e-mail").fill(DEMO_STUDENTS[3].name.split(" ")[1]);
  await page.getByRole("button", { name: "Search" }).click();
  await expect(page.getByRole("row")).toHaveCount(2);
});

test("an admin signs in and sees every class and the users list", async ({ page }) => {
  await signIn(page, admin.email);
  await expectSignedInAs(page, admin.name);
  await expect(main(page).getByRole("link", { name: "Users" })).toBeVisible();
  await main(page).getByRole("link", { name: "Users" }).click();
  await expect(page.getByRole("heading", { name: "Users" })).toBeVisible();
  await expect(page.getByRole("table")).toContainText(dana.email);
  await main(page).getByRole("link", { name: "Classes", exact: true }).click();
  await expect(page.getByRole("heading", { name: "Every class" })).toBeVisible();
});

test("a wrong password shows a readable message and stays on the sign-in page", async ({ page }) => {
  await signIn(page, dana.email, "definitely wrong");
  await expect(page.locator("#signin-error").getByRole("alert")).toHaveText("That e-mail and password do not match an account. Check both and try again.");
  await expect(page).toHaveURL(/\/signin/);
});

test("the sign-in form names empty fields before sending anything", async ({ page }) => {
  await page.goto("/signin");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByText("Enter your e-mail address.")).toBeVisible();
  await expect(page.getByText("Enter your password.")).toBeVisible();
});

test("a self-learner signs up, lands signed in, and can sign out", async ({ page }) => {
  await page.goto("/signup");
  await page.getByLabel("Your name").fill("Jordan Beck");
  await page.getByLabel("E-mail").fill("jordan.beck@example.com");
  await page.getByLabel("Password").fill("short");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("Use at least 10 characters for your password.")).toBeVisible();

  await page.getByLabel("Password").fill("square and plumb");
  await page.getByRole("button", { name: "Create account" }).click();
  await expectSignedInAs(page, "Jordan Beck");
  await page.goto("/my-classes");
  await expect(page.getByText("You are not in a class.")).toBeVisible();

  await page.getByLabel("Account menu for Jordan Beck").click();
  await page.getByRole("button", { name: "Sign out" }).click();
  await expect(page.getByRole("banner").getByRole("link", { name: "Sign in" })).toBeVisible();
  await expect(page.getByLabel("Account menu for Jordan Beck")).toHaveCount(0);
});

test("signing up with a taken e-mail says so beside the field", async ({ page }) => {
  await page.goto("/signup");
  await page.getByLabel("Your name").fill("Dana Copy");
  await page.getByLabel("E-mail").fill(dana.email);
  await page.getByLabel("Password").fill("square and plumb");
  await page.getByRole("button", { name: "Create account" }).click();
  await expect(page.getByText("An account with that e-mail already exists.")).toBeVisible();
});

test("an anonymous visitor to a protected page is sent to sign in and back", async ({ page }) => {
  await page.goto("/classes");
  await expect(page).toHaveURL(/\/signin\?callbackUrl=%2Fclasses/);
  await page.getByLabel("E-mail").fill(dana.email);
  await page.getByLabel("Password").fill("layout-1616");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page).toHaveURL(/\/classes$/);
  await expect(page.getByRole("heading", { name: "Classes you teach" })).toBeVisible();
});
