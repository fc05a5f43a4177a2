import { expect, test } from "@playwright/test";
import { DEMO_STUDENTS } from "@/seeders/demo";
import { signIn, expectSignedInAs } from "./helpers";

const marks = (page: import("@playwright/test").Page) => page.getByRole("table").filter({ hasText: "Marks from the left end" });

test("changing the inputs changes the marks, the drawing and the address", async ({ page }) => {
  await page.goto("/calculators/even-spacing");
  await page.getByLabel("Span", { exact: true }).fill("128 3/4");
  await page.getByLabel("Member width").fill("2 1/2");
  await page.getByLabel("Number of members").fill("6");
  // common practice, no source: six 2 1/2" verticals on a 128 3/4" wall leave five bays of 22 3/4";
  // the second vertical's left edge is at 25 1/4".
  await expect(page.getByText("reads as 10' 8 3/4\"")).toBeVisible();
  await expect(marks(page).getByRole("row")).toHaveCount(7);
  await expect(marks(page).getByRole("row").nth(2)).toContainText('25 1/4"');
  await expect(page.getByRole("img", { name: "Layout drawing" }).locator("desc")).toContainText('5 equal gaps of 22 3/4"');
  await expect(page).toHaveURL(/span=128\+3%2F4/);

  await page.getByLabel("Number of members").fill("7");
  await expect(marks(page).getByRole("row")).toHaveCount(8);
  await expect(page.getByRole("img", { name: "Layout drawing" }).locator("desc")).toContainText("6 equal gaps");
});

test("an unreadable length says what is wrong and the old results go away", async ({ page }) => {
  await page.goto("/calculators/even-spacing");
  await page.getByLabel("Span", { exact: true }).fill("12 3/");
  await expect(page.getByText(/fraction/i).first()).toBeVisible();
  await expect(page.getByText("Fix the highlighted field to see the layout.")).toBeVisible();
  await expect(marks(page)).toHaveCount(0);
});

test("a shared link restores the whole layout", async ({ page }) => {
  await page.goto("/calculators/even-spacing?unit=in&denominator=32&span=96&memberWidth=1+1%2F2&by=maxGap&count=&maxGap=4&endCondition=gaps");
  await expect(page.getByLabel("Span", { exact: true })).toHaveValue("96");
  await expect(page.getByRole("textbox", { name: "Widest gap allowed" })).toHaveValue("4");
  await expect(page.getByLabel("Round to")).toHaveValue("32");
  await expect(page.getByLabel("A gap at each end (between two posts)")).toBeChecked();
  // 96" between posts, 1 1/2" members, gaps ≤ 4" (at most): n ≥ (96 − 4) / 5.5 → 17 members, 18 gaps of 3 5/6" (arithmetic).
  await expect(marks(page).getByRole("row")).toHaveCount(18);
});

test("switching to millimetres converts the typed lengths", async ({ page }) => {
  await page.goto("/calculators/even-spacing");
  await page.getByLabel("Span", { exact: true }).fill("100");
  await page.getByText("mm", { exact: true }).click();
  // 100" × 25.4 = 2540 mm exactly.
  await expect(page.getByLabel("Span", { exact: true })).toHaveValue("2540 mm");
});

test("a signed-in student saves the layout and reopens it from My layouts", async ({ page }) => {
  const student = DEMO_STUDENTS[5];
  await signIn(page, student.email);
  await expectSignedInAs(page, student.name);
  await page.goto("/calculators/even-spacing");
  await page.getByLabel("Span", { exact: true }).fill("100 1/4");
  await page.getByRole("button", { name: "Save layout" }).click();
  await page.getByLabel("Name").fill("Mudroom wall");
  await page.getByRole("button", { name: "Save", exact: true }).click();
  await expect(page.getByText("Saved “Mudroom wall”.")).toBeVisible();

  await page.goto("/layouts");
  await page.getByRole("link", { name: "Mudroom wall" }).click();
  await expect(page.getByLabel("Span", { exact: true })).toHaveValue("100 1/4");

  await page.goto("/layouts");
  await page.getByRole("button", { name: "Rename Mudroom wall" }).click();
  await page.getByLabel("New name").fill("Mudroom, east wall");
  await page.getByRole("button", { name: "Save name" }).click();
  await expect(page.getByRole("link", { name: "Mudroom, east wall" })).toBeVisible();

  page.once("dialog", (dialog) => dialog.accept());
  await page.getByRole("button", { name: "Delete Mudroom, east wall" }).click();
  await expect(page.getByText("No saved layouts yet.")).toBeVisible();
});

test("the print view is a shop sheet: inputs hidden, drawing and marks kept", async ({ page }) => {
  await page.goto("/calculators/even-spacing");
  await page.emulateMedia({ media: "print" });
  await expect(page.getByRole("form", { name: "Even spacing inputs" })).toBeHidden();
  await expect(page.getByText("Sixteenths shop sheet · Even spacing")).toBeVisible();
  await expect(page.getByRole("img", { name: "Layout drawing" })).toBeVisible();
  await expect(marks(page)).toBeVisible();
  const pdf = await page.pdf({ format: "Letter" });
  expect(pdf.byteLength).toBeGreaterThan(10_000);
});
