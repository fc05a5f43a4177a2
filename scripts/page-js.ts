/**
 * First-load JavaScript of prerendered pages, read from the build output (run `npm run build` first).
 *
 *   npm run bench:page-js                       # /safety and every lesson
 *   npm run bench:page-js -- /safety /lessons/even-spacing
 *   npm run bench:page-js -- --json /safety     # machine-readable, for comparing two builds
 *   npm run bench:page-js -- --nomodule         # also count the legacy-browser polyfills
 *
 * It starts nothing: it reads the prerendered `.html` files under `<distDir>/server/app`, takes every
 * script the page makes the browser fetch — each `<script src>`, and each `<link rel="preload"
 * as="script">`, which is how next/dynamic names the chunks a server-rendered lazy component needs
 * to hydrate — and sums their sizes gzipped with node:zlib at its default level (what a compressing
 * server sends). `nomodule` scripts (Next's polyfills, ≈39 KB gzipped on
 * every page) are left out unless asked for: a browser that runs modules never downloads them.
 */
import fs from "node:fs";
import path from "node:path";
import { gzipSync } from "node:zlib";

const distDir = path.resolve(process.env.NEXT_DIST_DIR ?? ".next");
const appDir = path.join(distDir, "server/app");

type PageJs = { route: string; scripts: number; bytes: number; gzip: number };

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

function pageJs(route: string, pages: Map<string, string>, withNomodule: boolean): PageJs {
  const file = pages.get(route);
  if (!file) throw new Error(`${route} was not prerendered (no .html in ${path.relative(process.cwd(), appDir)}); is it a dynamic page?`);
  const sizes = scriptSources(fs.readFileSync(file, "utf8"), withNomodule).map(measureScript);
  return {
    route,
    scripts: sizes.length,
    bytes: sizes.reduce((sum, s) => sum + s.bytes, 0),
    gzip: sizes.reduce((sum, s) => sum + s.gzip, 0),
  };
}

function main(argv: string[]) {
  if (!fs.existsSync(appDir)) throw new Error(`No build in ${distDir}: run \`npm run build\` first.`);
  const json = argv.includes("--json");
  const withNomodule = argv.includes("--nomodule");
  const pages = prerenderedPages();
  const asked = argv.filter((a) => !a.startsWith("--"));
  const routes = asked.length > 0 ? asked : ["/safety", ...[...pages.keys()].filter((r) => r.startsWith("/lessons/")).sort()];
  const rows = routes.map((r) => pageJs(r, pages, withNomodule));
  if (json) {
    console.log(JSON.stringify(rows, null, 2));
    return;
  }
  const kb = (n: number) => (n / 1024).toFixed(1).padStart(7);
  const width = Math.max(...rows.map((r) => r.route.length), 5);
  console.log(`${"page".padEnd(width)}  scripts      KB  KB gzip`);
  for (const r of rows) console.log(`${r.route.padEnd(width)}  ${String(r.scripts).padStart(7)} ${kb(r.bytes)} ${kb(r.gzip)}`);
}

main(process.argv.slice(2));
