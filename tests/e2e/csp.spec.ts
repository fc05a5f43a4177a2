import { expect, test, type Page } from "@playwright/test";
import { DEMO_CLASS, DEMO_STAFF, DEMO_STUDENTS } from "@/seeders/demo";
import { withDatabase } from "../support/assignment-fixtures";
import { expectSignedInAs, signIn } from "./helpers";

// The Content-Security-Policy from next.config.ts, in Chromium, on the pages each role uses: a
// page that needed something the policy forbids (an inline handler, eval, a foreign font) would
// report a violation here, or would stop working — so each page is also driven a little.

type Violation = { directive: string; blocked: string; source: string };
declare global {
  interface Window {
    __cspViolations: Violation[];
  }
}

const file = process.env.E2E_DATABASE_PATH!;
const instructor = DEMO_STAFF[0];
// The demo student with a graded past, so the progress charts have something to draw.
const student = DEMO_STUDENTS[3];

/** Starts recording before any of the page's own scripts run, on every navigation. */
async function watchPolicy(page: Page): Promise<string[]> {
  const consoleErrors: string[] = [];
  await page.addInitScript(() => {
    window.__cspViolations = [];
    document.addEventListener("securitypolicyviolation", (e) => {
      window.__cspViolations.push({ directive: e.violatedDirective, blocked: e.blockedURI, source: `${e.sourceFile}:${e.lineNumber}` });
    });
  });
  page.on("console", (message) => {
    if (message.type() === "error" && /content security policy|refused to (load|execute|apply|evaluate|connect|frame)/i.test(message.text())) {
      consoleErrors.push(`${page.url()}: ${message.text()}`);
    }
  });
  return consoleErrors;
}

async function expectNoViolations(page: Page, consoleErrors: string[]) {
  // Lazy chunks (charts, calculators) load after hydration; let them arrive first.
  await page.waitForLoadState("networkidle");
  const violations = await page.evaluate(() => window.__cspViolations);
  expect(violations, `CSP violations on ${page.url()}`).toEqual([]);
  expect(consoleErrors).toEqual([]);
}

async function visit(page: Page, consoleErrors: string[], path: string, ready?: (page: Page) => Promise<void>) {
  const response = await page.goto(path);
  expect(response?.status(), path).toBe(200);
  await ready?.(page);
  await expectNoViolations(page, consoleErrors);
}

// Each test walks many pages (the print view lays out the whole demo class at once): more than
// the default 30 s on a busy machine.
test.describe.configure({ timeout: 120_000 });

async function demoIds() {
  return withDatabase(file, async (db) => {
    const klass = await db.models.SchoolClass.findOne({ where: { joinCode: DEMO_CLASS.joinCode } });
    const assignment = await db.models.Assignment.findOne({ where: { classId: klass!.id, status: "published" }, order: [["id", "ASC"]] });
    return { classId: klass!.id, assignmentId: assignment!.id };
  });
}

test("anonymous: home, a lesson with math and a calculator, every calculator, and a practice problem answered", async ({ page }) => {
  const consoleErrors = await watchPolicy(page);
  await visit(page, consoleErrors, "/", async (p) => {
    await expect(p.getByRole("heading", { level: 1 })).toBeVisible();
  });

  await visit(page, consoleErrors, "/lessons/even-spacing", async (p) => {
    await expect(p.locator(".katex").first()).toBeVisible();
    // The compact calculator in the lesson still recomputes in the browser.
    const members = p.getByLabel("Number of members").first();
    await members.fill("7");
    await expect(p.getByRole("img", { name: "Layout drawing" }).first().locator("desc")).toContainText("6 equal gaps");
  });

  for (const kind of ["even-spacing", "wall-grid", "cut-list", "guard-spacing", "stairs", "fraction-bench"]) {
    await visit(page, consoleErrors, `/calculators/${kind}`, async (p) => {
      await expect(p.getByRole("heading", { level: 1 })).toBeVisible();
    });
  }
  // Hydrated under the policy: typing recomputes the layout.
  await visit(page, consoleErrors, "/calculators/even-spacing", async (p) => {
    await p.getByLabel("Number of members").fill("7");
    await expect(p.getByRole("table").filter({ hasText: "Marks from the left end" }).getByRole("row")).toHaveCount(8);
  });

  await visit(page, consoleErrors, "/practice");
  await page.locator("[data-skill]").first().getByRole("button", { name: /^Level 1/ }).click();
  await expect(page).toHaveURL(/\/practice\/[0-9a-f-]{36}$/);
  const fields = page.locator("[data-part] input");
  await expect(fields.first()).toBeVisible();
  for (const field of await fields.all()) await field.fill("1");
  await page.getByRole("button", { name: "Check answers" }).click();
  await expect(page.locator("[data-verdict]").first()).toBeVisible();
  await expectNoViolations(page, consoleErrors);
});

