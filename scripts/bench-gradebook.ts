// The gradebook's speed beside the floor SQLite sets, in one run: a generated class of 50
// students × 40 assignments × 6 items × 3 tries, written with plain SQL into a temp file, then
// gradebook() (every query it makes plus the arithmetic) timed in alternating rounds with ONE raw
// aggregate that computes the same per-student totals. Prints both and the ratio (target ≤ 3×)
// and checks the totals agree. Then, when a production build exists, the built app is started on
// the same data and Chromium loads the gradebook page: the time from navigation to the full table
// on screen and to the table answering clicks (hydrated), beside the same figures for a plain
// static page (/safety) loaded in the same rounds. It only prints; nothing here passes or fails.
//
//   npm run build && npm run bench   (runs under `tsx --conditions react-server`, as lib/ is server code)
import crypto from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";

const STUDENTS = 50;
const ASSIGNMENTS = 40;
const ITEMS = 6;
const TRIES = 3;
const ROUNDS = 7;

const PAGE_ROUNDS = 5;
const PASSWORD = "bench-gradebook-1616";

const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-bench-gradebook-"));
process.env.NEXTAUTH_SECRET ??= crypto.randomBytes(32).toString("hex");
process.env.NEXTAUTH_URL ??= "http://localhost:3000";
const built = fs.existsSync(path.join(process.env.NEXT_DIST_DIR ?? ".next", "BUILD_ID"));

function random(seed: number) {
  let s = seed >>> 0;
  return () => ((s = (s * 1664525 + 1013904223) >>> 0), s / 2 ** 32);
}

async function main() {
  // The app, when there is a build, owns the database file; the generated class is written into it.
  const { startApp } = await import("../tests/support/app-server");
  const app = built ? await startApp({ seed: false }) : null;
  process.env.DATABASE_PATH = app?.databasePath ?? path.join(dir, "bench.sqlite");
  try {
    await benchmark(app?.url ?? null);
  } finally {
    await app?.stop();
  }
}

