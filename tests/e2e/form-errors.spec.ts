import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import { expect, test, type Locator, type Page } from "@playwright/test";
import { openDatabase, type Database } from "@/lib/db";
import { linkIn, waitForMail } from "../support/mail-catcher";
import { expectSignedInAs, signIn } from "./helpers";

// For each form, the server refuses something the page's own checks let through; the refusal
// must appear beside the field it is about (aria-invalid, described by the message, focused)
// and nothing may be saved. Where the page's checks would stop the bad value first, the request
// is changed on its way out (page.route), which is what a stale page or a script would send.

const PASSWORD = "mitre-and-cope-4242";
const DAY = 24 * 60 * 60 * 1000;
const run = crypto.randomBytes(3).toString("hex");
const teacher = { email: `e2e-forms-teacher-${run}@example.com`, name: "Marta Kowalczyk" };
const colleague = { email: `e2e-forms-colleague-${run}@example.com`, name: "Jonah Reid" };
const learner = { email: `e2e-forms-student-${run}@example.com`, name: "Ada Mbeki" };
const ids = { classId: 0, draft: 0, published: 0, student: 0, joinCode: `FE${run}`.toUpperCase() };

async function withDb<T>(work: (db: Database) => Promise<T>): Promise<T> {
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  try {
    return await work(database);
  } finally {
    await database.sequelize.close();
  }
}

test.beforeAll(async () => {
  await withDb(async ({ models }) => {
    const passwordHash = await bcrypt.hash(PASSWORD, 10);
    const instructor = await models.User.create({ ...teacher, role: "instructor", passwordHash });
    await models.User.create({ ...colleague, role: "student", passwordHash });
    const student = await models.User.create({ ...learner, role: "student", passwordHash });
    const shop = await models.SchoolClass.create({ name: `Trim Shop ${run}`, term: "Spring", joinCode: ids.joinCode, instructorId: instructor.id });
    await models.Enrollment.create({ classId: shop.id, studentId: student.id, status: "active" });
    const now = Date.now();
    const base = { classId: shop.id, instructions: "Lay out the battens.", opensAt: new Date(now - DAY), dueAt: new Date(now + 6 * DAY) };
    const draft = await models.Assignment.create({ ...base, title: "Draft battens", status: "draft" });
    await models.AssignmentItem.create({ assignmentId: draft.id, position: 1, kind: "even-gap", level: 1, problemCount: 1, points: 5 });
    const published = await models.Assignment.create({ ...base, title: "Wainscot battens", status: "published", publishedAt: new Date(now - DAY) });
    await models.AssignmentItem.create({ assignmentId: published.id, position: 1, kind: "even-gap", level: 1, problemCount: 1, points: 10 });
    Object.assign(ids, { classId: shop.id, draft: draft.id, published: published.id, student: student.id });
  });
});

/** The refusal sits beside the field: marked invalid, read out with it, and the focus is there. */
async function expectBeside(field: Locator, message: RegExp, { focused = true } = {}) {
  await expect(field).toHaveAttribute("aria-invalid", "true");
  await expect(field).toHaveAccessibleDescription(message);
  if (focused) await expect(field).toBeFocused();
}

/** Changes the next JSON request to `url` on its way out, as a script or an old page would send it. */
async function rewriteNext(page: Page, url: string | RegExp, change: (body: Record<string, unknown>) => Record<string, unknown>) {
  await page.route(
    url,
    async (route) => {
      const body = (route.request().postDataJSON() ?? {}) as Record<string, unknown>;
      await route.continue({ postData: JSON.stringify(change(body)) });
    },
    { times: 1 },
  );
}

const count = (model: "User" | "SchoolClass" | "Invitation" | "SavedLayout" | "AssignmentExtension" | "ScoreOverride" | "ClassInstructor" | "Enrollment", where: Record<string, unknown> = {}) =>
  withDb(({ models }) => (models[model] as unknown as { count: (o: object) => Promise<number> }).count({ where }));

test("sign-up: an address already in use is refused beside the e-mail", async ({ page }) => {
  const before = await count("User");
  await page.goto("/signup");
  await page.getByLabel("Your name").fill("Someone Else");
  await page.getByLabel("E-mail").fill(learner.email);
  await page.getByLabel("Password").fill("a-long-enough-phrase");
  await page.getByRole("button", { name: "Create account" }).click();
  await expectBeside(page.getByLabel("E-mail"), /already exists/);
  expect(await count("User")).toBe(before);
});

test("forgot password: a malformed address that slips past the page is refused beside the e-mail", async ({ page }) => {
  await page.goto("/forgot-password");
  await page.getByLabel("E-mail").fill(learner.email);
  await rewriteNext(page, "**/api/password-reset", () => ({ email: "not an address" }));
  await page.getByRole("button", { name: "Send me a link" }).click();
  await expectBeside(page.getByLabel("E-mail"), /e-mail/i);
  await expect(page.getByText(/is on its way/)).toHaveCount(0);
});

