// One gradebook cell opened: the student's problems with every try (through the instructor's
// review of the assignment, not a second copy of it), the time each try took, photos and
// comments, and the override history.
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import type { SessionUser } from "@/lib/auth/roles";
import { studentReview } from "@/lib/assignments/student-review";
import { listUploads } from "@/lib/uploads/store";
import { classAssignment } from "./override";
import { overrideHistory, overridesInForce } from "./overrides";
import type { DrillDownView } from "./types";

export type DrillDown = DrillDownView;

export async function drillDown(user: SessionUser, classId: number, assignmentId: number, studentId: number): Promise<DrillDown> {
  const assignment = await classAssignment(user, classId, assignmentId);
  const review = await studentReview(assignment, studentId);
  const [photos, history, inForce, times] = await Promise.all([
    listUploads(user, assignment.id, studentId),
    overrideHistory(assignment.id, studentId),
    overridesInForce([assignment.id], studentId),
    db().sequelize.query<{ problemId: string; submission: number; timeMs: number | null }>(
      `SELECT a.problem_id AS problemId, a.submission, MAX(a.time_ms) AS timeMs FROM attempts a JOIN assignment_items i ON i.id = a.assignment_item_id
       WHERE a.user_id = ? AND i.assignment_id = ? GROUP BY a.problem_id, a.submission`,
      { replacements: [studentId, assignment.id], type: QueryTypes.SELECT },
    ),
  ]);
  const secondsPerTry: Record<string, number> = {};
  for (const t of times) if (t.timeMs !== null) secondsPerTry[`${t.problemId}:${t.submission}`] = Math.round(Number(t.timeMs) / 100) / 10;
  return { review, secondsPerTry, photos, history, inForce: inForce.get(`${assignment.id}:${studentId}`) ?? null };
}
