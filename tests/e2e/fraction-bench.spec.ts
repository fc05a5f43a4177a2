import { expect, test, type Page } from "@playwright/test";

const section = (page: Page, name: string) => page.getByRole("region", { name, exact: true });
const tape = (page: Page) => page.getByRole("slider", { name: "Tape reading" });
const readout = (page: Page) => page.locator("[data-tape-readout]");

// Typing before React has hydrated the form would be overwritten by the form's first render.
async function open(page: Page, path = "/calculators/fraction-bench") {
  await page.goto(path);
  await page.waitForLoadState("networkidle");
}

test("a calculation on lengths gives the exact, rounded and plain-number answers", async ({ page }) => {
  await open(page);
  const calculate = section(page, "Calculate");
  // Arithmetic: 3 × 1 1/2 = 4.5; 96 − 4.5 = 91.5; 91.5 ÷ 4 = 22.875 = 22 7/8.
  await expect(calculate.getByLabel("Calculation")).toHaveValue("(96 - 3 × 1 1/2) ÷ 4");
  await expect(calculate.getByText('22 7/8"', { exact: true })).toBeVisible();
  await expect(calculate.getByText(/exact 22\.875″ · no rounding/)).toBeVisible();

  // Arithmetic: 3 × 2.5 = 7.5 — a bare number beside × is a count.
  await calculate.getByLabel("Calculation").fill('3 × 2 1/2"');
  await expect(calculate.getByText('7 1/2"', { exact: true })).toBeVisible();
  await expect(page).toHaveURL(/expr=3\+%C3%97\+2\+1%2F2%22/);

  // Arithmetic: 96 ÷ 24 = 4 — a length ÷ a length is how many fit, a plain number.
  await calculate.getByLabel("Calculation").fill('96 ÷ 24"');
  await expect(calculate.getByText("How many fit", { exact: true })).toBeVisible();
  await expect(calculate.getByText("4", { exact: true }).first()).toBeVisible();
  await expect(calculate.getByText('4"', { exact: true })).toHaveCount(0);

  // The sign keys write into the box at the caret (phone keyboards have no × or ÷).
  await calculate.getByRole("button", { name: "Clear" }).click();
  await calculate.getByLabel("Calculation").pressSequentially("22 3/4");
  await calculate.getByRole("button", { name: "Insert divided by" }).click();
  await calculate.getByLabel("Calculation").pressSequentially("2");
  await expect(calculate.getByLabel("Calculation")).toHaveValue("22 3/4 ÷ 2");
  // Arithmetic: 22.75 ÷ 2 = 11.375 = 11 3/8.
  await expect(calculate.getByText('11 3/8"', { exact: true })).toBeVisible();
});

test("a calculation that cannot be read says why and marks where", async ({ page }) => {
  await open(page);
  const calculate = section(page, "Calculate");
  const box = calculate.getByLabel("Calculation");

  await box.fill("22 3/4 +");
  await expect(calculate.getByText('"+" needs a length or a number after it.')).toBeVisible();
  await expect(box).toHaveAttribute("aria-invalid", "true");
  // Something is missing at the end: a caret after the text.
  await expect(calculate.locator("[data-error-at]")).toHaveText("‸");
  await expect(calculate.getByText("Fix the calculation to see the answer.")).toBeVisible();

  await box.fill('(96 - 3" × 2"');
  await expect(calculate.getByText(/Cannot multiply a length by a length/)).toBeVisible();
  await expect(calculate.locator("[data-error-at]")).toHaveText("×");

  await box.fill("(96 - 3");
  await expect(calculate.getByText(/is never closed/)).toBeVisible();
  await expect(calculate.locator("[data-error-at]")).toHaveText("(");

  await box.fill("96 - 3");
  await expect(box).not.toHaveAttribute("aria-invalid", "true");
  await expect(calculate.getByText('93"', { exact: true })).toBeVisible();
});

