// Graded answers are the busiest write. Sequelize opens a fresh SQLite connection for every
// transaction and awaits each statement, so under load one try held the write lock for many
// turns of a busy event loop. Here the tries that arrive together share one transaction on one
// long-lived connection: their statements run back to back in SQLite's own thread, and each
// try is acknowledged only after the COMMIT that holds it (the journal is synced as usual).
import path from "node:path";
import sqlite3 from "sqlite3";
import { CONNECTION_PRAGMAS } from "@/lib/db";
import { env } from "@/lib/env";

type Statement = { sql: string; params: unknown[] };

/**
 * Rows to insert only if `guard` (an UPDATE) changes exactly one row — a compare-and-set: the
 * rows are written when the guarded row was still as expected, and nothing is written otherwise.
 */
export type GuardedInsert = { guard: Statement; table: string; columns: string[]; rows: unknown[][] };

type Job = { write: GuardedInsert; resolve: (written: boolean) => void; reject: (error: Error) => void };

function insertAfterGuard({ table, columns, rows }: GuardedInsert): Statement {
  const row = `(${columns.map(() => "?").join(", ")})`;
  // changes() still reports the guard, the last statement that completed on this connection.
  return {
    sql: `INSERT INTO ${table} (${columns.join(", ")}) SELECT * FROM (VALUES ${rows.map(() => row).join(", ")}) WHERE changes() = 1`,
    params: rows.flat(),
  };
}

/** SQLite text for a date, as Sequelize writes it, so models read these rows back as Dates. */
export function sqliteDate(date: Date): string {
  return date.toISOString().replace("T", " ").replace("Z", " +00:00");
}

class GroupCommit {
  private connection: Promise<sqlite3.Database> | undefined;
  private pending: Job[] = [];
  private flushing = false;

  constructor(private readonly file: string) {}

  write(write: GuardedInsert): Promise<boolean> {
    if (write.rows.length === 0) return Promise.reject(new Error("a guarded insert needs at least one row"));
    return new Promise((resolve, reject) => {
      this.pending.push({ write, resolve, reject });
      if (!this.flushing) void this.flush();
    });
  }

  private open(): Promise<sqlite3.Database> {
    this.connection ??= new Promise((resolve, reject) => {
      const db = new sqlite3.Database(path.resolve(this.file), (error) => {
        if (error) return reject(error);
        db.serialize(() => CONNECTION_PRAGMAS.forEach((pragma) => db.run(pragma)));
        db.run("SELECT 1", (e) => (e ? reject(e) : resolve(db)));
      });
    });
    return this.connection;
  }

  private async flush(): Promise<void> {
    this.flushing = true;
    try {
      while (this.pending.length > 0) {
        const batch = this.pending.splice(0);
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

  /** One transaction for the batch; resolves every job after COMMIT, or throws having rolled back. */
  private async commit(batch: Job[]): Promise<void> {
    const db = await this.open();
    const changed: number[] = [];
    let failure: Error | null = null;
    const note = (error: Error | null) => (failure ??= error);
    await new Promise<void>((done) => {
      db.serialize(() => {
        db.run("BEGIN IMMEDIATE", note);
        batch.forEach((job, i) => {
          db.run(job.write.guard.sql, job.write.guard.params, function (this: sqlite3.RunResult, error) {
            note(error);
            changed[i] = error ? 0 : this.changes;
          });
          const insert = insertAfterGuard(job.write);
          db.run(insert.sql, insert.params, note);
        });
        // Statements queued above run in order; this one's callback comes after all of theirs.
        db.run("SELECT 1", () => done());
      });
    });
    const end = (sql: string) => new Promise<void>((resolve, reject) => db.run(sql, (error) => (error ? reject(error) : resolve())));
    if (failure) {
      await end("ROLLBACK").catch(() => undefined);
      throw failure;
    }
    try {
      await end("COMMIT");
    } catch (error) {
      await end("ROLLBACK").catch(() => undefined);
      throw error;
    }
    batch.forEach((job, i) => job.resolve(changed[i] === 1));
  }
}

const holder = globalThis as typeof globalThis & { __sixteenthsGroupCommit?: GroupCommit };

/** Writes `write` in the next shared transaction; true when the guard held and the rows are stored. */
export function guardedInsert(write: GuardedInsert): Promise<boolean> {
  holder.__sixteenthsGroupCommit ??= new GroupCommit(env().DATABASE_PATH);
  return holder.__sixteenthsGroupCommit.write(write);
}
