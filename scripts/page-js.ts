/**
 * First-load JavaScript per page, read from the build output (run `npm run build` first).
 *
 *   npm run bench:page-js                       # every page route, smallest first; each lesson's excess
 *   npm run bench:page-js -- /safety /lessons/even-spacing   # some prerendered pages
 *   npm run bench:page-js -- --json             # machine-readable, for comparing two builds
 *   npm run bench:page-js -- --nomodule         # also count the legacy-browser polyfills
 *
 * It starts nothing. Two sources, because neither alone covers every page:
 *
 * - Prerendered pages (every lesson, /safety, /calculators…): the `.html` files under
 *   `<distDir>/server/app`, every script the page makes the browser fetch — each `<script src>`, and
 *   each `<link rel="preload" as="script">`, which is how next/dynamic names the chunks a
 *   server-rendered lazy component needs to hydrate. This is exactly what a browser loads.
 * - Every page route, dynamic ones included (`/classes/[classId]/gradebook`…): the route's client
 *   reference manifest (`<distDir>/server/app/<route>/page_client-reference-manifest.js`), whose
 *   `entryJSFiles` name the chunks of the page, its layouts and their error/not-found boundaries, plus
 *   the bootstrap every page loads (`rootMainFiles` in build-manifest.json). A dynamic route has no
 *   file to read and fetching it would need a signed-in user and real ids for every parameter; the
 *   manifests need neither. What they cannot see is a next/dynamic chunk a page renders on the
 *   server, which the browser fetches at once (they appear in the HTML only): for prerendered pages
 *   the HTML figure is shown, so a lesson's calculators count.
 *
 * Sizes are gzipped with node:zlib at its default level (what a compressing server sends).
 * `nomodule` scripts (Next's polyfills, ≈39 KB gzipped on every page) are left out unless asked
 * for: a browser that runs modules never downloads them.
 */
import fs from "node:fs";
import path from "node:path";
import vm from "node:vm";
import { gzipSync } from "node:zlib";

const distDir = path.resolve(process.env.NEXT_DIST_DIR ?? ".next");
const appDir = path.join(distDir, "server/app");

type PageJs = { route: string; scripts: number; bytes: number; gzip: number; source: "html" | "manifest" };

/** Route → prerendered file; route groups such as `(site)` are not part of the address. */
function prerenderedPages(): Map<string, string> {
  const pages = new Map<string, string>();
  for (const entry of fs.readdirSync(appDir, { recursive: true, withFileTypes: true })) {
    if (!entry.isFile() || !entry.name.endsWith(".html")) continue;
    const file = path.join(entry.parentPath, entry.name);
    const segments = path
      .relative(appDir, file)
      .replace(/\.html$/, "")
      .split(path.sep)
      .filter((s) => !/^\(.*\)$/.test(s));
    const route = "/" + segments.join("/");
    pages.set(route === "/index" ? "/" : route, file);
  }
  return pages;
}

function scriptSources(html: string, withNomodule: boolean): string[] {
  const sources = new Set<string>();
  for (const [tag] of html.matchAll(/<script\b[^>]*>/gi)) {
    if (!withNomodule && /\bnomodule\b/i.test(tag)) continue;
    const src = /\bsrc="([^"]+)"/i.exec(tag)?.[1];
    if (src) sources.add(src);
  }
  for (const [tag] of html.matchAll(/<link\b[^>]*>/gi)) {
    if (!/\brel="preload"/i.test(tag) || !/\bas="script"/i.test(tag)) continue;
    const href = /\bhref="([^"]+)"/i.exec(tag)?.[1];
    if (href) sources.add(href);
  }
  return [...sources];
}

const gzipCache = new Map<string, { bytes: number; gzip: number }>();

