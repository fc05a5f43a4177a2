// The gradebook and one student's record as CSV (escaped against formula injection in csv.ts).
import "server-only";
import { db } from "@/lib/db";
import type { SessionUser } from "@/lib/auth/roles";
import { classForTeacher } from "@/lib/classes/queries";
import { itemsOf } from "@/lib/assignments/access";
import { WORK_STATUS_TEXT } from "@/lib/assignments/student-status";
import { loadVariants, problemView } from "@/lib/assignments/work";
import { csvFileName, toCsv } from "./csv";
import { gradebook, publishedAssignments } from "./gradebook";
import { activeStudent } from "./override";
import { overridesInForce } from "./overrides";
import type { GradebookCell } from "./types";

export type CsvFile = { fileName: string; text: string };

const cellText = (c: GradebookCell) => (c.excused ? "EXCUSED" : c.missing ? "MISSING" : c.earned);

export async function gradebookCsv(user: SessionUser, classId: number): Promise<CsvFile> {
  const book = await gradebook(user, classId);
  const header = ["Student", "E-mail", ...book.assignments.map((a) => `${a.title} (${a.possible} pts)`), "Total points", "Points possible", "Percent"];
  const rows = book.students.map((s) => [s.name, s.email, ...s.cells.map(cellText), s.earned, s.possible, s.percent]);
  return { fileName: csvFileName(book.className, "gradebook"), text: toCsv(header, rows) };
}

/** Every published assignment of the class for one active student, then every try, in order. */
export async function studentRecordCsv(user: SessionUser, classId: number, studentId: number): Promise<CsvFile> {
  const summary = await classForTeacher(user, classId);
  const student = await activeStudent(classId, studentId);
  const book = await gradebook(user, classId);
  const row = book.students.find((s) => s.id === studentId)!;
  const assignments = await publishedAssignments(classId);
  const overrides = await overridesInForce(assignments.map((a) => a.id), studentId);
  const extensions = await db().models.AssignmentExtension.findAll({ where: { assignmentId: assignments.map((a) => a.id), studentId } });
  const header = ["Assignment", "Due (UTC)", "Status", "Score", "Possible", "Changed by instructor", "Problem", "Try", "Answered at (UTC)", "Late", "Part", "Answer", "Verdict", "Slip"];
  const lines: (string | number | null)[][] = [];
  for (const [index, a] of assignments.entries()) {
    const cell = row.cells[index];
    const status = cell.status === "excused" ? "Excused" : WORK_STATUS_TEXT[cell.status];
    const override = overrides.get(`${a.id}:${studentId}`);
    lines.push([a.title, a.dueAt.toISOString(), status, cell.excused ? "EXCUSED" : cell.earned, cell.possible, override ? override.reason : "", "", "", "", "", "", "", "", ""]);
    // One read per assignment for one student: a record, not the class-wide gradebook.
    const variants = await loadVariants(studentId, await itemsOf(a.id));
    const ext = extensions.find((e) => e.assignmentId === a.id);
    const ctx = { assignment: a, extension: ext ? { dueAt: ext.dueAt, extraAttempts: ext.extraAttempts } : null, now: new Date() };
    for (const v of variants) {
      const view = problemView(v, ctx, true);
      for (const t of view.tries) {
        for (const answer of t.answers) {
          lines.push([a.title, "", "", "", "", "", view.number, t.number, t.at, t.late ? "late" : "", answer.label, answer.raw, answer.verdict, answer.slip ?? ""]);
        }
      }
    }
  }
  lines.push(["Total", "", "", row.earned, row.possible, `${row.percent}%`, "", "", "", "", "", "", "", ""]);
  return { fileName: csvFileName(`${summary.name} ${student.name}`, "record"), text: toCsv(header, lines) };
}
