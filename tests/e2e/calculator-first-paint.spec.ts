import { expect, test, type Page } from "@playwright/test";
import { holdScripts } from "./helpers";

// What a calculator is before its scripts run: the server's HTML, which a phone on a slow
// connection shows (and lets the visitor type into) for a second or more.

const box = (page: Page, name: string) => page.getByRole("textbox", { name, exact: true });
const elevation = (page: Page) => page.getByRole("img", { name: "Wall elevation" });

test.describe("without scripts", () => {
  test.use({ javaScriptEnabled: false });

  test("the boxes hold the layout's values and can be typed into", async ({ page }) => {
    await page.goto("/calculators/wall-grid?unit=in&denominator=32&wallWidth=130&by=maxBay&maxBay=20");
    await expect(box(page, "Wall width")).toHaveValue("130");
    await expect(box(page, "Wall width")).toBeEnabled();
    await expect(box(page, "Widest bay allowed")).toHaveValue("20");
    await expect(page.getByRole("radio", { name: "The widest bay allowed" })).toBeChecked();
    await expect(page.getByRole("radio", { name: "inches" })).toBeChecked();
    await expect(page.getByRole("combobox", { name: "Round to" })).toHaveValue("32");
    await expect(page.getByRole("checkbox", { name: "Check which verticals land on a stud" })).toBeChecked();
  });
});

test("what a visitor types and picks before the page hydrates is kept and laid out", async ({ page }) => {
  const release = await holdScripts(page);
  await page.goto("/calculators/wall-grid", { waitUntil: "domcontentloaded" });
  await box(page, "Wall width").fill("130");
  await page.getByRole("radio", { name: "The widest bay allowed" }).check();
  await page.getByRole("combobox", { name: "Round to" }).selectOption("8");
  release();

  // Hydrated: the address follows the form, and the field that only the chosen mode shows appears.
  await expect(page).toHaveURL(/wallWidth=130&/);
  await expect(page).toHaveURL(/by=maxBay/);
  await expect(page).toHaveURL(/denominator=8&/);
  await expect(box(page, "Widest bay allowed")).toHaveValue("24");
  await expect(box(page, "Wall width")).toHaveValue("130");
  await expect(page.getByRole("radio", { name: "The widest bay allowed" })).toBeChecked();
  await expect(elevation(page).locator("desc")).toContainText("Elevation of a wall 130");
});

test("a phone gets the narrow canvas, a screen the wide one, and paper the narrow one", async ({ page }) => {
  await page.goto("/calculators/wall-grid");
  await expect(elevation(page)).toHaveAttribute("viewBox", /^0 0 640 /);
  await page.setViewportSize({ width: 360, height: 740 });
  await expect(elevation(page)).toHaveAttribute("viewBox", /^0 0 380 /);
  await page.setViewportSize({ width: 1280, height: 800 });
  await page.emulateMedia({ media: "print" });
  await expect(elevation(page)).toHaveAttribute("viewBox", /^0 0 380 /);
});
