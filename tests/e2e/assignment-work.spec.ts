import { expect, test } from "@playwright/test";
import { QueryTypes } from "sequelize";
import { findKind, type Level } from "@/lib/problems";
import { answersFor, createAssignment, createClass, createPerson, FIXTURE_PASSWORD, withDatabase } from "../support/assignment-fixtures";
import { expectSignedInAs, fillAnswers, signIn } from "./helpers";

const file = process.env.E2E_DATABASE_PATH!;
const KIND = findKind("even-gap")!;
const LEVEL: Level = 1;

type Setup = { classId: number; assignmentId: number; title: string; student: { email: string; name: string }; instructor: { email: string; name: string } };
let setup: Setup;

/** The answers of the student's stored variants, read from the seeds the server chose. */
async function variantsOf(studentEmail: string, assignmentId: number) {
  const rows = await withDatabase(file, (db) =>
    db.sequelize.query<{ seed: number }>(
      `SELECT p.seed FROM practice_problems p JOIN users u ON u.id = p.user_id JOIN assignment_items i ON i.id = p.assignment_item_id
       WHERE u.email = ? AND i.assignment_id = ? ORDER BY i.position, p.variant`,
      { replacements: [studentEmail, assignmentId], type: QueryTypes.SELECT },
    ),
  );
  return rows.map(({ seed }) => answersFor(KIND.key, seed, LEVEL, { count: 3, length: 7 }));
}

test.describe.serial("doing an assignment", () => {
  test.beforeAll(async () => {
    const instructor = await createPerson(file, "Ilse Framer", "instructor");
    const student = await createPerson(file, "Rafael Chalkline");
    const classId = await createClass(file, instructor.id, [student.id], "CARP 130 — Decks and Rails");
    const title = "Picket layout, week 3";
    const { id } = await createAssignment(file, classId, { title, attemptsAllowed: 3, instructions: "Lay out the **pickets** on paper first." }, [{ kind: KIND.key, level: LEVEL, problemCount: 2, points: 4 }]);
    setup = { classId, assignmentId: id, title, student, instructor };
  });

  test("a student answers wrong, then right, and sees tries left, the worked solution and the score", async ({ page }) => {
    await signIn(page, setup.student.email, FIXTURE_PASSWORD);
    await expectSignedInAs(page, setup.student.name);
    await page.goto(`/my-classes/${setup.classId}`);
    const row = page.locator(`[data-assignment="${setup.assignmentId}"]`);
    await expect(row.locator("[data-status]")).toHaveText(/Not started/);
    await row.getByRole("link", { name: setup.title }).click();

    await expect(page.getByRole("heading", { level: 1, name: setup.title })).toBeVisible();
    await expect(page.locator("strong", { hasText: "pickets" })).toBeVisible();
    const problems = page.getByRole("article");
    await expect(problems).toHaveCount(2);
    await expect(page.locator("[data-finished]")).toHaveText("0 of 2");

    const [first] = await variantsOf(setup.student.email, setup.assignmentId);
    const problem = problems.first();
    await fillAnswers(problem, first.parts, first.wrong);
    await problem.getByRole("textbox", { name: first.parts[0].label }).press("Enter");
    await expect(problem.locator("[data-verdict]").first()).toHaveAttribute("data-verdict", /incorrect|imprecise/);
    await expect(problem.getByText("2 tries left.")).toBeVisible();
    await expect(problem.locator("[data-solution]")).toHaveCount(0);
    await expect(problem.locator("[data-try]")).toHaveCount(1);

    await fillAnswers(problem, first.parts, first.right);
    await problem.getByRole("button", { name: "Check answers" }).click();
    const solution = problem.locator("[data-solution]");
    await expect(solution).toContainText("Solved");
    await expect(solution.locator(".katex").first()).toBeVisible();
    await expect(problem.locator("[data-points]")).toContainText("4 of 4 points");
    await expect(page.locator("[data-finished]")).toHaveText("1 of 2");
    await expect(page.locator("[data-score]")).toContainText("4 / 8");
    await expect(page.locator("[data-progress] [data-status]")).toHaveText(/In progress/);

    // The work is kept: a reload shows the same problem solved with both tries.
    await page.reload();
    await expect(page.getByRole("article").first().locator("[data-try]")).toHaveCount(2);
    await expect(page.getByRole("article").first()).toHaveAttribute("data-status", "solved");
  });

  test("the instructor sees the score in the list and the student's answers", async ({ page }) => {
    await signIn(page, setup.instructor.email, FIXTURE_PASSWORD);
    await expectSignedInAs(page, setup.instructor.name);
    await page.goto(`/classes/${setup.classId}/assignments/${setup.assignmentId}/students`);
    const row = page.getByRole("row", { name: new RegExp(setup.student.name) });
    await expect(row.locator("[data-score]")).toHaveText("4 / 8");
    await expect(row.locator("td [data-status]")).toHaveText(/In progress/);
    await page.getByLabel("Search students by name or e-mail").fill("nobody-by-this-name");
    await page.getByRole("button", { name: "Search" }).click();
    await expect(page.getByText("No student matches")).toBeVisible();
    await page.getByRole("link", { name: "Show everyone" }).click();
    await page.getByRole("link", { name: setup.student.name }).click();
    await expect(page.getByRole("heading", { level: 1, name: setup.student.name })).toBeVisible();
    const reviewed = page.getByRole("article").first();
    await expect(reviewed.locator("[data-try]")).toHaveCount(2);
    await expect(reviewed.locator("[data-points]")).toHaveText("4 / 4");
    await expect(reviewed.locator("[data-expected]")).toHaveCount(4);
  });
});
