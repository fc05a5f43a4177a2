import crypto from "node:crypto";
import { readdirSync } from "node:fs";
import { mkdtemp, rm } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import AxeBuilder from "@axe-core/playwright";
import { expect, test, type Browser, type Page } from "@playwright/test";
import { openDatabase } from "@/lib/db";
import { gradeAnswer } from "@/lib/grading/grade";
import { findKind } from "@/lib/problems";
import { roundedAnswer } from "@/lib/problems/kit";
import { hashToken } from "@/lib/classes/tokens";
import { DEMO_CLASS, DEMO_STAFF, DEMO_STUDENTS } from "@/seeders/demo";
import { expectSignedInAs, signIn } from "./helpers";

// Every page, for every role that can open it, checked by axe against WCAG 2.2 AA: no serious or
// critical violation. Then the states that only appear after something is done (a slip named, a
// dialog open, a table unfolded) and the 360 px layout of the pages used most in the shop.

type Role = "anonymous" | "student" | "self-learner" | "instructor" | "admin";
const SIGNED_IN: Exclude<Role, "anonymous">[] = ["student", "self-learner", "instructor", "admin"];
const EVERYONE: Role[] = ["anonymous", ...SIGNED_IN];
const TEACHING: Role[] = ["instructor", "admin"];
const LEARNING: Role[] = ["student", "self-learner"];

// A self-learner of its own (made in beforeAll): this file starts practice problems, and the demo's
// self-learner belongs to the practice journey, which expects a clean history.
const selfLearner = { email: `e2e-axe-learner-${crypto.randomBytes(3).toString("hex")}@example.com`, name: "Tomasz Rivera" };

const accounts: Record<Exclude<Role, "anonymous">, { email: string; name: string }> = {
  student: DEMO_STUDENTS[3],
  "self-learner": selfLearner,
  instructor: DEMO_STAFF.find((s) => s.role === "instructor")!,
  admin: DEMO_STAFF.find((s) => s.role === "admin")!,
};

const ids = { classId: 0, assignmentId: 0, studentId: 0, inviteToken: "", resetToken: "" };
const LESSONS = readdirSync(path.join(process.cwd(), "content/lessons"))
  .filter((f) => f.endsWith(".mdx"))
  .map((f) => f.replace(/^\d+-/, "").replace(/\.mdx$/, ""));
const CALCULATORS = ["cut-list", "even-spacing", "fraction-bench", "guard-spacing", "stairs", "wall-grid"];

type Row = { route: string; roles: Role[]; paths: () => string[] };
const one = (p: () => string) => () => [p()];
const cls = () => `/classes/${ids.classId}`;
const asg = () => `${cls()}/assignments/${ids.assignmentId}`;

