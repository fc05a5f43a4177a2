import crypto, { randomUUID } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { QueryTypes, type Sequelize } from "sequelize";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { backupDatabase, type BackupResult } from "@/lib/backup";
import { openDatabase } from "@/lib/db";
import { migrateUp, migrator } from "@/lib/migrator";
import { prepareDatabase } from "@/lib/setup";
import { signedInPerson, withDatabase } from "../support/assignment-fixtures";
import { freePort } from "../support/free-port";
import { AppProcess, sessionCookie } from "../support/load-run";

const baseURL = inject("baseURL");
const databasePath = inject("databasePath");
const scratch = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-maintenance-"));
afterAll(() => fs.rmSync(scratch, { recursive: true, force: true }));

type Ack = { userId: number; key: string; problemId: string; submission: number };
type Writer = { userId: number; cookie: string };

// Requests of the writers not yet answered: the backup must start while some are on their way.
const inFlight = { count: 0 };

async function post(cookie: string, url: string, body: unknown, key?: string) {
  inFlight.count++;
  try {
    const res = await fetch(url, { method: "POST", headers: { "content-type": "application/json", cookie, ...(key ? { "Idempotency-Key": key } : {}) }, body: JSON.stringify(body) });
    return { status: res.status, json: (await res.json()) as { problem: { id: string; parts: { key: string }[]; attemptsUsed: number; status: string } } };
  } finally {
    inFlight.count--;
  }
}

/**
 * One student answering practice problems one after another, each answer keyed, until told to
 * stop or out of answers (the shared app allows 30 a minute per student).
 */
async function keepAnswering(base: string, who: Writer, acked: Ack[], state: { stop: boolean }, most: number) {
  let problem: { id: string; parts: { key: string }[] } | null = null;
  for (let n = 0; n < most && !state.stop; n++) {
    if (!problem) {
      const made = await post(who.cookie, `${base}/api/practice`, { kind: "even-gap", level: 1 });
      expect(made.status).toBe(201);
      problem = made.json.problem;
    }
    const key = randomUUID();
    const reply = await post(who.cookie, `${base}/api/practice/${problem.id}/answers`, { answers: Object.fromEntries(problem.parts.map((p) => [p.key, "997"])) }, key);
    expect(reply.status).toBe(200);
    acked.push({ userId: who.userId, key, problemId: problem.id, submission: reply.json.problem.attemptsUsed });
    if (reply.json.problem.status !== "open") problem = null;
  }
}

async function heldIn(file: string, acks: Ack[]): Promise<Ack[]> {
  return withDatabase(file, async (db) => {
    const missing: Ack[] = [];
    for (const a of acks) {
      const [row] = await db.sequelize.query<{ tries: number }>(
        `SELECT (SELECT COUNT(*) FROM answer_receipts r WHERE r.user_id = ? AND r.key = ? AND r.problem_id = ? AND r.submission = ?) *
                (SELECT COUNT(*) FROM attempts a WHERE a.problem_id = ? AND a.submission = ?) AS tries`,
        { replacements: [a.userId, a.key, a.problemId, a.submission, a.problemId, a.submission], type: QueryTypes.SELECT },
      );
      if (!row || row.tries === 0) missing.push(a);
    }
    return missing;
  });
}

describe("online backup and restore", () => {
  let backup: BackupResult;
  const acked: Ack[] = [];
  let ackedBefore: Ack[] = [];
  let writers: Writer[];

  beforeAll(async () => {
    writers = await Promise.all(
      ["Bea Backup", "Cal Backup", "Dee Backup"].map(async (name) => {
        const person = await signedInPerson(baseURL, databasePath, name);
        return { userId: person.id, cookie: person.cookie };
      }),
    );
  });

  it("backs up while answers are being written; the copy passes integrity_check and holds every answer acknowledged before it began", async () => {
    const state = { stop: false };
    const writing = Promise.all(writers.map((w) => keepAnswering(baseURL, w, acked, state, 24)));
    while (acked.length < 9) await new Promise((r) => setTimeout(r, 20));
    ackedBefore = [...acked];
    const inFlightAtStart = inFlight.count;
    backup = await backupDatabase(databasePath, path.join(scratch, "backups"));
    // Keep writing a little after the snapshot, then stop.
    await new Promise((r) => setTimeout(r, 300));
    state.stop = true;
    await writing;

    expect(inFlightAtStart).toBeGreaterThan(0);
    expect(acked.length).toBeGreaterThan(ackedBefore.length);
    expect(path.basename(backup.file)).toMatch(/^test-backup-\d{8}-\d{6}Z\.sqlite$/);
    expect(backup.integrity).toBe("ok");
    expect(backup.bytes).toBeGreaterThan(0);
    expect(backup.tables.find((t) => t.name === "answer_receipts")!.rows).toBeGreaterThanOrEqual(ackedBefore.length);
    expect(await heldIn(backup.file, ackedBefore)).toEqual([]);
    // And the live database holds every answer, those after the snapshot too.
    expect(await heldIn(databasePath, acked)).toEqual([]);
  });

  it("the backup, copied back in place of a database, runs a fresh app with the students' work in it", async () => {
    const dir = path.join(scratch, "restored");
    fs.mkdirSync(dir);
    const file = path.join(dir, "sixteenths.sqlite");
    fs.copyFileSync(backup.file, file);
    if (backup.uploads) fs.cpSync(backup.uploads.folder, path.join(dir, "uploads"), { recursive: true });

    const url = `http://127.0.0.1:${await freePort()}`;
    const secret = crypto.randomBytes(32).toString("base64url");
    const app = new AppProcess(url, { DATABASE_PATH: file, NEXTAUTH_SECRET: secret, NEXTAUTH_URL: url, BCRYPT_COST: "10" });
    try {
      await app.start();
      const [first] = ackedBefore;
      const cookie = await sessionCookie(first.userId, secret);
      const view = await fetch(`${url}/api/practice/${first.problemId}`, { headers: { cookie } });
      expect(view.status).toBe(200);
      expect((await view.json()).problem.attemptsUsed).toBeGreaterThanOrEqual(first.submission);
      // A key stored before the backup is still known: its retry is answered, not counted again.
      const problem = await fetch(`${url}/api/practice/${first.problemId}`, { headers: { cookie } }).then((r) => r.json());
      const replay = await post(cookie, `${url}/api/practice/${first.problemId}/answers`, { answers: Object.fromEntries(problem.problem.parts.map((p: { key: string }) => [p.key, "997"])) }, first.key);
      expect(replay.status).toBe(200);
      expect(replay.json.problem.attemptsUsed).toBe(first.submission);
      // And the restored database takes new work.
      const more: Ack[] = [];
      await keepAnswering(url, { userId: first.userId, cookie }, more, { stop: false }, 2);
      expect(await heldIn(file, more)).toEqual([]);
    } finally {
      await app.kill("SIGTERM");
    }
  }, 60_000);
});

