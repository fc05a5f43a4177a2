import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import { expect, test } from "@playwright/test";
import { openDatabase } from "@/lib/db";
import { linkIn, waitForMail } from "../support/mail-catcher";
import { signIn } from "./helpers";

const PASSWORD = "square and plumb";
const tag = crypto.randomBytes(3).toString("hex");

/** Instructors are made by an admin, not by sign-up, so the test writes one into the app's database. */
async function makeInstructor(): Promise<{ email: string; name: string }> {
  const person = { email: `e2e.lead.${tag}@example.com`, name: "Hollis Fairbanks" };
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  await database.models.User.create({ ...person, role: "instructor", passwordHash: await bcrypt.hash(PASSWORD, 10) });
  await database.sequelize.close();
  return person;
}

test("an instructor imports a roster, a student accepts the e-mailed invitation, and the roster shows them active", async ({ page, browser, baseURL }) => {
  test.setTimeout(90_000);
  const lead = await makeInstructor();
  const className = `CARP 140 — Trim and Casing ${tag}`;
  const students = [
    { name: "Wren Abernathy", email: `wren.${tag}@example.com` },
    { name: "Yusuf Okonkwo", email: `yusuf.${tag}@example.com` },
    { name: "Zoe Park", email: `zoe.${tag}@example.com` },
  ];

  await signIn(page, lead.email, PASSWORD);
  await page.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Classes" }).click();
  await page.getByRole("link", { name: "New class" }).click();
  await page.getByLabel("Class name").fill(className);
  await page.getByLabel("Term").fill("Fall 2027");
  await page.getByLabel("Section code (optional)").fill("C");
  await page.getByRole("button", { name: "Create class" }).click();
  await expect(page.getByRole("heading", { name: "Import a roster file" })).toBeVisible();

  const csv = ["Student Name,Email Address", ...students.map((s) => `${s.name},${s.email}`), "Misspelled Row,zoe-at-example.com"].join("\n");
  await page.getByLabel("Roster file (.csv)").setInputFiles({ name: "roster.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  const preview = page.getByRole("table");
  await expect(preview).toContainText("Wren Abernathy");
  await expect(preview.getByRole("row").filter({ hasText: "Misspelled Row" })).toContainText("“zoe-at-example.com” is not an e-mail address.");
  await expect(preview.getByText("Will invite").filter({ visible: true })).toHaveCount(3);
  await expect(preview.getByText("Error", { exact: true }).filter({ visible: true })).toHaveCount(1);

  await page.getByRole("button", { name: "Send 3 invitations" }).click();
  await expect(page.getByTestId("send-progress")).toHaveText("3 of 3 e-mails sent — done.", { timeout: 20_000 });

  const mail = await waitForMail(process.env.E2E_MAIL_URL!, students[0].email, new RegExp(`added you to ${className}`));
  const link = linkIn(mail, `${baseURL}/invite/`);

  const studentContext = await browser.newContext();
  const studentPage = await studentContext.newPage();
  await studentPage.goto(link);
  await expect(studentPage.getByRole("heading", { name: className })).toBeVisible();
  await expect(studentPage.getByLabel("Your name")).toHaveValue("Wren Abernathy");
  await studentPage.getByLabel("Your name").fill("Wren A. Abernathy");
  await studentPage.getByLabel("Password").fill(PASSWORD);
  await studentPage.getByRole("button", { name: "Create account and join" }).click();
  await expect(studentPage).toHaveURL(/\/my-classes$/);
  await expect(studentPage.getByRole("heading", { name: className })).toBeVisible();
  await expect(studentPage.getByLabel("Account menu for Wren A. Abernathy")).toBeVisible();
  await studentContext.close();

  await page.getByRole("link", { name: "Roster" }).click();
  const row = page.getByRole("row").filter({ hasText: "Wren A. Abernathy" });
  await expect(row).toContainText("active");
  await expect(page.getByRole("row").filter({ hasText: students[1].email })).toContainText("invited");
});

test("a student removed with confirmation shows as removed and can be added back", async ({ page }) => {
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  const hash = await bcrypt.hash(PASSWORD, 10);
  const lead = await database.models.User.create({ email: `e2e.remover.${tag}@example.com`, name: "Ada Remover", role: "instructor", passwordHash: hash });
  const student = await database.models.User.create({ email: `e2e.student.${tag}@example.com`, name: "Bea Student", role: "student", passwordHash: hash });
  const klass = await database.models.SchoolClass.create({ name: `CARP 150 ${tag}`, term: "Fall 2027", joinCode: `E2E${tag}`.toUpperCase().slice(0, 12), instructorId: lead.id });
  await database.models.Enrollment.create({ classId: klass.id, studentId: student.id, status: "active" });
  await database.sequelize.close();

  await signIn(page, lead.email, PASSWORD);
  await expect(page.getByLabel("Account menu for Ada Remover")).toBeVisible();
  await page.goto(`/classes/${klass.id}`);
  await page.getByRole("button", { name: "Remove Bea Student from the class" }).click();
  const dialog = page.getByRole("dialog", { name: "Remove Bea Student from the class?" });
  await expect(dialog).toContainText("Their answers, scores and shop photos are kept");
  await dialog.getByRole("button", { name: "Cancel" }).click();
  await expect(page.getByRole("row").filter({ hasText: "Bea Student" })).toContainText("active");

  await page.getByRole("button", { name: "Remove Bea Student from the class" }).click();
  await dialog.getByRole("button", { name: "Remove student" }).click();
  await expect(page.getByRole("row").filter({ hasText: "Bea Student" })).toContainText("removed");
  await page.getByRole("button", { name: "Add Bea Student back to the class" }).click();
  await expect(page.getByRole("row").filter({ hasText: "Bea Student" })).toContainText("active");
});
