// Graded answers are the busiest write. Sequelize opens a fresh SQLite connection for every
// transaction and awaits each statement, and every statement of node-sqlite3 costs a turn of
// the event loop, which is slow while the server is busy. So the tries that arrive together
// share one transaction on one long-lived connection, written with a fixed four statements
// however many tries there are: BEGIN, one compare-and-set UPDATE … RETURNING for all of them,
// one INSERT of the rows of those whose guard held, COMMIT. Each try is acknowledged only after
// the COMMIT that holds it (the journal is synced as usual).
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
};

type Job = { write: GuardedInsert; resolve: (written: boolean) => void; reject: (error: Error) => void };

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

function insertStatement(writes: GuardedInsert[]): { sql: string; params: Value[] } {
  const { table, columns } = writes[0].into;
  const rows = writes.flatMap((w) => w.into.rows);
  const row = `(${columns.map(() => "?").join(", ")})`;
  return { sql: `INSERT INTO ${table} (${columns.join(", ")}) VALUES ${rows.map(() => row).join(", ")}`, params: rows.flat() };
}

class GroupCommit {
  private connection: Promise<sqlite3.Database> | undefined;
  private pending: Job[] = [];
  private flushing = false;

  constructor(private readonly file: string) {}

  write(write: GuardedInsert): Promise<boolean> {
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

  /** Pending jobs of one shape, at most one per guarded row (a second try at a row waits for the next batch). */
  private takeBatch(): Job[] {
    const shape = shapeOf(this.pending[0].write);
    const batch: Job[] = [];
    const rows = new Set<string>();
    this.pending = this.pending.filter((job) => {
      if (batch.length >= MAX_BATCH || shapeOf(job.write) !== shape || rows.has(job.write.id)) return true;
      rows.add(job.write.id);
      batch.push(job);
      return false;
    });
    return batch;
  }

  /** One transaction for the batch; resolves every job after COMMIT, or throws having rolled back. */
  private async commit(batch: Job[]): Promise<void> {
    const db = await this.open();
    const run = (sql: string, params: Value[] = []) => new Promise<void>((resolve, reject) => db.run(sql, params, (error) => (error ? reject(error) : resolve())));
    const all = (sql: string, params: Value[]) => new Promise<{ id: string }[]>((resolve, reject) => db.all<{ id: string }>(sql, params, (error, rows) => (error ? reject(error) : resolve(rows))));
    await run("BEGIN IMMEDIATE");
    try {
      const guard = guardStatement(batch.map((j) => j.write));
      const held = new Set((await all(guard.sql, guard.params)).map((r) => r.id));
      const written = batch.filter((j) => held.has(j.write.id)).map((j) => j.write);
      if (written.length > 0) {
        const insert = insertStatement(written);
        await run(insert.sql, insert.params);
      }
      await run("COMMIT");
      batch.forEach((job) => job.resolve(held.has(job.write.id)));
    } catch (error) {
      await run("ROLLBACK").catch(() => undefined);
      throw error;
    }
  }
}

const holder = globalThis as typeof globalThis & { __sixteenthsGroupCommit?: GroupCommit };

/** Writes `write` in the next shared transaction; true when the guard held and the rows are stored. */
export function guardedInsert(write: GuardedInsert): Promise<boolean> {
  holder.__sixteenthsGroupCommit ??= new GroupCommit(env().DATABASE_PATH);
  return holder.__sixteenthsGroupCommit.write(write);
}
