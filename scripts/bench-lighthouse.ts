/**
 * Lighthouse in mobile mode on the pages people open most: the home page, a lesson with math and a
 * calculator, the wall-grid calculator, a practice problem and the demo class's gradebook.
 *
 *   npm run build && npm run bench:pages               # 3 runs a page, prints the medians
 *   npm run bench:pages -- --runs 5 --why              # more runs; name what costs each page time
 *   npm run bench:pages -- --only lesson,gradebook     # some of the pages
 *   npm run bench:pages -- --strict                    # exit 1 when a page misses a target
 *   NEXT_DIST_DIR=.next-old npm run bench:pages        # another build, e.g. before a change
 *
 * Slow (a minute or more a page), so `npm run bench` leaves it out. It starts the built app on a fresh
 * demo database (tests/support/app-server.ts), signs in over HTTP like the sign-in form, and hands the
 * session cookie to Lighthouse as an extra request header for the pages behind sign-in. Lighthouse runs
 * with its defaults: a Moto G Power-sized phone, simulated slow 4G and a 4× slower CPU. Its figures
 * follow the CPU it runs on, so each run's benchmark index is printed beside them; on a busy machine
 * TBT and the score drop first, and the median of several runs is the figure to quote.
 *
 * Targets: performance ≥ 95 and web.dev's "good" thresholds (LCP ≤ 2.5 s, CLS ≤ 0.1, TBT ≤ 200 ms).
 * Chromium is Debian's (/usr/bin/chromium, or CHROME_PATH), headless, a fresh profile for every run.
 *
 * Each run is Lighthouse's own CLI in a plain Node process rather than its API in this one: tsx
 * compiles node_modules too and wraps functions in a `__name` helper, and Lighthouse sends some of
 * its functions to the page as source text, where that helper does not exist.
 */
import { execFile } from "node:child_process";
import path from "node:path";
import { promisify } from "node:util";
import { startApp, type RunningApp } from "../tests/support/app-server";
import { signInCookie } from "../tests/support/http";
import { DEMO_CLASS, DEMO_PASSWORD, DEMO_STAFF } from "../seeders/demo";

const INSTRUCTOR = DEMO_STAFF.find((p) => p.role === "instructor")!.email;
// A self-learner: practice works without a class, and their problem page is the one a student sees.
const LEARNER = DEMO_STAFF.find((p) => p.role === "student")!.email;

const TARGETS = { score: 95, lcpMs: 2500, cls: 0.1, tbtMs: 200 };

type Page = { name: string; path: string; cookie: string | null };
type Run = { version: string; score: number; lcpMs: number; cls: number; tbtMs: number; fcpMs: number; benchmarkIndex: number; why: string[] };

function option(argv: string[], name: string): string | undefined {
  const at = argv.indexOf(name);
  return at >= 0 ? argv[at + 1] : undefined;
}

async function json<T>(res: Response): Promise<T> {
  if (!res.ok) throw new Error(`${res.url} answered ${res.status}: ${await res.text()}`);
  return (await res.json()) as T;
}

async function pagesToMeasure(app: RunningApp): Promise<Page[]> {
  const instructor = await signInCookie(app.url, INSTRUCTOR, DEMO_PASSWORD);
  const learner = await signInCookie(app.url, LEARNER, DEMO_PASSWORD);
  if (!instructor || !learner) throw new Error("Signing in to the demo accounts failed.");
  const { classes } = await json<{ classes: { id: number; name: string }[] }>(await fetch(`${app.url}/api/classes`, { headers: { cookie: instructor } }));
  const demoClass = classes.find((c) => c.name === DEMO_CLASS.name);
  if (!demoClass) throw new Error(`The demo class "${DEMO_CLASS.name}" is not in the instructor's classes.`);
  const { problem } = await json<{ problem: { id: string } }>(
    await fetch(`${app.url}/api/practice`, { method: "POST", headers: { cookie: learner, "content-type": "application/json" }, body: JSON.stringify({ next: true }) }),
  );
  return [
    { name: "home", path: "/", cookie: null },
    // Display math, inline math and a compact even-spacing calculator.
    { name: "lesson", path: "/lessons/even-spacing", cookie: null },
    { name: "wall-grid", path: "/calculators/wall-grid", cookie: null },
    { name: "practice", path: `/practice/${problem.id}`, cookie: learner },
    { name: "gradebook", path: `/classes/${demoClass.id}/gradebook`, cookie: instructor },
  ];
}