test("instructor forms: class, co-instructor, invitations, roster file, builder, extension", async ({ page }) => {
  test.setTimeout(90_000);
  await signIn(page, teacher.email, PASSWORD);
  await expectSignedInAs(page, teacher.name);

  // New class: a name over the limit, sent by an old page.
  const classesBefore = await count("SchoolClass");
  await page.goto("/classes/new");
  await page.getByLabel("Class name").fill("CARP 150 — Stairs");
  await page.getByLabel("Term").fill("Fall 2027");
  await rewriteNext(page, "**/api/classes", (body) => ({ ...body, term: "x".repeat(61) }));
  await page.getByRole("button", { name: "Create class" }).click();
  await expectBeside(page.getByLabel("Term"), /under 60 characters/);
  expect(await count("SchoolClass")).toBe(classesBefore);

  // Co-instructor: the address belongs to a student, which only the server knows.
  await page.goto(`/classes/${ids.classId}/settings`);
  await page.getByLabel("Add a co-instructor by e-mail").fill(colleague.email);
  await page.getByRole("button", { name: "Add co-instructor" }).click();
  await expectBeside(page.getByLabel("Add a co-instructor by e-mail"), /No instructor account has that e-mail/);
  expect(await count("ClassInstructor", { classId: ids.classId })).toBe(0);

  // Invitations: the page takes any text; the server reads the list.
  await page.goto(`/classes/${ids.classId}/add-students`);
  const addresses = page.getByRole("textbox", { name: /addresses/i });
  await addresses.fill("wren@example.com, not-an-address");
  await page.getByRole("button", { name: "Send invitations" }).click();
  await expectBeside(addresses, /not-an-address/);
  expect(await count("Invitation", { classId: ids.classId })).toBe(0);

  // Roster file without an e-mail column: the verdict sits under the pasted rows.
  const pasted = page.getByLabel("Or paste the rows");
  await pasted.fill("Name,Phone\nWren Abernathy,555-0100\n");
  await page.getByRole("button", { name: "Check pasted rows" }).click();
  await expectBeside(pasted, /No e-mail column found/);
  expect(await count("Invitation", { classId: ids.classId })).toBe(0);

  // Builder: a title the page would stop, changed on the way out.
  await page.goto(`/classes/${ids.classId}/assignments/${ids.draft}/edit`);
  await expect(page.getByLabel("Title")).toHaveValue("Draft battens");
  await rewriteNext(page, `**/api/assignments/${ids.draft}`, (body) => ({ ...body, title: "" }));
  await page.getByRole("button", { name: "Save draft" }).click();
  await expectBeside(page.getByLabel("Title"), /title/i);
  expect(await withDb(async ({ models }) => (await models.Assignment.findByPk(ids.draft))!.title)).toBe("Draft battens");

  // Extension: neither a new date nor extra tries, sent by an old page.
  await page.goto(`/classes/${ids.classId}/assignments/${ids.published}`);
  const extension = page.getByRole("form", { name: "Grant or change an extension" });
  await extension.getByLabel("Student").selectOption({ label: learner.name });
  await extension.getByLabel("Extra tries per problem").fill("1");
  await rewriteNext(page, `**/api/assignments/${ids.published}/extensions`, (body) => ({ ...body, dueAt: null, extraAttempts: 0 }));
  await extension.getByRole("button", { name: "Save extension" }).click();
  await expectBeside(extension.getByLabel("New due date (optional)"), /new due date, extra tries, or both/);
  expect(await count("AssignmentExtension", { assignmentId: ids.published })).toBe(0);
});

