import { expect, test } from "@playwright/test";

test("the home page has the product name, the main navigation and the safety link", async ({ page }) => {
  await page.goto("/");
  await expect(page.getByRole("link", { name: "Sixteenths" })).toBeVisible();
  await expect(page.getByRole("heading", { level: 1 })).toHaveText("Count the spaces, not the boards.");
  await page.getByRole("contentinfo").getByRole("link", { name: "Shop safety" }).click();
  await expect(page.getByRole("heading", { name: "Shop safety" })).toBeVisible();
});

test("nothing overflows the page sideways", async ({ page }) => {
  test.setTimeout(60_000);
  const calculators = ["even-spacing", "wall-grid", "cut-list", "guard-spacing", "stairs", "fraction-bench"].map((k) => `/calculators/${k}`);
  for (const path of ["/", "/signin", "/signup", "/safety", "/calculators", ...calculators, "/lessons", "/lessons/board-and-batten-wall"]) {
    await page.goto(path);
    const overflow = await page.evaluate(() => document.documentElement.scrollWidth - document.documentElement.clientWidth);
    expect(overflow, `${path} scrolls sideways`).toBeLessThanOrEqual(0);
  }
});

test("the fonts come from the app itself, not the network", async ({ page }) => {
  const fontHosts = new Set<string>();
  page.on("request", (req) => {
    if (req.resourceType() === "font") fontHosts.add(new URL(req.url()).host);
  });
  await page.goto("/");
  await page.evaluate(() => document.fonts.ready);
  expect([...fontHosts].every((h) => h.startsWith("127.0.0.1"))).toBe(true);
  expect(await page.evaluate(() => getComputedStyle(document.body).fontFamily)).toMatch(/Atkinson|textFont|__/i);
});

test("printing hides the header and footer", async ({ page }) => {
  await page.goto("/safety");
  await page.emulateMedia({ media: "print" });
  await expect(page.locator("header[data-chrome]")).toBeHidden();
  await expect(page.locator("footer[data-chrome]")).toBeHidden();
  await expect(page.getByRole("heading", { name: "Shop safety" })).toBeVisible();
});
