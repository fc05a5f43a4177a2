// A student's own progress: their scores in each class, their mastery, and the slips they make
// most often with the lesson section that addresses each. Only ever the signed-in user's rows.
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import type { SessionUser } from "@/lib/auth/roles";
import { listStudentClasses } from "@/lib/classes/queries";
import { assignmentRecord } from "@/lib/assignments/access";
import { scoresOfStudent } from "@/lib/assignments/scores";
import type { WorkStatus } from "@/lib/assignments/student-status";
import { masteryFor } from "@/lib/practice/history";
import type { SkillMastery } from "@/lib/practice/skills";
import { ERROR_PATTERNS, findKind, isErrorPattern } from "@/lib/problems";
import { average, slipLesson } from "./summaries";

export type MyAssignmentScore = { id: number; title: string; dueAt: string; earned: number; possible: number; percent: number; status: WorkStatus; late: boolean };
export type MyClassScores = { id: number; name: string; term: string; average: number | null; assignments: MyAssignmentScore[] };
export type MySlip = { pattern: string; name: string; feedback: string; lessonHref: string | null; count: number; kinds: string[]; lastAt: string };
export type MyProgress = { classes: MyClassScores[]; mastery: SkillMastery[]; slips: MySlip[] };

export async function myProgress(user: SessionUser): Promise<MyProgress> {
  const classes = await listStudentClasses(user);
  const rows = classes.length === 0 ? [] : await db().models.Assignment.findAll({ where: { classId: classes.map((c) => c.id), status: "published" }, order: [["dueAt", "ASC"], ["id", "ASC"]] });
  const records = rows.map(assignmentRecord);
  const [scores, mastery, slipRows] = await Promise.all([
    scoresOfStudent(records, user.id),
    masteryFor(user),
    db().sequelize.query<{ pattern: string; kind: string; count: number; lastAt: string }>(
      `SELECT pattern, kind, COUNT(*) AS count, MAX(created_at) AS lastAt FROM attempts
       WHERE user_id = ? AND pattern IS NOT NULL AND verdict != 'correct' GROUP BY pattern, kind`,
      { replacements: [user.id], type: QueryTypes.SELECT },
    ),
  ]);

  const slips = new Map<string, MySlip>();
  for (const row of slipRows) {
    const lesson = slipLesson(row.pattern);
    const slip = slips.get(row.pattern) ?? {
      pattern: row.pattern,
      name: lesson?.name ?? row.pattern,
      feedback: isErrorPattern(row.pattern) ? ERROR_PATTERNS[row.pattern].feedback : "",
      lessonHref: lesson?.href ?? null,
      count: 0,
      kinds: [],
      lastAt: row.lastAt,
    };
    slip.count += Number(row.count);
    slip.kinds.push(findKind(row.kind)?.title ?? row.kind);
    if (row.lastAt > slip.lastAt) slip.lastAt = row.lastAt;
    slips.set(row.pattern, slip);
  }

  return {
    classes: classes.map((c) => {
      const assignments = records
        .filter((a) => a.classId === c.id)
        .map((a) => {
          const s = scores.get(a.id);
          return { id: a.id, title: a.title, dueAt: a.dueAt.toISOString(), earned: s?.earned ?? 0, possible: s?.possible ?? 0, percent: s?.percent ?? 0, status: s?.status ?? "not-started", late: s?.late ?? false };
        });
      return { id: c.id, name: c.name, term: c.term, average: average(assignments.map((a) => a.percent)), assignments };
    }),
    mastery,
    slips: [...slips.values()].map((s) => ({ ...s, lastAt: new Date(s.lastAt).toISOString(), kinds: s.kinds.sort() })).sort((a, b) => b.count - a.count || a.name.localeCompare(b.name)),
  };
}
