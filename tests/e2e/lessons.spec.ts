import { expect, test } from "@playwright/test";
import { DEMO_STUDENTS } from "@/seeders/demo";
import { expectSignedInAs, signIn } from "./helpers";

test("a reader opens the outline, a lesson, and works its embedded calculator", async ({ page }) => {
  await page.goto("/lessons");
  await expect(page.getByRole("heading", { name: "Lessons", level: 1 })).toBeVisible();
  await page.getByRole("link", { name: /Even spacing/ }).first().click();
  await expect(page.getByRole("heading", { name: /Even spacing/, level: 1 })).toBeVisible();
  const calculator = page.getByRole("region", { name: "Even spacing calculator" }).first();
  await expect(calculator).toBeVisible();
  const count = calculator.getByLabel("Number of members");
  await count.fill("6");
  const desc = calculator.locator("desc");
  await expect(desc).toContainText("6 members");
  await count.fill("9");
  await expect(desc).toContainText("9 members");
  // A lesson's calculator keeps its state to itself: the address does not change.
  await expect(page).not.toHaveURL(/count=9/);
  await expect(page.getByRole("heading", { name: "Sources", level: 2 })).toBeVisible();
});

test("an anonymous reader is invited to sign up to keep progress", async ({ page }) => {
  await page.goto("/lessons/even-spacing");
  await expect(page.getByText("to mark lessons complete and keep your progress")).toBeVisible();
});

test("a student marks a lesson complete and sees it in the outline after a reload", async ({ page }) => {
  const student = DEMO_STUDENTS[9];
  await signIn(page, student.email);
  await expectSignedInAs(page, student.name);
  await page.goto("/lessons/even-spacing");
  await page.getByRole("button", { name: "Mark lesson complete" }).click();
  await expect(page.getByText("You completed this lesson.")).toBeVisible();
  await page.goto("/lessons");
  await page.reload();
  const item = page.getByRole("listitem").filter({ has: page.getByRole("link", { name: /Even spacing/ }) });
  await expect(item.getByText("Completed")).toBeVisible();
});

test("an unknown lesson is a 404 page", async ({ page }) => {
  const res = await page.goto("/lessons/no-such-lesson");
  expect(res?.status()).toBe(404);
  await expect(page.getByRole("heading", { name: "Nothing is marked here." })).toBeVisible();
});

test("a lesson prints without the site chrome or the table of contents", async ({ page }) => {
  await page.goto("/lessons/even-spacing");
  await page.emulateMedia({ media: "print" });
  await expect(page.locator("header[data-chrome]")).toBeHidden();
  await expect(page.getByText("In this lesson")).toBeHidden();
  await expect(page.getByText("On this page")).toBeHidden();
  await expect(page.getByRole("heading", { level: 1 })).toBeVisible();
});

test("lesson math is set by KaTeX's stylesheet: the MathML copy is for screen readers only", async ({ page }) => {
  await page.goto("/lessons/even-spacing");
  const formula = page.locator(".katex-display").first();
  await expect(formula).toBeVisible();
  // Without the stylesheet the MathML copy shows beside the typeset formula as a second, plain-text one.
  await expect(formula.locator(".katex-mathml")).toHaveCSS("position", "absolute");
  await expect(formula.locator(".katex-mathml")).toHaveCSS("clip-path", "inset(50%)");
  await expect(formula.locator(".katex-html")).toHaveCSS("display", "block");
});

test("a lesson's calculator lays out in the text column without cramming its results", async ({ page }) => {
  await page.goto("/lessons/board-and-batten-wall");
  const calculator = page.getByRole("region", { name: "Wall grid calculator" });
  // The lesson's own list styling stops at the calculator: its warnings carry no bullets.
  await expect(calculator.getByRole("list", { name: "Warnings" })).toHaveCSS("list-style-type", "none");
  // Side by side in a prose-wide column, the results were too narrow for their tables, which scrolled.
  const crammed = await calculator.locator("table").evaluateAll((tables) =>
    tables.filter((t) => t.parentElement!.scrollWidth > t.parentElement!.clientWidth + 1).map((t) => t.querySelector("caption")?.textContent ?? "a table"),
  );
  expect(crammed).toEqual([]);
});

test("on a desktop the table of contents is a side column that stays in view", async ({ page }) => {
  await page.goto("/lessons/board-and-batten-wall");
  const toc = page.getByRole("navigation", { name: "In this lesson" });
  await expect(toc).toBeVisible();
  await expect(page.getByText("On this page")).toBeHidden();
  await toc.getByRole("link", { name: "Order of installation" }).click();
  await expect(page).toHaveURL(/#order-of-installation$/);
  await expect(page.getByRole("heading", { name: "Order of installation", level: 2 })).toBeInViewport();
  await expect(toc).toBeInViewport();
});
