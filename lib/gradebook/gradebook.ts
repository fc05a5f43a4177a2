// The class's gradebook: active students × published assignments, from a fixed handful of grouped
// queries (scoresFor's four, one for overrides, one for photo counts, two small lists) whatever the
// size of the class.
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import type { SessionUser } from "@/lib/auth/roles";
import { assignmentRecord, type AssignmentRecord } from "@/lib/assignments/access";
import { scoresFor, type StudentScore } from "@/lib/assignments/scores";
import { percentOf } from "@/lib/assignments/student-status";
import { classForTeacher, type ClassSummary } from "@/lib/classes/queries";
import { overridesInForce } from "./overrides";
import { classAverage, studentTotal } from "./totals";
import type { Gradebook, GradebookCell, GradebookStudent } from "./types";

export async function publishedAssignments(classId: number): Promise<AssignmentRecord[]> {
  const rows = await db().models.Assignment.findAll({ where: { classId, status: "published" }, order: [["dueAt", "ASC"], ["id", "ASC"]] });
  return rows.map(assignmentRecord);
}

async function activeStudents(classId: number): Promise<{ id: number; name: string; email: string }[]> {
  return db().sequelize.query(
    `SELECT s.id, s.name, s.email FROM enrollments e JOIN users s ON s.id = e.student_id WHERE e.class_id = ? AND e.status = 'active' ORDER BY s.name COLLATE NOCASE, s.id`,
    { replacements: [classId], type: QueryTypes.SELECT },
  );
}

async function photoCounts(assignmentIds: readonly number[]): Promise<Map<string, number>> {
  if (assignmentIds.length === 0) return new Map();
  const rows = await db().sequelize.query<{ assignmentId: number; studentId: number; photos: number }>(
    `SELECT assignment_id AS assignmentId, student_id AS studentId, COUNT(*) AS photos FROM uploads WHERE assignment_id IN (${assignmentIds.map(() => "?").join(", ")}) GROUP BY assignment_id, student_id`,
    { replacements: [...assignmentIds], type: QueryTypes.SELECT },
  );
  return new Map(rows.map((r) => [`${r.assignmentId}:${r.studentId}`, Number(r.photos)]));
}

export function cellOf(assignmentId: number, score: StudentScore | undefined, possible: number, override: { earned: number | null; excused: boolean } | undefined, photos: number): GradebookCell {
  const computedEarned = score?.earned ?? 0;
  const excused = override?.excused ?? false;
  const overridden = override !== undefined && !excused;
  const earned = overridden ? (override.earned ?? 0) : computedEarned;
  const status = excused ? "excused" : (score?.status ?? "not-started");
  return {
    assignmentId,
    earned,
    computedEarned,
    possible,
    percent: percentOf(earned, possible),
    status,
    late: !excused && (score?.late ?? false),
    // A score given by hand stands for the work, so it is no longer missing.
    missing: status === "missing" && !overridden,
    excused,
    overridden,
    photos,
  };
}

/** For the class's instructors and admins (403 otherwise, 404 for no such class). */
export async function gradebook(user: SessionUser, classId: number): Promise<Gradebook> {
  return gradebookOf(await classForTeacher(user, classId));
}

/** The gradebook of a class the caller has already been allowed to teach (classForTeacher's result). */
export async function gradebookOf(summary: ClassSummary): Promise<Gradebook> {
  const classId = summary.id;
  const assignments = await publishedAssignments(classId);
  const ids = assignments.map((a) => a.id);
  const [students, scores, overrides, photos] = await Promise.all([activeStudents(classId), scoresFor(assignments), overridesInForce(ids), photoCounts(ids)]);
  const possibleOf = new Map<number, number>();
  const scoreOf = new Map<string, StudentScore>();
  for (const [assignmentId, list] of scores) {
    for (const s of list) {
      scoreOf.set(`${assignmentId}:${s.studentId}`, s);
      possibleOf.set(assignmentId, s.possible);
    }
  }
  // With nobody enrolled scoresFor has no rows to carry the possible points; read them once.
  if (students.length === 0 && ids.length > 0) {
    const rows = await db().sequelize.query<{ assignmentId: number; possible: number }>(
      `SELECT assignment_id AS assignmentId, SUM(points * problem_count) AS possible FROM assignment_items WHERE assignment_id IN (${ids.map(() => "?").join(", ")}) GROUP BY assignment_id`,
      { replacements: ids, type: QueryTypes.SELECT },
    );
    for (const r of rows) possibleOf.set(r.assignmentId, Number(r.possible));
  }

  const rows: GradebookStudent[] = students.map((s) => {
    const cells = assignments.map((a) => {
      const key = `${a.id}:${s.id}`;
      return cellOf(a.id, scoreOf.get(key), possibleOf.get(a.id) ?? 0, overrides.get(key), photos.get(key) ?? 0);
    });
    return { ...s, cells, ...studentTotal(cells) };
  });
  return {
    classId,
    className: summary.name,
    assignments: assignments.map((a, index) => {
      const column = rows.map((r) => r.cells[index]);
      return {
        id: a.id,
        title: a.title,
        dueAt: a.dueAt.toISOString(),
        possible: possibleOf.get(a.id) ?? 0,
        average: classAverage(column),
        graded: column.filter((c) => !c.excused).length,
      };
    }),
    students: rows,
  };
}
