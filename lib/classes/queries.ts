import { Op } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import type { EnrollmentStatus } from "@/models/enrollment";

export type ClassSummary = {
  id: number;
  name: string;
  term: string;
  program: string | null;
  joinCode: string;
  instructorName: string;
  studentCount: number;
  myRole: "lead" | "co-instructor" | "admin" | "student";
};

export type RosterEntry = { studentId: number; name: string; email: string; status: EnrollmentStatus; joinedAt: string };

async function classIdsTaughtBy(userId: number): Promise<number[]> {
  const { SchoolClass, ClassInstructor } = db().models;
  const [lead, co] = await Promise.all([
    SchoolClass.findAll({ attributes: ["id"], where: { instructorId: userId } }),
    ClassInstructor.findAll({ attributes: ["classId"], where: { userId } }),
  ]);
  return [...new Set([...lead.map((c) => c.id), ...co.map((c) => c.classId)])];
}

async function summaries(where: object, user: SessionUser): Promise<ClassSummary[]> {
  const { SchoolClass, User, Enrollment } = db().models;
  const rows = await SchoolClass.findAll({
    where: { ...where, archivedAt: null },
    include: [{ model: User, as: "instructor", attributes: ["name"] }],
    order: [["term", "DESC"], ["name", "ASC"]],
  });
  // One grouped count for all the classes, not one query per class.
  const counts = await Enrollment.count({
    where: { classId: rows.map((r) => r.id), status: "active" },
    group: ["classId"],
  });
  const countOf = new Map(counts.map((c) => [Number(c.classId), c.count]));
  return rows.map((row) => {
    const instructor = (row as unknown as { instructor?: { name: string } }).instructor;
    return {
      id: row.id,
      name: row.name,
      term: row.term,
      program: row.program ?? null,
      joinCode: row.joinCode,
      instructorName: instructor?.name ?? "",
      studentCount: countOf.get(row.id) ?? 0,
      myRole: user.role === "student" ? "student" : row.instructorId === user.id ? "lead" : user.role === "admin" ? "admin" : "co-instructor",
    };
  });
}

/** The classes an instructor teaches (lead or co-instructor); an admin sees every class. */
export async function listTeachingClasses(user: SessionUser): Promise<ClassSummary[]> {
  if (user.role === "admin") return summaries({}, user);
  if (user.role !== "instructor") throw new AppError("forbidden", "Only instructors see the classes they teach.");
  return summaries({ id: { [Op.in]: await classIdsTaughtBy(user.id) } }, user);
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

/** A class and its roster, for someone who teaches it; anyone else gets a 403 (or 404 when it does not exist). */
export async function getClassWithRoster(user: SessionUser, classId: number): Promise<{ summary: ClassSummary; roster: RosterEntry[] }> {
  const { SchoolClass, Enrollment, User } = db().models;
  if (!(await SchoolClass.findByPk(classId, { attributes: ["id"] }))) throw new AppError("not_found", "There is no such class.");
  if (!(await canTeach(user, classId))) throw new AppError("forbidden", "Only the class's instructors can see its roster.");
  const [summary] = await summaries({ id: classId }, user);
  if (!summary) throw new AppError("not_found", "That class is archived.");
  const enrollments = await Enrollment.findAll({
    where: { classId },
    include: [{ model: User, as: "student", attributes: ["id", "name", "email"] }],
  });
  const roster = enrollments
    .map((e) => {
      const student = (e as unknown as { student: { id: number; name: string; email: string } }).student;
      return { studentId: student.id, name: student.name, email: student.email, status: e.status, joinedAt: e.createdAt.toISOString() };
    })
    .sort((a, b) => a.name.localeCompare(b.name));
  return { summary, roster };
}
