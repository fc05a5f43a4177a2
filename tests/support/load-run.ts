// A crash under load, measured: many students answer practice problems at once, each answer with
// its own idempotency key; part-way through the server is killed with SIGKILL and started again
// on the same database, and every unacknowledged answer is retried with its key until it is
// acknowledged. Afterwards the database is read directly: every acknowledged answer must be
// stored exactly once. Shared by `npm run bench:load` and the smaller integration test.
import { spawn, type ChildProcess } from "node:child_process";
import crypto, { randomUUID } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { encode } from "next-auth/jwt";
import { QueryTypes } from "sequelize";
import { openDatabase } from "@/lib/db";
import { prepareDatabase } from "@/lib/setup";
import { freePort } from "./free-port";

const root = process.cwd();

export type LoadOptions = {
  students: number;
  answersEach: number;
  /** Share of all answers acknowledged before the SIGKILL (0.4 = after 40 %). */
  killAfter: number;
  /** Nothing is retried past this; unacknowledged answers are then reported, not waited for. */
  deadlineMs: number;
  log?: (line: string) => void;
};

export type LoadReport = {
  students: number;
  sent: number;
  acknowledged: number;
  stored: number;
  lost: number;
  duplicates: number;
  /** Answers the server stored whose reply never arrived (each retried to a replay, so 0 at the end unless the deadline hit). */
  unacknowledged: number;
  refused: number;
  retries: number;
  replays: number;
  requests: number;
  requestsPerSecond: number;
  killedAtAcknowledged: number;
  restartMs: number;
  totalMs: number;
};

/** `next start` on a fixed port and database, so it can be killed and started again in place. */
export class AppProcess {
  private child: ChildProcess | null = null;
  output = "";

  constructor(
    readonly url: string,
    private readonly env: Record<string, string>,
  ) {}

  async start(): Promise<void> {
    const port = new URL(this.url).port;
    this.child = spawn(process.execPath, [path.join(root, "node_modules/next/dist/bin/next"), "start", "-H", "127.0.0.1", "-p", port], {
      cwd: root,
      env: { ...process.env, NODE_ENV: "production", ...this.env },
      stdio: ["ignore", "pipe", "pipe"],
    });
    this.child.stdout?.on("data", (d) => (this.output += d));
    this.child.stderr?.on("data", (d) => (this.output += d));
    const deadline = Date.now() + 30_000;
    while (Date.now() < deadline) {
      if (this.child.exitCode !== null) throw new Error(`The app exited during start-up:\n${this.output}`);
      try {
        if ((await fetch(`${this.url}/api/health`)).ok) return;
      } catch {
        // not listening yet
      }
      await sleep(100);
    }
    throw new Error(`The app did not answer /api/health within 30 s:\n${this.output}`);
  }

  /** The crash: no shutdown hooks, no flushing, whatever was in flight is cut off. */
  async kill(signal: NodeJS.Signals = "SIGKILL"): Promise<void> {
    const child = this.child;
    if (!child || child.exitCode !== null || child.signalCode !== null) return;
    const exited = new Promise((resolve) => child.once("exit", resolve));
    child.kill(signal);
    await exited;
  }
}

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

export function hasBuild(): boolean {
  return fs.existsSync(path.join(root, process.env.NEXT_DIST_DIR ?? ".next", "BUILD_ID"));
}

/** A migrated temp database with `count` students written straight in (they never type a password here). */
async function prepareStudents(file: string, count: number): Promise<number[]> {
  await prepareDatabase(file, { seed: false, bcryptCost: 10 });
  const database = openDatabase(file);
  try {
    // A placeholder hash: these students sign in through a session token, never with a password.
    const rows = Array.from({ length: count }, (_, i) => ({ name: `Load Student ${i + 1}`, email: `load.student.${i + 1}@load.example`, passwordHash: "!", role: "student" as const }));
    const users = await database.models.User.bulkCreate(rows);
    return users.map((u) => u.id);
  } finally {
    await database.sequelize.close();
  }
}