// One row per page file; the first test below fails when a page has no row. A public page is
// checked for the signed-in roles only where it shows them something different (the header by
// role on "/", mastery on the practice pages, lesson progress), and an admin sees the teaching
// pages as an instructor does, so only the ones that differ for them are checked again.
const ROWS: Row[] = [
  { route: "/", roles: EVERYONE, paths: one(() => "/") },
  { route: "/safety", roles: ["anonymous"], paths: one(() => "/safety") },
  { route: "/signin", roles: ["anonymous"], paths: one(() => "/signin") },
  { route: "/signup", roles: ["anonymous"], paths: one(() => "/signup") },
  { route: "/forgot-password", roles: ["anonymous"], paths: one(() => "/forgot-password") },
  { route: "/reset-password/[token]", roles: ["anonymous"], paths: () => [`/reset-password/${ids.resetToken}`, "/reset-password/not-a-real-link"] },
  { route: "/invite/[token]", roles: ["anonymous"], paths: () => [`/invite/${ids.inviteToken}`, "/invite/not-a-real-link"] },
  { route: "/lessons", roles: ["anonymous", "student"], paths: one(() => "/lessons") },
  { route: "/lessons/[slug]", roles: ["anonymous"], paths: () => LESSONS.map((s) => `/lessons/${s}`) },
  { route: "/lessons/[slug]", roles: ["student"], paths: () => [`/lessons/${LESSONS[3]}`] },
  { route: "/calculators", roles: ["anonymous"], paths: one(() => "/calculators") },
  ...CALCULATORS.map((c): Row => ({ route: `/calculators/${c}`, roles: ["anonymous"], paths: one(() => `/calculators/${c}`) })),
  // Signed in, a calculator adds saving the layout.
  { route: "/calculators/even-spacing", roles: ["instructor"], paths: one(() => "/calculators/even-spacing") },
  { route: "/practice", roles: EVERYONE, paths: one(() => "/practice") },
  { route: "/practice/[id]", roles: EVERYONE, paths: () => [] /* made per role in the test */ },
  { route: "/layouts", roles: SIGNED_IN, paths: one(() => "/layouts") },
  { route: "/my-classes", roles: LEARNING, paths: one(() => "/my-classes") },
  { route: "/my-classes/[classId]", roles: ["student"], paths: one(() => `/my-classes/${ids.classId}`) },
  { route: "/my-classes/[classId]/assignments/[assignmentId]", roles: ["student"], paths: one(() => `/my-classes/${ids.classId}/assignments/${ids.assignmentId}`) },
  { route: "/my-progress", roles: LEARNING, paths: one(() => "/my-progress") },
  { route: "/classes", roles: TEACHING, paths: one(() => "/classes") },
  { route: "/classes/new", roles: ["instructor"], paths: one(() => "/classes/new") },
  { route: "/classes/[classId]", roles: TEACHING, paths: one(cls) },
  { route: "/classes/[classId]/add-students", roles: ["instructor"], paths: one(() => `${cls()}/add-students`) },
  { route: "/classes/[classId]/join-code", roles: ["instructor"], paths: one(() => `${cls()}/join-code`) },
  { route: "/classes/[classId]/settings", roles: TEACHING, paths: one(() => `${cls()}/settings`) },
  { route: "/classes/[classId]/gradebook", roles: ["instructor"], paths: one(() => `${cls()}/gradebook`) },
  { route: "/classes/[classId]/progress", roles: ["instructor"], paths: one(() => `${cls()}/progress`) },
  { route: "/classes/[classId]/assignments", roles: ["instructor"], paths: one(() => `${cls()}/assignments`) },
  { route: "/classes/[classId]/assignments/new", roles: ["instructor"], paths: one(() => `${cls()}/assignments/new`) },
  { route: "/classes/[classId]/assignments/[assignmentId]", roles: ["instructor"], paths: one(asg) },
  { route: "/classes/[classId]/assignments/[assignmentId]/edit", roles: ["instructor"], paths: one(() => `${asg()}/edit`) },
  { route: "/classes/[classId]/assignments/[assignmentId]/students", roles: ["instructor"], paths: one(() => `${asg()}/students`) },
  { route: "/classes/[classId]/assignments/[assignmentId]/students/[studentId]", roles: ["instructor"], paths: one(() => `${asg()}/students/${ids.studentId}`) },
  { route: "/classes/[classId]/assignments/[assignmentId]/worksheets", roles: ["instructor"], paths: one(() => `${asg()}/worksheets?student=${ids.studentId}`) },
  { route: "/admin/users", roles: ["admin"], paths: one(() => "/admin/users") },
  { route: "/admin/classes", roles: ["admin"], paths: one(() => "/admin/classes") },
];

const TAGS = ["wcag2a", "wcag2aa", "wcag21a", "wcag21aa", "wcag22aa"];

/** Every serious or critical violation written out: rule, help, and each element with what to fix ("" when none). */
async function axeReport(page: Page, where: string): Promise<string> {
  const { violations } = await new AxeBuilder({ page }).withTags(TAGS).analyze();
  const bad = violations.filter((v) => v.impact === "serious" || v.impact === "critical");
  if (bad.length === 0) return "";
  const lines = bad.map((v) =>
    [`  ${v.id} (${v.impact}): ${v.help}`, ...v.nodes.slice(0, 6).map((n) => `    ${n.target.join(" ")}\n      ${(n.failureSummary ?? "").replace(/\n/g, "\n      ")}`)].join("\n"),
  );
  return `${where}\n${lines.join("\n")}\n`;
}

