import crypto from "node:crypto";
import { readFile } from "node:fs/promises";
import bcrypt from "bcryptjs";
import Papa from "papaparse";
import { expect, test } from "@playwright/test";
import { openDatabase } from "@/lib/db";
import { generateTries, randomFrom } from "../support/gradebook-data";
import { expectSignedInAs, signIn } from "./helpers";

// The gradebook in Chromium: the instructor sorts and filters, opens one student's work from
// the keyboard, changes the score with a reason, exports the CSV, and the student sees the
// change. Accounts, class and tries are made for this file alone.

const PASSWORD = "square-and-level-2727";
const DAY = 24 * 60 * 60 * 1000;
const run = crypto.randomBytes(3).toString("hex");
const teacher = { email: `e2e-grades-teacher-${run}@example.com`, name: "Ingrid Solberg" };
const learners = [
  { email: `e2e-grades-a-${run}@example.com`, name: "Abel Furniss" },
  { email: `e2e-grades-b-${run}@example.com`, name: "Beatriz Lomas" },
  { email: `e2e-grades-c-${run}@example.com`, name: "Cyrus Ndlovu" },
];
const ids = { classId: 0, deck: 0, trim: 0, students: [] as number[] };

test.beforeAll(async () => {
  const file = process.env.E2E_DATABASE_PATH!;
  const database = openDatabase(file);
  const { User, SchoolClass, Enrollment, Assignment, AssignmentItem } = database.models;
  const passwordHash = await bcrypt.hash(PASSWORD, 10);
  const instructor = await User.create({ ...teacher, role: "instructor", passwordHash });
  const shop = await SchoolClass.create({ name: `Framing Lab ${run}`, term: "Spring", joinCode: `GB${run}`.toUpperCase(), instructorId: instructor.id });
  for (const l of learners) {
    const user = await User.create({ ...l, role: "student", passwordHash });
    await Enrollment.create({ classId: shop.id, studentId: user.id, status: "active" });
    ids.students.push(user.id);
  }
  const now = Date.now();
  const deck = await Assignment.create({ classId: shop.id, title: "Deck joists", instructions: "Lay out the joists.", opensAt: new Date(now - 9 * DAY), dueAt: new Date(now - 2 * DAY), status: "published", publishedAt: new Date(now - 9 * DAY) });
  const deckItem = await AssignmentItem.create({ assignmentId: deck.id, position: 1, kind: "even-gap", level: 1, problemCount: 2, points: 5 });
  const trim = await Assignment.create({ classId: shop.id, title: "Wainscot battens", instructions: "Space the battens.", opensAt: new Date(now - DAY), dueAt: new Date(now + 6 * DAY), status: "published", publishedAt: new Date(now - DAY) });
  const trimItem = await AssignmentItem.create({ assignmentId: trim.id, position: 1, kind: "even-gap", level: 1, problemCount: 1, points: 10 });
  await database.sequelize.close();
  Object.assign(ids, { classId: shop.id, deck: deck.id, trim: trim.id });
  const random = randomFrom(11);
  // Abel and Beatriz work both; Cyrus never opens the deck joists, so it is missing for him.
  for (const [i, id] of ids.students.entries()) {
    const items = [{ itemId: trimItem.id, kind: "even-gap", level: 1 as const, problemCount: 1 }];
    if (i < 2) items.push({ itemId: deckItem.id, kind: "even-gap", level: 1 as const, problemCount: 2 });
    await generateTries(file, "e2e", id, items, { tries: 3, rightShare: i === 0 ? 0.9 : 0.4, startAt: new Date(now - 5 * DAY), random });
  }
});