async function benchmark(appUrl: string | null) {
  const { db } = await import("@/lib/db");
  const { migrateUp } = await import("@/lib/migrator");
  const { gradebook } = await import("@/lib/gradebook/gradebook");
  const { sequelize } = db();
  await migrateUp(sequelize);

  const started = performance.now();
  const rnd = random(1616);
  const day = 24 * 3600 * 1000;
  const now = Date.now();
  const iso = (ms: number) => new Date(ms).toISOString().replace("T", " ").replace("Z", " +00:00");
  const insert = async (table: string, columns: string[], rows: unknown[][]) => {
    // SQLite takes at most 32766 bound values per statement.
    const per = Math.floor(30000 / columns.length);
    for (let i = 0; i < rows.length; i += per) {
      const chunk = rows.slice(i, i + per);
      await sequelize.query(`INSERT INTO ${table} (${columns.join(", ")}) VALUES ${chunk.map(() => `(${columns.map(() => "?").join(", ")})`).join(", ")}`, { replacements: chunk.flat() });
    }
  };
  await sequelize.transaction(async () => {
    const t = iso(now);
    await insert("users", ["id", "name", "email", "password_hash", "role", "created_at", "updated_at"], [
      [1, "Bench Instructor", "bench-teacher@example.com", (await import("bcryptjs")).default.hashSync(PASSWORD, 10), "admin", t, t],
      ...Array.from({ length: STUDENTS }, (_, i) => [i + 2, `Student ${String(i + 1).padStart(2, "0")}`, `bench-${i}@example.com`, "x", "student", t, t]),
    ]);
    await insert("classes", ["id", "name", "term", "join_code", "instructor_id", "created_at", "updated_at"], [[1, "Bench class", "Spring", "BENCH1", 1, t, t]]);
    await insert("enrollments", ["class_id", "student_id", "status", "created_at", "updated_at"], Array.from({ length: STUDENTS }, (_, i) => [1, i + 2, "active", t, t]));
    const assignments: unknown[][] = [];
    const items: unknown[][] = [];
    const problems: unknown[][] = [];
    const attempts: unknown[][] = [];
    for (let a = 1; a <= ASSIGNMENTS; a++) {
      const due = now - (ASSIGNMENTS - a) * day;
      assignments.push([a, 1, `Layout ${a}`, "", iso(due - 7 * day), iso(due), "none", 3, "when-final", "published", iso(due - 7 * day), t, t]);
      for (let k = 0; k < ITEMS; k++) {
        const itemId = (a - 1) * ITEMS + k + 1;
        items.push([itemId, a, k, "even-gap", 1, 1, "half", 2 + (k % 3) * 2, t, t]);
        for (let s = 2; s <= STUDENTS + 1; s++) {
          const id = crypto.randomUUID();
          const parts = 1 + (k % 2);
          const right = new Set<number>();
          let used = 0;
          for (let tr = 1; tr <= TRIES; tr++) {
            used = tr;
            for (let p = 0; p < parts; p++) {
              if (right.has(p)) continue;
              const ok = rnd() < 0.5;
              if (ok) right.add(p);
              // Every try before the due date: the raw aggregate need not model late penalties.
              attempts.push([id, s, itemId, "even-gap", 1, 1, tr, `p${p}`, "1", "1/1", "1/1", ok ? "correct" : "incorrect", null, 40000, iso(due - 2 * day + tr * 3600_000)]);
            }
            if (right.size === parts) break;
          }
          problems.push([id, s, itemId, 0, "even-gap", 1, 1, TRIES, used, right.size === parts ? "solved" : "failed", parts, iso(due - 2 * day + used * 3600_000), t, t]);
        }
      }
    }
    await insert("assignments", ["id", "class_id", "title", "instructions", "opens_at", "due_at", "late_policy", "attempts_allowed", "reveal", "status", "published_at", "created_at", "updated_at"], assignments);
    await insert("assignment_items", ["id", "assignment_id", "position", "kind", "level", "problem_count", "tolerance", "points", "created_at", "updated_at"], items);
    await insert("practice_problems", ["id", "user_id", "assignment_item_id", "variant", "kind", "level", "seed", "attempts_allowed", "attempts_used", "status", "part_count", "last_try_at", "created_at", "updated_at"], problems);
    await insert("attempts", ["problem_id", "user_id", "assignment_item_id", "kind", "level", "seed", "submission", "part", "raw", "value", "expected", "verdict", "pattern", "time_ms", "created_at"], attempts);
    console.log(`Generated ${STUDENTS} students × ${ASSIGNMENTS} assignments × ${ITEMS} items: ${problems.length} problems, ${attempts.length} tries (${Math.round(performance.now() - started)} ms)`);
  });
  await sequelize.query("ANALYZE");

  // The floor: one statement, the per-student points straight from the rows.
  const rawTotals = async () =>
    sequelize.query<{ studentId: number; earned: number }>(
      `SELECT p.user_id AS studentId, SUM(i.points * CAST(COALESCE(c.rightParts, 0) AS REAL) / p.part_count) AS earned
       FROM practice_problems p
       JOIN assignment_items i ON i.id = p.assignment_item_id
       JOIN assignments a ON a.id = i.assignment_id AND a.class_id = 1 AND a.status = 'published'
       LEFT JOIN (SELECT problem_id, COUNT(DISTINCT part) AS rightParts FROM attempts WHERE verdict = 'correct' GROUP BY problem_id) c ON c.problem_id = p.id
       WHERE p.variant < i.problem_count
       GROUP BY p.user_id`,
      { type: (await import("sequelize")).QueryTypes.SELECT },
    );
  const admin = { id: 1, email: "bench-teacher@example.com", name: "Bench Instructor", role: "admin" as const };

  const times = { gradebook: [] as number[], raw: [] as number[] };
  let book = await gradebook(admin, 1);
  let raw = await rawTotals();
  for (let r = 0; r < ROUNDS; r++) {
    let t0 = performance.now();
    book = await gradebook(admin, 1);
    times.gradebook.push(performance.now() - t0);
    t0 = performance.now();
    raw = await rawTotals();
    times.raw.push(performance.now() - t0);
  }
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const g = median(times.gradebook);
  const q = median(times.raw);
  const rawOf = new Map(raw.map((r) => [r.studentId, Number(r.earned)]));
  const disagree = book.students.filter((s) => Math.abs(s.earned - (rawOf.get(s.id) ?? 0)) > 1e-6);
  console.log(`gradebook()           median ${g.toFixed(1)} ms over ${ROUNDS} rounds (${book.students.length} students × ${book.assignments.length} assignments)`);
  console.log(`one raw SQL aggregate median ${q.toFixed(1)} ms`);
  console.log(`ratio ${(g / q).toFixed(2)}× (target ≤ 3×)`);
  console.log(disagree.length === 0 ? "Totals agree for every student." : `Totals DISAGREE for ${disagree.length} students, e.g. ${disagree[0].name}: ${disagree[0].earned} vs ${rawOf.get(disagree[0].id)}`);
  await sequelize.close();
  if (appUrl) await timePage(appUrl);
  else console.log("No production build: run `npm run build` first for the page's time in Chromium.");
}