/** What Lighthouse says would save the most time on this page, largest first. */
function whatCosts(audits: Record<string, { score: number | null; title: string; displayValue?: string; details?: { type?: string; overallSavingsMs?: number } }>): string[] {
  const notes: string[] = [];
  for (const [id, audit] of Object.entries(audits)) {
    const savings = audit.details?.type === "opportunity" && (audit.score ?? 1) < 0.9 ? (audit.details.overallSavingsMs ?? 0) : 0;
    if (savings > 0) notes.push(`${Math.round(savings)} ms  ${audit.title} (${id})`);
  }
  notes.sort((a, b) => parseInt(b) - parseInt(a));
  for (const id of ["largest-contentful-paint-element", "lcp-lazy-loaded", "layout-shifts", "long-tasks", "bootup-time", "mainthread-work-breakdown", "font-display", "total-byte-weight"]) {
    const audit = audits[id];
    if (audit && audit.score !== null && audit.score < 0.9) notes.push(`${audit.title}${audit.displayValue ? `: ${audit.displayValue}` : ""} (${id})`);
  }
  return notes;
}

const LIGHTHOUSE_CLI = path.join(process.cwd(), "node_modules/lighthouse/cli/index.js");

type Report = {
  lighthouseVersion: string;
  runtimeError?: { message: string };
  environment: { benchmarkIndex: number };
  categories: { performance: { score: number | null } };
  audits: Parameters<typeof whatCosts>[0] & Record<string, { numericValue?: number }>;
};

/**
 * Lighthouse 12 with Debian's Chromium now and then loses its own trace (NO_NAVSTART, or its trace
 * engine failing on a missing frame): the run reports nothing about the page, so it is run again,
 * up to twice, and the retry is said.
 */
async function measureAgainOnTraceLoss(url: string, cookie: string | null): Promise<Run> {
  for (let attempt = 1; ; attempt++) {
    try {
      return await measure(url, cookie);
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      const traceLost = /NO_NAVSTART|NO_FCP|recording the trace|frame_sequence/.test(message);
      if (!traceLost || attempt === 3) throw error;
      console.log(`  (Lighthouse lost the trace of ${new URL(url).pathname}; running it again)`);
    }
  }
}

async function measure(url: string, cookie: string | null): Promise<Run> {
  const args = [
    LIGHTHOUSE_CLI,
    url,
    "--output=json",
    "--output-path=stdout",
    "--only-categories=performance",
    "--quiet",
    "--chrome-flags=--headless=new --no-sandbox --disable-gpu",
    ...(cookie ? [`--extra-headers=${JSON.stringify({ Cookie: cookie })}`] : []),
  ];
  const { stdout } = await promisify(execFile)(process.execPath, args, {
    env: { ...process.env, CHROME_PATH: process.env.CHROME_PATH ?? "/usr/bin/chromium" },
    maxBuffer: 256 * 1024 * 1024,
  });
  const lhr = JSON.parse(stdout) as Report;
  if (lhr.runtimeError) throw new Error(`Lighthouse could not load ${url}: ${lhr.runtimeError.message}`);
  const value = (id: string) => lhr.audits[id]?.numericValue ?? Number.NaN;
  return {
    version: lhr.lighthouseVersion,
    score: Math.round((lhr.categories.performance.score ?? 0) * 100),
    lcpMs: value("largest-contentful-paint"),
    cls: value("cumulative-layout-shift"),
    tbtMs: value("total-blocking-time"),
    fcpMs: value("first-contentful-paint"),
    benchmarkIndex: lhr.environment.benchmarkIndex,
    why: whatCosts(lhr.audits),
  };
}

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  const mid = Math.floor(sorted.length / 2);
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