test("a decimal converts to the nearest sixteenth with its error, and a fraction to a decimal", async ({ page }) => {
  await open(page);
  const convert = section(page, "Convert");
  // US Navy Builder manual (REFERENCES.md): decimal part × 16, .5 or more rounds up —
  // 0.78125 × 16 = 12.5 → 13, so 22.78125 reads 22 13/16, which is 1/32 long.
  await expect(convert.getByLabel("Decimal inches")).toHaveValue("22.78125");
  await expect(convert.getByText('22 13/16"', { exact: true })).toBeVisible();
  await expect(convert.getByText(/error \+1\/32" · the mark is long/)).toBeVisible();
  await expect(convert.getByText(/0\.78125 × 16 = 12\.5 sixteenths → 13\/16 \(an exact half rounds up\)/)).toBeVisible();

  // Arithmetic: 13/16 = 0.8125.
  await convert.getByLabel("Fraction or mixed number").fill("5 13/16");
  await expect(convert.getByText("5.8125″", { exact: true })).toBeVisible();
  await convert.getByLabel("Fraction or mixed number").fill("1/3");
  await expect(convert.getByText("0.333333…″", { exact: true })).toBeVisible();

  await convert.getByLabel("Decimal inches").fill("22.7.8");
  await expect(convert.getByText(/a number has one decimal point/)).toBeVisible();
});

test("inches and millimetres convert exactly, and the mm setting converts typed lengths", async ({ page }) => {
  await open(page);
  const convert = section(page, "Convert");
  // 1" = 25.4 mm exactly (the international inch, 1959).
  await convert.getByLabel("Length, in inches or mm").fill('1"');
  await expect(convert.getByText("25.4 mm", { exact: true })).toBeVisible();
  // Arithmetic: 600 / 25.4 = 23.622…, nearest sixteenth 23 5/8 (23.625).
  await convert.getByLabel("Length, in inches or mm").fill("600 mm");
  await expect(convert.getByText('23 5/8"', { exact: true })).toBeVisible();

  await page.getByText("mm", { exact: true }).click();
  // 8' = 96" × 25.4 = 2438.4 mm.
  await expect(section(page, "Lumber sizes").getByLabel("Board length")).toHaveValue("2438.4 mm");
  const calculate = section(page, "Calculate");
  await expect(calculate.getByText("Numbers with no unit are millimetres; write 1 1/2\" for inches.")).toBeVisible();
  // Arithmetic: 600 − 2 × 19 = 562 mm; 562 / 25.4 = 22.126… → 22 1/8".
  await calculate.getByLabel("Calculation").fill("600 - 2 × 19");
  await expect(calculate.getByText("562 mm", { exact: true })).toBeVisible();
  await expect(calculate.getByText('22 1/8"', { exact: true })).toBeVisible();
  await expect(page).toHaveURL(/unit=mm/);
});

test("rounding shows the graduations either side; an exact half rounds away from zero", async ({ page }) => {
  await open(page);
  const round = section(page, "Round");
  await expect(round.getByText("An exact half rounds away from zero (up, for a length).")).toBeVisible();
  // 1/32" is exactly halfway between 0 and 1/16". NIST Handbook 44 §10.3 would read the even
  // graduation (0); this bench rounds half away from zero and says so, so it lands on 1/16".
  await round.getByLabel("Length to round (or a calculation)").fill("1/32");
  const sixteenths = round.locator('tr[data-round-to="16"]');
  await expect(sixteenths).toContainText('0"');
  await expect(sixteenths).toContainText('1/16"');
  await expect(sixteenths.locator("td").first()).toContainText('1/16"');
  await expect(sixteenths).toContainText("exactly halfway: away from zero");
  await expect(sixteenths).toContainText('+1/32"');
  // At 1/8 it is nearer 0; at 1/32 it is on a graduation.
  await expect(round.locator('tr[data-round-to="8"] td').first()).toHaveText('0"');
  await expect(round.locator('tr[data-round-to="32"]')).toContainText("on a graduation");
  await expect(round.locator("svg desc")).toContainText('At 1/16″ it rounds to 1/16", error +1/32"');

  // The demo hallway wall (demo example): (141 1/2 − 8 × 3 1/2) ÷ 7 = 113 1/2 ÷ 7 = 16 3/14 = 16.2142857…
  // × 8 = 129.71 → 130/8 = 16 1/4; × 16 = 259.43 → 259/16 = 16 3/16; × 32 = 518.86 → 519/32 = 16 7/32 (arithmetic).
  await round.getByLabel("Length to round (or a calculation)").fill("(141 1/2 - 8 × 3 1/2) ÷ 7");
  await expect(round.locator('tr[data-round-to="8"] td').first()).toHaveText('16 1/4"');
  await expect(round.locator('tr[data-round-to="16"] td').first()).toHaveText('16 3/16"');
  await expect(round.locator('tr[data-round-to="32"] td').first()).toHaveText('16 7/32"');
});

test("the tape reads back where the keyboard or a click puts the marker", async ({ page }) => {
  await open(page);
  const slider = tape(page);
  await expect(slider).toHaveAttribute("aria-valuetext", "22 inches");
  await slider.focus();
  // Twelve sixteenths past 22 is 22 12/16 = 22 3/4 (arithmetic).
  for (let i = 0; i < 12; i++) await page.keyboard.press("ArrowRight");
  await expect(slider).toHaveAttribute("aria-valuetext", "22 3/4 inches");
  await expect(slider).toHaveAttribute("aria-valuenow", "22.75");
  await expect(readout(page)).toHaveText('22 3/4"');
  await expect(page.getByText("22 and 12/16 — 12/16 reduces to 3/4")).toBeVisible();
  await expect(page.locator("[data-tape-reading] desc")).toContainText('The marker is on 22 3/4".');
  await expect(page).toHaveURL(/tape=22\+3%2F4/);

  await page.keyboard.press("Shift+ArrowRight");
  await expect(readout(page)).toHaveText('23 3/4"');
  await page.keyboard.press("Shift+ArrowLeft");
  await page.keyboard.press("ArrowLeft");
  await expect(readout(page)).toHaveText('22 11/16"');

  await page.locator('[data-graduation="23 1/8"]').click();
  await expect(readout(page)).toHaveText('23 1/8"');
  await expect(slider).toHaveAttribute("aria-valuetext", "23 1/8 inches");

  await page.getByRole("button", { name: "On one inch" }).click();
  await page.getByRole("button", { name: "On one inch" }).click();
  // Past the drawn stretch, the tape moves along so the marker stays in view.
  await expect(readout(page)).toHaveText('25 1/8"');
  await expect(page.locator("[data-tape-reading] desc")).toContainText('A tape measure from 23" to 26"');
});

test("practice names a length and checks where the marker was put", async ({ page }) => {
  await open(page);
  await page.getByRole("button", { name: "Give me a length to find" }).click();
  const target = (await page.locator("[data-tape-target]").textContent()) ?? "";
  expect(target).toMatch(/^\d+ \d+\/\d+"$/);
  await expect(page).toHaveURL(/seed=\w+/);

  await page.locator(`[data-graduation="${target.replace('"', "")}"]`).click();
  await page.getByRole("button", { name: "Check my mark" }).click();
  await expect(page.getByRole("status")).toHaveText(`Right — the marker is on ${target}.`);

  await tape(page).focus();
  await page.keyboard.press("ArrowRight");
  await page.getByRole("button", { name: "Check my mark" }).click();
  await expect(page.getByRole("status")).toContainText(`1/16" past ${target}`);

  // The same seed asks for the same length after a reload.
  await page.reload();
  await expect(page.locator("[data-tape-target]")).toHaveText(target);
});

test("a shared link restores every section", async ({ page }) => {
  const params = new URLSearchParams({
    unit: "in",
    denominator: "32",
    style: "feet-inches",
    expr: "8' - 2 × 3/4",
    decimal: "22.78125",
    fraction: "3/8",
    metric: "2",
    round: "5 3/64",
    tape: "5 1/4",
    nominal: "2x4",
    boardLength: "14'",
  });
  await open(page, `/calculators/fraction-bench?${params}`);
  await expect(page.getByLabel("Round to")).toHaveValue("32");
  await expect(page.getByLabel("feet and inches, 1' 10 3/4\"")).toBeChecked();
  // Arithmetic: 96 − 1.5 = 94.5 = 7' 10 1/2".
  await expect(section(page, "Calculate").getByText("7' 10 1/2\"", { exact: true })).toBeVisible();
  // At 1/32 the decimal is exact: 0.78125 × 32 = 25, so 22 25/32" with no error (arithmetic).
  await expect(section(page, "Convert").getByText('22 25/32"', { exact: true })).toBeVisible();
  await expect(section(page, "Convert").getByText("0.375″", { exact: true })).toBeVisible();
  // 2" × 25.4 = 50.8 mm.
  await expect(section(page, "Convert").getByText("50.8 mm", { exact: true })).toBeVisible();
  await expect(tape(page)).toHaveAttribute("aria-valuetext", "5 1/4 inches");
  // Board measure (US Navy Engineering Aid manual, REFERENCES.md): a 14' 2x4 is 2 × 4 × 14 / 12 = 9 1/3 bf;
  // PS 20 dry size 1 1/2" × 3 1/2".
  const lumber = section(page, "Lumber sizes");
  await expect(lumber.getByText("9 1/3 bf")).toBeVisible();
  await expect(lumber.getByText('1 1/2" × 3 1/2"')).toBeVisible();
});

test("the print view is a shop sheet of the calculations, with the tape drawn", async ({ page }) => {
  await open(page);
  await page.emulateMedia({ media: "print" });
  await expect(page.getByText("Sixteenths shop sheet · Fraction bench")).toBeVisible();
  await expect(page.getByRole("form", { name: "Fraction bench inputs" })).toBeHidden();
  await expect(page.getByRole("form", { name: "Calculate inputs" })).toBeHidden();
  const sheet = page.getByRole("table", { name: "Calculations on the bench" });
  await expect(sheet).toBeVisible();
  await expect(sheet.getByRole("row", { name: /Calculate/ })).toContainText('22 7/8"');
  await expect(sheet.getByRole("row", { name: /Decimal to a fraction/ })).toContainText('22 13/16"');
  await expect(sheet.getByRole("row", { name: /Tape reading/ })).toContainText('22"');
  await expect(page.locator("[data-tape-reading] svg")).toBeVisible();
  const pdf = await page.pdf({ format: "Letter" });
  expect(pdf.byteLength).toBeGreaterThan(10_000);
});

test.describe("on a 360 px phone", () => {
  test.use({ viewport: { width: 360, height: 740 }, isMobile: true, hasTouch: true });

  test("the bench fits the width and a tap reads a graduation", async ({ page }) => {
    await open(page);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow).toBeLessThanOrEqual(0);
    await page.locator('[data-graduation="22 5/8"]').tap();
    await expect(readout(page)).toHaveText('22 5/8"');
    await page.getByRole("button", { name: "On one sixteenth" }).tap();
    await expect(readout(page)).toHaveText('22 11/16"');
  });
});
