import { expect, test, type Page } from "@playwright/test";

const marks = (page: Page) => page.getByRole("table").filter({ hasText: "Marks from the left end" });
const pieces = (page: Page) => page.getByRole("table").filter({ hasText: "Pieces to cut" });
const studCheck = (page: Page) => page.getByRole("table").filter({ hasText: "Verticals over the studs" });
const readout = (page: Page, label: string) => page.locator("dl > div").filter({ has: page.locator("dt", { hasText: label }) });
const desc = (page: Page) => page.locator("#wall-grid-desc");
// The elevation is drawn on a wide and a narrow canvas, and CSS shows the one that fits the screen.
const vertical = (page: Page, n: number) => page.getByRole("img", { name: "Wall elevation" }).locator(`[data-vertical="${n}"]`);

// Typing before React has hydrated the form would be lost when the form first renders.
async function open(page: Page, url: string) {
  await page.goto(url);
  await page.waitForLoadState("networkidle");
}

async function fillWall(page: Page, values: Record<string, string>) {
  for (const [label, value] of Object.entries(values)) await page.getByRole("textbox", { name: label, exact: true }).fill(value);
}

test("a 128 3/4\" wall with six 2 1/2\" verticals: bays, marks, cut lengths and the drawing", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  await fillWall(page, {
    "Wall width": "128 3/4",
    "Wall height": "96",
    "Top rail width": "5 1/2",
    "Bottom rail width": "2 1/2",
    "Existing base trim height": "4",
    "Vertical width": "2 1/2",
    "Number of verticals": "6",
    "Rows of horizontal rails": "1",
  });
  await expect(page.getByText("reads as 10' 8 3/4\"")).toBeVisible();

  // common practice, no source: six 2 1/2" verticals, one flush at each end of a 128 3/4" wall,
  // leave (128 3/4 − 6 × 2 1/2) ÷ 5 = 113 3/4 ÷ 5 = 22 3/4" bays; the second vertical's left
  // edge is 2 1/2 + 22 3/4 = 25 1/4" from the left end.
  await expect(marks(page).getByRole("row")).toHaveCount(7);
  await expect(marks(page).getByRole("row").nth(2)).toContainText('25 1/4"');
  await expect(readout(page, "Bay (row rail cut)")).toContainText('22 3/4"');
  await expect(desc(page)).toContainText('5 bays of 22 3/4"');
  await expect(desc(page)).toContainText('second vertical\'s left edge is 25 1/4"');

  // common practice, no source: 96 − 5 1/2 top board − 2 1/2 bottom rail − 4 base trim = 84".
  await expect(readout(page, "Vertical cut length")).toContainText('84"');
  await expect(page.locator("[data-working]")).toContainText('96" − 5 1/2" top rail − 2 1/2" bottom rail − 4" base trim = 84"');
  await expect(desc(page)).toContainText('each cut 84" long');

  // The row rails are cut to the bay: one row across five bays is five pieces of 22 3/4".
  await expect(pieces(page).getByRole("row", { name: /Vertical/ })).toContainText(/84"\s*6/);
  await expect(pieces(page).getByRole("row", { name: /Row rail/ })).toContainText(/22 3\/4"\s*5/);
  await expect(page).toHaveURL(/wallWidth=128\+3%2F4/);

  await page.getByRole("textbox", { name: "Number of verticals", exact: true }).fill("7");
  await expect(marks(page).getByRole("row")).toHaveCount(8);
  await expect(desc(page)).toContainText("6 bays of");
});

test("a vertical that misses every stud is flagged in the table, the drawing and a warning", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  await fillWall(page, { "Wall width": "128 3/4", "Vertical width": "2 1/2", "Number of verticals": "6", "First stud centre": "16", "Stud spacing (on centre)": "16" });
  // Arithmetic: studs 16" o.c. (IRC Table R602.3(5)) from 16", 1 1/2" faces, plus a stud at each
  // end (3/4" and 128" centres). Vertical 2 spans 25 1/4"–27 3/4": the nearest studs, 15 1/4"–16 3/4"
  // and 31 1/4"–32 3/4", lie under none of it. Vertical 6 (126 1/4"–128 3/4") covers the end stud.
  await expect(studCheck(page).getByRole("row", { name: /^2 / })).toContainText("misses every stud");
  await expect(studCheck(page).getByRole("row", { name: /^6 / })).toContainText("stud");
  await expect(studCheck(page).getByRole("row", { name: /^6 / })).not.toContainText("misses");
  await expect(vertical(page, 2)).toHaveAttribute("data-misses-studs", "true");
  await expect(vertical(page, 6)).not.toHaveAttribute("data-misses-studs", "true");
  await expect(page.locator('[data-warning="misses-studs"]')).toContainText("Verticals 2, 3, 4, 5 miss every stud");
  await expect(desc(page)).toContainText("Verticals 2, 3, 4 and 5 miss every stud and are hatched.");
  await expect(page.getByText("Fastening a vertical that misses every stud.")).toBeVisible();

  // Move the layout so a stud's centre sits under vertical 2's centre (25 1/4 + 1 1/4 = 26 1/2").
  await fillWall(page, { "First stud centre": "26 1/2" });
  await expect(studCheck(page).getByRole("row", { name: /^2 / })).not.toContainText("misses");
  await expect(vertical(page, 2)).not.toHaveAttribute("data-misses-studs", "true");

  await page.getByLabel("Check which verticals land on a stud").uncheck();
  await expect(studCheck(page)).toHaveCount(0);
  await expect(page.locator('[data-warning="misses-studs"]')).toHaveCount(0);
});

