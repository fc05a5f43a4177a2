import { Op } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";

export type ClassSummary = {
  id: number;
  name: string;
  term: string;
  program: string | null;
  sectionCode: string | null;
  joinCode: string;
  leadId: number;
  instructorName: string;
  studentCount: number;
  invitedCount: number;
  archivedAt: string | null;
  myRole: "lead" | "co-instructor" | "admin" | "student";
};

export type Person = { id: number; name: string; email: string };
export type ClassSettings = { summary: ClassSummary; lead: Person; coInstructors: Person[] };

async function classIdsTaughtBy(userId: number): Promise<number[]> {
  const { SchoolClass, ClassInstructor } = db().models;
  const [lead, co] = await Promise.all([
    SchoolClass.findAll({ attributes: ["id"], where: { instructorId: userId } }),
    ClassInstructor.findAll({ attributes: ["classId"], where: { userId } }),
  ]);
  return [...new Set([...lead.map((c) => c.id), ...co.map((c) => c.classId)])];
}

async function summaries(where: object, user: SessionUser, archived: boolean | "any" = false): Promise<ClassSummary[]> {
  const { SchoolClass, User, Enrollment, Invitation } = db().models;
  const archivedWhere = archived === "any" ? {} : { archivedAt: archived ? { [Op.ne]: null } : null };
  const rows = await SchoolClass.findAll({
    where: { ...where, ...archivedWhere },
    include: [{ model: User, as: "instructor", attributes: ["name"] }],
    order: [["term", "DESC"], ["name", "ASC"]],
  });
  const ids = rows.map((r) => r.id);
  // One grouped count per table for all the classes, not one query per class.
  const [students, invited] = await Promise.all([
    Enrollment.count({ where: { classId: ids, status: "active" }, group: ["classId"] }),
    Invitation.count({ where: { classId: ids, acceptedAt: null, revokedAt: null, expiresAt: { [Op.gt]: new Date() } }, group: ["classId"] }),
  ]);
  const studentsOf = new Map(students.map((c) => [Number(c.classId), c.count]));
  const invitedOf = new Map(invited.map((c) => [Number(c.classId), c.count]));
  return rows.map((row) => {
    const instructor = (row as unknown as { instructor?: { name: string } }).instructor;
    return {
      id: row.id,
      name: row.name,
      term: row.term,
      program: row.program || null,
      sectionCode: row.sectionCode || null,
      joinCode: row.joinCode,
      leadId: row.instructorId,
      instructorName: instructor?.name ?? "",
      studentCount: studentsOf.get(row.id) ?? 0,
      invitedCount: invitedOf.get(row.id) ?? 0,
      archivedAt: row.archivedAt ? row.archivedAt.toISOString() : null,
      myRole: user.role === "student" ? "student" : row.instructorId === user.id ? "lead" : user.role === "admin" ? "admin" : "co-instructor",
    };
  });
}

/** The classes an instructor teaches (lead or co-instructor); an admin sees every class. Archived ones only when asked. */
export async function listTeachingClasses(user: SessionUser, { archived = false }: { archived?: boolean } = {}): Promise<ClassSummary[]> {
  if (user.role === "admin") return summaries({}, user, archived);
  if (user.role !== "instructor") throw new AppError("forbidden", "Only instructors see the classes they teach.");
  return summaries({ id: { [Op.in]: await classIdsTaughtBy(user.id) } }, user, archived);
}

export async function listStudentClasses(user: SessionUser): Promise<ClassSummary[]> {
  const { Enrollment } = db().models;
  const enrolled = await Enrollment.findAll({ attributes: ["classId"], where: { studentId: user.id, status: "active" } });
  const result = await summaries({ id: { [Op.in]: enrolled.map((e) => e.classId) } }, user);
  // A student does not need the join code of a class they are already in.
  return result.map((c) => ({ ...c, joinCode: "" }));
}

export async function canTeach(user: SessionUser, classId: number): Promise<boolean> {
  if (user.role === "admin") return true;
  if (user.role !== "instructor") return false;
  return (await classIdsTaughtBy(user.id)).includes(classId);
}

/** A class for someone who teaches it, archived or not; anyone else gets a 403 (or 404 when it does not exist). */
export async function classForTeacher(user: SessionUser, classId: number): Promise<ClassSummary> {
  if (!(await db().models.SchoolClass.findByPk(classId, { attributes: ["id"] }))) throw new AppError("not_found", "There is no such class.");
  if (!(await canTeach(user, classId))) throw new AppError("forbidden", "Only the class's instructors can open this class.");
  const [summary] = await summaries({ id: classId }, user, "any");
  return summary;
}

/** Archiving and choosing co-instructors belong to the lead instructor (and admins), not to every co-instructor. */
export async function classForLead(user: SessionUser, classId: number): Promise<ClassSummary> {
  const summary = await classForTeacher(user, classId);
  if (summary.myRole !== "lead" && summary.myRole !== "admin") {
    throw new AppError("forbidden", "Only the lead instructor or a program admin can do that for this class.");
  }
  return summary;
}

export async function classSettings(user: SessionUser, classId: number): Promise<ClassSettings> {
  const summary = await classForTeacher(user, classId);
  const { User, ClassInstructor } = db().models;
  const [lead, co] = await Promise.all([
    User.findByPk(summary.leadId, { attributes: ["id", "name", "email"] }),
    ClassInstructor.findAll({ where: { classId }, include: [{ model: User, as: "user", attributes: ["id", "name", "email"] }] }),
  ]);
  const coInstructors = co
    .map((c) => (c as unknown as { user: Person }).user)
    .map((u) => ({ id: u.id, name: u.name, email: u.email }))
    .sort((a, b) => a.name.localeCompare(b.name));
  return { summary, lead: { id: lead!.id, name: lead!.name, email: lead!.email }, coInstructors };
}