/**
 * Drawings that a screen reader would meet without a name. Every SVG is either decoration hidden
 * from assistive technology (aria-hidden on it or around it) or a figure: role="img" and a name from
 * aria-label, aria-labelledby or its <title>, so the measures it shows are said in words too.
 */
async function unnamedFigures(page: Page, where: string): Promise<string> {
  const unnamed = await page.locator("svg").evaluateAll((svgs) =>
    svgs
      .filter((svg) => !svg.closest("[aria-hidden='true']") && !svg.parentElement?.closest("svg"))
      .filter((svg) => {
        const byIds = (svg.getAttribute("aria-labelledby") ?? "").split(/\s+/).map((id) => document.getElementById(id)?.textContent ?? "").join("");
        const name = `${svg.getAttribute("aria-label") ?? ""}${byIds}${svg.querySelector(":scope > title")?.textContent ?? ""}`.trim();
        return svg.getAttribute("role") !== "img" || name.length < 10;
      })
      .map((svg) => `    ${svg.outerHTML.slice(0, 160)}`),
  );
  return unnamed.length === 0 ? "" : `${where}\n  drawings without a text alternative:\n${unnamed.join("\n")}\n`;
}

async function expectAccessible(page: Page, where: string) {
  expect((await axeReport(page, where)) + (await unnamedFigures(page, where))).toBe("");
}

let stateDir = "";
const storage = (role: Role) => (role === "anonymous" ? undefined : path.join(stateDir, `${role}.json`));

async function open(browser: Browser, role: Role, viewport = { width: 1280, height: 800 }) {
  const context = await browser.newContext({ storageState: storage(role), viewport });
  return { context, page: await context.newPage() };
}

/** Loads a page and checks it is the page asked for, not a sign-in redirect or a refusal. */
async function visit(page: Page, url: string) {
  const response = await page.goto(url);
  expect(response?.status(), url).toBeLessThan(400);
  expect(new URL(page.url()).pathname).toBe(url.split("?")[0]);
  await page.waitForLoadState("networkidle");
}

test.beforeAll(async ({ browser }) => {
  test.setTimeout(60_000);
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  const { SchoolClass, Assignment, User, Invitation, PasswordReset } = database.models;
  const demo = (await SchoolClass.findOne({ where: { joinCode: DEMO_CLASS.joinCode } }))!;
  const past = (await Assignment.findAll({ where: { classId: demo.id, status: "published" }, order: [["dueAt", "ASC"]] }))[0];
  const student = (await User.findOne({ where: { email: accounts.student.email } }))!;
  const run = crypto.randomBytes(3).toString("hex");
  ids.inviteToken = crypto.randomBytes(32).toString("base64url");
  await Invitation.create({ classId: demo.id, email: `axe-invited-${run}@example.com`, name: "Nils Haugen", tokenHash: hashToken(ids.inviteToken), invitedBy: demo.instructorId, expiresAt: new Date(Date.now() + 86_400_000) });
  ids.resetToken = crypto.randomBytes(32).toString("base64url");
  await PasswordReset.create({ userId: student.id, tokenHash: hashToken(ids.resetToken) /* reset links are kept as the same SHA-256 */, expiresAt: new Date(Date.now() + 3_600_000) });
  // Signs in with the demo password like the other roles; the hash is copied from a demo account.
  await User.create({ ...selfLearner, role: "student", passwordHash: student.passwordHash });
  await database.sequelize.close();
  Object.assign(ids, { classId: demo.id, assignmentId: past.id, studentId: student.id });

  stateDir = await mkdtemp(path.join(os.tmpdir(), "axe-state-"));
  for (const role of SIGNED_IN) {
    const context = await browser.newContext();
    const page = await context.newPage();
    await signIn(page, accounts[role].email);
    await expectSignedInAs(page, accounts[role].name);
    await context.storageState({ path: storage(role) });
    await context.close();
  }
});

test.afterAll(async () => {
  if (stateDir) await rm(stateDir, { recursive: true, force: true });
});

