import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import { expect, test, type Locator, type Page } from "@playwright/test";
import { openDatabase } from "@/lib/db";
import { findKind, type Level } from "@/lib/problems";
import { roundedAnswer } from "@/lib/problems/kit";
import { DEMO_CLASS, DEMO_PASSWORD, DEMO_STAFF } from "@/seeders/demo";

// The whole journey from the keyboard alone: Tab, Shift+Tab, Enter, Space, arrows and Escape, and
// typing into whatever has focus. No clicks and no filling of fields found by a locator; locators
// only say where focus should have arrived. Each stop must show where focus is.

const KIND = findKind("even-gap")!;
const LEVEL: Level = 1;
const SEED = 4242;
const PASSWORD = "plumb-and-square-5151";
const run = crypto.randomBytes(3).toString("hex");
const learner = { email: `e2e-keys-${run}@example.com`, name: "Keziah Arnott" };
const instructor = DEMO_STAFF.find((s) => s.role === "instructor")!;

test.beforeAll(async () => {
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  await database.models.User.create({ ...learner, role: "student", passwordHash: await bcrypt.hash(PASSWORD, 10) });
  await database.sequelize.close();
});

const isFocused = (target: Locator) => target.evaluate((el) => el === document.activeElement || el.contains(document.activeElement)).catch(() => false);

/** Presses Tab (or Shift+Tab) until `target` has focus; fails if it never comes. */
async function tabTo(page: Page, target: Locator, { back = false, max = 200 } = {}) {
  for (let i = 0; i < max; i++) {
    if (await isFocused(target)) return expectFocusRing(page);
    await page.keyboard.press(back ? "Shift+Tab" : "Tab");
  }
  await expect(target).toBeFocused();
}

/** The focused element shows it: a computed outline or box shadow, not "none". */
async function expectFocusRing(page: Page) {
  const ring = await page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return { what: "nothing", shown: false };
    const style = getComputedStyle(el);
    const outline = style.outlineStyle !== "none" && Number.parseFloat(style.outlineWidth) > 0;
    return { what: `${el.tagName.toLowerCase()} "${(el.getAttribute("aria-label") ?? el.textContent ?? "").trim().slice(0, 40)}"`, shown: outline || style.boxShadow !== "none" };
  });
  expect(ring.shown, `a visible focus indicator on ${ring.what}`).toBe(true);
}

/** Replaces what is in the focused box, as a person would: select all, then type. */
async function retype(page: Page, text: string) {
  await page.keyboard.press("ControlOrMeta+a");
  await page.keyboard.type(text);
}

async function signInByKeyboard(page: Page, email: string, password: string) {
  await page.goto("/signin");
  await page.keyboard.press("Tab");
  const skip = page.getByRole("link", { name: "Skip to content" });
  await expect(skip).toBeFocused();
  await expect(skip).toBeVisible();
  await expectFocusRing(page);
  await tabTo(page, page.getByLabel("E-mail"));
  await page.keyboard.type(email);
  await tabTo(page, page.getByLabel("Password"));
  await page.keyboard.type(password);
  await page.keyboard.press("Enter");
  await expect(page.getByLabel(/^Account menu for/)).toBeVisible();
}