test("student forms: join code, saved layout name, rename, practice answer", async ({ page }) => {
  test.setTimeout(90_000);
  await signIn(page, learner.email, PASSWORD);
  await expectSignedInAs(page, learner.name);

  // Join code: well formed, but no class has it.
  const enrolled = await count("Enrollment", { studentId: ids.student });
  await page.goto("/my-classes");
  await page.getByLabel("Join code").fill("ZZZZ9999");
  await page.getByRole("button", { name: "Join class" }).click();
  await expectBeside(page.getByLabel("Join code"), /code/i);
  expect(await count("Enrollment", { studentId: ids.student })).toBe(enrolled);

  // Save layout: an empty name is the server's to refuse.
  const layoutsBefore = await count("SavedLayout");
  await page.goto("/calculators/even-spacing?span=96&memberWidth=2+1%2F2&count=6");
  await page.getByRole("button", { name: "Save layout" }).click();
  const dialog = page.getByRole("dialog", { name: "Save this layout" });
  await dialog.getByRole("button", { name: "Save", exact: true }).click();
  await expectBeside(dialog.getByLabel("Name"), /name/i);
  expect(await count("SavedLayout")).toBe(layoutsBefore);
  await dialog.getByLabel("Name").fill("Hall battens");
  await dialog.getByRole("button", { name: "Save", exact: true }).click();
  await expect(page.getByText("Saved “Hall battens”.")).toBeVisible();

  // Rename: blanked, the refusal is beside the new-name box, not in a banner above the list.
  await page.goto("/layouts");
  await page.getByRole("button", { name: "Rename Hall battens" }).click();
  await page.getByLabel("New name").fill("   ");
  await page.getByRole("button", { name: "Save name" }).click();
  await expectBeside(page.getByLabel("New name"), /name/i);
  expect(await withDb(async ({ models }) => (await models.SavedLayout.findOne({ where: { name: "Hall battens" } })) !== null)).toBe(true);

  // Practice: an answer the grader cannot read is refused beside its box and not counted.
  const created = await page.request.post("/api/practice", { data: { kind: "even-gap", level: 1 } });
  expect(created.status()).toBe(201);
  const { problem } = (await created.json()) as { problem: { id: string; parts: { key: string; label: string }[] } };
  await page.goto(`/practice/${problem.id}`);
  const box = page.getByRole("textbox", { name: problem.parts[0].label });
  for (const part of problem.parts) await page.getByRole("textbox", { name: part.label }).fill("3 1/4");
  await box.fill("three and a bit");
  await page.getByRole("button", { name: "Check answers" }).click();
  await expectBeside(box, /.+/);
  const tries = await withDb(({ models }) => models.Attempt.count({ where: { problemId: problem.id } }));
  expect(tries).toBe(0);
});

test("gradebook override: a reason too short for the server is refused beside the reason", async ({ page }) => {
  await signIn(page, teacher.email, PASSWORD);
  await expectSignedInAs(page, teacher.name);
  await page.goto(`/classes/${ids.classId}/gradebook`);
  await page.getByRole("grid").getByRole("button", { name: new RegExp(`^${learner.name}, Wainscot battens`) }).click();
  const panel = page.locator("dialog[data-drill-down]");
  await panel.getByLabel("Points (0 to 10)").fill("7");
  await panel.getByLabel("Reason (the student reads this)").fill("Marks checked on the wall.");
  await panel.getByRole("button", { name: "Review the change" }).click();
  await rewriteNext(page, /\/override$/, (body) => ({ ...body, reason: "ok" }));
  await page.getByRole("button", { name: "Change and e-mail" }).click();
  await expectBeside(panel.getByLabel("Reason (the student reads this)"), /Say why the score is changed/);
  expect(await count("ScoreOverride", { assignmentId: ids.published })).toBe(0);
});

test("password reset: a new password too short for the server is refused beside it", async ({ page, baseURL }) => {
  await page.goto("/forgot-password");
  await page.getByLabel("E-mail").fill(learner.email);
  await page.getByRole("button", { name: "Send me a link" }).click();
  await expect(page.getByText(/is on its way/)).toBeVisible();
  const mail = await waitForMail(process.env.E2E_MAIL_URL!, learner.email, /new Sixteenths password/);
  await page.goto(linkIn(mail, `${baseURL}/reset-password/`));
  await page.getByLabel("New password").fill("a-fresh-long-phrase");
  await page.getByLabel("Type it again").fill("a-fresh-long-phrase");
  await rewriteNext(page, "**/api/password-reset/confirm", (body) => ({ ...body, password: "short" }));
  await page.getByRole("button", { name: "Save the new password" }).click();
  await expectBeside(page.getByLabel("New password"), /10 characters/);
  // The old password still works: nothing was changed.
  await signIn(page, learner.email, PASSWORD);
  await expectSignedInAs(page, learner.name);
  await expect(page).not.toHaveURL(/signin/);
});

test("invitation: a newcomer's password too short for the server is refused beside it, and no account is made", async ({ page, browser, baseURL }) => {
  const newcomer = `e2e-forms-newcomer-${run}@example.com`;
  await signIn(page, teacher.email, PASSWORD);
  await expectSignedInAs(page, teacher.name);
  const invited = await page.request.post(`/api/classes/${ids.classId}/invitations`, { data: { addresses: newcomer } });
  expect(invited.status()).toBe(201);
  const mail = await waitForMail(process.env.E2E_MAIL_URL!, newcomer, /added you to/);

  const visitor = await (await browser.newContext()).newPage();
  await visitor.goto(linkIn(mail, `${baseURL}/invite/`));
  await visitor.getByLabel("Your name").fill("Noor Haddad");
  await visitor.getByLabel("Password").fill("a-long-enough-phrase");
  await rewriteNext(visitor, /\/api\/invitations\/[^/]+\/accept$/, (body) => ({ ...body, password: "short" }));
  await visitor.getByRole("button", { name: "Create account and join" }).click();
  await expectBeside(visitor.getByLabel("Password"), /10 characters/);
  expect(await count("User", { email: newcomer })).toBe(0);
  await visitor.context().close();
});