/** Every table's rows as one hash each (rows sorted, so a table rebuilt in another order still matches). */
async function fingerprints(sequelize: Sequelize): Promise<Record<string, { rows: number; sha256: string }>> {
  const tables = await sequelize.query<{ name: string }>("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' AND name <> 'schema_migrations' ORDER BY name", { type: QueryTypes.SELECT });
  const result: Record<string, { rows: number; sha256: string }> = {};
  for (const { name } of tables) {
    const rows = (await sequelize.query<object>(`SELECT * FROM "${name}"`, { type: QueryTypes.SELECT })).map((r) => JSON.stringify(r)).sort();
    result[name] = { rows: rows.length, sha256: crypto.createHash("sha256").update(rows.join("\n")).digest("hex") };
  }
  return result;
}

const schemaOf = (sequelize: Sequelize) =>
  sequelize.query<{ type: string; name: string; sql: string | null }>("SELECT type, name, sql FROM sqlite_master WHERE name NOT LIKE 'sqlite_%' ORDER BY type, name", { type: QueryTypes.SELECT });

describe("migrations on a copy of the demo database", () => {
  // The newest migrations can be taken down and up again: the session version (a column that is 0
  // on a fresh demo), the answer receipts and the score overrides (tables). The dropped tables'
  // rows are put back after the way up, as a deployed database would have gained them; every other
  // table must come through untouched. The walk stops above 20261203-0009: its way down drops the
  // stored part counts, which the scores then fill in again, so the rows would differ.
  const REVERSIBLE = 3;

  it("down the newest reversible migrations and up again loses nothing, and a second run is a no-op", async () => {
    const demo = path.join(scratch, "demo.sqlite");
    await prepareDatabase(demo, { seed: true, bcryptCost: 10 });
    const copy = path.join(scratch, "demo-copy.sqlite");
    const database = openDatabase(demo);
    await database.sequelize.query("PRAGMA wal_checkpoint(TRUNCATE)");
    await database.sequelize.close();
    fs.copyFileSync(demo, copy);

    await withDatabase(copy, async ({ sequelize }) => {
      const before = await fingerprints(sequelize);
      const schemaBefore = await schemaOf(sequelize);
      expect(before.users.rows).toBeGreaterThan(0);
      expect(before.attempts.rows).toBeGreaterThan(0);

      const umzug = migrator(sequelize);
      const executed = await umzug.executed();
      const reverted = await umzug.down({ step: REVERSIBLE });
      expect(reverted.map((m) => m.name)).toEqual(executed.slice(-REVERSIBLE).map((m) => m.name).reverse());
      const afterDown = await fingerprints(sequelize);
      const dropped = Object.keys(before).filter((t) => !(t in afterDown));
      expect(dropped.length).toBeGreaterThan(0);
      const schemaDown = await schemaOf(sequelize);
      const sqlOf = (schema: typeof schemaDown, table: string) => schema.find((s) => s.type === "table" && s.name === table)?.sql;
      for (const table of Object.keys(afterDown)) {
        if (sqlOf(schemaDown, table) === sqlOf(schemaBefore, table)) expect({ table, ...afterDown[table] }).toEqual({ table, ...before[table] });
        // A table that lost a column on the way down (users.session_version) keeps every row; the
        // round trip below must then give back exactly what was there.
        else expect({ table, rows: afterDown[table].rows }).toEqual({ table, rows: before[table].rows });
      }

      const saved = Object.fromEntries(
        await Promise.all(dropped.map(async (t) => [t, await withDatabase(demo, (db) => db.sequelize.query<Record<string, unknown>>(`SELECT * FROM "${t}"`, { type: QueryTypes.SELECT }))] as const)),
      );
      expect((await migrateUp(sequelize)).map((m) => m.name)).toEqual(reverted.map((m) => m.name).reverse());
      for (const [table, rows] of Object.entries(saved)) if (rows.length > 0) await sequelize.getQueryInterface().bulkInsert(table, rows);

      expect(await fingerprints(sequelize)).toEqual(before);
      expect(await schemaOf(sequelize)).toEqual(schemaBefore);

      // Running the migrations again changes nothing.
      expect(await migrateUp(sequelize)).toEqual([]);
      expect(await fingerprints(sequelize)).toEqual(before);
    });
  }, 180_000);
});
