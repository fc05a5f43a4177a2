import { describe, expect, it } from "vitest";
import { ownUnitDatabase, wrongTry } from "../../support/unit-database";

const { db, problemIds: ids } = await ownUnitDatabase({ openProblems: 30 });
const { guardedInsert, sqliteDate } = await import("@/lib/group-commit");

function aTry(id: string, expectUsed: number, part = "gap") {
  return guardedInsert(wrongTry(id, expectUsed, { part, now: sqliteDate(new Date()) }));
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
    // No such problem: the foreign key refuses the row.
    const bad = guardedInsert(wrongTry(ids[5], 1, { problemId: "missing", now: sqliteDate(new Date()) }));
    const good = [aTry(ids[6], 1), aTry(ids[7], 1)];
    await expect(bad).rejects.toThrow(/FOREIGN KEY/);
    expect(await Promise.all(good)).toEqual([true, true]);
    expect(await db().models.Attempt.count()).toBe(before + 2);
    expect((await db().models.PracticeProblem.findByPk(ids[5]))?.attemptsUsed).toBe(1);
  });
});
