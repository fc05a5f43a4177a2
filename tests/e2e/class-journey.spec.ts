import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import sharp from "sharp";
import { expect, test } from "@playwright/test";
import { QueryTypes } from "sequelize";
import { openDatabase } from "@/lib/db";
import { findKind } from "@/lib/problems";
import { linkIn, waitForMail } from "../support/mail-catcher";
import { answersFor, withDatabase } from "../support/assignment-fixtures";
import { expectSignedInAs, fillAnswers, signIn } from "./helpers";

// One class from start to finish, through the pages only: the instructor makes the class and imports
// a roster, the student joins from the e-mailed invitation, the instructor builds and publishes an
// assignment, the student works it (one wrong try, one right) and sends a shop photo, and the
// instructor sees the photo beside the score. Only the instructor's account is written directly:
// instructors are made by an admin, not by sign-up.

const file = process.env.E2E_DATABASE_PATH!;
const mailURL = process.env.E2E_MAIL_URL!;
const PASSWORD = "mark from one end";
const tag = crypto.randomBytes(3).toString("hex");
const lead = { name: "Odalys Ferreira", email: `journey.lead.${tag}@example.com` };
const student = { name: "Kofi Mensah", email: `journey.kofi.${tag}@example.com` };
const className = `CARP 160 — Wainscot ${tag}`;
const title = "Wainscot battens, week 1";
const KIND = findKind("even-gap")!;

/** The right and wrong answers of the student's one stored variant, from the seed the server chose. */
async function storedVariantAnswers(assignmentId: number) {
  const [{ seed, level }] = await withDatabase(file, (db) =>
    db.sequelize.query<{ seed: number; level: 1 | 2 | 3 }>(
      `SELECT p.seed, p.level FROM practice_problems p JOIN users u ON u.id = p.user_id JOIN assignment_items i ON i.id = p.assignment_item_id
       WHERE u.email = ? AND i.assignment_id = ?`,
      { replacements: [student.email, assignmentId], type: QueryTypes.SELECT },
    ),
  );
  return answersFor(KIND.key, seed, level, { count: 3, length: 7 });
}

test.beforeAll(async () => {
  const database = openDatabase(file);
  await database.models.User.create({ ...lead, role: "instructor", passwordHash: await bcrypt.hash(PASSWORD, 10) });
  await database.sequelize.close();
});

