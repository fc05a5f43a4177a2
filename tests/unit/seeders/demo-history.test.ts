// The demo's class history, seeded into a real SQLite file: written once, graded as the grader
// grades, dated inside each assignment's window, and absent for the students other tests sign in as.
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { QueryTypes } from "sequelize";
import { openDatabase } from "@/lib/db";
import { prepareDatabase } from "@/lib/setup";
import { acceptsWork } from "@/lib/assignments/policy";
import { gradeValue, readAnswer } from "@/lib/grading/grade";
import { findKind, type Level } from "@/lib/problems";
import { DEMO_ASSIGNMENTS, DEMO_STUDENTS } from "@/seeders/demo";
import { HISTORY_STUDENTS } from "@/seeders/demo-history";
import { recomputedScores } from "../../support/assignment-scores";

const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-demo-history-"));
const file = path.join(dir, "demo.sqlite");
const TABLES = ["practice_problems", "attempts", "lesson_progress", "uploads", "assignments", "assignment_items", "score_overrides"];

type AttemptRow = {
  problemId: string; userId: number; itemId: number | null; kind: string; level: number; seed: number; submission: number; part: string;
  raw: string; value: string; expected: string; verdict: string; pattern: string | null; timeMs: number | null; createdAt: string;
};

async function query<T extends object>(sql: string): Promise<T[]> {
  const database = openDatabase(file);
  try {
    return await database.sequelize.query<T>(sql, { type: QueryTypes.SELECT });
  } finally {
    await database.sequelize.close();
  }
}

async function counts(): Promise<Record<string, number>> {
  const out: Record<string, number> = {};
  for (const table of TABLES) out[table] = (await query<{ n: number }>(`SELECT COUNT(*) AS n FROM ${table}`))[0].n;
  return out;
}

const sqlDate = (text: string) => new Date(text.replace(" ", "T").replace(" +00:00", "Z"));

let attempts: AttemptRow[] = [];

beforeAll(async () => {
  await prepareDatabase(file, { seed: true, bcryptCost: 10 });
  attempts = await query<AttemptRow>(
    `SELECT problem_id AS problemId, user_id AS userId, assignment_item_id AS itemId, kind, level, seed, submission, part, raw, value, expected, verdict, pattern,
            time_ms AS timeMs, created_at AS createdAt FROM attempts`,
  );
}, 60_000);

afterAll(() => fs.rmSync(dir, { recursive: true, force: true }));