async function main(argv: string[]) {
  const runs = Number(option(argv, "--runs") ?? 3);
  const only = option(argv, "--only")?.split(",");
  const strict = argv.includes("--strict");
  const showWhy = argv.includes("--why");
  if (!Number.isInteger(runs) || runs < 1) throw new Error("--runs takes a whole number of at least 1.");

  const app = await startApp({ seed: true });
  let misses = 0;
  try {
    const pages = (await pagesToMeasure(app)).filter((p) => !only || only.includes(p.name));
    const rows: string[] = [];
    let version = "";
    const head = `${"page".padEnd(10)} ${"score".padStart(5)} ${"LCP s".padStart(6)} ${"CLS".padStart(6)} ${"TBT ms".padStart(7)} ${"FCP s".padStart(6)}  bench-index  verdict`;
    for (const page of pages) {
      const done: Run[] = [];
      for (let i = 0; i < runs; i++) {
        done.push(await measureAgainOnTraceLoss(app.url + page.path, page.cookie));
        process.stderr.write(`${page.name} run ${i + 1}/${runs}: score ${done[i].score}, LCP ${(done[i].lcpMs / 1000).toFixed(2)} s, TBT ${Math.round(done[i].tbtMs)} ms\n`);
      }
      version = done[0].version;
      const m = {
        score: median(done.map((r) => r.score)),
        lcpMs: median(done.map((r) => r.lcpMs)),
        cls: median(done.map((r) => r.cls)),
        tbtMs: median(done.map((r) => r.tbtMs)),
        fcpMs: median(done.map((r) => r.fcpMs)),
        benchmarkIndex: median(done.map((r) => r.benchmarkIndex)),
      };
      const missed = [
        m.score < TARGETS.score && `score < ${TARGETS.score}`,
        m.lcpMs > TARGETS.lcpMs && "LCP > 2.5 s",
        m.cls > TARGETS.cls && "CLS > 0.1",
        m.tbtMs > TARGETS.tbtMs && "TBT > 200 ms",
      ].filter(Boolean);
      misses += missed.length > 0 ? 1 : 0;
      rows.push(
        `${page.name.padEnd(10)} ${String(m.score).padStart(5)} ${(m.lcpMs / 1000).toFixed(2).padStart(6)} ${m.cls.toFixed(3).padStart(6)} ${String(Math.round(m.tbtMs)).padStart(7)} ${(m.fcpMs / 1000).toFixed(2).padStart(6)}  ${String(Math.round(m.benchmarkIndex)).padStart(11)}  ${missed.length ? `MISS (${missed.join(", ")})` : "pass"}`,
      );
      if (showWhy) {
        // The run closest to the median score shows what typically holds the page back.
        const typical = [...done].sort((a, b) => Math.abs(a.score - m.score) - Math.abs(b.score - m.score))[0];
        rows.push(...(typical.why.length ? typical.why : ["nothing flagged"]).map((w) => `             ${w}`));
      }
    }
    console.log(`Lighthouse ${version} mobile, simulated throttling; median of ${runs} run${runs > 1 ? "s" : ""} a page`);
    console.log(`targets: score ≥ ${TARGETS.score}, LCP ≤ 2.5 s, CLS ≤ 0.1, TBT ≤ 200 ms\n`);
    console.log(head);
    for (const row of rows) console.log(row);
  } finally {
    await app.stop();
  }
  if (strict && misses > 0) process.exitCode = 1;
}

main(process.argv.slice(2)).catch((error: unknown) => {
  console.error(error);
  process.exitCode = 1;
});