test("every page file has a row in this table", () => {
  const appDir = path.join(process.cwd(), "app");
  const routes = (readdirSync(appDir, { recursive: true }) as string[])
    .filter((f) => f.endsWith(`${path.sep}page.tsx`) || f === "page.tsx")
    .map((f) => "/" + f.split(path.sep).slice(0, -1).filter((s) => !/^\(.+\)$/.test(s)).join("/"));
  const covered = new Set(ROWS.map((r) => r.route));
  expect(routes.filter((r) => !covered.has(r)).sort()).toEqual([]);
  expect(routes.length).toBeGreaterThan(30);
});

for (const role of EVERYONE) {
  const rows = ROWS.filter((r) => r.roles.includes(role) && r.route !== "/practice/[id]");
  test(`every page ${role === "anonymous" ? "a visitor" : `${/^[aeiou]/.test(role) ? "an" : "a"} ${role}`} can open (${rows.length} routes)`, async ({ browser }) => {
    test.setTimeout(240_000);
    const { context, page } = await open(browser, role);
    // Every page is checked before failing, so one run lists all that needs fixing.
    const reports: string[] = [];
    for (const row of rows) {
      for (const url of row.paths()) {
        await visit(page, url);
        reports.push(await axeReport(page, `${url} as ${role}`), await unnamedFigures(page, `${url} as ${role}`));
      }
    }
    expect(reports.join("")).toBe("");
    // A practice problem of their own, made the way the practice page makes one.
    const made = await page.request.post("/api/practice", { data: { kind: "even-gap", level: 1 } });
    expect(made.status()).toBe(201);
    const { problem } = await made.json();
    await visit(page, `/practice/${problem.id}`);
    await expectAccessible(page, `/practice/[id] as ${role}`);
    await context.close();
  });
}

/** A seed of the even-gap kind whose length part has a rounding slip the grader names, with that slip typed out. */
function seedWithNamedSlip(): { seed: number; part: string; answers: Record<string, string> } {
  const kind = findKind("even-gap")!;
  for (let seed = 1; seed < 10_000; seed++) {
    const params = kind.generate(seed, 1);
    const expected = kind.solve(params);
    for (const part of kind.parts(params).filter((p) => p.answer === "length")) {
      const rounded = roundedAnswer(expected[part.key], part.precision);
      const other = rounded.compare(expected[part.key]) >= 0 ? rounded.sub(1 / part.precision) : rounded.add(1 / part.precision);
      const graded = gradeAnswer(part, expected[part.key], other.toFraction(true), (v) => kind.diagnose(params, part.key, v));
      if (graded.verdict !== "imprecise" || !graded.pattern) continue;
      const answers = Object.fromEntries(
        kind.parts(params).map((p) => [p.key, p.answer === "count" ? expected[p.key].toString() : roundedAnswer(expected[p.key], p.precision).toFraction(true)]),
      );
      return { seed, part: part.key, answers: { ...answers, [part.key]: other.toFraction(true) } };
    }
  }
  throw new Error("no even-gap seed with a named slip");
}

