import fs from "node:fs";
import path from "node:path";
import { describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_STUDENTS } from "@/seeders/demo";
import { signInCookie } from "../support/http";

const baseURL = inject("baseURL");
const distDir = path.join(process.cwd(), process.env.NEXT_DIST_DIR ?? ".next");
const slugs = fs
  .readdirSync(path.join(process.cwd(), "content/lessons"))
  .filter((f) => /^\d{2}-.*\.mdx$/.test(f))
  .map((f) => f.replace(/^\d{2}-/, "").replace(/\.mdx$/, ""));

/** The JavaScript a page makes the browser fetch on first load, next/dynamic's preloaded chunks included. */
async function pageScripts(route: string): Promise<string> {
  const html = await (await fetch(`${baseURL}${route}`)).text();
  const sources = new Set([
    ...[...html.matchAll(/<script[^>]+src="([^"]+)"/g)].map((m) => m[1]),
    ...[...html.matchAll(/<link(?=[^>]*rel="preload")(?=[^>]*as="script")[^>]*href="([^"]+)"/g)].map((m) => m[1]),
  ]);
  const bodies = await Promise.all([...sources].map(async (src) => (await fetch(`${baseURL}${src}`)).text()));
  return bodies.join("\n");
}

describe("lessons", () => {
  it("has at least ten lessons", () => {
    expect(slugs.length).toBeGreaterThanOrEqual(10);
  });

  it.each(slugs)("%s is rendered at build time, with its math already typeset", (slug) => {
    // The prerendered HTML in the build output: KaTeX ran during `next build`, not in the browser.
    const html = fs.readFileSync(path.join(distDir, "server/app/lessons", `${slug}.html`), "utf8");
    expect(html).toContain('class="katex"');
    expect(html).toContain("<h1");
  });

  it.each(slugs)("%s sets its $$ formulas as display math, not inline", (slug) => {
    const file = fs.readdirSync(path.join(process.cwd(), "content/lessons")).find((f) => f.endsWith(`-${slug}.mdx`))!;
    const source = fs.readFileSync(path.join(process.cwd(), "content/lessons", file), "utf8");
    // Written on one line, $$…$$ is inline math to remark-math: text-size fractions that wrap on a phone.
    expect(source).not.toMatch(/^\$\$\S.*\$\$\s*$/m);
    const fences = source.match(/^\$\$\s*$/gm)?.length ?? 0;
    const html = fs.readFileSync(path.join(distDir, "server/app/lessons", `${slug}.html`), "utf8");
    expect(html.split('class="katex-display"').length - 1).toBe(fences / 2);
  });

  it.each(slugs)("%s sends no KaTeX code to the reader", async (slug) => {
    // Every script the page fetches, the calculators' lazily loaded chunks included.
    const js = await pageScripts(`/lessons/${slug}`);
    expect(js.length).toBeGreaterThan(0);
    expect(js).not.toMatch(/renderToString|KaTeX parse error/);
  });

  it("loads only the calculators a lesson shows", async () => {
    // Labels that only the stair and even-spacing calculators carry. The stair lesson proves the label
    // reaches the browser at all; the tape lesson embeds neither calculator, so it must not fetch them.
    const stairs = await pageScripts("/lessons/stair-layout");
    expect(stairs).toContain("Total rise");
    const tape = await pageScripts("/lessons/reading-a-tape");
    expect(tape).not.toContain("Total rise");
    expect(tape).not.toContain("Number of members");
  });

  it("answers a real 404 for an unknown lesson", async () => {
    expect((await fetch(`${baseURL}/lessons/no-such-lesson`)).status).toBe(404);
  });

  it("every internal link in every lesson resolves", async () => {
    const checked = new Map<string, number>();
    for (const slug of ["", ...slugs]) {
      const html = await (await fetch(`${baseURL}/lessons${slug ? `/${slug}` : ""}`)).text();
      const main = html.slice(html.indexOf('<main'), html.indexOf("</main>"));
      for (const [, href] of main.matchAll(/href="(\/[^"#]*)(?:#[^"]*)?"/g)) {
        const target = href.replace(/&amp;/g, "&");
        if (checked.has(target)) continue;
        const res = await fetch(`${baseURL}${target}`, { redirect: "manual" });
        checked.set(target, res.status);
      }
    }
    const broken = [...checked].filter(([, status]) => status >= 400);
    expect(broken).toEqual([]);
    expect(checked.size).toBeGreaterThan(5);
  });
});

describe("lesson progress", () => {
  const slug = slugs[0];

  it("needs an account", async () => {
    expect((await fetch(`${baseURL}/api/progress`)).status).toBe(401);
  });

  it("is recorded per user and only moves forward", async () => {
    const cookie = (await signInCookie(baseURL, DEMO_STUDENTS[6].email, DEMO_PASSWORD))!;
    const post = (body: unknown) =>
      fetch(`${baseURL}/api/progress`, { method: "POST", headers: { cookie, "content-type": "application/json" }, body: JSON.stringify(body) });
    expect(await (await post({ slug, status: "opened" })).json()).toEqual({ slug, status: "opened" });
    expect(await (await post({ slug, status: "completed" })).json()).toEqual({ slug, status: "completed" });
    // Opening a finished lesson again keeps it finished.
    expect(await (await post({ slug, status: "opened" })).json()).toEqual({ slug, status: "completed" });
    const { progress } = await (await fetch(`${baseURL}/api/progress`, { headers: { cookie } })).json();
    expect(progress).toEqual({ [slug]: "completed" });

    const other = (await signInCookie(baseURL, DEMO_STUDENTS[7].email, DEMO_PASSWORD))!;
    expect((await (await fetch(`${baseURL}/api/progress`, { headers: { cookie: other } })).json()).progress).toEqual({});
  });

  it("keeps both of two writes that race for a lesson not yet started", async () => {
    // A quick reader can press "Mark lesson complete" while the page is still recording "opened".
    const cookie = (await signInCookie(baseURL, DEMO_STUDENTS[5].email, DEMO_PASSWORD))!;
    const post = (lesson: string, status: string) =>
      fetch(`${baseURL}/api/progress`, { method: "POST", headers: { cookie, "content-type": "application/json" }, body: JSON.stringify({ slug: lesson, status }) });
    for (const lesson of slugs) {
      const [opened, completed] = await Promise.all([post(lesson, "opened"), post(lesson, "completed")]);
      expect([lesson, opened.status, completed.status]).toEqual([lesson, 200, 200]);
      expect((await completed.json()).status).toBe("completed");
    }
    const { progress } = await (await fetch(`${baseURL}/api/progress`, { headers: { cookie } })).json();
    expect(Object.values(progress)).toEqual(slugs.map(() => "completed"));
  });

  it("rejects an unknown lesson and a status the reader may not set", async () => {
    const cookie = (await signInCookie(baseURL, DEMO_STUDENTS[8].email, DEMO_PASSWORD))!;
    const post = (body: unknown) =>
      fetch(`${baseURL}/api/progress`, { method: "POST", headers: { cookie, "content-type": "application/json" }, body: JSON.stringify(body) });
    const unknown = await post({ slug: "no-such-lesson", status: "opened" });
    expect(unknown.status).toBe(404);
    const practised = await post({ slug, status: "practised" });
    expect(practised.status).toBe(400);
    expect((await practised.json()).error.fields).toHaveProperty("status");
  });
});
