import { expect, test } from "@playwright/test";
import { openDatabase } from "@/lib/db";
import { gradeAnswer } from "@/lib/grading/grade";
import { findKind, type Level } from "@/lib/problems";
import { roundedAnswer, roundingSlip } from "@/lib/problems/kit";
import { DEMO_STAFF } from "@/seeders/demo";
import { expectSignedInAs, holdScripts, signIn } from "./helpers";

const KIND = findKind("even-gap")!;
const LEVEL: Level = 1;

/**
 * A seed whose problem has a length part that can be rounded the wrong way, so the test can make
 * a slip the grader names, and then put it right.
 */
function seedWithRoundingSlip(): { seed: number; slipPart: string; slipText: string; right: Record<string, string> } {
  for (let seed = 1; seed < 10_000; seed++) {
    const params = KIND.generate(seed, LEVEL);
    const expected = KIND.solve(params);
    const parts = KIND.parts(params);
    const right = Object.fromEntries(parts.map((p) => [p.key, p.answer === "count" ? expected[p.key].toString() : roundedAnswer(expected[p.key], p.precision).toFraction(true)]));
    for (const part of parts.filter((p) => p.answer === "length")) {
      const exact = expected[part.key];
      const step = 1 / part.precision;
      const rounded = roundedAnswer(exact, part.precision);
      const other = rounded.compare(exact) >= 0 ? rounded.sub(step) : rounded.add(step);
      if (roundingSlip(exact, part.precision, other) === null) continue;
      const graded = gradeAnswer(part, exact, other.toFraction(true), (v) => KIND.diagnose(params, part.key, v));
      if (graded.verdict === "imprecise" && graded.pattern) return { seed, slipPart: part.key, slipText: other.toFraction(true), right };
    }
  }
  throw new Error("no seed with a rounding slip");
}

async function pinSeed(id: string, seed: number) {
  const database = openDatabase(process.env.E2E_DATABASE_PATH!);
  await database.models.PracticeProblem.update({ seed }, { where: { id } });
  await database.sequelize.close();
}

test("a self-learner makes a slip, sees it named, puts it right, sees the worked solution, and mastery moves", async ({ page }) => {
  const learner = DEMO_STAFF.find((s) => s.note.startsWith("self-learner"))!;
  await signIn(page, learner.email);
  await expectSignedInAs(page, learner.name);

  await page.goto("/practice");
  const skillCard = page.locator(`[data-skill="${KIND.skill}"]`);
  await expect(skillCard.locator("[data-mastery]")).toContainText("level 1: none finished yet");
  await skillCard.getByRole("group", { name: `Start ${KIND.title}` }).getByRole("button", { name: /^Level 1/ }).click();
  await expect(page).toHaveURL(/\/practice\/[0-9a-f-]{36}$/);
  const id = page.url().split("/").pop()!;

  const { seed, slipPart, slipText, right } = seedWithRoundingSlip();
  await pinSeed(id, seed);
  await page.reload();

  const parts = KIND.parts(KIND.generate(seed, LEVEL));
  for (const part of parts) await page.getByRole("textbox", { name: part.label }).fill(part.key === slipPart ? slipText : right[part.key]);
  await expect(page.locator(`[data-part="${slipPart}"]`)).toContainText("reads as");
  await page.getByRole("textbox", { name: parts[0].label }).press("Enter");

  const slip = page.locator(`[data-part="${slipPart}"] [data-verdict]`);
  await expect(slip).toHaveAttribute("data-verdict", "imprecise");
  await expect(slip.locator("[data-pattern]")).toBeVisible();
  await expect(page.locator("[data-solution]")).toHaveCount(0);
  await expect(page.getByText("2 tries left.")).toBeVisible();

  await page.getByRole("textbox", { name: parts.find((p) => p.key === slipPart)!.label }).fill(right[slipPart]);
  await page.getByRole("button", { name: "Check answers" }).click();
  const solution = page.locator("[data-solution]");
  await expect(solution).toContainText("Solved");
  await expect(solution.locator(".katex").first()).toBeVisible();
  await expect(solution.getByRole("listitem").first()).toBeVisible();

  await page.goto("/practice");
  await expect(page.locator(`[data-skill="${KIND.skill}"] [data-mastery]`)).toContainText("level 1: 1 of the last 1 solved");
  await expect(page.getByRole("table", { name: /practice problems/ }).getByRole("link", { name: KIND.title })).toBeVisible();

  // The course outline shows the practice beside the lesson that teaches the skill.
  await page.goto("/lessons");
  await expect(page.locator(`[data-mastery="${KIND.skill}"]`)).toHaveText("Practice: 0 of 3 levels mastered");
});

test("an anonymous reader starts a problem inside a lesson and is asked to sign up to keep progress", async ({ page }) => {
  await page.goto("/lessons/even-spacing");
  const embed = page.locator('[data-lesson-practice="even-spacing"]');
  await embed.getByRole("button", { name: "Start a practice problem" }).click();
  await expect(embed.getByRole("button", { name: "Check answers" })).toBeVisible();
  await embed.getByRole("button", { name: "Check answers" }).click();
  await expect(embed.getByRole("alert")).toContainText("nothing was counted");
});

test("on a 360 px phone the problem fits the width", async ({ page }) => {
  await page.setViewportSize({ width: 360, height: 740 });
  await page.goto("/practice");
  await page.getByRole("button", { name: "Give me a problem" }).click();
  await expect(page.getByRole("button", { name: "Check answers" })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
});

test("answers typed before the page hydrates are kept and checked; the button waits for the page", async ({ page }) => {
  const learner = DEMO_STAFF.find((s) => s.note.startsWith("self-learner"))!;
  await signIn(page, learner.email);
  await expectSignedInAs(page, learner.name);
  await page.goto("/practice");
  await page.locator(`[data-skill="${KIND.skill}"]`).getByRole("group", { name: `Start ${KIND.title}` }).getByRole("button", { name: /^Level 1/ }).click();
  await expect(page).toHaveURL(/\/practice\/[0-9a-f-]{36}$/);
  const id = page.url().split("/").pop()!;
  const seed = 7;
  await pinSeed(id, seed);
  const parts = KIND.parts(KIND.generate(seed, LEVEL));
  const first = parts[0];

  const release = await holdScripts(page);
  await page.reload({ waitUntil: "domcontentloaded" });
  for (const part of parts) await page.getByRole("textbox", { name: part.label }).fill(part.answer === "count" ? "6" : "12 3/4");
  await expect(page.getByRole("button", { name: "Check answers" })).toBeDisabled();
  release();

  await expect(page.locator(`[data-part="${first.key}"]`)).toContainText("reads as");
  await page.getByRole("button", { name: "Check answers" }).click();
  for (const part of parts) await expect(page.locator(`[data-part="${part.key}"] [data-verdict]`)).toBeVisible();
  await expect(page.getByRole("textbox", { name: first.label })).toHaveValue(first.answer === "count" ? "6" : "12 3/4");
  await expectSignedInAs(page, learner.name);
});
