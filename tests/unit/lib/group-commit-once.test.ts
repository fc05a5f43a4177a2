import { randomUUID } from "node:crypto";
import { QueryTypes } from "sequelize";
import { describe, expect, it } from "vitest";
import { ownUnitDatabase, wrongTry } from "../../support/unit-database";

const { db, problemIds: ids } = await ownUnitDatabase({ openProblems: 4 });
const { guardedWrite, sqliteDate } = await import("@/lib/group-commit");

/** A try at `id` after `used` tries, claiming the visitor's `key` with `reply` as its receipt. */
function keyedTry(id: string, used: number, key: string, reply: string) {
  const now = sqliteDate(new Date());
  return guardedWrite({
    ...wrongTry(id, used, { now }),
    once: { table: "answer_receipts", unique: { visitor_id: "v", key }, values: { problem_id: id, submission: used + 1, fingerprint: "f", status: 200, response: reply, created_at: now } },
  });
}

describe("group commit with a claimed key", () => {
  it("of identical writes sent at once, one is stored and the rest learn what was stored", async () => {
    const key = randomUUID();
    const outcomes = await Promise.all(Array.from({ length: 8 }, (_, i) => keyedTry(ids[0], 0, key, `reply ${i}`)));
    expect(outcomes.filter((o) => o.kind === "written")).toHaveLength(1);
    const claimed = outcomes.filter((o) => o.kind === "claimed");
    expect(claimed).toHaveLength(7);
    const winner = outcomes.findIndex((o) => o.kind === "written");
    for (const o of claimed) expect(o.kind === "claimed" && o.row.response).toBe(`reply ${winner}`);
    expect(await db().models.Attempt.count({ where: { problemId: ids[0] } })).toBe(1);
    expect((await db().models.PracticeProblem.findByPk(ids[0]))?.attemptsUsed).toBe(1);
  });

  it("the same key at two problems sent together: the second finds the first's claim and writes nothing", async () => {
    const key = randomUUID();
    const [first, second] = await Promise.all([keyedTry(ids[1], 0, key, "one"), keyedTry(ids[2], 0, key, "two")]);
    expect(first.kind).toBe("written");
    expect(second).toMatchObject({ kind: "claimed", row: { problem_id: ids[1], response: "one" } });
    expect(await db().models.Attempt.count({ where: { problemId: ids[2] } })).toBe(0);
  });

  it("tries with new keys at one problem are each stored with their own receipt", async () => {
    const outcomes = await Promise.all([0, 1].map((n) => keyedTry(ids[3], n, randomUUID(), `r${n}`)));
    // The second expects the first already stored: it waits for the next batch and its guard holds.
    expect(outcomes.map((o) => o.kind)).toEqual(["written", "written"]);
    const [row] = await db().sequelize.query<{ n: number }>("SELECT COUNT(*) AS n FROM answer_receipts WHERE problem_id = ?", { replacements: [ids[3]], type: QueryTypes.SELECT });
    expect(row.n).toBe(2);
  });
});

describe("receipt retention", () => {
  it("prunes receipts older than a week and keeps the rest", async () => {
    const { pruneReceipts, RECEIPT_RETENTION_MS } = await import("@/lib/practice/receipt-retention");
    const now = new Date();
    const at = (ms: number) => sqliteDate(new Date(now.getTime() - ms));
    const rows = [RECEIPT_RETENTION_MS + 60_000, RECEIPT_RETENTION_MS - 60_000, 1000].map((age, i) => ({
      visitor_id: "old",
      key: randomUUID(),
      problem_id: ids[3],
      submission: 10 + i,
      fingerprint: "f",
      status: 200,
      response: "{}",
      created_at: at(age),
    }));
    await db().sequelize.getQueryInterface().bulkInsert("answer_receipts", rows);
    expect(await pruneReceipts(db().sequelize, now)).toBe(1);
    const left = await db().sequelize.query<{ submission: number }>("SELECT submission FROM answer_receipts WHERE visitor_id = 'old' ORDER BY submission", { type: QueryTypes.SELECT });
    expect(left.map((r) => r.submission)).toEqual([11, 12]);
  });
});