/**
 * The session cookie next-auth itself would set after a sign-in, made with the app's own secret:
 * a hundred real sign-ins would spend the run's time on bcrypt instead of on the answers.
 */
export async function sessionCookie(userId: number, secret: string): Promise<string> {
  const token = await encode({ token: { sub: String(userId), uid: userId, role: "student" }, secret });
  return `next-auth.session-token=${token}`;
}

type Ack = { key: string; problemId: string; submission: number; userId: number };

class Counters {
  requests = 0;
  retries = 0;
  replays = 0;
  refused = 0;
  acked: Ack[] = [];
  sent = 0;
}

/** One POST; a lost connection, a timeout or a 5xx is `null` (worth retrying), anything else the reply. */
async function postOnce(url: string, cookie: string, body: unknown, counters: Counters, key?: string): Promise<{ status: number; json: unknown; replayed: boolean } | null> {
  counters.requests++;
  try {
    const res = await fetch(url, {
      method: "POST",
      headers: { "content-type": "application/json", cookie, ...(key ? { "Idempotency-Key": key } : {}) },
      body: JSON.stringify(body),
      signal: AbortSignal.timeout(15_000),
    });
    const json = await res.json().catch(() => null);
    if (res.status >= 500) return null;
    return { status: res.status, json, replayed: res.headers.get("idempotent-replayed") === "true" };
  } catch {
    return null;
  }
}

type Problem = { id: string; parts: { key: string }[]; attemptsAllowed: number; attemptsUsed: number; status: string };

async function student(base: string, userId: number, cookie: string, options: LoadOptions, counters: Counters, until: number): Promise<void> {
  let problem: Problem | null = null;
  for (let n = 0; n < options.answersEach && Date.now() < until; n++) {
    while (!problem && Date.now() < until) {
      const reply = await postOnce(`${base}/api/practice`, cookie, { kind: "even-gap", level: 1 }, counters);
      if (reply?.status === 201) problem = (reply.json as { problem: Problem }).problem;
      else await sleep(150 + Math.random() * 150);
    }
    if (!problem) return;
    // Readable and wrong, so every problem takes all its tries and each answer is one stored try.
    const body = { answers: Object.fromEntries(problem.parts.map((p) => [p.key, "997"])), timeMs: 1000 + n };
    const key = randomUUID();
    counters.sent++;
    for (let attempt = 0; Date.now() < until; attempt++) {
      if (attempt > 0) {
        counters.retries++;
        await sleep(Math.min(1000, 100 * attempt) + Math.random() * 100);
      }
      const reply = await postOnce(`${base}/api/practice/${problem.id}/answers`, cookie, body, counters, key);
      if (!reply) continue;
      if (reply.status === 200) {
        const { problem: update } = reply.json as { problem: { attemptsUsed: number; status: string } };
        if (reply.replayed) counters.replays++;
        counters.acked.push({ key, problemId: problem.id, submission: update.attemptsUsed, userId });
        problem = update.status === "open" ? { ...problem, attemptsUsed: update.attemptsUsed } : null;
      } else {
        // A refusal stores nothing; it is counted, never treated as acknowledged.
        counters.refused++;
        problem = null;
      }
      break;
    }
  }
}

