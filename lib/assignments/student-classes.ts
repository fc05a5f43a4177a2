// "My classes" → one class: its published assignments with this student's dates, status and score.
import "server-only";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { closesAt, effectiveDue } from "./policy";
import { assignmentRecord } from "./access";
import { scoresOfStudent } from "./scores";
import { overridesInForce } from "@/lib/gradebook/overrides";
import type { OverrideNotice } from "@/lib/gradebook/types";
import { percentOf } from "./student-status";
import { workWindow, type WorkStatus, type WorkWindow } from "./student-status";

export type StudentAssignmentRow = {
  id: number;
  title: string;
  opensAt: string;
  dueAt: string;
  /** The class's due date, when this student's extension moved it. */
  originalDueAt: string | null;
  closesAt: string;
  window: WorkWindow;
  status: WorkStatus;
  late: boolean;
  earned: number;
  possible: number;
  percent: number;
  finished: number;
  total: number;
  /** Set when the instructor changed or excused this score by hand. */
  override: OverrideNotice | null;
};

export type StudentClassView = { id: number; name: string; term: string; instructorName: string; assignments: StudentAssignmentRow[] };

/** For an active student of the class; anyone else gets a 404, as for a class that does not exist. */
export async function studentClass(user: SessionUser, classId: number): Promise<StudentClassView> {
  const { SchoolClass, Enrollment, Assignment, AssignmentExtension, User } = db().models;
  const enrolled = Number.isSafeInteger(classId) && (await Enrollment.findOne({ attributes: ["id"], where: { classId, studentId: user.id, status: "active" } }));
  const row = enrolled ? await SchoolClass.findByPk(classId, { include: [{ model: User, as: "instructor", attributes: ["name"] }] }) : null;
  if (!row || row.archivedAt) throw new AppError("not_found", "There is no such class in your classes.");
  const assignments = (await Assignment.findAll({ where: { classId, status: "published" }, order: [["dueAt", "ASC"], ["id", "ASC"]] })).map(assignmentRecord);
  const [scores, extensions, overrides] = await Promise.all([
    scoresOfStudent(assignments, user.id),
    AssignmentExtension.findAll({ where: { assignmentId: assignments.map((a) => a.id), studentId: user.id } }),
    overridesInForce(assignments.map((a) => a.id), user.id),
  ]);
  const now = new Date();
  return {
    id: row.id,
    name: row.name,
    term: row.term,
    instructorName: (row as unknown as { instructor?: { name: string } }).instructor?.name ?? "",
    assignments: assignments.map((a) => {
      const ext = extensions.find((e) => e.assignmentId === a.id);
      const extension = ext ? { dueAt: ext.dueAt, extraAttempts: ext.extraAttempts } : null;
      const due = effectiveDue(a, extension);
      const score = scores.get(a.id);
      const override = overrides.get(`${a.id}:${user.id}`) ?? null;
      const earned = override ? (override.earned ?? 0) : (score?.earned ?? 0);
      return {
        id: a.id,
        title: a.title,
        opensAt: a.opensAt.toISOString(),
        dueAt: due.toISOString(),
        originalDueAt: due.getTime() !== a.dueAt.getTime() ? a.dueAt.toISOString() : null,
        closesAt: closesAt(a, extension).toISOString(),
        window: workWindow(now, a.opensAt, a, extension),
        status: score?.status ?? "not-started",
        late: score?.late ?? false,
        earned,
        possible: score?.possible ?? 0,
        percent: percentOf(earned, score?.possible ?? 0),
        finished: score?.finished ?? 0,
        total: score?.total ?? 0,
        override,
      };
    }),
  };
}
