// Scores computed from the attempts, never typed in: a handful of grouped queries per batch of
// assignments, however many students and problems there are. The gradebook reuses these.
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import { assignmentRecord, type AssignmentRecord } from "./access";
import type { StudentExtension } from "./policy";
import { percentOf, problemCredit, roundPoints, workedLate, workStatus, type WorkStatus } from "./student-status";
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

/**
 * Scores of the active students of each assignment's class (or only `onlyStudent`), keyed by
 * assignment id. Six queries for the whole batch.
 */
export async function scoresFor(assignments: readonly AssignmentRecord[], onlyStudent: Id | null = null, now = new Date()): Promise<Map<Id, StudentScore[]>> {
  const result = new Map<Id, StudentScore[]>(assignments.map((a) => [a.id, []]));
  if (assignments.length === 0) return result;
  const ids = assignments.map((a) => a.id);
  const classIds = [...new Set(assignments.map((a) => a.classId))];
  const student = onlyStudent === null ? "" : " AND s.id = ?";
  const byStudent = onlyStudent === null ? "" : " AND p.user_id = ?";
  const also = onlyStudent === null ? [] : [onlyStudent];

  const [items, students, extensions, problems, corrects, activity] = await Promise.all([
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
    select<{ id: string; userId: Id; assignmentId: Id; points: number; partCount: number | null; kind: string; level: number; seed: number; status: string }>(
      `SELECT p.id, p.user_id AS userId, i.assignment_id AS assignmentId, i.points, p.part_count AS partCount, p.kind, p.level, p.seed, p.status
       FROM practice_problems p JOIN assignment_items i ON i.id = p.assignment_item_id
       WHERE i.assignment_id IN (${marks(ids)}) AND p.variant < i.problem_count${byStudent}`,
      [...ids, ...also],
    ),
    // Once a part is right it is not asked again, so its earliest right answer is the one that counts.
    select<{ problemId: string; firstAt: string }>(
      `SELECT a.problem_id AS problemId, MIN(a.created_at) AS firstAt
       FROM attempts a JOIN assignment_items i ON i.id = a.assignment_item_id JOIN practice_problems p ON p.id = a.problem_id
       WHERE i.assignment_id IN (${marks(ids)}) AND a.verdict = 'correct' AND p.variant < i.problem_count${byStudent}
       GROUP BY a.problem_id, a.part`,
      [...ids, ...also],
    ),
    select<{ assignmentId: Id; userId: Id; tries: number; lastAt: string }>(
      `SELECT i.assignment_id AS assignmentId, a.user_id AS userId, COUNT(DISTINCT a.problem_id || ':' || a.submission) AS tries, MAX(a.created_at) AS lastAt
       FROM attempts a JOIN assignment_items i ON i.id = a.assignment_item_id JOIN practice_problems p ON p.id = a.problem_id
       WHERE i.assignment_id IN (${marks(ids)}) AND p.variant < i.problem_count${byStudent}
       GROUP BY i.assignment_id, a.user_id`,
      [...ids, ...also],
    ),
  ]);

  const firstCorrect = new Map<string, Date[]>();
  for (const c of corrects) firstCorrect.set(c.problemId, [...(firstCorrect.get(c.problemId) ?? []), sqlDate(c.firstAt)]);
  const key = (assignmentId: Id, studentId: Id) => `${assignmentId}:${studentId}`;
  const extensionOf = new Map(extensions.map((e) => [key(e.assignmentId, e.studentId), e]));
  const activityOf = new Map(activity.map((a) => [key(a.assignmentId, a.userId), a]));
  const problemsOf = new Map<string, typeof problems>();
  for (const p of problems) problemsOf.set(key(p.assignmentId, p.userId), [...(problemsOf.get(key(p.assignmentId, p.userId)) ?? []), p]);

  for (const assignment of assignments) {
    const mine = items.filter((i) => i.assignmentId === assignment.id);
    const possible = mine.reduce((sum, i) => sum + i.points * i.problemCount, 0);
    const total = mine.reduce((sum, i) => sum + i.problemCount, 0);
    for (const s of students.filter((st) => st.classId === assignment.classId)) {
      const ext = extensionOf.get(key(assignment.id, s.id));
      const extension: StudentExtension = ext ? { dueAt: ext.dueAt ? sqlDate(ext.dueAt) : null, extraAttempts: ext.extraAttempts } : null;
      const theirs = problemsOf.get(key(assignment.id, s.id)) ?? [];
      const earned = roundPoints(
        theirs.reduce((sum, p) => sum + problemCredit(p.points, p.partCount ?? partCountOf(p.kind, p.level, p.seed), firstCorrect.get(p.id) ?? [], assignment, extension), 0),
      );
      const act = activityOf.get(key(assignment.id, s.id));
      const lastTryAt = act ? sqlDate(act.lastAt) : null;
      const finished = theirs.filter((p) => p.status !== "open").length;
      result.get(assignment.id)!.push({
        studentId: s.id,
        name: s.name,
        email: s.email,
        earned,
        possible,
        percent: percentOf(earned, possible),
        late: workedLate(lastTryAt, assignment, extension),
        status: workStatus({ tries: act?.tries ?? 0, lastTryAt, finished, total }, now, assignment, extension),
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
