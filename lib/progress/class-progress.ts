// One class's progress for its instructors: score spread per published assignment, mastery per
// skill, the slips worth re-teaching, lesson reading and daily activity. Each part is one grouped
// query over the class's active students (plus scoresFor's few), never a query per student.
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import type { SessionUser } from "@/lib/auth/roles";
import { classForTeacher, type ClassSummary } from "@/lib/classes/queries";
import { assignmentRecord } from "@/lib/assignments/access";
import { scoresFor } from "@/lib/assignments/scores";
import { courseOutline } from "@/lib/lessons/load";
import { findKind, PROBLEM_KINDS, SKILLS, type Skill } from "@/lib/problems";
import { masteryOf, SKILL_TITLES, type FinishedProblem, type SkillMastery } from "@/lib/practice/skills";
import { average, dayKeys, fillDays, scoreBuckets, slipLesson, type ScoreBucket } from "./summaries";

export const ACTIVITY_DAYS = 56;
// masteryFor looks at a student's latest 600 finished problems; the batched form keeps the same window.
const MASTERY_LOOKBACK = 600;

export type AssignmentDistribution = { id: number; title: string; dueAt: string; students: number; average: number | null; percents: number[]; buckets: ScoreBucket[] };
export type SkillProgress = { skill: Skill; title: string; students: number; mastered: number; levels: { level: number; mastered: number }[] };
export type SlipStudent = { id: number; name: string; count: number };
export type ClassSlip = { pattern: string; name: string; lessonHref: string | null; count: number; kinds: { kind: string; title: string; count: number }[]; students: SlipStudent[] };
export type LessonCompletion = { slug: string; title: string; opened: number; read: number; practised: number; mastered: number | null };
export type ClassProgress = {
  summary: ClassSummary;
  students: number;
  assignments: AssignmentDistribution[];
  skills: SkillProgress[];
  slips: ClassSlip[];
  lessons: LessonCompletion[];
  activity: { day: string; tries: number }[];
};

type Id = number;

function select<T extends object>(sql: string, replacements: unknown[]): Promise<T[]> {
  return db().sequelize.query<T>(sql, { replacements, type: QueryTypes.SELECT });
}

const ACTIVE = "JOIN enrollments e ON e.student_id = {user} AND e.class_id = ? AND e.status = 'active'";
const activeJoin = (column: string) => ACTIVE.replace("{user}", column);
// Practice tries, and assignment tries only for this class's own assignments (a student in two
// classes should not bring the other class's work here).
const CLASS_TRIES = `(a.assignment_item_id IS NULL OR a.assignment_item_id IN
  (SELECT i.id FROM assignment_items i JOIN assignments s ON s.id = i.assignment_id WHERE s.class_id = ?))`;

/** Mastery per student from finished problems, newest first, grouped in one query. */
export async function classMastery(classId: Id): Promise<Map<Id, SkillMastery[]>> {
  const rows = await select<{ userId: Id; kind: string; level: number; status: string }>(
    `SELECT userId, kind, level, status FROM (
       SELECT p.user_id AS userId, p.kind, p.level, p.status, p.finished_at AS finishedAt,
              ROW_NUMBER() OVER (PARTITION BY p.user_id ORDER BY p.finished_at DESC) AS n
       FROM practice_problems p ${activeJoin("p.user_id")} WHERE p.status != 'open'
     ) WHERE n <= ${MASTERY_LOOKBACK} ORDER BY userId, finishedAt DESC`,
    [classId],
  );
  const skills = SKILLS.filter((s) => PROBLEM_KINDS.some((k) => k.skill === s));
  const finishedOf = new Map<Id, FinishedProblem[]>();
  for (const row of rows) {
    const kind = findKind(row.kind);
    if (!kind) continue;
    const list = finishedOf.get(row.userId) ?? [];
    list.push({ skill: kind.skill, level: row.level, solved: row.status === "solved" });
    finishedOf.set(row.userId, list);
  }
  return new Map([...finishedOf].map(([id, finished]) => [id, masteryOf(skills, finished)]));
}

export function skillProgress(mastery: ReadonlyMap<Id, SkillMastery[]>, students: number): SkillProgress[] {
  const skills = SKILLS.filter((s) => PROBLEM_KINDS.some((k) => k.skill === s));
  return skills.map((skill) => {
    const each = [...mastery.values()].map((list) => list.find((m) => m.skill === skill)).filter((m): m is SkillMastery => Boolean(m));
    return {
      skill,
      title: SKILL_TITLES[skill],
      students,
      mastered: each.filter((m) => m.mastered).length,
      levels: [1, 2, 3].map((level) => ({ level, mastered: each.filter((m) => m.levels[level - 1].mastered).length })),
    };
  });
}

