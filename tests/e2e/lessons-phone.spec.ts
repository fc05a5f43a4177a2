// Lessons on a 360 px phone (the "phone" project runs this file; the desktop one does not).
import { expect, test } from "@playwright/test";

test("the table of contents folds under the lesson header and its links jump", async ({ page }) => {
  await page.goto("/lessons/board-and-batten-wall");
  await expect(page.getByRole("navigation", { name: "In this lesson" })).toBeHidden();
  const summary = page.locator("summary", { hasText: "On this page" });
  const title = page.getByRole("heading", { level: 1 });
  // The title and summary come first; the folded list sits under them, above the lesson text.
  const [titleBox, summaryBox, objectivesBox] = await Promise.all([title.boundingBox(), summary.boundingBox(), page.getByRole("heading", { name: "Objectives" }).boundingBox()]);
  expect(summaryBox!.y).toBeGreaterThan(titleBox!.y + titleBox!.height);
  expect(summaryBox!.y).toBeLessThan(objectivesBox!.y);

  const toc = page.getByRole("navigation", { name: "On this page" });
  await expect(toc).toBeHidden();
  // Keyboard: the summary takes focus and Enter opens it; Tab reaches the first link.
  await summary.focus();
  await page.keyboard.press("Enter");
  await expect(toc).toBeVisible();
  await page.keyboard.press("Tab");
  await expect(toc.getByRole("link", { name: "Objectives" })).toBeFocused();

  await toc.getByRole("link", { name: "Order of installation" }).tap();
  await expect(page).toHaveURL(/#order-of-installation$/);
  await expect(page.getByRole("heading", { name: "Order of installation", level: 2 })).toBeInViewport();
  await expect(summary).not.toBeInViewport();

  await page.evaluate(() => window.scrollTo(0, 0));
  await toc.getByRole("link", { name: "Sources" }).tap();
  await expect(page).toHaveURL(/#sources$/);
  await expect(page.getByRole("heading", { name: "Sources", level: 2 })).toBeInViewport();
});

test("a lesson and its embedded calculator fit the width without sideways scrolling", async ({ page }) => {
  await page.goto("/lessons/board-and-batten-wall");
  await expect(page.getByRole("region", { name: "Wall grid calculator" })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
});
