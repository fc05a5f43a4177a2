import { expect, test, type Page } from "@playwright/test";

const marks = (page: Page) => page.getByRole("table").filter({ hasText: "Marks from the left end" });
const drawingDesc = (page: Page) => page.getByRole("img", { name: "Guard drawing" }).locator("desc");
const readout = (page: Page, label: string) => page.locator("dl > div").filter({ has: page.getByText(label, { exact: true }) });

test("72 inches between posts with 2x2 balusters takes 13, each opening 3 3/4", async ({ page }) => {
  await page.goto("/calculators/guard-spacing");
  await page.getByLabel("Span between posts").fill("72");
  await page.getByLabel("Baluster width").fill("1 1/2");
  // REFERENCES.md, baluster example (a general how-to page, medium confidence): 72" between posts,
  // 1 1/2" balusters, openings under 4" → 13 balusters, 14 spaces, 52 1/2 / 14 = 3 3/4".
  await expect(readout(page, "Balusters")).toContainText("13");
  await expect(readout(page, "Spaces")).toContainText("14");
  await expect(readout(page, "Opening")).toContainText('3 3/4"');
  await expect(drawingDesc(page)).toContainText('13 balusters 1 1/2" wide');
  await expect(drawingDesc(page)).toContainText('14 equal openings of 3 3/4"');
  await expect(marks(page).getByRole("row")).toHaveCount(14);
  // First baluster's left edge sits one opening from the post: 3 3/4" (arithmetic).
  await expect(marks(page).getByRole("row").nth(1)).toContainText('3 3/4"');
  await expect(page).toHaveURL(/span=72&balusterWidth=1\+1%2F2/);

  // REFERENCES.md, the second example: 52" span, same balusters → fewest is 9 (computed).
  await page.getByLabel("Span between posts").fill("52");
  await expect(drawingDesc(page)).toContainText("9 balusters");
  await expect(marks(page).getByRole("row")).toHaveCount(10);
});

test("the demo porch guard explains why one baluster fewer fails the sphere rule", async ({ page }) => {
  await page.goto("/calculators/guard-spacing");
  await expect(page.getByLabel("Span between posts")).toHaveValue(`9' 2"`);
  await expect(page.getByText(`reads as 9' 2"`)).toBeVisible();
  // Arithmetic: 110" span, 1 1/2" balusters, under 4": n > (110 − 4) / 5.5 = 19.3 → 20 balusters.
  // One fewer, 19: (110 − 28 1/2) / 20 = 4.075", which rounds to 4 1/16" and lets a 4" sphere through.
  await expect(readout(page, "Balusters")).toContainText("20");
  const note = page.getByTestId("one-fewer");
  await expect(note).toContainText("one baluster fewer (19)");
  await expect(note).toContainText('4 1/16"');
  await expect(note).toContainText('a 4" sphere passes');
  await expect(drawingDesc(page)).toContainText('A 4" sphere is drawn to scale');
  await expect(drawingDesc(page)).toContainText('the openings would be 4 1/16"');
});

test("the code caution is on the page", async ({ page }) => {
  await page.goto("/calculators/guard-spacing");
  const caution = page.getByRole("complementary").filter({ hasText: "Check your local code." });
  await expect(caution).toBeVisible();
  // IRC 2018 R312.1.1 (30" above grade), R312.1.2 (36" tall), R312.1.3 (4" sphere).
  await expect(caution).toContainText('more than 30" above');
  await expect(caution).toContainText("R312.1.1");
  await expect(caution).toContainText('at least 36" tall (R312.1.2)');
  await expect(caution).toContainText('4" sphere');
});

test("an unreadable length says what is wrong and the old results go away", async ({ page }) => {
  await page.goto("/calculators/guard-spacing");
  await page.getByLabel("Baluster width").fill("1 1/");
  await expect(page.getByText(/fraction/i).first()).toBeVisible();
  await expect(page.getByText("Fix the highlighted field to see the layout.")).toBeVisible();
  await expect(marks(page)).toHaveCount(0);
  // The code caution stays while the layout is gone.
  await expect(page.getByText("Check your local code.", { exact: true })).toBeVisible();
});

test("a shared link restores the layout, including the open side of a stair", async ({ page }) => {
  await page.goto("/calculators/guard-spacing?unit=in&denominator=32&span=72&balusterWidth=1+1%2F2&limit=stair&maxOpening=4");
  await expect(page.getByLabel("Span between posts")).toHaveValue("72");
  await expect(page.getByLabel("Round to")).toHaveValue("32");
  await expect(page.getByLabel(/open side of a stair/)).toBeChecked();
  // IRC 2018 R312.1.3 allows 4 3/8" on the open side of a stair. Arithmetic: n > (72 − 4 3/8) / 5 7/8 = 11.5
  // → 12 balusters; 13 openings of (72 − 18) / 13 = 4 2/13" ≈ 4.154", 4 5/32" at 1/32.
  await expect(drawingDesc(page)).toContainText('12 balusters');
  await expect(readout(page, "Opening")).toContainText('4 5/32"');

  await page.getByLabel("A limit I type (your local code)").check();
  await page.getByRole("textbox", { name: "Largest opening" }).fill("3 1/2");
  // Arithmetic: n > (72 − 3 1/2) / 5 = 13.7 → 14 balusters.
  await expect(drawingDesc(page)).toContainText("14 balusters");
  await expect(page).toHaveURL(/limit=other&maxOpening=3\+1%2F2/);
});

test("switching to millimetres converts the lengths and keeps the layout", async ({ page }) => {
  await page.goto("/calculators/guard-spacing");
  await page.getByLabel("Span between posts").fill("72");
  await page.getByText("mm", { exact: true }).click();
  // 72" × 25.4 = 1828.8 mm and 1 1/2" = 38.1 mm exactly; 4" = 101.6 mm.
  await expect(page.getByLabel("Span between posts")).toHaveValue("1828.8 mm");
  await expect(page.getByLabel("Baluster width")).toHaveValue("38.1 mm");
  await expect(page.getByText("101.6 mm — deck, porch, landing")).toBeVisible();
  await expect(drawingDesc(page)).toContainText("13 balusters 38 mm wide");
  await expect(page).toHaveURL(/unit=mm/);
});

test("the print view is a shop sheet: inputs hidden, drawing and marks kept", async ({ page }) => {
  await page.goto("/calculators/guard-spacing");
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("form", { name: "Guard spacing inputs" })).toBeHidden();
  await expect(page.getByText("Sixteenths shop sheet · Guard spacing")).toBeVisible();
  await expect(page.getByRole("img", { name: "Guard drawing" })).toBeVisible();
  // On paper the 20 marks of the demo guard run in two tables of 10 side by side.
  await expect(marks(page)).toHaveCount(2);
  await expect(marks(page).first().getByRole("row")).toHaveCount(11);
  await expect(marks(page).last().getByRole("row").last()).toContainText("20");
  await expect(page.getByText("Check your local code.", { exact: true })).toBeVisible();
  const pdf = await page.pdf({ format: "Letter" });
  expect(pdf.byteLength).toBeGreaterThan(10_000);
});

test("on a 360 px phone nothing scrolls sideways", async ({ page }) => {
  await page.setViewportSize({ width: 360, height: 740 });
  await page.goto("/calculators/guard-spacing");
  await expect(page.getByRole("img", { name: "Guard drawing" })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
});
