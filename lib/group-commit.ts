// Graded answers are the busiest write. Sequelize opens a fresh SQLite connection for every
// transaction and awaits each statement, and every statement of node-sqlite3 costs a turn of
// the event loop, which is slow while the server is busy. So the tries that arrive together
// share one transaction on one long-lived connection, written with a fixed four statements
// however many tries there are: BEGIN, one compare-and-set UPDATE … RETURNING for all of them,
// one INSERT of the rows of those whose guard held, COMMIT. Each try is acknowledged only after
// the COMMIT that holds it (the journal is synced as usual). A write may also claim a unique
// row (an idempotency receipt): the claim is looked up inside the same transaction, so of two
// identical requests racing, exactly one is stored and the other learns what was stored.
import path from "node:path";
import sqlite3 from "sqlite3";
import { CONNECTION_PRAGMAS } from "@/lib/db";
import { env } from "@/lib/env";

type Value = string | number | null;

/**
 * A compare-and-set on one row plus the rows that go with it: if the row `id` of `table` still
 * has the `expect`ed values, it gets the `set` values and `rows` are inserted into `into`;
 * otherwise nothing is written. Every write of one kind uses the same tables and columns.
 */
export type GuardedInsert = {
  table: string;
  id: string;
  expect: Record<string, Value>;
  set: Record<string, Value>;
  into: { table: string; columns: string[]; rows: Value[][] };
  /** A row stored with the write unless a row with the same `unique` values is already there. */
  once?: { table: string; unique: Record<string, Value>; values: Record<string, Value> };
};

/** What became of a write: stored, refused by its guard, or already claimed (with the row that claimed it). */
export type WriteOutcome = { kind: "written" } | { kind: "refused" } | { kind: "claimed"; row: Record<string, Value> };

type Job = { write: GuardedInsert; resolve: (outcome: WriteOutcome) => void; reject: (error: Error) => void };

// Far under SQLite's limit on bound values, and more tries than ever arrive at once.
const MAX_BATCH = 100;

/** SQLite text for a date, as Sequelize writes it, so models read these rows back as Dates. */
export function sqliteDate(date: Date): string {
  return date.toISOString().replace("T", " ").replace("Z", " +00:00");
}

const shapeOf = (w: GuardedInsert) => JSON.stringify([w.table, Object.keys(w.expect), Object.keys(w.set), w.into.table, w.into.columns]);

/** One UPDATE for every guarded row: each column set per id by CASE, the ids that held returned. */
function guardStatement(writes: GuardedInsert[]): { sql: string; params: Value[] } {
  const [first] = writes;
  const params: Value[] = [];
  const sets = Object.keys(first.set).map((column) => {
    const cases = writes.map((w) => (params.push(w.id, w.set[column]), "WHEN ? THEN ?")).join(" ");
    return `${column} = CASE id ${cases} END`;
  });
  const guards = writes.map((w) => {
    params.push(w.id);
    const checks = Object.entries(w.expect).map(([column, value]) => (params.push(value), `${column} = ?`));
    return `(id = ? AND ${checks.join(" AND ")})`;
  });
  return { sql: `UPDATE ${first.table} SET ${sets.join(", ")} WHERE ${guards.join(" OR ")} RETURNING id`, params };
}

function insertStatement({ table, columns, rows }: GuardedInsert["into"]): { sql: string; params: Value[] } {
  const row = `(${columns.map(() => "?").join(", ")})`;
  return { sql: `INSERT INTO ${table} (${columns.join(", ")}) VALUES ${rows.map(() => row).join(", ")}`, params: rows.flat() };
}

type Once = NonNullable<GuardedInsert["once"]>;
const claimOf = (once: Once) => JSON.stringify([once.table, Object.entries(once.unique)]);

/** Jobs grouped so each group's rows share one table and column list (one statement per group). */
function groupBy<T>(items: T[], keyOf: (item: T) => string): T[][] {
  const groups = new Map<string, T[]>();
  for (const item of items) groups.set(keyOf(item), [...(groups.get(keyOf(item)) ?? []), item]);
  return [...groups.values()];
}

class GroupCommit {
  private connection: Promise<sqlite3.Database> | undefined;
  private pending: Job[] = [];
  private flushing = false;

  constructor(private readonly file: string) {}

  write(write: GuardedInsert): Promise<WriteOutcome> {
    if (write.into.rows.length === 0) return Promise.reject(new Error("a guarded insert needs at least one row"));
    return new Promise((resolve, reject) => {
      this.pending.push({ write, resolve, reject });
      if (!this.flushing) void this.flush();
    });
  }

  private open(): Promise<sqlite3.Database> {
    this.connection ??= new Promise((resolve, reject) => {
      const db = new sqlite3.Database(path.resolve(this.file), (error) => {
        if (error) return reject(error);
        // Each pragma is awaited before the next and before the first write: the driver may run
        // queued statements out of order, and foreign_keys set inside a transaction is silently ignored.
        const pragmas = CONNECTION_PRAGMAS.reduce<Promise<void>>(
          (previous, pragma) => previous.then(() => new Promise<void>((done, fail) => db.run(pragma, (e) => (e ? fail(e) : done())))),
          Promise.resolve(),
        );
        pragmas.then(() => resolve(db), reject);
      });
    });
    return this.connection;
  }

