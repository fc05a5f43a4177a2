// Scores computed from the attempts, never typed in: a handful of grouped queries per batch of
// assignments, however many students and problems there are. The gradebook reuses these.
import "server-only";
import { QueryTypes, Transaction } from "sequelize";
import { db } from "@/lib/db";
import { assignmentRecord, type AssignmentRecord } from "./access";
import type { StudentExtension } from "./policy";
import { percentOf, roundPoints, workedLate, workStatus, type WorkStatus } from "./student-status";
import { partCountOf } from "./variants";

export type StudentScore = {
  studentId: number;
  name: string;
  email: string;
  earned: number;
  possible: number;
  percent: number;
  /** Any counted try after the student's due date. */
  late: boolean;
  status: WorkStatus;
  finished: number;
  total: number;
  lastActivityAt: string | null;
  extension: { dueAt: string | null; extraAttempts: number } | null;
};

type Id = number;
const marks = (values: readonly unknown[]) => values.map(() => "?").join(", ");
const sqlDate = (text: string) => new Date(text);

async function select<T extends object>(sql: string, replacements: unknown[]): Promise<T[]> {
  return db().sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });
}

// Unix milliseconds of a stored date. julianday() reads Sequelize's "YYYY-MM-DD HH:MM:SS.SSS +00:00";
// a double holds the day count to well under a millisecond, so rounding gives the exact instant.
const unixMs = (column: string) => `CAST(ROUND((julianday(${column}) - 2440587.5) * 86400000.0) AS INTEGER)`;
const DAY_MS = 24 * 60 * 60 * 1000;

/**
 * One pass giving, per student and assignment: the points earned, how many problems are finished
 * and how many tried, and the last try. Each try is counted on its problem as it is stored
 * (attempts_used, last_try_at), so only the right tries are read, from their own covering index
 * (migration 0013); the problems come from a covering index too. A part earns its problem's
 * points ÷ parts × the credit share of the try in which it came out right; a part once right is not
 * asked again, so it has one right try at most (a unique index). The share is policy.ts's
 * creditShare written in SQL — 1 on time; under a daily penalty, 1 − days late (any part of a day
 * counts) × percent, never below 0 — from the student's own due date. The joins run assignment →
 * student → item → problem, the order of the GROUP BY, so SQLite sums as it reads, with no sort.
 * The gradebook integration test checks the result against a recomputation from the raw tries.
 */
function workSql(assignmentCount: number, byStudent: string): string {
  const over = `(${unixMs("a.created_at")} - ${unixMs("COALESCE(x.due_at, s.due_at)")})`;
  const days = `(CASE WHEN ${over} <= 0 THEN 0 ELSE (${over} + ${DAY_MS - 1}) / ${DAY_MS} END)`;
  const share = `(CASE WHEN s.late_policy = 'penalty' AND s.late_penalty_percent > 0
      THEN MAX(0.0, 1.0 - ${days} * s.late_penalty_percent / 100.0) ELSE 1.0 END)`;
  return `SELECT s.id AS assignmentId, e.student_id AS userId,
      TOTAL((SELECT TOTAL(${share}) FROM attempts a WHERE a.problem_id = p.id AND a.verdict = 'correct') * i.points / p.part_count) AS earned,
      SUM(p.status <> 'open') AS finished, SUM(p.attempts_used > 0) AS tried, MAX(p.last_try_at) AS lastAt
    FROM assignments s
    JOIN enrollments e ON e.class_id = s.class_id AND e.status = 'active'
    LEFT JOIN assignment_extensions x ON x.assignment_id = s.id AND x.student_id = e.student_id
    CROSS JOIN assignment_items i ON i.assignment_id = s.id
    CROSS JOIN practice_problems p ON p.assignment_item_id = i.id AND p.user_id = e.student_id AND p.variant < i.problem_count
    WHERE s.id IN (${marks(Array.from({ length: assignmentCount }))})${byStudent}
    GROUP BY s.id, e.student_id`;
}

/**
 * Variants made before part counts were stored have none; the sum above needs it. Counting means
 * rebuilding the problem from its seed, so it is done once here and kept (deterministic, so two
 * requests filling the same row write the same number).
 */
async function sizeUnsizedProblems(assignmentIds: readonly Id[]): Promise<void> {
  // Every variant made today stores its count, so an assignment once sized stays sized: look once
  // per assignment per process (per database, as tests open several in one process).
  const { sequelize } = db();
  let sized = sizedAssignments.get(sequelize);
  if (!sized) sizedAssignments.set(sequelize, (sized = new Set()));
  const unchecked = assignmentIds.filter((id) => !sized.has(id));
  if (unchecked.length === 0) return;
  const unsized = await select<{ id: string; kind: string; level: number; seed: number }>(
    `SELECT p.id, p.kind, p.level, p.seed FROM practice_problems p JOIN assignment_items i ON i.id = p.assignment_item_id
     WHERE i.assignment_id IN (${marks(unchecked)}) AND p.part_count IS NULL`,
    [...unchecked],
  );
  if (unsized.length > 0) {
    await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
      for (const p of unsized) {
        await sequelize.query("UPDATE practice_problems SET part_count = ? WHERE id = ? AND part_count IS NULL", {
          replacements: [partCountOf(p.kind, p.level, p.seed), p.id],
          transaction,
        });
      }
    });
  }
  for (const id of unchecked) sized.add(id);
}
const sizedAssignments = new WeakMap<object, Set<Id>>();

