import "server-only";
import { literal, Op, Transaction } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { assignmentForTeacher } from "./access";
import type { extensionSchema } from "./schemas";
import type { z } from "zod";

// Accommodations for one student: a later due date and/or more tries per problem. A student's
// problems are made with the tries allowed at that moment, so granting tries also raises the
// problems they already have — only those still open: a finished problem may have shown its answers.

export type ExtensionView = {
  studentId: number;
  studentName: string;
  studentEmail: string;
  dueAt: string | null;
  extraAttempts: number;
  note: string | null;
  grantedByName: string | null;
  updatedAt: string;
};

type ExtensionData = z.output<typeof extensionSchema>;

export async function listExtensions(user: SessionUser, assignmentId: number): Promise<ExtensionView[]> {
  await assignmentForTeacher(user, assignmentId);
  const { AssignmentExtension, User } = db().models;
  const rows = await AssignmentExtension.findAll({ where: { assignmentId }, raw: true });
  const people = await User.findAll({ attributes: ["id", "name", "email"], where: { id: [...new Set(rows.flatMap((r) => [r.studentId, r.grantedBy].filter((v): v is number => v != null)))] }, raw: true });
  const byId = new Map(people.map((p) => [p.id, p]));
  return rows
    .map((r) => ({
      studentId: r.studentId,
      studentName: byId.get(r.studentId)?.name ?? "",
      studentEmail: byId.get(r.studentId)?.email ?? "",
      dueAt: r.dueAt ? new Date(r.dueAt).toISOString() : null,
      extraAttempts: r.extraAttempts,
      note: r.note,
      grantedByName: r.grantedBy ? (byId.get(r.grantedBy)?.name ?? null) : null,
      updatedAt: new Date(r.updatedAt).toISOString(),
    }))
    .sort((a, b) => a.studentName.localeCompare(b.studentName));
}

/**
 * Moves the tries allowed on this student's open problems of the assignment by `delta`. Taking
 * tries back (delta < 0) only touches problems not yet started, so nobody loses a try mid-problem.
 */
async function shiftOpenTries(assignmentId: number, studentId: number, delta: number, transaction: Transaction): Promise<number> {
  if (delta === 0) return 0;
  const { AssignmentItem, PracticeProblem } = db().models;
  const items = await AssignmentItem.findAll({ attributes: ["id"], where: { assignmentId }, transaction });
  if (items.length === 0) return 0;
  const [changed] = await PracticeProblem.update(
    { attemptsAllowed: literal(`attempts_allowed + (${Math.trunc(delta)})`) as unknown as number },
    { where: { assignmentItemId: { [Op.in]: items.map((i) => i.id) }, userId: studentId, status: "open", ...(delta < 0 ? { attemptsUsed: 0 } : {}) }, transaction },
  );
  return changed;
}

export async function grantExtension(user: SessionUser, assignmentId: number, data: ExtensionData): Promise<ExtensionView> {
  const assignment = await assignmentForTeacher(user, assignmentId);
  const { sequelize, models } = db();
  const enrolled = await models.Enrollment.findOne({ attributes: ["status"], where: { classId: assignment.classId, studentId: data.studentId } });
  if (!enrolled || enrolled.status === "removed") throw new AppError("bad_request", "That student is not on this class's roster.", { studentId: "Choose a student from the class roster." });
  if (data.dueAt && Date.parse(data.dueAt) <= assignment.opensAt.getTime()) {
    throw new AppError("bad_request", "The new due date must come after the assignment opens.", { dueAt: "The new due date must come after the assignment opens." });
  }
  await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const existing = await models.AssignmentExtension.findOne({ where: { assignmentId, studentId: data.studentId }, transaction });
    const values = { dueAt: data.dueAt ? new Date(data.dueAt) : null, extraAttempts: data.extraAttempts, note: data.note || null, grantedBy: user.id };
    await shiftOpenTries(assignmentId, data.studentId, data.extraAttempts - (existing?.extraAttempts ?? 0), transaction);
    if (existing) await existing.update(values, { transaction });
    else await models.AssignmentExtension.create({ assignmentId, studentId: data.studentId, ...values }, { transaction });
  });
  const all = await listExtensions(user, assignmentId);
  return all.find((e) => e.studentId === data.studentId)!;
}

export async function removeExtension(user: SessionUser, assignmentId: number, studentId: number): Promise<void> {
  await assignmentForTeacher(user, assignmentId);
  const { sequelize, models } = db();
  await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const existing = await models.AssignmentExtension.findOne({ where: { assignmentId, studentId }, transaction });
    if (!existing) throw new AppError("not_found", "That student has no extension on this assignment.");
    await shiftOpenTries(assignmentId, studentId, -existing.extraAttempts, transaction);
    await existing.destroy({ transaction });
  });
}