test("a wall longer than the stock splits the rails with joints on studs", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  await fillWall(page, { "Wall width": "200", "Number of verticals": "9" });
  // Arithmetic: the longest stock is 144", so a 200" rail takes two pieces; the stud at 96" (16" o.c.
  // from 16") is the centre nearest halfway, giving 96" + 104", each within 144".
  await expect(page.locator('[data-rail="top rail"]')).toContainText('2 pieces, 96" + 104"; joint at 96" from the left (each joint on a stud centre)');
  await expect(page.locator('[data-warning="rail-split"]').first()).toContainText("cut in 2 pieces");
});

test("unreadable or impossible inputs say what is wrong", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  await fillWall(page, { "Wall width": "12 3/" });
  await expect(page.getByText(/fraction/i).first()).toBeVisible();
  await expect(page.getByText("Fix the highlighted field to see the layout.")).toBeVisible();
  await expect(marks(page)).toHaveCount(0);

  await fillWall(page, { "Wall width": "141 1/2", "Wall height": "10" });
  await expect(page.getByText("The top rail, bottom rail and base trim take the whole wall height")).toBeVisible();

  await fillWall(page, { "Wall height": "96", "Stock lengths": "96, 12O" });
  await expect(page.getByText(/^Length 2:/)).toBeVisible();
});

test("picking a nominal board fills in its actual width", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  // PS 20 dry dressed width of a nominal 6" board: 5 1/2".
  await page.getByLabel("Vertical width: Board").selectOption("1x6");
  await expect(page.getByRole("textbox", { name: "Vertical width", exact: true })).toHaveValue('5 1/2"');
  await expect(pieces(page).getByRole("row", { name: /Vertical/ })).toContainText("(1x6)");
});

test("a shared link restores the whole wall", async ({ page }) => {
  await open(page, 
    "/calculators/wall-grid?unit=in&denominator=32&wallWidth=96&wallHeight=96&topRailWidth=3+1%2F2&bottomRailWidth=3+1%2F2&baseTrimHeight=&verticalWidth=2+1%2F2&by=maxBay&verticalCount=&maxBay=16&rows=0&rowWidth=&studs=off&firstStudCenter=16&studSpacing=16&endStuds=true&stock=96&kerf=1%2F8&trim=0",
  );
  await expect(page.getByRole("textbox", { name: "Wall width", exact: true })).toHaveValue("96");
  await expect(page.getByRole("textbox", { name: "Widest bay allowed", exact: true })).toHaveValue("16");
  await expect(page.getByLabel("Round to")).toHaveValue("32");
  await expect(page.getByLabel("Check which verticals land on a stud")).not.toBeChecked();
  // Arithmetic: n verticals leave (96 − 2 1/2 n) ÷ (n − 1) ≤ 16 when n ≥ 112 ÷ 18 1/2 → 7 verticals,
  // 6 bays of 78 1/2 ÷ 6 = 13 1/12", which rounds to 13 3/32" at 1/32".
  await expect(marks(page).getByRole("row")).toHaveCount(8);
  await expect(readout(page, "Bay")).toContainText('13 3/32"');
  await expect(desc(page)).toContainText("no base trim");
  await expect(studCheck(page)).toHaveCount(0);
});

test("switching to millimetres converts the typed lengths and the results", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  await page.getByText("mm", { exact: true }).click();
  // 141 1/2" × 25.4 = 3594.1 mm; 96" = 2438.4 mm; 83 1/2" = 2120.9 mm (exact conversions).
  await expect(page.getByRole("textbox", { name: "Wall width", exact: true })).toHaveValue("3594.1 mm");
  await expect(page.getByRole("textbox", { name: "Stock lengths", exact: true })).toHaveValue("2438.4 mm, 3048 mm, 3657.6 mm");
  await expect(readout(page, "Vertical cut length")).toContainText("2121 mm");
  await expect(desc(page)).toContainText("3594 mm wide");
  await expect(page).toHaveURL(/unit=mm/);
});

test("the print view is a shop sheet: inputs hidden, drawing and tables kept", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  const inputsLine = page.getByText(/^wall .+ × .+ · verticals 7 × .+ · rails top .+ · rows 1 · studs .+ o\.c\. from .+$/);
  await expect(inputsLine).toBeHidden();
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("form", { name: "Wall grid inputs" })).toBeHidden();
  await expect(page.getByText("Sixteenths shop sheet · Wall grid")).toBeVisible();
  await expect(inputsLine).toBeVisible();
  await expect(page.getByRole("img", { name: "Wall elevation" })).toBeVisible();
  await expect(marks(page)).toBeVisible();
  await expect(pieces(page)).toBeVisible();
  await expect(page.getByRole("table", { name: 'Cuts from each 3 1/2" (1x4) board' })).toBeVisible();
  // The demo wall's 1x4 pieces: seven 83 1/2" verticals, six 19 1/2" row rails and the 141 1/2"
  // bottom rail. Arithmetic: no two of those eight long pieces share even a 144" board (the
  // shortest pair is 167"), so 8 boards at least; a 144" board takes a vertical and three row
  // rails (83 1/2 + 3 × 19 1/2 + 3 kerfs of 1/8 = 142 3/8"), so two 12' boards hold all six rails,
  // the bottom rail needs the third 12', and the other five verticals each take an 8' board.
  await expect(page.getByRole("heading", { name: /3 1\/2" \(1x4\) stock/ })).toContainText("buy 5 × 8' 0\", 3 × 12' 0\"");
  const pdf = await page.pdf({ format: "Letter" });
  expect(pdf.byteLength).toBeGreaterThan(10_000);
});