function measureScript(src: string): { bytes: number; gzip: number } {
  const urlPath = src.replace(/^https?:\/\/[^/]+/, "").split(/[?#]/)[0];
  if (!urlPath.startsWith("/_next/static/")) throw new Error(`A script outside /_next/static: ${src}`);
  const file = path.join(distDir, "static", decodeURIComponent(urlPath.slice("/_next/static/".length)));
  let size = gzipCache.get(file);
  if (!size) {
    const body = fs.readFileSync(file);
    size = { bytes: body.length, gzip: gzipSync(body).length };
    gzipCache.set(file, size);
  }
  return size;
}

function total(route: string, sources: string[], source: PageJs["source"]): PageJs {
  const sizes = sources.map(measureScript);
  return {
    route,
    scripts: sizes.length,
    bytes: sizes.reduce((sum, s) => sum + s.bytes, 0),
    gzip: sizes.reduce((sum, s) => sum + s.gzip, 0),
    source,
  };
}

function pageJs(route: string, pages: Map<string, string>, withNomodule: boolean): PageJs {
  const file = pages.get(route);
  if (!file) throw new Error(`${route} was not prerendered (no .html in ${path.relative(process.cwd(), appDir)}); is it a dynamic page?`);
  return total(route, scriptSources(fs.readFileSync(file, "utf8"), withNomodule), "html");
}

/** "/(teaching)/classes/[classId]/page" → "/classes/[classId]". */
function routeOf(entry: string): string {
  const segments = entry.split("/").filter((s) => s && !/^\(.*\)$/.test(s));
  segments.pop();
  return "/" + segments.join("/");
}

/** Every page route the build knows, with the scripts its manifests say it loads first. */
function manifestPages(withNomodule: boolean): PageJs[] {
  const build = JSON.parse(fs.readFileSync(path.join(distDir, "build-manifest.json"), "utf8")) as { rootMainFiles: string[]; polyfillFiles: string[] };
  const bootstrap = [...build.rootMainFiles, ...(withNomodule ? build.polyfillFiles : [])];
  const entries = Object.keys(JSON.parse(fs.readFileSync(path.join(distDir, "server/app-paths-manifest.json"), "utf8")) as Record<string, string>);
  return entries
    .filter((entry) => entry.endsWith("/page"))
    .map((entry) => {
      const file = path.join(appDir, `${entry.slice(1)}_client-reference-manifest.js`);
      // The file assigns to globalThis.__RSC_MANIFEST; run it in a sandbox of its own.
      const sandbox: { __RSC_MANIFEST?: Record<string, { entryJSFiles: Record<string, string[]> }> } = {};
      vm.runInNewContext(fs.readFileSync(file, "utf8"), sandbox);
      const manifest = sandbox.__RSC_MANIFEST?.[entry];
      if (!manifest) throw new Error(`${path.relative(process.cwd(), file)} has no manifest for ${entry}`);
      const chunks = new Set([...bootstrap, ...Object.values(manifest.entryJSFiles).flat()]);
      return total(routeOf(entry), [...chunks].map((c) => `/_next/${c}`), "manifest");
    });
}

/**
 * One row per page a browser can open: a prerendered page by its HTML, every other route by its
 * manifests. A route prerendered for several params (/lessons/[slug]) is listed by each page.
 */
function allPages(pages: Map<string, string>, withNomodule: boolean): PageJs[] {
  const rows = [...pages.keys()].filter((route) => route !== "/_global-error").map((route) => pageJs(route, pages, withNomodule));
  const prerendered = new Set(rows.map((r) => r.route));
  // A route is prerendered when its address, with any [param] filled, is one of the HTML files.
  const coveredBy = (route: string) => {
    const pattern = new RegExp("^" + route.replace(/\[[^\]]+\]/g, "[^/]+") + "$");
    return [...prerendered].some((r) => pattern.test(r));
  };
  for (const row of manifestPages(withNomodule)) if (!coveredBy(row.route)) rows.push(row);
  return rows.sort((a, b) => a.gzip - b.gzip || a.route.localeCompare(b.route));
}

const kb = (n: number) => (n / 1024).toFixed(1).padStart(7);

function printTable(rows: PageJs[], withSource: boolean) {
  const width = Math.max(...rows.map((r) => r.route.length), 5);
  console.log(`${"page".padEnd(width)}  scripts      KB  KB gzip${withSource ? "  from" : ""}`);
  for (const r of rows) console.log(`${r.route.padEnd(width)}  ${String(r.scripts).padStart(7)} ${kb(r.bytes)} ${kb(r.gzip)}${withSource ? `  ${r.source}` : ""}`);
}

function main(argv: string[]) {
  if (!fs.existsSync(appDir)) throw new Error(`No build in ${distDir}: run \`npm run build\` first.`);
  const json = argv.includes("--json");
  const withNomodule = argv.includes("--nomodule");
  const pages = prerenderedPages();
  const asked = argv.filter((a) => !a.startsWith("--"));
  if (asked.length > 0) {
    const rows = asked.map((r) => pageJs(r, pages, withNomodule));
    if (json) console.log(JSON.stringify(rows, null, 2));
    else printTable(rows, false);
    return;
  }
  const rows = allPages(pages, withNomodule);
  // Internal pages (/_not-found) are not addresses anyone opens.
  const smallest = rows.find((r) => !r.route.startsWith("/_"))!;
  const lessons = rows.filter((r) => r.route.startsWith("/lessons/")).sort((a, b) => a.route.localeCompare(b.route));
  if (json) {
    console.log(JSON.stringify({ pages: rows, smallest: smallest.route, lessonExcess: lessons.map((l) => ({ route: l.route, gzip: l.gzip - smallest.gzip })) }, null, 2));
    return;
  }
  printTable(rows, true);
  console.log(`\nsmallest: ${smallest.route}, ${kb(smallest.gzip).trim()} KB gzip (${smallest.scripts} scripts)`);
  console.log("lessons over it:");
  const width = Math.max(...lessons.map((l) => l.route.length));
  for (const l of lessons) console.log(`  ${l.route.padEnd(width)}  +${kb(l.gzip - smallest.gzip).trim()} KB gzip (${((l.gzip / smallest.gzip - 1) * 100).toFixed(0)} %)`);
}

main(process.argv.slice(2));
