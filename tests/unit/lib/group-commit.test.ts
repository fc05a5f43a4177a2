import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { randomUUID } from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";

// A real, migrated SQLite file of this file's own; env is read on first use, so set it first.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-unit-"));
process.env.DATABASE_PATH = path.join(dir, "unit.sqlite");
process.env.NEXTAUTH_SECRET = "unit-test-secret-unit-test-secret-1234";

const { prepareDatabase } = await import("@/lib/setup");
const { db } = await import("@/lib/db");
const { guardedInsert, sqliteDate } = await import("@/lib/group-commit");

const ids = Array.from({ length: 30 }, () => randomUUID());

beforeAll(async () => {
  await prepareDatabase(process.env.DATABASE_PATH!, { seed: false, bcryptCost: 10 });
  await db().models.PracticeProblem.bulkCreate(ids.map((id, seed) => ({ id, userId: null, visitorId: "v", kind: "even-gap", level: 1, seed, attemptsAllowed: 3 })));
});

afterAll(async () => {
  await db().sequelize.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

function aTry(id: string, expectUsed: number, part = "gap") {
  const now = sqliteDate(new Date());
  return guardedInsert({
    table: "practice_problems",
    id,
    expect: { status: "open", attempts_used: expectUsed },
    set: { attempts_used: expectUsed + 1, status: "open", finished_at: null, updated_at: now },
    into: {
      table: "attempts",
      columns: ["problem_id", "kind", "level", "seed", "submission", "part", "raw", "value", "expected", "verdict", "created_at"],
      rows: [[id, "even-gap", 1, 0, expectUsed + 1, part, "1", "1", "2", "incorrect", now]],
    },
  });
}

describe("group commit", () => {
  it("stores every try sent at once whose guard holds, and refuses the one that lost its race", async () => {
    // Thirty tries at thirty problems, plus a second try at the first problem expecting the same count.
    const results = await Promise.all([...ids.map((id) => aTry(id, 0)), aTry(ids[0], 0, "racer")]);
    expect(results.slice(0, 30).every(Boolean)).toBe(true);
    expect(results[30]).toBe(false);
    const { Attempt, PracticeProblem } = db().models;
    expect(await Attempt.count()).toBe(30);
    expect(await Attempt.count({ where: { part: "racer" } })).toBe(0);
    const first = await PracticeProblem.findByPk(ids[0]);
    expect(first?.attemptsUsed).toBe(1);
    // Written rows read back through the models, dates included.
    expect(first?.updatedAt).toBeInstanceOf(Date);
    expect((await Attempt.findOne({ where: { problemId: ids[1] } }))?.createdAt).toBeInstanceOf(Date);
  });

  it("a try that breaks a constraint is refused alone; the others in its batch are stored", async () => {
    const before = await db().models.Attempt.count();
    const bad = guardedInsert({
      table: "practice_problems",
      id: ids[5],
      expect: { status: "open", attempts_used: 1 },
      set: { attempts_used: 2, status: "open", finished_at: null, updated_at: sqliteDate(new Date()) },
      // No such problem: the foreign key refuses the row.
      into: { table: "attempts", columns: ["problem_id", "kind", "level", "seed", "submission", "part", "raw", "value", "expected", "verdict", "created_at"], rows: [["missing", "even-gap", 1, 0, 2, "gap", "1", "1", "2", "incorrect", sqliteDate(new Date())]] },
    });
    const good = [aTry(ids[6], 1), aTry(ids[7], 1)];
    await expect(bad).rejects.toThrow(/FOREIGN KEY/);
    expect(await Promise.all(good)).toEqual([true, true]);
    expect(await db().models.Attempt.count()).toBe(before + 2);
    expect((await db().models.PracticeProblem.findByPk(ids[5]))?.attemptsUsed).toBe(1);
  });
});
