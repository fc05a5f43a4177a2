// The instructor's view of one student's work on one assignment: their variants with the prompts
// and answers, every try in order, and the score the attempts give.
import "server-only";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { EnrollmentStatus } from "@/models/enrollment";
import { itemsOf, type AssignmentRecord } from "./access";
import { closesAt, effectiveDue, type StudentExtension } from "./policy";
import { scoresFor, type StudentScore } from "./scores";
import { percentOf, roundPoints, type WorkStatus } from "./student-status";
import { loadVariants, problemView, type AssignmentProblemView } from "./work";

export type StudentReview = {
  student: { id: number; name: string; email: string; enrollment: EnrollmentStatus };
  assignment: { id: number; classId: number; title: string; dueAt: string; closesAt: string; attemptsAllowed: number };
  extension: { dueAt: string | null; extraAttempts: number; note: string | null } | null;
  score: Pick<StudentScore, "earned" | "possible" | "percent" | "late" | "finished" | "total" | "lastActivityAt"> & { status: WorkStatus | null };
  problems: AssignmentProblemView[];
};

/** For breadcrumbs on the instructor's pages. */
export async function classNameOf(classId: number): Promise<string> {
  return (await db().models.SchoolClass.findByPk(classId, { attributes: ["name"] }))?.name ?? "Class";
}

/**
 * For someone who teaches the class (checked by the caller). A student who was removed from the
 * class still has their work shown; someone never in the class is a 404.
 */
export async function studentReview(assignment: AssignmentRecord, studentId: number): Promise<StudentReview> {
  const { Enrollment, User, AssignmentExtension } = db().models;
  const enrollment = Number.isSafeInteger(studentId) ? await Enrollment.findOne({ where: { classId: assignment.classId, studentId } }) : null;
  const user = enrollment ? await User.findByPk(studentId, { attributes: ["id", "name", "email"] }) : null;
  if (!enrollment || !user) throw new AppError("not_found", "That student is not in this class.");

  const [ext, items] = await Promise.all([AssignmentExtension.findOne({ where: { assignmentId: assignment.id, studentId } }), itemsOf(assignment.id)]);
  const extension: StudentExtension = ext ? { dueAt: ext.dueAt, extraAttempts: ext.extraAttempts } : null;
  // Only the variants the student has opened exist; the rest are shown as not opened by the totals.
  const variants = await loadVariants(studentId, items);
  const ctx = { assignment, extension, now: new Date() };
  const problems = variants.map((v) => problemView(v, ctx, true));

  const scored = enrollment.status === "active" ? (await scoresFor([assignment], studentId)).get(assignment.id)?.[0] : undefined;
  const possible = items.reduce((sum, i) => sum + i.points * i.problemCount, 0);
  const earned = roundPoints(problems.reduce((sum, p) => sum + p.earned, 0));
  const lastTry = problems.flatMap((p) => p.tries.map((t) => t.at)).sort().at(-1) ?? null;
  return {
    student: { id: user.id, name: user.name, email: user.email, enrollment: enrollment.status },
    assignment: {
      id: assignment.id,
      classId: assignment.classId,
      title: assignment.title,
      dueAt: effectiveDue(assignment, extension).toISOString(),
      closesAt: closesAt(assignment, extension).toISOString(),
      attemptsAllowed: assignment.attemptsAllowed + (extension?.extraAttempts ?? 0),
    },
    extension: ext ? { dueAt: ext.dueAt?.toISOString() ?? null, extraAttempts: ext.extraAttempts, note: ext.note } : null,
    score: {
      earned,
      possible,
      percent: percentOf(earned, possible),
      late: scored?.late ?? problems.some((p) => p.tries.some((t) => t.late)),
      status: scored?.status ?? null,
      finished: problems.filter((p) => p.status !== "open").length,
      total: items.reduce((sum, i) => sum + i.problemCount, 0),
      lastActivityAt: lastTry,
    },
    problems,
  };
}