/**
 * Scores of the active students of each assignment's class (or only `onlyStudent`), keyed by
 * assignment id. Four queries for the whole batch, whatever its size (and, once, an update for
 * variants made before part counts were stored; the gradebook test's generated class has such rows).
 */
export async function scoresFor(assignments: readonly AssignmentRecord[], onlyStudent: Id | null = null, now = new Date()): Promise<Map<Id, StudentScore[]>> {
  const result = new Map<Id, StudentScore[]>(assignments.map((a) => [a.id, []]));
  if (assignments.length === 0) return result;
  const ids = assignments.map((a) => a.id);
  const classIds = [...new Set(assignments.map((a) => a.classId))];
  const student = onlyStudent === null ? "" : " AND s.id = ?";
  const byEnrolled = onlyStudent === null ? "" : " AND e.student_id = ?";
  const also = onlyStudent === null ? [] : [onlyStudent];

  await sizeUnsizedProblems(ids);
  const [items, students, extensions, work] = await Promise.all([
    select<{ id: Id; assignmentId: Id; points: number; problemCount: number }>(
      `SELECT id, assignment_id AS assignmentId, points, problem_count AS problemCount FROM assignment_items WHERE assignment_id IN (${marks(ids)})`,
      ids,
    ),
    select<{ classId: Id; id: Id; name: string; email: string }>(
      `SELECT e.class_id AS classId, s.id, s.name, s.email FROM enrollments e JOIN users s ON s.id = e.student_id
       WHERE e.class_id IN (${marks(classIds)}) AND e.status = 'active'${student} ORDER BY s.name`,
      [...classIds, ...also],
    ),
    select<{ assignmentId: Id; studentId: Id; dueAt: string | null; extraAttempts: number }>(
      `SELECT assignment_id AS assignmentId, student_id AS studentId, due_at AS dueAt, extra_attempts AS extraAttempts FROM assignment_extensions s
       WHERE assignment_id IN (${marks(ids)})${onlyStudent === null ? "" : " AND s.student_id = ?"}`,
      [...ids, ...also],
    ),
    select<{ assignmentId: Id; userId: Id; earned: number; finished: number; tried: number; lastAt: string | null }>(workSql(ids.length, byEnrolled), [...ids, ...also]),
  ]);

  const key = (assignmentId: Id, studentId: Id) => `${assignmentId}:${studentId}`;
  const extensionOf = new Map(extensions.map((e) => [key(e.assignmentId, e.studentId), e]));
  const workOf = new Map(work.map((w) => [key(w.assignmentId, w.userId), w]));
  const studentsOf = new Map<Id, typeof students>();
  for (const s of students) {
    const list = studentsOf.get(s.classId);
    if (list) list.push(s);
    else studentsOf.set(s.classId, [s]);
  }

  for (const assignment of assignments) {
    const mine = items.filter((i) => i.assignmentId === assignment.id);
    const possible = mine.reduce((sum, i) => sum + i.points * i.problemCount, 0);
    const total = mine.reduce((sum, i) => sum + i.problemCount, 0);
    for (const s of studentsOf.get(assignment.classId) ?? []) {
      const ext = extensionOf.get(key(assignment.id, s.id));
      const extension: StudentExtension = ext ? { dueAt: ext.dueAt ? sqlDate(ext.dueAt) : null, extraAttempts: ext.extraAttempts } : null;
      const worked = workOf.get(key(assignment.id, s.id));
      const earned = roundPoints(Number(worked?.earned ?? 0));
      const finished = Number(worked?.finished ?? 0);
      const tried = Number(worked?.tried ?? 0);
      const lastTryAt = worked?.lastAt ? sqlDate(worked.lastAt) : null;
      result.get(assignment.id)!.push({
        studentId: s.id,
        name: s.name,
        email: s.email,
        earned,
        possible,
        percent: percentOf(earned, possible),
        late: workedLate(lastTryAt, assignment, extension),
        status: workStatus({ tries: tried, lastTryAt, finished, total }, now, assignment, extension),
        finished,
        total,
        lastActivityAt: lastTryAt?.toISOString() ?? null,
        extension: extension ? { dueAt: extension.dueAt?.toISOString() ?? null, extraAttempts: extension.extraAttempts } : null,
      });
    }
  }
  return result;
}

/**
 * Every active student's score on one assignment, by name. The caller has checked who may see
 * them (assignmentForTeacher); pass the record it returned, or an id.
 */
export async function scoresForAssignment(assignment: AssignmentRecord | number): Promise<StudentScore[]> {
  const record = typeof assignment === "number" ? await db().models.Assignment.findByPk(assignment).then((row) => (row ? assignmentRecord(row) : null)) : assignment;
  if (!record) return [];
  return (await scoresFor([record])).get(record.id) ?? [];
}

/** One student's score on each of these assignments. */
export async function scoresOfStudent(assignments: readonly AssignmentRecord[], studentId: Id): Promise<Map<Id, StudentScore | null>> {
  const all = await scoresFor(assignments, studentId);
  return new Map(assignments.map((a) => [a.id, all.get(a.id)?.[0] ?? null]));
}