test("a class from roster import to a graded assignment with a shop photo", async ({ browser, baseURL }) => {
  test.setTimeout(150_000);
  const teacher = await browser.newPage();
  await signIn(teacher, lead.email, PASSWORD);
  await expectSignedInAs(teacher, lead.name);

  // The class and its roster.
  await teacher.getByRole("navigation", { name: "Main" }).getByRole("link", { name: "Classes" }).click();
  await teacher.getByRole("link", { name: "New class" }).click();
  await teacher.getByLabel("Class name").fill(className);
  await teacher.getByLabel("Term").fill("Fall 2027");
  await teacher.getByRole("button", { name: "Create class" }).click();
  const csv = `Name,E-mail\n${student.name},${student.email}\nLena Voss,journey.lena.${tag}@example.com\n`;
  await teacher.getByLabel("Roster file (.csv)").setInputFiles({ name: "roster.csv", mimeType: "text/csv", buffer: Buffer.from(csv) });
  await expect(teacher.getByRole("table")).toContainText(student.name);
  await teacher.getByRole("button", { name: "Send 2 invitations" }).click();
  await expect(teacher.getByTestId("send-progress")).toHaveText("2 of 2 e-mails sent — done.", { timeout: 20_000 });

  // The student joins from the e-mail.
  const invitation = await waitForMail(mailURL, student.email, new RegExp(`added you to ${className}`));
  const learnerContext = await browser.newContext();
  const learner = await learnerContext.newPage();
  await learner.goto(linkIn(invitation, `${baseURL}/invite/`));
  await expect(learner.getByLabel("Your name")).toHaveValue(student.name);
  await learner.getByLabel("Password").fill(PASSWORD);
  await learner.getByRole("button", { name: "Create account and join" }).click();
  // The invitation page names the class too: wait until the student has landed in My classes.
  await expect(learner).toHaveURL(/\/my-classes$/);
  await expect(learner.getByRole("heading", { name: className })).toBeVisible();

  // The instructor builds and publishes one problem of even spacing.
  await teacher.getByRole("link", { name: "Roster" }).click();
  await expect(teacher.getByRole("row").filter({ hasText: student.name })).toContainText("active");
  await teacher.getByRole("link", { name: "Assignments", exact: true }).click();
  await teacher.getByRole("link", { name: "Build the first assignment" }).click();
  await teacher.getByLabel("Title").fill(title);
  const item = teacher.locator('[data-item="0"]');
  await item.getByLabel("Problem kind").selectOption(KIND.key);
  await item.getByLabel("Level and precision").selectOption("1");
  await item.getByLabel("Problems").fill("1");
  await item.getByLabel("Points each").fill("4");
  await teacher.getByRole("button", { name: "Save draft" }).click();
  await expect(teacher.getByRole("heading", { name: title })).toBeVisible();
  await teacher.getByRole("button", { name: "Publish", exact: true }).click();
  await teacher.getByRole("dialog", { name: /Publish/ }).getByRole("button", { name: "Publish and e-mail" }).click();
  await expect(teacher.getByText("Published. 1 student e-mailed.")).toBeVisible();
  const assignmentId = Number(new URL(teacher.url()).pathname.split("/").pop());

  // The student works it from the published e-mail: one wrong try, then right.
  const published = await waitForMail(mailURL, student.email, new RegExp(title));
  await learner.goto(linkIn(published, `${baseURL}/my-classes/`));
  await expect(learner.getByRole("heading", { level: 1, name: title })).toBeVisible();
  const problem = learner.getByRole("article").first();
  await expect(problem).toBeVisible();
  const { parts, right, wrong } = await storedVariantAnswers(assignmentId);
  await fillAnswers(problem, parts, wrong);
  await problem.getByRole("button", { name: "Check answers" }).click();
  await expect(problem.locator('[data-verdict="incorrect"], [data-verdict="imprecise"]').first()).toBeVisible();
  await expect(problem.getByText("2 tries left.")).toBeVisible();
  await expect(problem.locator("[data-solution]")).toHaveCount(0);
  await fillAnswers(problem, parts, right);
  await problem.getByRole("button", { name: "Check answers" }).click();
  await expect(problem.locator("[data-solution]")).toContainText("Solved");
  await expect(learner.locator("[data-score]")).toContainText("4 / 4");

  // A shop photo of the marked layout, with its camera metadata.
  const photo = await sharp({ create: { width: 1200, height: 900, channels: 3, background: "#b9a27e" } }).withExif({ IFD0: { Artist: "phone-owner" } }).jpeg().toBuffer();
  const photos = learner.getByRole("region", { name: "Shop photos" });
  await photos.getByLabel("Choose photos").setInputFiles({ name: "marked-wall.jpg", mimeType: "image/jpeg", buffer: photo });
  await expect(photos.getByText("1 of 5 photos")).toBeVisible({ timeout: 15_000 });

  // The instructor sees the score and the photo.
  await teacher.getByRole("link", { name: /Student work/ }).click();
  const row = teacher.getByRole("row", { name: new RegExp(student.name) });
  await expect(row.locator("[data-score]")).toHaveText("4 / 4");
  await teacher.getByRole("link", { name: student.name }).click();
  await expect(teacher.locator("[data-score]").first()).toContainText("4 / 4");
  const thumb = teacher.getByRole("region", { name: "Shop photos" }).getByRole("img", { name: "Photo 1: marked-wall.jpg" });
  await thumb.scrollIntoViewIfNeeded();
  await expect.poll(() => thumb.evaluate((img: HTMLImageElement) => img.naturalWidth)).toBeGreaterThan(0);
  await expect(teacher.getByRole("article").first().locator("[data-try]")).toHaveCount(2);
  await learnerContext.close();
});