/** Reads what the database holds for the run's students and holds it against the acknowledgements. */
async function verify(file: string, userIds: number[], acked: Ack[]): Promise<Pick<LoadReport, "stored" | "lost" | "duplicates" | "unacknowledged">> {
  const database = openDatabase(file);
  try {
    const q = <T extends object>(sql: string) => database.sequelize.query<T>(sql, { replacements: [userIds], type: QueryTypes.SELECT });
    const receipts = await q<{ userId: number; key: string; problemId: string; submission: number }>(
      "SELECT user_id AS userId, key, problem_id AS problemId, submission FROM answer_receipts WHERE user_id IN (?)",
    );
    const tries = await q<{ problemId: string; submission: number; rows: number }>(
      "SELECT problem_id AS problemId, submission, COUNT(*) AS rows FROM attempts WHERE user_id IN (?) GROUP BY problem_id, submission",
    );
    const counters = await q<{ id: string; attemptsUsed: number; stored: number }>(
      `SELECT p.id, p.attempts_used AS attemptsUsed, (SELECT COUNT(DISTINCT a.submission) FROM attempts a WHERE a.problem_id = p.id) AS stored
       FROM practice_problems p WHERE p.user_id IN (?)`,
    );
    const receiptOf = new Map<string, typeof receipts>();
    for (const r of receipts) receiptOf.set(`${r.userId}:${r.key}`, [...(receiptOf.get(`${r.userId}:${r.key}`) ?? []), r]);
    const tryAt = new Set(tries.map((t) => `${t.problemId}:${t.submission}`));
    const ackedKeys = new Set(acked.map((a) => `${a.userId}:${a.key}`));

    let lost = 0;
    for (const a of acked) {
      const found = receiptOf.get(`${a.userId}:${a.key}`) ?? [];
      const held = found.length === 1 && found[0].problemId === a.problemId && found[0].submission === a.submission && tryAt.has(`${a.problemId}:${a.submission}`);
      if (!held) lost++;
    }
    // A duplicate is a try stored without its own receipt (a retry that counted twice), a key
    // stored twice, or a problem whose try counter disagrees with the tries stored for it.
    const keyedTries = new Set(receipts.map((r) => `${r.problemId}:${r.submission}`));
    const duplicates =
      tries.filter((t) => !keyedTries.has(`${t.problemId}:${t.submission}`)).length +
      [...receiptOf.values()].filter((rows) => rows.length > 1).length +
      counters.filter((c) => c.attemptsUsed !== c.stored).length;
    return { stored: tries.length, lost, duplicates, unacknowledged: receipts.filter((r) => !ackedKeys.has(`${r.userId}:${r.key}`)).length };
  } finally {
    await database.sequelize.close();
  }
}

export async function runLoad(options: LoadOptions): Promise<LoadReport> {
  const log = options.log ?? (() => undefined);
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-load-"));
  const file = path.join(dir, "load.sqlite");
  const port = await freePort();
  const url = `http://127.0.0.1:${port}`;
  const secret = crypto.randomBytes(32).toString("base64url");
  const app = new AppProcess(url, { DATABASE_PATH: file, NEXTAUTH_SECRET: secret, NEXTAUTH_URL: url, BCRYPT_COST: "10", ANSWERS_PER_MINUTE: "100000" });
  try {
    const userIds = await prepareStudents(file, options.students);
    const cookies = await Promise.all(userIds.map((id) => sessionCookie(id, secret)));
    await app.start();
    log(`app on ${url}; ${options.students} students × ${options.answersEach} answers`);

    const counters = new Counters();
    const total = options.students * options.answersEach;
    const started = Date.now();
    const until = started + options.deadlineMs;
    let killedAt = 0;
    let restartMs = 0;
    const crash = (async () => {
      while (counters.acked.length < total * options.killAfter && Date.now() < until) await sleep(10);
      killedAt = counters.acked.length;
      await app.kill("SIGKILL");
      log(`SIGKILL after ${killedAt} acknowledged answers; starting again on the same database`);
      const restarting = Date.now();
      await app.start();
      restartMs = Date.now() - restarting;
      log(`back up after ${restartMs} ms`);
    })();
    await Promise.all(userIds.map((id, i) => student(url, id, cookies[i], options, counters, until)));
    await crash;
    const totalMs = Date.now() - started;
    await app.kill("SIGTERM");

    const checked = await verify(file, userIds, counters.acked);
    return {
      students: options.students,
      sent: counters.sent,
      acknowledged: counters.acked.length,
      ...checked,
      refused: counters.refused,
      retries: counters.retries,
      replays: counters.replays,
      requests: counters.requests,
      requestsPerSecond: Math.round((counters.requests / totalMs) * 1000),
      killedAtAcknowledged: killedAt,
      restartMs,
      totalMs,
    };
  } finally {
    await app.kill("SIGKILL");
    fs.rmSync(dir, { recursive: true, force: true });
  }
}
