import { expect, test, type Page } from "@playwright/test";

const readout = (page: Page, label: string) => page.locator("dl > div").filter({ has: page.locator("dt", { hasText: label }) });
const readoutValue = (page: Page, label: string) => readout(page, label).locator("dd").first();
const desc = (page: Page) => page.locator("#cut-list-boards-desc");

// Typing before React has hydrated the form would be lost when the form first renders.
async function open(page: Page, url: string) {
  await page.goto(url);
  await page.waitForLoadState("networkidle");
}
const pieceRows = (page: Page) => page.locator("[data-piece-row]");
const buyTable = (page: Page) => page.getByRole("table").filter({ hasText: "Boards to buy" });

test("the kerf decides whether four 24\" pieces come out of one 96\" board", async ({ page }) => {
  await open(page, "/calculators/cut-list?unit=in&denominator=16&pieces=shelf~24~4&stock=96~&kerf=1%2F8&trim=");
  // REFERENCES.md, saw kerf (common practice, no handbook source): four 24" pieces from a 96"
  // board need three 1/8" kerfs, so the last piece comes out 3/8" short → a second board.
  await expect(readoutValue(page, "Boards to buy")).toHaveText("2");
  await expect(readout(page, "Boards to buy")).toContainText("2 × 8' 0\"");
  // Arithmetic: board 1 gives 3 × 24 + 2 kerfs + the parting kerf = 72 3/8", leaving 23 5/8".
  await expect(desc(page)).toContainText('Board 1, 8\' 0" stock: cut 1, shelf 24"; cut 2, shelf 24"; cut 3, shelf 24"; offcut 23 5/8".');
  await expect(page.locator('[data-board-table="2"]')).toContainText("shelf");
  await expect(page.locator('[data-verdict="proven"]')).toContainText("Proven fewest boards.");

  // With no kerf the four pieces use the board exactly: 4 × 24 = 96.
  await page.getByRole("textbox", { name: "Kerf (saw blade width)" }).fill("0");
  await expect(readout(page, "Boards to buy")).toContainText("1 × 8' 0\"");
  await expect(desc(page)).toContainText("cut 4, shelf 24\"; no offcut.");
  await expect(readout(page, "Waste")).toContainText("0.0%");
  await expect(page).toHaveURL(/kerf=0/);
});

test("pieces are added, removed and restored from the keyboard", async ({ page }) => {
  await open(page, "/calculators/cut-list");
  await expect(pieceRows(page)).toHaveCount(3);
  // The demo list: 7 verticals + 6 row rails + 1 bottom rail = 14 pieces.
  await expect(readout(page, "Pieces add up to")).toContainText("14 pieces placed");

  await page.getByRole("button", { name: "Add a piece" }).click();
  await expect(pieceRows(page)).toHaveCount(4);
  await expect(page.getByRole("textbox", { name: "Piece 4 label" })).toBeFocused();
  await page.keyboard.type("shelf");
  await page.keyboard.press("Tab");
  await expect(page.getByRole("button", { name: "Remove piece 4 (shelf)" })).toBeFocused();
  await page.getByRole("textbox", { name: "Piece 4 length" }).fill("24");
  await page.getByRole("textbox", { name: "Piece 4 Qty" }).fill("2");
  await expect(readout(page, "Pieces add up to")).toContainText("16 pieces placed");
  await expect(page).toHaveURL(/pieces=.*shelf~24~2/);

  await page.getByRole("button", { name: "Remove piece 1 (vertical)" }).click();
  await expect(pieceRows(page)).toHaveCount(3);
  await expect(page.getByRole("textbox", { name: "Piece 1 label" })).toHaveValue("row rail");
  await expect(readout(page, "Pieces add up to")).toContainText("9 pieces placed");
  await expect(page.getByText("Removed “vertical”.")).toBeVisible();
  await expect(page.getByRole("button", { name: "Undo" })).toBeFocused();
  await page.keyboard.press("Enter");
  await expect(pieceRows(page)).toHaveCount(4);
  await expect(page.getByRole("textbox", { name: "Piece 1 label" })).toHaveValue("vertical");
  await expect(page.getByRole("textbox", { name: "Piece 1 length" })).toHaveValue("83 1/2");
  await expect(readout(page, "Pieces add up to")).toContainText("16 pieces placed");
});