describe("the demo class history", () => {
  it("is written once: seeding again adds nothing", async () => {
    const before = await counts();
    expect(before.attempts).toBeGreaterThan(100);
    expect(before.uploads).toBeGreaterThanOrEqual(4);
    expect(before.assignments).toBe(DEMO_ASSIGNMENTS.length);
    await prepareDatabase(file, { seed: true, bcryptCost: 10 });
    expect(await counts()).toEqual(before);
    expect(fs.readdirSync(path.join(dir, "uploads"))).toHaveLength(before.uploads * 2);
  }, 60_000);

  it("stores every try with the verdict, slip and values the grader gives its raw answer", () => {
    for (const row of attempts) {
      const kind = findKind(row.kind)!;
      const params = kind.generate(row.seed, row.level as Level);
      const part = kind.parts(params).find((p) => p.key === row.part)!;
      const expected = kind.solve(params)[row.part];
      const read = readAnswer(part, row.raw);
      if (!read.ok) throw new Error(`unreadable demo answer ${row.raw}`);
      const grade = gradeValue(part, expected, read.value, read.readAs, (v) => kind.diagnose(params, row.part, v));
      expect({ verdict: row.verdict, pattern: row.pattern, value: row.value, expected: row.expected }).toEqual({
        verdict: grade.verdict, pattern: grade.pattern, value: grade.value.toFraction(), expected: expected.toFraction(),
      });
    }
    const verdicts = new Set(attempts.map((a) => a.verdict));
    expect(verdicts).toEqual(new Set(["correct", "imprecise", "incorrect"]));
    // The slips chart has several real slips to show, the students' habits among them.
    const patterns = new Set(attempts.map((a) => a.pattern).filter(Boolean));
    expect(patterns.size).toBeGreaterThanOrEqual(5);
    for (const slip of ["divided-by-members", "forgot-member-width", "on-center-for-gap"]) expect(patterns).toContain(slip);
  });

  it("keeps each problem's count and status in step with its tries", async () => {
    const problems = await query<{ id: string; attemptsUsed: number; attemptsAllowed: number; status: string; partCount: number; finishedAt: string | null }>(
      "SELECT id, attempts_used AS attemptsUsed, attempts_allowed AS attemptsAllowed, status, part_count AS partCount, finished_at AS finishedAt FROM practice_problems",
    );
    for (const problem of problems) {
      const mine = attempts.filter((a) => a.problemId === problem.id);
      const used = Math.max(0, ...mine.map((a) => a.submission));
      const solvedParts = new Set(mine.filter((a) => a.verdict === "correct").map((a) => a.part));
      const solved = solvedParts.size === problem.partCount;
      expect(problem.attemptsUsed).toBe(used);
      expect(problem.status).toBe(solved ? "solved" : used >= problem.attemptsAllowed ? "failed" : "open");
      expect(problem.finishedAt === null).toBe(problem.status === "open");
      // A part once right is never answered again.
      for (const part of solvedParts) {
        const right = mine.find((a) => a.part === part && a.verdict === "correct")!;
        expect(mine.filter((a) => a.part === part && a.submission > right.submission)).toEqual([]);
      }
    }
  });

  it("dates every assignment try inside the window that assignment takes work, with some late under the penalty", async () => {
    const windows = await query<{ itemId: number; opensAt: string; dueAt: string; latePolicy: "none" | "until" | "penalty"; lateUntil: string | null; latePenaltyPercent: number | null }>(
      `SELECT i.id AS itemId, a.opens_at AS opensAt, a.due_at AS dueAt, a.late_policy AS latePolicy, a.late_until AS lateUntil, a.late_penalty_percent AS latePenaltyPercent
       FROM assignment_items i JOIN assignments a ON a.id = i.assignment_id`,
    );
    const byItem = new Map(windows.map((w) => [w.itemId, w]));
    let late = 0;
    for (const row of attempts.filter((a) => a.itemId !== null)) {
      const w = byItem.get(row.itemId!)!;
      const rules = { dueAt: sqlDate(w.dueAt), latePolicy: w.latePolicy, lateUntil: w.lateUntil ? sqlDate(w.lateUntil) : null, latePenaltyPercent: w.latePenaltyPercent };
      const at = sqlDate(row.createdAt);
      expect(acceptsWork(at, sqlDate(w.opensAt), rules, null)).toBe(true);
      expect(at.getTime()).toBeLessThan(Date.now());
      if (at > rules.dueAt) {
        expect(w.latePolicy).toBe("penalty");
        late += 1;
      }
    }
    expect(late).toBeGreaterThan(0);
    expect(attempts.every((a) => a.timeMs !== null && a.timeMs > 0)).toBe(true);
  });

  it("leaves the students the other suites sign in as without any history", async () => {
    const withHistory = new Set(HISTORY_STUDENTS.map((s) => DEMO_STUDENTS[s.index].email));
    for (const index of [0, 4, 5, 6, 9, 14, 15, 16, 17]) expect(withHistory.has(DEMO_STUDENTS[index].email)).toBe(false);
    const blank = DEMO_STUDENTS.filter((s) => !withHistory.has(s.email)).map((s) => `'${s.email}'`).join(", ");
    const touched = await query<{ n: number }>(
      `SELECT (SELECT COUNT(*) FROM practice_problems p JOIN users u ON u.id = p.user_id WHERE u.email IN (${blank}))
            + (SELECT COUNT(*) FROM lesson_progress l JOIN users u ON u.id = l.user_id WHERE u.email IN (${blank}))
            + (SELECT COUNT(*) FROM uploads f JOIN users u ON u.id = f.student_id WHERE u.email IN (${blank})) AS n`,
    );
    expect(touched[0].n).toBe(0);
    // Harlan works the assignments but the lesson tests expect him never to have opened a lesson.
    const harlan = await query<{ n: number }>(`SELECT COUNT(*) AS n FROM lesson_progress l JOIN users u ON u.id = l.user_id WHERE u.email = '${DEMO_STUDENTS[7].email}'`);
    expect(harlan[0].n).toBe(0);
  });

  it("gives most history students lessons read and one photo an instructor's comment", async () => {
    const readers = await query<{ n: number }>("SELECT COUNT(DISTINCT user_id) AS n FROM lesson_progress");
    expect(readers[0].n).toBeGreaterThanOrEqual(HISTORY_STUDENTS.length - 2);
    const statuses = await query<{ status: string }>("SELECT DISTINCT status FROM lesson_progress");
    expect(new Set(statuses.map((s) => s.status))).toEqual(new Set(["opened", "completed", "practised"]));
    const commented = await query<{ n: number }>("SELECT COUNT(*) AS n FROM uploads WHERE comment IS NOT NULL AND comment_by IS NOT NULL");
    expect(commented[0].n).toBe(1);
  });

  it("has one score changed by the instructor, whose history starts from the score the tries earn", async () => {
    const rows = await query<{ assignmentId: number; studentId: number; points: number; fromPoints: number; toPoints: number; reason: string; createdBy: number; createdAt: string; email: string }>(
      `SELECT o.assignment_id AS assignmentId, o.student_id AS studentId, o.points, o.from_points AS fromPoints, o.to_points AS toPoints, o.reason,
              o.created_by AS createdBy, o.created_at AS createdAt, u.email FROM score_overrides o JOIN users u ON u.id = o.student_id`,
    );
    expect(rows).toHaveLength(1);
    const [row] = rows;
    expect(row.email).toBe(DEMO_STUDENTS[3].email);
    expect(row.reason.length).toBeGreaterThan(20);
    expect(row.createdBy).not.toBeNull();
    expect(sqlDate(row.createdAt).getTime()).toBeLessThan(Date.now());
    // The independent recomputation (tests/support) of what the tries earn is where the history starts.
    const earned = (await recomputedScores(file, row.assignmentId)).get(row.studentId) ?? 0;
    expect(row.fromPoints).toBe(Math.round(earned * 100));
    const [{ possible }] = await query<{ possible: number }>(`SELECT SUM(points * problem_count) AS possible FROM assignment_items WHERE assignment_id = ${row.assignmentId}`);
    expect(row.toPoints).toBeGreaterThan(row.fromPoints);
    expect(row.toPoints).toBeLessThanOrEqual(possible * 100);
    expect(row.points).toBe(row.toPoints);
  });
});
