import "server-only";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { canTeach } from "@/lib/classes/queries";
import type { Assignment } from "@/models";
import type { LateRules, StudentExtension } from "./policy";

/** An assignment as lib/ hands it around: plain data, dates as Date. */
export type AssignmentRecord = LateRules & {
  id: number;
  classId: number;
  title: string;
  instructions: string;
  opensAt: Date;
  attemptsAllowed: number;
  reveal: "when-final" | "after-due";
  status: "draft" | "published";
  publishedAt: Date | null;
};

export type AssignmentItemRecord = { id: number; assignmentId: number; position: number; kind: string; level: 1 | 2 | 3; problemCount: number; tolerance: "half" | "full"; points: number };

export function assignmentRecord(row: Assignment): AssignmentRecord {
  return {
    id: row.id,
    classId: row.classId,
    title: row.title,
    instructions: row.instructions,
    opensAt: row.opensAt,
    dueAt: row.dueAt,
    latePolicy: row.latePolicy,
    lateUntil: row.lateUntil,
    latePenaltyPercent: row.latePenaltyPercent,
    attemptsAllowed: row.attemptsAllowed,
    reveal: row.reveal,
    status: row.status,
    publishedAt: row.publishedAt,
  };
}

async function load(assignmentId: number): Promise<AssignmentRecord> {
  const row = Number.isSafeInteger(assignmentId) ? await db().models.Assignment.findByPk(assignmentId) : null;
  if (!row) throw new AppError("not_found", "There is no such assignment.");
  return assignmentRecord(row);
}

export async function itemsOf(assignmentId: number): Promise<AssignmentItemRecord[]> {
  const rows = await db().models.AssignmentItem.findAll({ where: { assignmentId }, order: [["position", "ASC"]] });
  return rows.map((r) => ({ id: r.id, assignmentId: r.assignmentId, position: r.position, kind: r.kind, level: r.level as 1 | 2 | 3, problemCount: r.problemCount, tolerance: r.tolerance, points: r.points }));
}

/** For the class's instructors (lead or co-) and admins; anyone else gets 403, a missing one 404. */
export async function assignmentForTeacher(user: SessionUser, assignmentId: number): Promise<AssignmentRecord> {
  const assignment = await load(assignmentId);
  if (!(await canTeach(user, assignment.classId))) throw new AppError("forbidden", "Only the class's instructors can see this assignment.");
  return assignment;
}

/**
 * For an active student of the class, once published. A draft, another class's assignment, or a
 * removed student all answer 404 alike, so a student cannot probe which assignments exist.
 */
export async function assignmentForStudent(user: SessionUser, assignmentId: number): Promise<{ assignment: AssignmentRecord; extension: StudentExtension }> {
  const assignment = await load(assignmentId).catch(() => null);
  const { Enrollment, AssignmentExtension } = db().models;
  const enrolled = assignment && (await Enrollment.findOne({ attributes: ["id"], where: { classId: assignment.classId, studentId: user.id, status: "active" } }));
  if (!assignment || !enrolled || assignment.status !== "published") throw new AppError("not_found", "There is no such assignment in your classes.");
  const ext = await AssignmentExtension.findOne({ where: { assignmentId, studentId: user.id } });
  return { assignment, extension: ext ? { dueAt: ext.dueAt, extraAttempts: ext.extraAttempts } : null };
}