test("a shared link restores pieces, stock with prices and settings", async ({ page }) => {
  await open(page, "/calculators/cut-list?unit=in&denominator=32&pieces=shelf~24~4|cleat~11+1%2F4~2&stock=96~5.00|120~&kerf=3%2F32&trim=1%2F2");
  await expect(pieceRows(page)).toHaveCount(2);
  await expect(page.getByRole("textbox", { name: "Piece 2 label" })).toHaveValue("cleat");
  await expect(page.getByRole("textbox", { name: "Piece 2 length" })).toHaveValue("11 1/4");
  await expect(page.getByRole("textbox", { name: "Stock 1 Price $ (optional)" })).toHaveValue("5.00");
  await expect(page.getByRole("textbox", { name: "Kerf (saw blade width)" })).toHaveValue("3/32");
  await expect(page.getByLabel("Round to")).toHaveValue("32");
  // Only one stock length is priced, so the plan ignores cost and says so.
  await expect(page.locator('[data-warning="price-missing"]')).toBeVisible();
  await expect(readout(page, "Cost")).toHaveCount(0);
  await expect(page.locator("[data-board-table]").first()).toContainText("end trim");
});

test("every stock priced: the cost is totalled", async ({ page }) => {
  await open(page, "/calculators/cut-list?pieces=shelf~24~4&stock=96~5.00&kerf=1%2F8");
  // Arithmetic: two 96" boards (see the kerf check) at $5.00 each.
  await expect(readout(page, "Cost")).toContainText("$10.00");
  await expect(buyTable(page)).toContainText("$10.00");
});

test("a piece longer than every stock length is left off with a warning", async ({ page }) => {
  await open(page, "/calculators/cut-list?pieces=ridge+board~150~1|shelf~24~1&stock=96~|144~&kerf=1%2F8");
  // Lumber comes in 2-foot steps (common practice, no source): 150" needs a 14' (168") board.
  await expect(page.locator('[data-warning="piece-longer-than-stock"]')).toContainText("longer than every stock length");
  await expect(page.locator('[data-warning="piece-longer-than-stock"]')).toContainText("a 14' board would do");
  await expect(readout(page, "Pieces add up to")).toContainText("1 piece placed");
});

test("an unreadable length says what is wrong and the old results go away", async ({ page }) => {
  await open(page, "/calculators/cut-list");
  await page.getByRole("textbox", { name: "Piece 2 length" }).fill("19 1/");
  await expect(page.getByText(/fraction/i).first()).toBeVisible();
  await expect(page.getByText("Fix the highlighted field to see the cut list.")).toBeVisible();
  await expect(buyTable(page)).toHaveCount(0);
  await page.getByRole("textbox", { name: "Stock 1 Price $ (optional)" }).fill("4.255");
  await expect(page.getByText("Stock 1 price: give it to the cent, like 4.25.")).toBeVisible();
});

test("switching to millimetres converts every typed length", async ({ page }) => {
  await open(page, "/calculators/cut-list");
  await page.getByText("mm", { exact: true }).click();
  // 83 1/2" × 25.4 = 2120.9 mm; 96" = 2438.4 mm (exact conversions).
  await expect(page.getByRole("textbox", { name: "Piece 1 length" })).toHaveValue("2120.9 mm");
  await expect(page.getByRole("textbox", { name: "Stock 1 length" })).toHaveValue("2438.4 mm");
  await expect(desc(page)).toContainText("2121 mm");
  await expect(readoutValue(page, "Boards to buy")).toHaveText("8");
  await expect(page).toHaveURL(/unit=mm/);
});

test("the wall grid sends its pieces to the cut list", async ({ page }) => {
  await open(page, "/calculators/wall-grid");
  // The wall grid's own plan for its 3 1/2" pieces: 8 boards (the same engine plans both pages).
  await expect(page.getByRole("table", { name: '3 1/2" (1x4) boards to buy' }).getByRole("row", { name: /Total/ })).toContainText("8");
  await page.getByRole("link", { name: 'Open these 3 1/2" (1x4) pieces in the cut list' }).click();
  await expect(page).toHaveURL(/\/calculators\/cut-list\?/);
  await expect(page.getByRole("textbox", { name: "Piece 1 label" })).toHaveValue("bottom rail");
  await expect(pieceRows(page)).toHaveCount(3);
  await expect(readoutValue(page, "Boards to buy")).toHaveText("8");
});

test("the print view is a shop sheet: inputs hidden, boards and tables kept", async ({ page }) => {
  await open(page, "/calculators/cut-list");
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("form", { name: "Cut list inputs" })).toBeHidden();
  await expect(page.getByText("Sixteenths shop sheet · Cut list")).toBeVisible();
  await expect(page.getByRole("img", { name: "Boards and their cuts" })).toBeVisible();
  await expect(buyTable(page)).toBeVisible();
  await expect(page.locator('[data-board-table="1"]')).toBeVisible();
  const pdf = await page.pdf({ format: "Letter" });
  expect(pdf.byteLength).toBeGreaterThan(10_000);
});
