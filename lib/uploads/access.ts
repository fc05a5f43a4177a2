import "server-only";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { assignmentForStudent, assignmentForTeacher, type AssignmentRecord } from "@/lib/assignments/access";
import type { StudentExtension } from "@/lib/assignments/policy";
import { canTeach } from "@/lib/classes/queries";
import type { Upload } from "@/models";

export type AssignmentViewer =
  | { kind: "teacher"; assignment: AssignmentRecord }
  | { kind: "student"; assignment: AssignmentRecord; extension: StudentExtension };

/**
 * Who is asking about an assignment's photos: one of its class's instructors (or an admin), or
 * an active student of the class. Everyone else gets the student side's 404, so a student of
 * another class cannot tell an assignment exists.
 */
export async function viewerOfAssignment(user: SessionUser, assignmentId: number): Promise<AssignmentViewer> {
  if (user.role !== "student") {
    try {
      return { kind: "teacher", assignment: await assignmentForTeacher(user, assignmentId) };
    } catch (error) {
      if (!(error instanceof AppError && error.code === "forbidden")) throw error;
    }
  }
  const { assignment, extension } = await assignmentForStudent(user, assignmentId);
  return { kind: "student", assignment, extension };
}

export type UploadRelation = "owner" | "teacher" | "stranger";

/** One stored photo and how the user stands to it; a missing photo answers as a stranger's would. */
export async function uploadFor(user: SessionUser, uploadId: string): Promise<{ row: Upload; relation: Exclude<UploadRelation, "stranger"> } | { row: Upload | null; relation: "stranger" }> {
  const { Upload, Assignment } = db().models;
  const row = await Upload.findByPk(uploadId);
  if (!row) return { row: null, relation: "stranger" };
  if (row.studentId === user.id) return { row, relation: "owner" };
  const assignment = await Assignment.findByPk(row.assignmentId, { attributes: ["classId"] });
  if (assignment && (await canTeach(user, assignment.classId))) return { row, relation: "teacher" };
  return { row, relation: "stranger" };
}

export function noSuchPhoto(): AppError {
  return new AppError("not_found", "There is no such photo.");
}
