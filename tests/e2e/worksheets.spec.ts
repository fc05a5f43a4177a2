import { expect, test, type Page } from "@playwright/test";
import { createAssignment, createClass, createPerson, FIXTURE_PASSWORD } from "../support/assignment-fixtures";
import { signIn } from "./helpers";

// Printed worksheets in Chromium: a class of three, an assignment of two problems. The layout
// promise the print rules keep, asserted exactly: each student's worksheet is one letter page, and
// the answer key gives each student one page of their own after all the worksheets — so the whole
// set is 2 × students pages, the sheets alone 1 × students, one student's key alone one page.

const STUDENTS = 3;
const ids = { classId: 0, assignmentId: 0, studentIds: [] as number[] };
let instructorEmail = "";

test.beforeAll(async () => {
  const file = process.env.E2E_DATABASE_PATH!;
  const instructor = await createPerson(file, "Wren Holloway", "instructor");
  instructorEmail = instructor.email;
  const names = ["Ada Kerfoot", "Bram Stile", "Cleo Rafter"];
  const students = [];
  for (const name of names.slice(0, STUDENTS)) students.push(await createPerson(file, name));
  ids.studentIds = students.map((s) => s.id);
  ids.classId = await createClass(file, instructor.id, ids.studentIds, "CARP 130 — Stair and Rail");
  const assignment = await createAssignment(
    file,
    ids.classId,
    { title: "Batten spacing on paper", instructions: "Work each layout with a pencil; show the free space and the gap before you mark." },
    [{ kind: "even-gap", level: 1, problemCount: 2, points: 4 }],
  );
  ids.assignmentId = assignment.id;
});

const printView = (query = "") => `/classes/${ids.classId}/assignments/${ids.assignmentId}/worksheets${query}`;

/** Pages of a PDF as Chromium writes it: each page is a `/Type /Page` dictionary (the tree's nodes are `/Pages`). */
function pageCount(pdf: Buffer): number {
  const text = pdf.toString("latin1");
  const pages = text.match(/\/Type\s*\/Page(?![a-zA-Z])/g)?.length ?? 0;
  const declared = Math.max(...[...text.matchAll(/\/Type\s*\/Pages\b[^>]*?\/Count\s+(\d+)/g)].map((m) => Number(m[1])), 0);
  expect(pages, "page objects agree with the page tree's count").toBe(declared);
  return pages;
}

async function printToPdf(page: Page): Promise<number> {
  // The drawings and the KaTeX fonts must be in before the page is laid out for paper.
  await page.evaluate(() => document.fonts.ready);
  return pageCount(await page.pdf({ preferCSSPageSize: true }));
}

test("the instructor prints one page per student and one key page per student", async ({ page }) => {
  await signIn(page, instructorEmail, FIXTURE_PASSWORD);
  await page.waitForURL((url) => !url.pathname.startsWith("/signin"));
  await page.goto(`/classes/${ids.classId}/assignments/${ids.assignmentId}`);
  await page.getByRole("link", { name: "Print worksheets" }).click();
  await page.waitForURL(/\/worksheets$/);
  await expect(page.getByRole("heading", { level: 1, name: "Worksheets: Batten spacing on paper" })).toBeVisible();
  await expect(page.locator("article[data-worksheet]")).toHaveCount(STUDENTS);
  await expect(page.locator("article[data-answer-key]")).toHaveCount(STUDENTS);
  await expect(page.getByRole("article", { name: "Worksheet for Bram Stile" }).locator("[data-sheet-problem]")).toHaveCount(2);

  expect(await printToPdf(page)).toBe(2 * STUDENTS);

  // On paper the site's menus and the choices are gone; the sheets stay.
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("banner")).toBeHidden();
  await expect(page.getByRole("form", { name: "What to print" })).toBeHidden();
  await expect(page.getByRole("article", { name: "Worksheet for Ada Kerfoot" })).toBeVisible();
  await page.emulateMedia({ media: "screen" });
});

test("the choices print the sheets alone, or one student's key", async ({ page }) => {
  await signIn(page, instructorEmail, FIXTURE_PASSWORD);
  await page.waitForURL((url) => !url.pathname.startsWith("/signin"));
  await page.goto(printView());

  await page.getByLabel("Print", { exact: true }).selectOption("without");
  await page.getByRole("button", { name: "Show" }).click();
  await page.waitForURL(/key=without/);
  await expect(page.locator("article[data-answer-key]")).toHaveCount(0);
  await expect(page.locator("article[data-worksheet]")).toHaveCount(STUDENTS);
  expect(await printToPdf(page)).toBe(STUDENTS);

  await page.getByLabel("Print", { exact: true }).selectOption("only");
  await page.getByLabel("Students").selectOption({ label: "Cleo Rafter" });
  await page.getByRole("button", { name: "Show" }).click();
  await page.waitForURL(/key=only/);
  await expect(page.locator("article[data-worksheet]")).toHaveCount(0);
  await expect(page.getByRole("article", { name: "Answer key for Cleo Rafter" })).toBeVisible();
  await expect(page.locator("article[data-answer-key]")).toHaveCount(1);
  expect(await printToPdf(page)).toBe(1);
});
