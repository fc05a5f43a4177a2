import crypto from "node:crypto";
import { expect, test } from "@playwright/test";
import { createClass, createPerson, FIXTURE_PASSWORD, withDatabase } from "../support/assignment-fixtures";
import { expectSignedInAs, signIn } from "./helpers";

const file = process.env.E2E_DATABASE_PATH!;
const sqlTime = (d: Date) => d.toISOString().replace("T", " ").replace("Z", " +00:00");

type Person = { id: number; email: string; name: string };
let instructor: Person;
let student: Person;
let classmate: Person;
let classId: number;

/** Finished practice problems with one named slip each, written as the grader would have stored them. */
async function slips(person: Person, pattern: string, count: number) {
  await withDatabase(file, async (db) => {
    for (let i = 0; i < count; i++) {
      const id = crypto.randomUUID();
      const at = sqlTime(new Date(Date.now() - i * 3600 * 1000));
      await db.sequelize.query(
        `INSERT INTO practice_problems (id, user_id, kind, level, seed, attempts_allowed, attempts_used, status, finished_at, part_count, created_at, updated_at)
         VALUES (?, ?, 'even-gap', 1, ?, 3, 1, 'failed', ?, 1, ?, ?)`,
        { replacements: [id, person.id, 500 + i, at, at, at] },
      );
      await db.sequelize.query(
        `INSERT INTO attempts (problem_id, user_id, kind, level, seed, submission, part, raw, value, expected, verdict, pattern, created_at)
         VALUES (?, ?, 'even-gap', 1, ?, 1, 'gap', '2', '2', '3', 'incorrect', ?, ?)`,
        { replacements: [id, person.id, 500 + i, pattern, at] },
      );
    }
  });
}

test.describe.serial("progress pages", () => {
  test.beforeAll(async () => {
    instructor = await createPerson(file, "Oskar Lindqvist", "instructor");
    student = await createPerson(file, "Rosa Kettering");
    classmate = await createPerson(file, "Tomas Abernethy");
    classId = await createClass(file, instructor.id, [student.id, classmate.id]);
    await slips(student, "divided-by-members", 3);
    await slips(classmate, "divided-by-members", 2);
    await slips(classmate, "forgot-member-width", 1);
  });

  test("an instructor sees the class's charts and the top slip in the table", async ({ page }) => {
    await signIn(page, instructor.email, FIXTURE_PASSWORD);
    await expectSignedInAs(page, instructor.name);
    await page.goto(`/classes/${classId}`);
    await page.getByRole("link", { name: "Progress", exact: true }).click();
    await expect(page.getByRole("heading", { level: 1, name: "Class progress" })).toBeVisible();

    const slipPanel = page.locator('[data-chart="slips"]');
    await expect(slipPanel.getByRole("heading", { name: "Slips to re-teach" })).toBeVisible();
    await expect(slipPanel.locator("[data-summary]")).toHaveText("Most common slip: divided by members, 5 times by 2 students. Next: forgot member width, 1 time.");
    // The drawing arrives in the browser after the server-rendered shell.
    await expect(slipPanel.locator(".recharts-bar-rectangle").first()).toBeVisible();
    await expect(page.locator('[data-chart="activity"] .recharts-bar-rectangle').first()).toBeVisible();

    await slipPanel.getByText("Show as a table").click();
    const firstRow = slipPanel.locator("details table tbody tr").first();
    await expect(firstRow.getByRole("rowheader")).toHaveText("Divided by members");
    await expect(firstRow).toContainText("Rosa Kettering (3)");
    await expect(firstRow).toContainText("Tomas Abernethy (2)");
    await expect(firstRow.getByRole("link", { name: "Lesson section" })).toHaveAttribute("href", "/lessons/even-spacing#count-the-spaces-not-the-members");
  });

  test("a student sees only their own slips and follows one to its lesson section", async ({ page }) => {
    await signIn(page, student.email, FIXTURE_PASSWORD);
    await expectSignedInAs(page, student.name);
    await page.getByRole("link", { name: "My progress" }).first().click();
    await expect(page.getByRole("heading", { level: 1, name: "My progress" })).toBeVisible();
    await expect(page.locator("[data-slip]")).toHaveCount(1);
    await expect(page.locator('[data-slip="divided-by-members"]')).toContainText("× 3");
    await expect(page.getByText("Tomas Abernethy")).toHaveCount(0);

    await page.getByRole("link", { name: "Read the lesson on divided by members" }).click();
    await expect(page).toHaveURL(/\/lessons\/even-spacing#count-the-spaces-not-the-members$/);
    await expect(page.getByRole("heading", { name: /count the spaces, not the members/i })).toBeVisible();
  });

  test("students cannot open the class's progress", async ({ page }) => {
    await signIn(page, student.email, FIXTURE_PASSWORD);
    await expectSignedInAs(page, student.name);
    const response = await page.goto(`/classes/${classId}/progress`);
    expect(response?.status()).toBe(403);
  });
});