test("student: their classes, an assignment and their progress charts", async ({ page }) => {
  const consoleErrors = await watchPolicy(page);
  const { classId, assignmentId } = await demoIds();
  await signIn(page, student.email);
  await expectSignedInAs(page, student.name);
  await expectNoViolations(page, consoleErrors);

  await visit(page, consoleErrors, "/my-classes");
  await visit(page, consoleErrors, `/my-classes/${classId}`);
  await visit(page, consoleErrors, `/my-classes/${classId}/assignments/${assignmentId}`, async (p) => {
    await expect(p.getByRole("heading", { level: 1 })).toBeVisible();
  });
  await visit(page, consoleErrors, "/my-progress", async (p) => {
    await expect(p.locator(".recharts-surface").first()).toBeVisible({ timeout: 20_000 });
  });
});

test("instructor: roster, gradebook, progress charts and the worksheet print view", async ({ page }) => {
  const consoleErrors = await watchPolicy(page);
  const { classId, assignmentId } = await demoIds();
  await signIn(page, instructor.email);
  await expectSignedInAs(page, instructor.name);

  await visit(page, consoleErrors, "/classes");
  await visit(page, consoleErrors, `/classes/${classId}`, async (p) => {
    await expect(p.getByRole("heading", { level: 1 })).toBeVisible();
  });
  await visit(page, consoleErrors, `/classes/${classId}/gradebook`, async (p) => {
    // Hydrated under the policy: sorting by name reorders the grid.
    const byName = p.getByRole("grid").locator('[data-sort="name"]');
    await byName.click();
    await expect(p.getByRole("grid").locator("th[aria-sort]:not([aria-sort='none'])")).toHaveCount(1);
  });
  await visit(page, consoleErrors, `/classes/${classId}/progress`, async (p) => {
    await expect(p.locator(".recharts-surface").first()).toBeVisible({ timeout: 20_000 });
  });
  await visit(page, consoleErrors, `/classes/${classId}/assignments/${assignmentId}/worksheets`, async (p) => {
    await expect(p.locator("article[data-worksheet]").first()).toBeVisible();
    await expect(p.locator("article[data-worksheet] .katex, article[data-worksheet] svg").first()).toBeVisible();
  });
});

test("a locked-out sign-in says how long to wait", async ({ page, request }) => {
  // An address nobody has: its tries count against that address alone, so no other test is locked out.
  const email = `locked.out.${Date.now()}@example.com`;
  for (let i = 0; i < 8; i++) {
    const { csrfToken } = (await (await request.get("/api/auth/csrf")).json()) as { csrfToken: string };
    await request.post("/api/auth/callback/credentials", { form: { csrfToken, email, password: "wrong-password-1", json: "true" } });
  }
  await page.goto("/signin");
  await page.getByLabel("E-mail").fill(email);
  await page.getByLabel("Password").fill("wrong-password-1");
  await page.getByRole("button", { name: "Sign in" }).click();
  await expect(page.getByRole("alert").filter({ hasText: /Wait \d+ minutes? and try again/ })).toBeVisible();
});
