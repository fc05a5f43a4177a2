// Paper copies of a published assignment for shops that work at the bench: each active student's
// own variants (the same stored seeds the screen and the grader use) and, for the instructor only,
// an answer key with every variant's answers and worked steps.
import "server-only";
import { QueryTypes } from "sequelize";
import { z } from "zod";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { assignmentForTeacher, itemsOf, type AssignmentItemRecord } from "@/lib/assignments/access";
import { effectiveDue } from "@/lib/assignments/policy";
import { toleranceText } from "@/lib/assignments/teacher-format";
import { ensureVariants } from "@/lib/assignments/variants";
import { inlineMathToHtml, mathTextToHtml, partView } from "@/lib/practice/present";
import { expectedText, workOut } from "@/lib/practice/view";
import type { Level, ProblemFigure } from "@/lib/problems";

/** What goes to the printer: the worksheets, the key, or both (sheets first, key after). */
export const KEY_MODES = ["with", "without", "only"] as const;
export type KeyMode = (typeof KEY_MODES)[number];

/** The print view's options from the address; anything unreadable falls back to the whole set. */
export const worksheetOptionsSchema = z.object({
  key: z.enum(KEY_MODES).catch("with"),
  student: z.coerce.number().int().positive().optional().catch(undefined),
});
export type WorksheetOptions = z.output<typeof worksheetOptionsSchema>;

export type WorksheetPart = { key: string; label: string; hint: string };
export type WorksheetProblem = { number: number; title: string; points: number; promptHtml: string; figure: ProblemFigure | null; parts: WorksheetPart[] };
export type KeyAnswer = { key: string; label: string; expected: string; accepts: string };
export type KeyProblem = { number: number; title: string; answers: KeyAnswer[]; stepsHtml: string[] };

export type StudentWorksheet = {
  studentId: number;
  name: string;
  /** This student's due date (an extension moves it), ISO. */
  dueAt: string;
  /** Empty when only the key is printed. */
  problems: WorksheetProblem[];
  /** Null unless the key is printed. */
  key: KeyProblem[] | null;
};

export type WorksheetSet = {
  assignment: { id: number; classId: number; title: string; instructions: string; published: boolean; points: number };
  schoolClass: { name: string; term: string; sectionCode: string | null; program: string | null };
  /** Every active student, for the "one student" choice. */
  roster: { id: number; name: string }[];
  keyMode: KeyMode;
  students: StudentWorksheet[];
};

type StoredVariant = { userId: number; itemId: number; variant: number; kind: string; level: number; seed: number };

/** Every listed student's stored variants of these items in one read. */
async function storedVariants(items: AssignmentItemRecord[], studentIds: number[]): Promise<StoredVariant[]> {
  if (items.length === 0 || studentIds.length === 0) return [];
  return db().sequelize.query<StoredVariant>(
    `SELECT user_id AS userId, assignment_item_id AS itemId, variant, kind, level, seed
       FROM practice_problems
      WHERE assignment_item_id IN (${items.map(() => "?").join(", ")}) AND user_id IN (${studentIds.map(() => "?").join(", ")})`,
    { replacements: [...items.map((i) => i.id), ...studentIds], type: QueryTypes.SELECT },
  );
}

async function activeStudents(classId: number): Promise<{ id: number; name: string }[]> {
  return db().sequelize.query<{ id: number; name: string }>(
    `SELECT u.id AS id, u.name AS name
       FROM enrollments e JOIN users u ON u.id = e.student_id
      WHERE e.class_id = ? AND e.status = 'active'
      ORDER BY u.name COLLATE NOCASE, u.id`,
    { replacements: [classId], type: QueryTypes.SELECT },
  );
}

/**
 * The print set for someone who teaches the class (403 for anyone else, 404 for no such
 * assignment in that class or a `student` who is not an active student of it). A draft gives the
 * assignment and roster but no sheets: its items may still change, and with them the numbers.
 */
export async function worksheetSet(user: SessionUser, address: { classId: number; assignmentId: number }, options: WorksheetOptions): Promise<WorksheetSet> {
  const assignment = await assignmentForTeacher(user, address.assignmentId);
  // Checked before any variant is made: another class's address for this assignment is a 404.
  if (assignment.classId !== address.classId) throw new AppError("not_found", "There is no such assignment in this class.");
  const { SchoolClass, AssignmentExtension } = db().models;
  const [schoolClass, roster, items] = await Promise.all([SchoolClass.findByPk(assignment.classId), activeStudents(assignment.classId), itemsOf(assignment.id)]);
  if (!schoolClass) throw new AppError("not_found", "There is no such class.");
  const chosen = options.student === undefined ? roster : roster.filter((s) => s.id === options.student);
  if (chosen.length === 0 && options.student !== undefined) throw new AppError("not_found", "That student is not an active student of this class.");
  const published = assignment.status === "published";

  const base: Omit<WorksheetSet, "students"> = {
    assignment: { id: assignment.id, classId: assignment.classId, title: assignment.title, instructions: assignment.instructions, published, points: items.reduce((sum, i) => sum + i.points * i.problemCount, 0) },
    schoolClass: { name: schoolClass.name, term: schoolClass.term, sectionCode: schoolClass.sectionCode || null, program: schoolClass.program || null },
    roster,
    keyMode: options.key,
  };
  if (!published) return { ...base, students: [] };

  const extensions = new Map(
    (await AssignmentExtension.findAll({ where: { assignmentId: assignment.id, studentId: chosen.map((s) => s.id) } })).map((e) => [e.studentId as number, { dueAt: e.dueAt, extraAttempts: e.extraAttempts }]),
  );
  // Made now if the student has not opened the assignment yet, exactly as opening it would, so the
  // paper and the screen show the same numbers whichever comes first.
  for (const student of chosen) {
    await ensureVariants(items, student.id, assignment.attemptsAllowed + (extensions.get(student.id)?.extraAttempts ?? 0));
  }
  const stored = await storedVariants(items, chosen.map((s) => s.id));
  const bySlot = new Map(stored.map((v) => [`${v.userId}:${v.itemId}:${v.variant}`, v]));

  const students = chosen.map((student): StudentWorksheet => {
    const problems: WorksheetProblem[] = [];
    const key: KeyProblem[] = [];
    let number = 0;
    for (const item of items) {
      for (let variant = 0; variant < item.problemCount; variant++) {
        number += 1;
        const row = bySlot.get(`${student.id}:${item.id}:${variant}`);
        if (!row) throw new Error(`variant ${variant} of item ${item.id} is missing for student ${student.id}`);
        const work = workOut({ kind: row.kind, level: row.level as Level, seed: row.seed }, item.tolerance);
        const title = work.kind.title;
        if (options.key !== "only") {
          const prompt = work.kind.render(work.params);
          problems.push({ number, title, points: item.points, promptHtml: mathTextToHtml(prompt.text), figure: prompt.figure ?? null, parts: work.parts.map((p) => ({ key: p.key, label: p.label, hint: partView(p).hint })) });
        }
        if (options.key !== "without") {
          key.push({
            number,
            title,
            answers: work.parts.map((p) => ({ key: p.key, label: p.label, expected: expectedText(p, work.expected[p.key]), accepts: toleranceText(p, item.tolerance) })),
            stepsHtml: work.kind.explain(work.params).map(inlineMathToHtml),
          });
        }
      }
    }
    const extension = extensions.get(student.id) ?? null;
    return { studentId: student.id, name: student.name, dueAt: effectiveDue(assignment, extension).toISOString(), problems, key: options.key === "without" ? null : key };
  });
  return { ...base, students };
}
