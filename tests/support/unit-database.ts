import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll } from "vitest";
import type { GuardedInsert } from "@/lib/group-commit";

/**
 * A real, migrated SQLite file of the calling test file's own, made before its tests and removed
 * after them, with `openProblems` anonymous practice problems open for tries (their ids returned).
 * The app reads its environment on first use, so call this at the top of the file, before any
 * module of lib/ is loaded, and import those dynamically after it.
 */
export async function ownUnitDatabase({ openProblems = 0 }: { openProblems?: number } = {}) {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-unit-"));
  process.env.DATABASE_PATH = path.join(dir, "unit.sqlite");
  process.env.NEXTAUTH_SECRET = "unit-test-secret-unit-test-secret-1234";

  const { prepareDatabase } = await import("@/lib/setup");
  const { db } = await import("@/lib/db");
  const problemIds = Array.from({ length: openProblems }, () => randomUUID());

  beforeAll(async () => {
    await prepareDatabase(process.env.DATABASE_PATH!, { seed: false, bcryptCost: 10 });
    if (problemIds.length === 0) return;
    await db().models.PracticeProblem.bulkCreate(problemIds.map((id, seed) => ({ id, userId: null, visitorId: "v", kind: "even-gap", level: 1, seed, attemptsAllowed: 3 })));
  });

  afterAll(async () => {
    await db().sequelize.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  return { db, problemIds };
}

/**
 * A wrong try at one of those problems, guarded on `used` tries already stored, as the practice
 * grader writes it. `problemId` need not exist: a missing one is how a test breaks the foreign key.
 */
export function wrongTry(guardedId: string, used: number, { part = "gap", problemId = guardedId, now }: { part?: string; problemId?: string; now: string }): GuardedInsert {
  return {
    table: "practice_problems",
    id: guardedId,
    expect: { status: "open", attempts_used: used },
    set: { attempts_used: used + 1, status: "open", finished_at: null, updated_at: now },
    into: {
      table: "attempts",
      columns: ["problem_id", "kind", "level", "seed", "submission", "part", "raw", "value", "expected", "verdict", "created_at"],
      rows: [[problemId, "even-gap", 1, 0, used + 1, part, "1", "1", "2", "incorrect", now]],
    },
  };
}