test.describe("states that appear after something is done", () => {
  test("a practice problem after a wrong try, with the slip named", async ({ browser }) => {
    const { context, page } = await open(browser, "self-learner");
    const made = await page.request.post("/api/practice", { data: { kind: "even-gap", level: 1 } });
    const { problem } = await made.json();
    const slip = seedWithNamedSlip();
    const database = openDatabase(process.env.E2E_DATABASE_PATH!);
    await database.models.PracticeProblem.update({ seed: slip.seed }, { where: { id: problem.id } });
    await database.sequelize.close();
    await visit(page, `/practice/${problem.id}`);
    for (const [part, text] of Object.entries(slip.answers)) await page.locator(`[data-part="${part}"]`).getByRole("textbox").fill(text);
    await page.keyboard.press("Enter");
    await expect(page.locator(`[data-part="${slip.part}"] [data-pattern]`)).toBeVisible();
    await expectAccessible(page, "practice problem after a slip");
    await context.close();
  });

  test("a calculator whose input cannot be read shows its error", async ({ browser }) => {
    const { context, page } = await open(browser, "anonymous");
    await visit(page, "/calculators/even-spacing?span=twelve&count=0");
    await expect(page.locator("[aria-invalid='true']").first()).toBeVisible();
    await expectAccessible(page, "even spacing with errors");
    await context.close();
  });

  test("the gradebook with one student's work open, and a confirm dialog", async ({ browser }) => {
    const { context, page } = await open(browser, "instructor");
    await visit(page, `${cls()}/gradebook`);
    await page.getByRole("grid").getByRole("button", { name: /submitted\. Open the work$/ }).first().click();
    const panel = page.locator("dialog[data-drill-down]");
    await expect(panel.locator("#drill-heading")).not.toHaveText("Loading the work…");
    await expect(panel.locator("article[data-problem]").first()).toBeVisible();
    await expectAccessible(page, "gradebook drill-down open");

    await visit(page, `${cls()}/settings`);
    await page.getByRole("button", { name: "Make a new code" }).click();
    await expect(page.getByRole("dialog")).toBeVisible();
    await expectAccessible(page, "confirm dialog open");
    await context.close();
  });

  test("the progress charts with their tables unfolded", async ({ browser }) => {
    test.setTimeout(90_000);
    for (const [role, url] of [["instructor", `${cls()}/progress`], ["student", "/my-progress"]] as const) {
      const { context, page } = await open(browser, role);
      await visit(page, url);
      const folds = page.locator("[data-chart] details");
      expect(await folds.count(), `charts on ${url}`).toBeGreaterThan(0);
      await folds.evaluateAll((all) => all.forEach((d) => ((d as HTMLDetailsElement).open = true)));
      await expect(page.locator("[data-chart] details table").first()).toBeVisible();
      await expectAccessible(page, `${url} with tables open`);
      await context.close();
    }
  });

  test("the 360 px phone layout of the pages used most and of those with wide tables", async ({ browser }) => {
    test.setTimeout(150_000);
    const phone = { width: 360, height: 740 };
    const pages: [Role, string][] = [
      ["anonymous", "/"],
      ["anonymous", "/lessons/even-spacing"],
      ["anonymous", "/calculators/even-spacing"],
      ["anonymous", "/calculators/stairs"],
      ["anonymous", "/calculators/wall-grid"],
      ["anonymous", "/calculators/fraction-bench"],
      ["student", "/practice"],
      ["student", `/my-classes/${ids.classId}`],
      ["student", `/my-classes/${ids.classId}/assignments/${ids.assignmentId}`],
      ["student", "/my-progress"],
      ["self-learner", "/practice"],
      ["instructor", cls()],
      ["instructor", `${cls()}/gradebook`],
      ["instructor", `${cls()}/progress`],
      ["instructor", `${cls()}/assignments`],
      ["instructor", asg()],
      ["instructor", `${asg()}/students`],
      ["admin", "/admin/users"],
      ["admin", "/admin/classes"],
    ];
    const reports: string[] = [];
    // Boxes that scroll sideways at this width, each of which axe must have found reachable.
    const scrolling: string[] = [];
    for (const [role, url] of pages) {
      const { context, page } = await open(browser, role, phone);
      await visit(page, url);
      // Folded tables (the lumber sizes, a chart's numbers) are checked unfolded.
      await page.locator("main details").evaluateAll((all) => all.forEach((d) => ((d as HTMLDetailsElement).open = true)));
      reports.push(await axeReport(page, `${url} as ${role} at 360 px`));
      const boxes = await page.locator("main *").evaluateAll((all) =>
        all.filter((el) => el.scrollWidth > el.clientWidth + 1 && ["auto", "scroll"].includes(getComputedStyle(el).overflowX)).length,
      );
      if (boxes > 0) {
        const { passes, violations } = await new AxeBuilder({ page }).withRules(["scrollable-region-focusable"]).analyze();
        expect(violations.flatMap((v) => v.nodes.map((n) => n.target.join(" "))), `${url} as ${role}`).toEqual([]);
        const reachable = passes.flatMap((v) => v.nodes).length;
        expect(reachable, `${url} as ${role}: every box that scrolls is checked`).toBeGreaterThanOrEqual(boxes);
        scrolling.push(`${url} (${boxes})`);
      }
      await context.close();
    }
    expect(reports.join("")).toBe("");
    // The pages with wide tables really have them at this width, so the rule above was put to work.
    expect(scrolling.length, scrolling.join(", ")).toBeGreaterThanOrEqual(5);
  });
});
