import { expect, test, type Browser, type Page } from "@playwright/test";
import { DEMO_STAFF, DEMO_STUDENTS } from "@/seeders/demo";
import { expectSignedInAs, signIn } from "./helpers";

// On a phone a wide table scrolls sideways inside its card: the keyboard must be able to reach and
// scroll that box, and a table that fits must not add an empty stop. And the header, which learns
// who is signed in only after the page has painted, must keep its height when it does.

const phone = { width: 360, height: 740 };
const tablet = { width: 768, height: 1024 };
const desktop = { width: 1280, height: 800 };

async function phonePage(browser: Browser) {
  const context = await browser.newContext({ viewport: phone });
  return { context, page: await context.newPage() };
}

/** Presses Tab until the focused element matches `selector`; fails after `limit` presses. */
async function tabTo(page: Page, selector: string, limit = 60) {
  for (let i = 0; i < limit; i++) {
    await page.keyboard.press("Tab");
    if (await page.evaluate((s) => document.activeElement?.matches(s) ?? false, selector)) return;
  }
  throw new Error(`Tab never reached ${selector}`);
}

test("at 360 px Tab reaches a wide table's named region and the arrow keys scroll it", async ({ browser }) => {
  const { context, page } = await phonePage(browser);
  await page.goto("/calculators/even-spacing");
  await page.waitForLoadState("networkidle");
  const region = page.locator("[data-scroll-region='scrolls']").first();
  await expect(region).toHaveAttribute("role", "region");
  await expect(region).toHaveAttribute("tabindex", "0");
  const name = await region.evaluate((el) => document.getElementById(el.getAttribute("aria-labelledby") ?? "")?.textContent?.trim() ?? "");
  expect(name.length).toBeGreaterThan(3);
  expect(await region.evaluate((el) => el.scrollWidth - el.clientWidth)).toBeGreaterThan(20);

  await tabTo(page, "[data-scroll-region='scrolls']");
  await expect(page.getByRole("region", { name })).toBeFocused();
  // The focus ring is drawn, so a sighted keyboard user sees where they are.
  expect(await region.evaluate((el) => getComputedStyle(el).outlineStyle)).not.toBe("none");
  expect(await region.evaluate((el) => el.scrollLeft)).toBe(0);
  for (let i = 0; i < 4; i++) await page.keyboard.press("ArrowRight");
  await expect.poll(() => region.evaluate((el) => el.scrollLeft)).toBeGreaterThan(0);
  await context.close();
});

test("a table that fits is a plain box, and becomes a region once it no longer fits", async ({ browser }) => {
  const context = await browser.newContext({ viewport: desktop });
  const page = await context.newPage();
  await page.goto("/calculators/even-spacing");
  await page.waitForLoadState("networkidle");
  const box = page.locator("[data-scroll-region]").first();
  await expect(box).toHaveAttribute("data-scroll-region", "fits");
  for (const attribute of ["tabindex", "role", "aria-labelledby"]) await expect(box).not.toHaveAttribute(attribute, /.*/);
  await page.setViewportSize(phone);
  await expect(box).toHaveAttribute("data-scroll-region", "scrolls");
  await expect(box).toHaveAttribute("tabindex", "0");
  await context.close();
});

const roles = [
  { role: "visitor", email: "", name: "" },
  { ...DEMO_STUDENTS[5], role: "student" },
  { ...DEMO_STAFF.find((s) => s.role === "instructor")!, role: "instructor" },
  { ...DEMO_STAFF.find((s) => s.role === "admin")!, role: "admin" },
];

for (const viewport of [phone, tablet, desktop]) {
  for (const account of roles) {
    test(`at ${viewport.width} px the header keeps its height when ${/^[aeiou]/.test(account.role) ? "an" : "a"} ${account.role}'s session loads`, async ({ browser }) => {
      const context = await browser.newContext({ viewport });
      const page = await context.newPage();
      const signedIn = account.role !== "visitor";
      const sessionKnown = async () => {
        if (signedIn) await expectSignedInAs(page, account.name);
        else await expect(page.locator("header").getByRole("link", { name: "Sign in", exact: true })).toBeVisible();
      };
      if (signedIn) {
        await signIn(page, account.email);
        await expectSignedInAs(page, account.name);
      }

      // Every height the header takes, from its first layout on.
      await page.addInitScript(() => {
        const seen: number[] = [];
        (window as unknown as { headerHeights: number[] }).headerHeights = seen;
        document.addEventListener("DOMContentLoaded", () => {
          const header = document.querySelector("header");
          if (header) new ResizeObserver(() => seen.push(Math.round(header.getBoundingClientRect().height))).observe(header);
        });
      });
      // The session answer is held back until the first paint has been measured, so "before" is
      // really the header that does not yet know who is signed in.
      let release = () => {};
      const held = new Promise<void>((resolve) => (release = resolve));
      await page.route("**/api/me", async (route) => {
        await held;
        await route.continue();
      });

      await page.goto("/lessons/even-spacing", { waitUntil: "commit" });
      await page.waitForFunction(() => performance.getEntriesByName("first-contentful-paint").length > 0 && document.querySelector("header") !== null);
      const header = page.locator("header").first();
      const before = await header.evaluate((el) => el.getBoundingClientRect().height);
      // Still waiting: neither the account menu nor the sign-in link is drawn yet.
      await expect(header.getByRole("link", { name: "Sign in", exact: true })).toHaveCount(0);
      await expect(header.locator("details")).toHaveCount(0);
      release();
      await sessionKnown();
      const after = await header.evaluate((el) => el.getBoundingClientRect().height);
      expect(after).toBe(before);
      const heights = await page.evaluate(() => (window as unknown as { headerHeights: number[] }).headerHeights);
      expect(heights.length).toBeGreaterThan(0);
      expect(new Set(heights), `header heights seen: ${heights.join(", ")}`).toEqual(new Set([Math.round(before)]));

      // No link is lost: every one is in the main navigation, reachable even where the row is cut.
      const expected = { visitor: [], student: ["My classes", "My progress"], instructor: ["Classes"], admin: ["Classes", "Users", "All classes"] }[account.role]!;
      const nav = page.getByRole("navigation", { name: "Main" });
      // Where the row is cut, a fade at the cut edge says there is more; where it fits, none.
      const row = nav.getByRole("list");
      await expect
        .poll(() => row.evaluate((el) => `${el.scrollWidth > el.clientWidth + 1} ${getComputedStyle(el).maskImage !== "none"}`))
        .toMatch(/^(true true|false false)$/);
      for (const label of ["Lessons", "Calculators", "Practice", ...expected]) {
        const link = nav.getByRole("link", { name: label, exact: true });
        await link.focus();
        await expect(link).toBeInViewport();
      }
      await context.close();
    });
  }
}
