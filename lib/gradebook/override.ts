// An instructor changes a student's score, excuses the work, or takes a change back. The history
// row and the student's e-mail are written in one IMMEDIATE transaction (SQLite's write lock from
// BEGIN), so two instructors changing the same score at once each record the "from" the other left.
import "server-only";
import { Transaction } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { assignmentForTeacher, type AssignmentRecord } from "@/lib/assignments/access";
import { scoresFor } from "@/lib/assignments/scores";
import { appLink } from "@/lib/mail/links";
import { enqueueMail } from "@/lib/mail/outbox";
import { scoreChangedMail } from "@/lib/mail/templates/score-changed";
import { overrideHistory, overridesInForce } from "./overrides";
import type { OverrideInput } from "./schemas";
import { toHundredths } from "./totals";
import type { OverrideEntry } from "./types";

/** The assignment, checked to belong to the class in the address and to be taught by this user. */
export async function classAssignment(user: SessionUser, classId: number, assignmentId: number): Promise<AssignmentRecord> {
  const assignment = await assignmentForTeacher(user, assignmentId);
  if (assignment.classId !== classId || assignment.status !== "published") throw new AppError("not_found", "There is no such assignment in this class's gradebook.");
  return assignment;
}

export async function activeStudent(classId: number, studentId: number): Promise<{ id: number; name: string; email: string }> {
  const { Enrollment, User } = db().models;
  const enrolled = Number.isSafeInteger(studentId) && (await Enrollment.findOne({ attributes: ["id"], where: { classId, studentId, status: "active" } }));
  const user = enrolled ? await User.findByPk(studentId, { attributes: ["id", "name", "email"] }) : null;
  if (!user) throw new AppError("not_found", "That student is not on this class's roster.");
  return { id: user.id, name: user.name, email: user.email };
}

export async function overrideScore(user: SessionUser, classId: number, assignmentId: number, studentId: number, input: OverrideInput): Promise<{ history: OverrideEntry[] }> {
  const assignment = await classAssignment(user, classId, assignmentId);
  const student = await activeStudent(classId, studentId);
  const computed = (await scoresFor([assignment], studentId)).get(assignment.id)?.[0];
  const possible = computed?.possible ?? 0;
  if (input.points !== undefined && input.points > possible) {
    throw new AppError("bad_request", `This assignment is worth ${possible} points; give at most that.`, { points: `Give at most ${possible} points.` });
  }
  const className = (await db().models.SchoolClass.findByPk(classId, { attributes: ["name"] }))?.name ?? "your class";
  const { ScoreOverride } = db().models;

  await db().sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    // Read inside the lock: the "from" is what was in force the moment this change lands.
    const inForce = (await overridesInForce([assignment.id], studentId)).get(`${assignment.id}:${studentId}`);
    const before = inForce ? inForce.earned : (computed?.earned ?? 0);
    const excused = input.excused === true;
    const cleared = input.clear === true;
    if (cleared && !inForce) throw new AppError("conflict", "There is no change to clear: the computed score is already in force.");
    const after = excused ? null : cleared ? (computed?.earned ?? 0) : input.points!;
    await ScoreOverride.create(
      {
        assignmentId: assignment.id,
        studentId,
        points: excused || cleared ? null : toHundredths(after!),
        excused,
        cleared,
        reason: input.reason,
        fromPoints: before === null ? null : toHundredths(before),
        toPoints: after === null ? null : toHundredths(after),
        createdBy: user.id,
      },
      { transaction },
    );
    const mail = scoreChangedMail({
      to: student.email,
      studentName: student.name,
      className,
      title: assignment.title,
      possible,
      fromPoints: before,
      toPoints: after,
      excused,
      reason: input.reason,
      url: appLink(`/my-classes/${classId}/assignments/${assignment.id}`),
    });
    await enqueueMail([mail], transaction);
  });
  return { history: await overrideHistory(assignment.id, studentId) };
}
