import crypto from "node:crypto";
import { expect, test } from "@playwright/test";
import bcrypt from "bcryptjs";
import { openDatabase } from "@/lib/db";
import { DEMO_STAFF } from "@/seeders/demo";
import { waitForMail } from "../support/mail-catcher";
import { signIn } from "./helpers";

const dana = DEMO_STAFF[0];

/** A class of Dana's own for this test, with one active student, written straight into the app's database. */
async function freshClass() {
  const run = crypto.randomBytes(3).toString("hex");
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  try {
    const lead = await database.models.User.findOne({ where: { email: dana.email } });
    const klass = await database.models.SchoolClass.create({ name: `CARP 130 — Trim Layout ${run}`, term: "Summer 2027", joinCode: `B${run.toUpperCase()}`, instructorId: lead!.id });
    const student = await database.models.User.create({ name: "Tomasz Weller", email: `builder-e2e-${run}@shop.example`, role: "student", passwordHash: await bcrypt.hash(crypto.randomUUID(), 10) });
    await database.models.Enrollment.create({ classId: klass.id, studentId: student.id, status: "active" });
    return { classId: klass.id, className: klass.name, studentEmail: student.email };
  } finally {
    await database.sequelize.close();
  }
}

test("an instructor builds an assignment with two items, previews a sample, saves a draft and publishes it", async ({ page }) => {
  const { classId, className, studentEmail } = await freshClass();
  await signIn(page, dana.email);
  await expect(page).not.toHaveURL(/signin/);

  await page.goto(`/classes/${classId}/assignments`);
  await expect(page.getByRole("heading", { name: "No assignments yet" })).toBeVisible();
  await page.getByRole("link", { name: "Build the first assignment" }).click();
  await expect(page.getByRole("heading", { name: "Build an assignment" })).toBeVisible();

  // Nothing typed yet: the title is refused beside its field and nothing is saved.
  await page.getByRole("button", { name: "Save draft" }).click();
  await expect(page.getByText("Give the assignment a title.")).toBeVisible();
  await expect(page.getByLabel("Title")).toHaveAttribute("aria-invalid", "true");
  await expect(page).toHaveURL(/\/assignments\/new$/);

  await page.getByLabel("Title").fill("Chair rail and battens");
  await page.getByLabel(/Instructions/).fill("Mark every batten from the **left end** of the wall.");
  await page.getByRole("button", { name: "Show how it reads" }).click();
  await expect(page.locator("[data-markdown-preview] strong")).toHaveText("left end");

  const first = page.locator('[data-item="0"]');
  await first.getByLabel("Problem kind").selectOption("even-gap");
  await first.getByLabel("Level and precision").selectOption("2");
  await expect(first.getByText(/answers to 1\/16"/)).toBeVisible();

  await page.getByRole("button", { name: "+ Add an item" }).click();
  const second = page.locator('[data-item="1"]');
  await second.getByLabel("Problem kind").selectOption("stair-risers");
  await second.getByLabel("Problems").fill("2");
  await second.getByLabel("Points each").fill("10");
  await second.getByLabel("Tolerance").selectOption("full");
  await expect(page.locator("[data-total-points]")).toHaveText("Total: 35 points");

  await first.getByRole("button", { name: "Preview a sample" }).click();
  const sample = page.locator("[data-sample-preview]");
  await expect(sample.getByRole("heading", { name: "The gap between evenly spaced members" })).toBeVisible();
  await expect(sample.locator('[data-expected="gap"]')).toContainText('"');
  const firstPrompt = await sample.locator(".card").first().innerText();
  await sample.getByRole("button", { name: "Show another sample" }).click();
  await expect(sample.getByText("sample 2")).toBeVisible();
  await expect.poll(() => sample.locator(".card").first().innerText()).not.toBe(firstPrompt);
  await sample.getByRole("button", { name: /Close/ }).click();
  await expect(sample).toBeHidden();

  await page.getByRole("button", { name: "Save draft" }).click();
  await expect(page.getByRole("heading", { name: "Chair rail and battens" })).toBeVisible();
  await expect(page.getByText("Saved.")).toBeVisible();
  await expect(page.locator("[data-status]").first()).toHaveText("Draft");
  await expect(page.locator("[data-items] tbody tr")).toHaveCount(2);

  await page.getByRole("button", { name: "Publish", exact: true }).click();
  const confirm = page.getByRole("dialog", { name: /Publish/ });
  await expect(confirm).toContainText(`1 student in ${className} will be e-mailed a link.`);
  await confirm.getByRole("button", { name: "Publish and e-mail" }).click();
  await expect(page.getByText("Published. 1 student e-mailed.")).toBeVisible();
  await expect(page.locator("[data-status]").first()).toHaveText("Published");

  await page.getByRole("link", { name: "Assignments", exact: true }).click();
  const row = page.locator("[data-assignments] tbody tr", { hasText: "Chair rail and battens" });
  await expect(row.getByText("Published")).toBeVisible();

  const mail = await waitForMail(process.env.E2E_MAIL_URL!, studentEmail, /Chair rail and battens/);
  expect(mail.text).toContain(`/my-classes/${classId}/assignments/`);
});