test("the instructor sorts, filters, opens a student's work, changes a score and exports; the student sees the change", async ({ page, browser }) => {
  await signIn(page, teacher.email, PASSWORD);
  await expectSignedInAs(page, teacher.name);
  await page.goto(`/classes/${ids.classId}`);
  await page.getByRole("link", { name: "Gradebook" }).click();
  await expect(page.getByRole("heading", { name: "Gradebook", level: 1 })).toBeVisible();
  const grid = page.getByRole("grid");
  const names = () => grid.locator("tbody tr").evaluateAll((rows) => rows.map((r) => r.getAttribute("data-student")));
  await expect.poll(names).toEqual(["Abel Furniss", "Beatriz Lomas", "Cyrus Ndlovu"]);

  // Sorting: by name down, then by percent.
  await grid.locator('[data-sort="name"]').click();
  await grid.locator('[data-sort="name"]').click();
  await expect.poll(names).toEqual(["Cyrus Ndlovu", "Beatriz Lomas", "Abel Furniss"]);
  await expect(grid.locator('th[aria-sort="descending"]')).toHaveCount(1);
  // A number column sorts highest first, then lowest first.
  const percents = async () => (await grid.locator("[data-percent]").allTextContents()).map((p) => Number.parseFloat(p));
  await grid.locator('[data-sort="percent"]').click();
  await expect(grid.locator('th[aria-sort="descending"]')).toContainText("Percent");
  let values = await percents();
  expect([...values].sort((a, b) => b - a)).toEqual(values);
  await grid.locator('[data-sort="percent"]').click();
  await expect(grid.locator('th[aria-sort="ascending"]')).toContainText("Percent");
  values = await percents();
  expect([...values].sort((a, b) => a - b)).toEqual(values);
  expect(new Set(values).size).toBeGreaterThan(1);

  // Filters: missing work, then a name search.
  await page.getByLabel("Has missing work").check();
  await expect.poll(names).toEqual(["Cyrus Ndlovu"]);
  await expect(grid.locator('[data-flag="missing"]')).toHaveCount(1);
  await page.getByLabel("Has missing work").uncheck();
  await page.getByLabel("Find a student").fill("beat");
  await expect.poll(names).toEqual(["Beatriz Lomas"]);
  await page.getByLabel("Total below (%)").fill("101");
  await expect(page.getByText("Enter a percent from 0 to 100.")).toBeVisible();
  await page.getByLabel("Total below (%)").fill("");
  await page.getByLabel("Find a student").fill("");
  await grid.locator('[data-sort="name"]').click();
  await expect.poll(names).toEqual(["Abel Furniss", "Beatriz Lomas", "Cyrus Ndlovu"]);

  // Keyboard: focus Beatriz's first score, move right and back, Enter opens her deck joists.
  const first = grid.getByRole("button", { name: /^Beatriz Lomas, Deck joists/ });
  await first.focus();
  await page.keyboard.press("ArrowRight");
  await expect(grid.getByRole("button", { name: /^Beatriz Lomas, Wainscot battens/ })).toBeFocused();
  await page.keyboard.press("ArrowLeft");
  await expect(first).toBeFocused();
  await page.keyboard.press("Enter");
  const panel = page.locator("dialog[data-drill-down]");
  await expect(panel.getByRole("heading", { name: "Beatriz Lomas — Deck joists" })).toBeVisible();
  await expect(panel.locator("article[data-problem]")).toHaveCount(2);
  await expect(panel.locator("[data-try-times]").first()).toContainText("try 1");

  // The override: a reason is required, then confirmed.
  await panel.getByLabel("Points (0 to 10)").fill("8.5");
  await panel.getByRole("button", { name: "Review the change" }).click();
  await expect(panel.getByText("Say why the score is changed")).toBeVisible();
  await panel.getByLabel("Reason (the student reads this)").fill("Joist marks checked on the rim board, all within 1/16 in.");
  await panel.getByRole("button", { name: "Review the change" }).click();
  await page.getByRole("button", { name: "Change and e-mail" }).click();
  await expect(panel.getByText(/Saved\. Beatriz Lomas has been e-mailed/)).toBeVisible();
  await expect(panel.locator("[data-history] li")).toHaveCount(1);
  await expect(panel.locator("[data-cell-score]")).toHaveText("8.5 / 10");
  await panel.getByRole("button", { name: "Close" }).click();
  const cell = grid.getByRole("button", { name: /^Beatriz Lomas, Deck joists: 8\.5 of 10 points/ });
  await expect(cell.locator('[data-flag="overridden"]')).toBeVisible();

  // Export: the downloaded file is the gradebook, with the changed score.
  const [download] = await Promise.all([page.waitForEvent("download"), page.getByRole("link", { name: "Export CSV" }).click()]);
  expect(download.suggestedFilename()).toMatch(/^framing-lab-.+-gradebook\.csv$/);
  const text = await readFile((await download.path())!, "utf8");
  expect(text.charCodeAt(0)).toBe(0xfeff);
  const rows = Papa.parse<Record<string, string>>(text.slice(1), { header: true, skipEmptyLines: true }).data;
  expect(rows.map((r) => r.Student)).toEqual(["Abel Furniss", "Beatriz Lomas", "Cyrus Ndlovu"]);
  expect(rows[1]["Deck joists (10 pts)"]).toBe("8.5");
  expect(rows[2]["Deck joists (10 pts)"]).toBe("MISSING");

  // The student sees the changed score and the reason.
  const context = await browser.newContext();
  const student = await context.newPage();
  await signIn(student, learners[1].email, PASSWORD);
  await expectSignedInAs(student, learners[1].name);
  await student.goto(`/my-classes/${ids.classId}`);
  await expect(student.locator("[data-override]")).toContainText("Joist marks checked on the rim board");
  await student.goto(`/my-classes/${ids.classId}/assignments/${ids.deck}`);
  await expect(student.locator("[data-override]")).toContainText("Score changed by your instructor.");
  await expect(student.locator("[data-score]").first()).toContainText("8.5 / 10");
  await context.close();
});