type SlipRow = { pattern: string; kind: string; userId: Id; name: string; count: number };

/** Groups (pattern, kind, student) counts into slips, most frequent first. */
export function groupSlips(rows: readonly SlipRow[]): ClassSlip[] {
  const byPattern = new Map<string, SlipRow[]>();
  for (const row of rows) byPattern.set(row.pattern, [...(byPattern.get(row.pattern) ?? []), row]);
  const slips = [...byPattern].map(([pattern, list]) => {
    const sum = (of: SlipRow[]) => of.reduce((n, r) => n + Number(r.count), 0);
    const kinds = [...new Set(list.map((r) => r.kind))].map((kind) => ({ kind, title: findKind(kind)?.title ?? kind, count: sum(list.filter((r) => r.kind === kind)) }));
    const students = [...new Set(list.map((r) => r.userId))].map((id) => {
      const theirs = list.filter((r) => r.userId === id);
      return { id, name: theirs[0].name, count: sum(theirs) };
    });
    const lesson = slipLesson(pattern);
    return {
      pattern,
      name: lesson?.name ?? pattern,
      lessonHref: lesson?.href ?? null,
      count: sum(list),
      kinds: kinds.sort((a, b) => b.count - a.count || a.title.localeCompare(b.title)),
      students: students.sort((a, b) => b.count - a.count || a.name.localeCompare(b.name)),
    };
  });
  return slips.sort((a, b) => b.count - a.count || a.name.localeCompare(b.name));
}

export async function classProgress(user: SessionUser, classId: Id, now = new Date()): Promise<ClassProgress> {
  const summary = await classForTeacher(user, classId);
  const days = dayKeys(now, ACTIVITY_DAYS);
  const assignmentRows = await db().models.Assignment.findAll({ where: { classId, status: "published" }, order: [["dueAt", "ASC"], ["id", "ASC"]] });
  const records = assignmentRows.map(assignmentRecord);

  const [scores, mastery, slipRows, lessonRows, activityRows, outline] = await Promise.all([
    scoresFor(records, null, now),
    classMastery(classId),
    select<SlipRow>(
      `SELECT a.pattern, a.kind, a.user_id AS userId, u.name, COUNT(*) AS count
       FROM attempts a ${activeJoin("a.user_id")} JOIN users u ON u.id = a.user_id
       WHERE a.pattern IS NOT NULL AND a.verdict != 'correct' AND ${CLASS_TRIES}
       GROUP BY a.pattern, a.kind, a.user_id`,
      [classId, classId],
    ),
    select<{ slug: string; status: string; count: number }>(
      `SELECT lp.lesson_slug AS slug, lp.status, COUNT(*) AS count FROM lesson_progress lp ${activeJoin("lp.user_id")}
       GROUP BY lp.lesson_slug, lp.status`,
      [classId],
    ),
    // A try is one submission of one problem, however many parts it answered.
    select<{ day: string; tries: number }>(
      `SELECT substr(a.created_at, 1, 10) AS day, COUNT(DISTINCT a.problem_id || ':' || a.submission) AS tries
       FROM attempts a ${activeJoin("a.user_id")}
       WHERE substr(a.created_at, 1, 10) >= ? AND ${CLASS_TRIES}
       GROUP BY day`,
      [classId, days[0], classId],
    ),
    courseOutline(),
  ]);

  const students = summary.studentCount;
  const skills = skillProgress(mastery, students);
  const masteredOf = new Map(skills.map((s) => [s.skill as string, s.mastered]));
  const lessonCount = (slug: string, statuses: string[]) => lessonRows.filter((r) => r.slug === slug && statuses.includes(r.status)).reduce((n, r) => n + Number(r.count), 0);

  return {
    summary,
    students,
    assignments: records.map((a) => {
      const percents = (scores.get(a.id) ?? []).map((s) => s.percent);
      return { id: a.id, title: a.title, dueAt: a.dueAt.toISOString(), students: percents.length, average: average(percents), percents, buckets: scoreBuckets(percents) };
    }),
    skills,
    slips: groupSlips(slipRows),
    lessons: outline.map((l) => ({
      slug: l.slug,
      title: l.title,
      opened: lessonCount(l.slug, ["opened", "completed", "practised"]),
      read: lessonCount(l.slug, ["completed", "practised"]),
      practised: lessonCount(l.slug, ["practised"]),
      mastered: masteredOf.get(l.skill) ?? null,
    })),
    activity: fillDays(days, new Map(activityRows.map((r) => [r.day, Number(r.tries)]))),
  };
}
