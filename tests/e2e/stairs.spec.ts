import { expect, test, type Page } from "@playwright/test";

const steps = (page: Page) => page.getByRole("table").filter({ hasText: "Marks for each step" });
const rules = (page: Page) => page.getByRole("table").filter({ hasText: "Rules of thumb" });
const drawingDesc = (page: Page) => page.getByRole("img", { name: "Stair drawing" }).locator("desc");
const readout = (page: Page, label: string) => page.locator("dl > div").filter({ has: page.getByText(label, { exact: true }) });

test("the handbook's 94 inch rise: 13 risers of 7 1/4, 12 treads of 10 1/2, 126 of run", async ({ page }) => {
  await page.goto("/calculators/stairs");
  await page.getByRole("textbox", { name: "Total rise" }).fill("94");
  await page.getByLabel("Riser to aim for").fill("7");
  await page.getByLabel("A tread depth I choose").check();
  await page.getByRole("textbox", { name: "Tread depth" }).fill("10 1/2");
  // US Army carpentry manual EN5156 §2-19/20 (REFERENCES.md): 94 / 7 = 13.43 → 13 risers;
  // 94 / 13 = 7.23 → 7 1/4" risers; 12 treads at 10 1/2" → total run 126".
  await expect(readout(page, "Risers")).toContainText("13");
  await expect(readout(page, "Riser height")).toContainText('7 1/4"');
  await expect(readout(page, "Riser height")).toContainText("exact 7 3/13″");
  await expect(readout(page, "Treads")).toContainText("12");
  await expect(readout(page, "Tread depth")).toContainText('10 1/2"');
  await expect(readout(page, "Total run")).toContainText(`10' 6"`);
  await expect(drawingDesc(page)).toContainText('13 risers of 7 1/4" and 12 treads of 10 1/2"');
  await expect(drawingDesc(page)).toContainText('total run of 126"');
  await expect(readout(page, "Stringer length")).toContainText("about");
  // The same manual's rules of thumb: 2R + T = 25 (24.96), R + T = 17–19 (17.73), R × T ≈ 75 (75.92).
  await expect(rules(page).locator("[data-ok=true]")).toHaveCount(3);
  // 13 rows of marks plus the header; the 13th riser's top is the upper floor at 94" (arithmetic).
  await expect(steps(page).getByRole("row")).toHaveCount(14);
  await expect(steps(page).getByRole("row").last()).toContainText('94"');
  await expect(steps(page).getByRole("row").last()).toContainText('126"');
  await expect(page).toHaveURL(/totalRise=94&treadsBy=treadDepth/);
});

test("a lower riser limit adds a riser, and a limit over the code warns", async ({ page }) => {
  await page.goto("/calculators/stairs");
  await page.getByRole("textbox", { name: "Total rise" }).fill("94");
  // Arithmetic: 94 / 7 = 13.43, so a 7" limit needs 14 risers of 94/14 = 6 5/7" (6 11/16" at 1/16).
  await page.getByLabel("Tallest riser allowed").fill("7");
  await expect(readout(page, "Risers")).toContainText("14");
  await expect(readout(page, "Riser height")).toContainText('6 11/16"');
  await expect(page.locator("[data-warning=riser-over-code]")).toHaveCount(0);

  // Arithmetic: 94 / 8 = 11.75 → 12 risers of 7 5/6" — over the 7 3/4" of IRC 2018 R311.7.5.1.
  await page.getByLabel("Tallest riser allowed").fill("8");
  await expect(readout(page, "Risers")).toContainText("12");
  await expect(page.locator("[data-warning=riser-over-code]")).toContainText('over the 7 3/4"');
});

test("the demo stair and the code caution", async ({ page }) => {
  await page.goto("/calculators/stairs");
  await expect(page.getByRole("textbox", { name: "Total rise" })).toHaveValue("104 3/4");
  // Arithmetic: 104 3/4 / 7 3/4 = 13.5 → 14 risers of 7.482", 7 1/2" at 1/16; 13 treads of 10".
  await expect(drawingDesc(page)).toContainText('14 risers of 7 1/2" and 13 treads of 10"');
  const caution = page.getByRole("complementary").filter({ hasText: "Check your local code." });
  await expect(caution).toBeVisible();
  // IRC 2018 R311.7.5.1, R311.7.5.2, R311.7.2, R311.7.1.
  await expect(caution).toContainText('each riser to 7 3/4" (R311.7.5.1)');
  await expect(caution).toContainText('at least 10" deep');
  await expect(caution).toContainText(`headroom of at least 6' 8" (R311.7.2)`);
  await expect(caution).toContainText('width of at least 36" (R311.7.1)');
  await expect(caution).toContainText("licensed practice");
});

