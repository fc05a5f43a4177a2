import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { enrollActive } from "./accept";
import { writeTransaction } from "./manage";

export type Joined = { classId: number; className: string; alreadyIn: boolean };

const NO_SUCH_CODE = "No open class has that code. Check it with your instructor; codes change when they make a new one.";

/**
 * A student joins with the code on the board. The caller spends a rate-limit point first, so codes
 * cannot be found by trying them. A removed student cannot come back this way: the instructor
 * removed them, so the instructor decides.
 */
export async function joinByCode(user: SessionUser, code: string): Promise<Joined> {
  if (user.role !== "student") throw new AppError("forbidden", "Join codes are for student accounts. Instructors are added by the class's lead instructor.");
  const { SchoolClass, Enrollment } = db().models;
  const schoolClass = await SchoolClass.findOne({ where: { joinCode: code, archivedAt: null } });
  if (!schoolClass) throw new AppError("not_found", NO_SUCH_CODE, { code: NO_SUCH_CODE });
  return writeTransaction(async (transaction) => {
    const existing = await Enrollment.findOne({ where: { classId: schoolClass.id, studentId: user.id }, transaction });
    if (existing?.status === "removed") {
      const message = "You were removed from this class, so the code cannot add you back. Ask your instructor.";
      throw new AppError("forbidden", message, { code: message });
    }
    if (existing?.status === "active") return { classId: schoolClass.id, className: schoolClass.name, alreadyIn: true };
    await enrollActive(transaction, schoolClass.id, user);
    return { classId: schoolClass.id, className: schoolClass.name, alreadyIn: false };
  });
}