test("a student signs in, reads a lesson, uses its calculator and answers a practice problem, all from the keyboard", async ({ page }) => {
  test.setTimeout(60_000);
  await signInByKeyboard(page, learner.email, PASSWORD);

  // The skip link moves focus past the header to the page itself.
  await page.goto("/lessons");
  await page.keyboard.press("Tab");
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(/#main$/);
  const lessonLink = page.locator("main").getByRole("link", { name: /Even spacing/ }).first();
  await tabTo(page, lessonLink);
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(/\/lessons\/even-spacing$/);

  // The lesson's calculator: change the number of members and see the gap change.
  const calculator = page.locator("main").getByRole("textbox", { name: "Number of members" }).first();
  const readouts = page.locator("main dl").first();
  await tabTo(page, calculator);
  const before = await readouts.textContent();
  await retype(page, "10");
  await expect(calculator).toHaveValue("10");
  await expect(readouts).not.toHaveText(before ?? "");
  await expect(readouts).toContainText("10");
  // Shift+Tab goes back to the field before it: one of the radio buttons of "Decide the layout by".
  await page.keyboard.press("Shift+Tab");
  await expect(page.getByRole("radio", { name: "How many members" }).first()).toBeFocused();
  await expectFocusRing(page);

  // Practice: the even-gap skill at level 1, started with Enter.
  await page.goto("/practice");
  const start = page.locator(`[data-skill="${KIND.skill}"]`).getByRole("group", { name: `Start ${KIND.title}` }).getByRole("button", { name: /^Level 1/ });
  await tabTo(page, start);
  await page.keyboard.press("Enter");
  await expect(page).toHaveURL(/\/practice\/[0-9a-f-]{36}$/);
  // Known numbers, so the test knows which answers are right.
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  await database.models.PracticeProblem.update({ seed: SEED }, { where: { id: page.url().split("/").pop()! } });
  await database.sequelize.close();
  await page.reload();

  const params = KIND.generate(SEED, LEVEL);
  const expected = KIND.solve(params);
  const parts = KIND.parts(params);
  const right = (key: string) => {
    const part = parts.find((p) => p.key === key)!;
    return part.answer === "count" ? expected[key].toString() : roundedAnswer(expected[key], part.precision).toFraction(true);
  };
  // First try: every box gets 1, which no even-gap layout has as its answer.
  for (const part of parts) {
    await tabTo(page, page.getByRole("textbox", { name: part.label }));
    await retype(page, "1");
  }
  await page.keyboard.press("Enter");
  await expect(page.locator("[data-verdict='incorrect']").first()).toBeVisible();
  await expect(page.getByText("2 tries left")).toBeVisible();

  // Second try: back up to the first box, then the right answers in every box still open.
  await tabTo(page, page.getByRole("textbox", { name: parts[0].label }), { back: true });
  for (const part of parts) {
    const box = page.getByRole("textbox", { name: part.label });
    if (!(await box.isEditable())) continue;
    await tabTo(page, box);
    await retype(page, right(part.key));
  }
  await page.keyboard.press("Enter");
  await expect(page.locator("[data-verdict]")).toHaveCount(parts.length);
  await expect(page.locator("[data-verdict]:not([data-verdict='correct'])")).toHaveCount(0);
  // The worked solution takes focus when the problem is finished.
  await expect(page.getByRole("heading", { name: /solution/i })).toBeFocused();
});

test("an instructor opens the gradebook, opens one student's work and closes it, all from the keyboard", async ({ page }) => {
  test.setTimeout(60_000);
  await signInByKeyboard(page, instructor.email, DEMO_PASSWORD);
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  const demo = (await database.models.SchoolClass.findOne({ where: { joinCode: DEMO_CLASS.joinCode } }))!;
  await database.sequelize.close();

  await page.goto(`/classes/${demo.id}`);
  await tabTo(page, page.locator("main").getByRole("link", { name: "Gradebook" }));
  await page.keyboard.press("Enter");
  await expect(page.getByRole("heading", { name: "Gradebook", level: 1 })).toBeVisible();

  // One Tab stop into the grid, then arrows move between the cells.
  const grid = page.getByRole("grid");
  await tabTo(page, grid.locator("tbody"));
  await page.keyboard.press("ArrowDown");
  await page.keyboard.press("ArrowRight");
  const cell = grid.locator("button:focus");
  await expect(cell).toHaveCount(1);
  await expectFocusRing(page);
  const cellName = await cell.getAttribute("aria-label");
  expect(cellName).toMatch(/Open the work$/);

  await page.keyboard.press("Enter");
  const panel = page.locator("dialog[data-drill-down]");
  await expect(panel).toBeVisible();
  await expect(panel.locator("#drill-heading")).not.toHaveText("Loading the work…");
  // Focus is inside the dialog and can move within it.
  await page.keyboard.press("Tab");
  expect(await isFocused(panel)).toBe(true);
  await expectFocusRing(page);
  await page.keyboard.press("Escape");
  await expect(panel).toBeHidden();
  // Focus comes back to the cell that opened it.
  await expect(grid.locator("button:focus")).toHaveAttribute("aria-label", cellName!);
  await expectFocusRing(page);
});
