import { Transaction, UniqueConstraintError } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { classForLead, classForTeacher, type ClassSummary } from "./queries";
import type { ClassInput } from "./schemas";
import { generateJoinCode } from "./tokens";

/**
 * Writes take SQLite's write lock at BEGIN (IMMEDIATE): a deferred transaction that reads first
 * and writes later can be refused outright when another writer commits in between.
 */
export function writeTransaction<T>(work: (transaction: Transaction) => Promise<T>): Promise<T> {
  return db().sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, work);
}

/** Tries fresh codes until one is free; the unique index is the final word if two classes race. */
async function freeJoinCode(transaction: Transaction): Promise<string> {
  const { SchoolClass } = db().models;
  for (let i = 0; i < 10; i++) {
    const code = generateJoinCode();
    if (!(await SchoolClass.findOne({ attributes: ["id"], where: { joinCode: code }, transaction }))) return code;
  }
  throw new AppError("unavailable", "Could not find a free join code. Try again.");
}

const columns = (input: ClassInput) => ({ name: input.name, term: input.term, sectionCode: input.sectionCode || null, program: input.program || null });

export async function createClass(user: SessionUser, input: ClassInput): Promise<{ id: number }> {
  if (user.role !== "instructor" && user.role !== "admin") throw new AppError("forbidden", "Only instructors create classes.");
  const created = await writeTransaction(async (transaction) =>
    db().models.SchoolClass.create({ ...columns(input), joinCode: await freeJoinCode(transaction), instructorId: user.id }, { transaction }),
  );
  return { id: created.id };
}

export async function updateClass(user: SessionUser, classId: number, input: ClassInput): Promise<ClassSummary> {
  await classForTeacher(user, classId);
  await db().models.SchoolClass.update(columns(input), { where: { id: classId } });
  return classForTeacher(user, classId);
}

export async function setArchived(user: SessionUser, classId: number, archived: boolean): Promise<ClassSummary> {
  await classForLead(user, classId);
  await db().models.SchoolClass.update({ archivedAt: archived ? new Date() : null }, { where: { id: classId } });
  return classForTeacher(user, classId);
}

/** A new code at once; the old one stops working in the same write. */
export async function regenerateJoinCode(user: SessionUser, classId: number): Promise<{ joinCode: string }> {
  await classForTeacher(user, classId);
  const joinCode = await writeTransaction(async (transaction) => {
    const code = await freeJoinCode(transaction);
    await db().models.SchoolClass.update({ joinCode: code }, { where: { id: classId }, transaction });
    return code;
  });
  return { joinCode };
}

export async function addCoInstructor(user: SessionUser, classId: number, email: string): Promise<{ id: number; name: string; email: string }> {
  const summary = await classForLead(user, classId);
  const { User, ClassInstructor } = db().models;
  const colleague = await User.findOne({ where: { email } });
  if (!colleague || colleague.role === "student") {
    throw new AppError("bad_request", "No instructor account has that e-mail. Ask a program admin to make one first.", {
      email: "No instructor account has that e-mail.",
    });
  }
  if (colleague.id === summary.leadId) throw new AppError("conflict", "That is the lead instructor of this class.", { email: "That is the lead instructor of this class." });
  try {
    await ClassInstructor.create({ classId, userId: colleague.id });
  } catch (error) {
    if (error instanceof UniqueConstraintError) {
      throw new AppError("conflict", `${colleague.name} already teaches this class.`, { email: `${colleague.name} already teaches this class.` });
    }
    throw error;
  }
  return { id: colleague.id, name: colleague.name, email: colleague.email };
}

export async function removeCoInstructor(user: SessionUser, classId: number, userId: number): Promise<void> {
  await classForLead(user, classId);
  const removed = await db().models.ClassInstructor.destroy({ where: { classId, userId } });
  if (removed === 0) throw new AppError("not_found", "That person is not a co-instructor of this class.");
}