  private async flush(): Promise<void> {
    this.flushing = true;
    try {
      while (this.pending.length > 0) {
        const batch = this.takeBatch();
        try {
          await this.commit(batch);
        } catch {
          // One bad try must not sink the others: commit each alone, and refuse only the one that fails.
          for (const job of batch) await this.commit([job]).catch((error: Error) => job.reject(error));
        }
      }
    } finally {
      this.flushing = false;
    }
  }

  /**
   * Pending jobs of one shape, at most one per guarded row and one per claim: a second try at a
   * row, or a second request with the same key, waits for the next batch and meets the first there.
   */
  private takeBatch(): Job[] {
    const shape = shapeOf(this.pending[0].write);
    const batch: Job[] = [];
    const rows = new Set<string>();
    const claims = new Set<string>();
    this.pending = this.pending.filter((job) => {
      const claim = job.write.once ? claimOf(job.write.once) : null;
      if (batch.length >= MAX_BATCH || shapeOf(job.write) !== shape || rows.has(job.write.id) || (claim && claims.has(claim))) return true;
      rows.add(job.write.id);
      if (claim) claims.add(claim);
      batch.push(job);
      return false;
    });
    return batch;
  }

  /** One transaction for the batch; resolves every job after COMMIT, or throws having rolled back. */
  private async commit(batch: Job[]): Promise<void> {
    const db = await this.open();
    const run = (sql: string, params: Value[] = []) => new Promise<void>((resolve, reject) => db.run(sql, params, (error) => (error ? reject(error) : resolve())));
    const all = <T>(sql: string, params: Value[]) => new Promise<T[]>((resolve, reject) => db.all<T>(sql, params, (error, rows) => (error ? reject(error) : resolve(rows))));
    await run("BEGIN IMMEDIATE");
    try {
      const claimed = await this.claimedRows(batch, all);
      const live = batch.filter((job) => !claimed.has(job));
      let held = new Set<string>();
      if (live.length > 0) {
        const guard = guardStatement(live.map((j) => j.write));
        held = new Set((await all<{ id: string }>(guard.sql, guard.params)).map((r) => r.id));
      }
      const written = live.filter((j) => held.has(j.write.id)).map((j) => j.write);
      if (written.length > 0) {
        const insert = insertStatement({ ...written[0].into, rows: written.flatMap((w) => w.into.rows) });
        await run(insert.sql, insert.params);
      }
      for (const group of groupBy(written.filter((w) => w.once), (w) => JSON.stringify([w.once!.table, Object.keys(w.once!.unique), Object.keys(w.once!.values)]))) {
        const first = group[0].once!;
        const columns = [...Object.keys(first.unique), ...Object.keys(first.values)];
        const insert = insertStatement({ table: first.table, columns, rows: group.map((w) => [...Object.values(w.once!.unique), ...Object.values(w.once!.values)]) });
        await run(insert.sql, insert.params);
      }
      await run("COMMIT");
      for (const job of batch) {
        const row = claimed.get(job);
        job.resolve(row ? { kind: "claimed", row } : held.has(job.write.id) ? { kind: "written" } : { kind: "refused" });
      }
    } catch (error) {
      await run("ROLLBACK").catch(() => undefined);
      throw error;
    }
  }

  /** The jobs whose claim is already stored, each with the row that holds it; read inside the batch's transaction. */
  private async claimedRows(batch: Job[], all: <T>(sql: string, params: Value[]) => Promise<T[]>): Promise<Map<Job, Record<string, Value>>> {
    const claimed = new Map<Job, Record<string, Value>>();
    const claiming = batch.filter((job) => job.write.once);
    for (const group of groupBy(claiming, (job) => JSON.stringify([job.write.once!.table, Object.keys(job.write.once!.unique)]))) {
      const { table, unique } = group[0].write.once!;
      const columns = Object.keys(unique);
      const params: Value[] = [];
      const matches = group.map((job) => `(${columns.map((column) => (params.push(job.write.once!.unique[column]), `${column} = ?`)).join(" AND ")})`);
      const rows = await all<Record<string, Value>>(`SELECT * FROM ${table} WHERE ${matches.join(" OR ")}`, params);
      for (const job of group) {
        const row = rows.find((r) => columns.every((column) => r[column] === job.write.once!.unique[column]));
        if (row) claimed.set(job, row);
      }
    }
    return claimed;
  }
}

const holder = globalThis as typeof globalThis & { __sixteenthsGroupCommit?: GroupCommit };

/** Writes `write` in the next shared transaction and says what became of it. */
export function guardedWrite(write: GuardedInsert): Promise<WriteOutcome> {
  holder.__sixteenthsGroupCommit ??= new GroupCommit(env().DATABASE_PATH);
  return holder.__sixteenthsGroupCommit.write(write);
}

/** Writes `write` in the next shared transaction; true when the guard held and the rows are stored. */
export async function guardedInsert(write: GuardedInsert): Promise<boolean> {
  return (await guardedWrite(write)).kind === "written";
}