test("an unreadable length says what is wrong and the old results go away", async ({ page }) => {
  await page.goto("/calculators/stairs");
  await page.getByRole("textbox", { name: "Total rise" }).fill("8' 8 3/");
  await expect(page.getByText(/fraction/i).first()).toBeVisible();
  await expect(page.getByText("Fix the highlighted field to see the layout.")).toBeVisible();
  await expect(steps(page)).toHaveCount(0);
  await expect(page.getByText("Check your local code.", { exact: true })).toBeVisible();

  await page.getByRole("textbox", { name: "Total rise" }).fill("94");
  await page.getByLabel("The total run I have").check();
  await expect(page.getByText("Enter the total run to see the layout.")).toBeVisible();
});

test("a shared link restores the whole layout", async ({ page }) => {
  await page.goto("/calculators/stairs?unit=in&denominator=32&totalRise=94&treadsBy=totalRun&totalRun=126&treadDepth=&maxRiser=&minTread=&targetRiser=7&nosing=1");
  await expect(page.getByRole("textbox", { name: "Total rise" })).toHaveValue("94");
  await expect(page.getByLabel("The total run I have")).toBeChecked();
  await expect(page.getByRole("textbox", { name: "Total run" })).toHaveValue("126");
  await expect(page.getByLabel("Round to")).toHaveValue("32");
  // EN5156 again, from the run: 126 / 12 treads = 10 1/2"; 94 / 13 = 7.2308" → 7 7/32" at 1/32 (arithmetic).
  await expect(readout(page, "Tread depth")).toContainText('10 1/2"');
  await expect(readout(page, "Riser height")).toContainText('7 7/32"');
  // 10 1/2" tread + 1" nosing = an 11 1/2" tread board.
  await expect(readout(page, "Tread board")).toContainText('11 1/2"');
});

test("switching to millimetres converts the lengths and keeps the layout", async ({ page }) => {
  await page.goto("/calculators/stairs");
  await page.getByRole("textbox", { name: "Total rise" }).fill("94");
  await page.getByText("mm", { exact: true }).click();
  // 94" × 25.4 = 2387.6 mm exactly; 1" nosing = 25.4 mm; 7 3/4" = 196.85 mm → 196.9 mm.
  await expect(page.getByRole("textbox", { name: "Total rise" })).toHaveValue("2387.6 mm");
  await expect(page.getByRole("textbox", { name: /^Nosing/ })).toHaveValue("25.4 mm");
  await expect(page.getByText("blank = 196.9 mm (IRC R311.7.5.1)")).toBeVisible();
  await expect(drawingDesc(page)).toContainText("13 risers of 184 mm");
  await expect(page).toHaveURL(/unit=mm/);
});

test("the print view is a shop sheet: inputs hidden, drawing and tables kept", async ({ page }) => {
  await page.goto("/calculators/stairs");
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("form", { name: "Stair layout inputs" })).toBeHidden();
  await expect(page.getByText("Sixteenths shop sheet · Stair layout")).toBeVisible();
  await expect(page.getByRole("img", { name: "Stair drawing" })).toBeVisible();
  await expect(steps(page)).toBeVisible();
  await expect(rules(page)).toBeVisible();
  await expect(page.getByText("Check your local code.", { exact: true })).toBeVisible();
  const pdf = await page.pdf({ format: "Letter" });
  expect(pdf.byteLength).toBeGreaterThan(10_000);
});

test("on a 360 px phone nothing scrolls sideways", async ({ page }) => {
  await page.setViewportSize({ width: 360, height: 740 });
  await page.goto("/calculators/stairs");
  await expect(page.getByRole("img", { name: "Stair drawing" })).toBeVisible();
  const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
  expect(overflow).toBeLessThanOrEqual(0);
});