/** Milliseconds from navigation start until `ready` holds in the page, read from the page's own clock. */
async function timeTo(page: import("@playwright/test").Page, url: string, ready: () => boolean): Promise<number> {
  await page.goto(url, { waitUntil: "commit" });
  await page.waitForFunction(ready, undefined, { polling: "raf", timeout: 30_000 });
  return page.evaluate(() => performance.now());
}

async function timePage(appUrl: string) {
  const { chromium } = await import("@playwright/test");
  const { signInCookie } = await import("../tests/support/http");
  const cookie = await signInCookie(appUrl, "bench-teacher@example.com", PASSWORD);
  if (!cookie) throw new Error("Could not sign in to the benchmark app.");
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? "/usr/bin/chromium", args: ["--no-sandbox"] });
  const context = await browser.newContext({ viewport: { width: 1280, height: 800 } });
  await context.addCookies(cookie.split("; ").map((pair) => ({ name: pair.slice(0, pair.indexOf("=")), value: pair.slice(pair.indexOf("=") + 1), url: appUrl })));
  const page = await context.newPage();
  const rows = () => document.querySelectorAll("[data-gradebook-table] tbody tr[data-student]").length >= 50;
  // React marks the elements it has hydrated with its own property keys; a sort button with them answers clicks.
  const hydrated = () => {
    const button = document.querySelector("[data-gradebook-table] [data-sort]");
    return button !== null && Object.keys(button).some((k) => k.startsWith("__reactProps"));
  };
  const heading = () => document.querySelector("main h1") !== null;
  const times = { table: [] as number[], interactive: [] as number[], plain: [] as number[], firstByte: [] as number[] };
  let html = 0;
  await timeTo(page, `${appUrl}/classes/1/gradebook`, hydrated); // warm the server and the browser cache once
  for (let r = 0; r < PAGE_ROUNDS; r++) {
    times.table.push(await timeTo(page, `${appUrl}/classes/1/gradebook`, rows));
    const navigation = await page.evaluate(() => performance.getEntriesByType("navigation")[0].toJSON() as { responseStart: number; decodedBodySize: number });
    times.firstByte.push(navigation.responseStart);
    html = navigation.decodedBodySize;
    times.interactive.push(await timeTo(page, `${appUrl}/classes/1/gradebook`, hydrated));
    times.plain.push(await timeTo(page, `${appUrl}/safety`, heading));
  }
  await browser.close();
  const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
  const [table, interactive, plain] = [median(times.table), median(times.interactive), median(times.plain)];
  console.log(`Chromium, gradebook page (50 × 40): table on screen median ${table.toFixed(0)} ms, answering clicks ${interactive.toFixed(0)} ms over ${PAGE_ROUNDS} rounds`);
  console.log(`  of which the server's first byte ${median(times.firstByte).toFixed(0)} ms; page HTML ${(html / 1024).toFixed(0)} KB`);
  console.log(`Chromium, a static page (/safety): heading on screen median ${plain.toFixed(0)} ms`);
  console.log(`ratio table / static page ${(table / plain).toFixed(2)}×`);
}

main()
  .catch((error) => {
    console.error(error);
    process.exitCode = 1;
  })
  .finally(() => fs.rmSync(dir, { recursive: true, force: true }));
