import "server-only";
import { forbidden, notFound } from "next/navigation";
import { assignmentForTeacher, type AssignmentRecord } from "@/lib/assignments/access";
import type { SessionUser } from "@/lib/auth/roles";
import { AppError } from "@/lib/errors";

/** The assignment for someone who teaches its class, and only at its own class's address. */
export async function teacherAssignmentOr404(user: SessionUser, classId: string, assignmentId: string): Promise<AssignmentRecord> {
  try {
    const assignment = await assignmentForTeacher(user, Number(assignmentId));
    if (assignment.classId !== Number(classId)) notFound();
    return assignment;
  } catch (error) {
    if (error instanceof AppError && error.code === "forbidden") forbidden();
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
