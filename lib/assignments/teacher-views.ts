import "server-only";
import { fn, col, literal } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { classForTeacher as teachingClass, listTeachingClasses } from "@/lib/classes/queries";
import { findKind, PROBLEM_KINDS } from "@/lib/problems";
import { SKILL_TITLES } from "@/lib/practice/skills";
import { assignmentForTeacher, itemsOf, type AssignmentItemRecord, type AssignmentRecord } from "./access";
import type { KindOption } from "./teacher-format";

// What the instructor's pages and the API hand out: plain objects, dates as ISO strings.

export type TeacherItem = {
  id: number;
  position: number;
  kind: string;
  kindTitle: string;
  skillTitle: string;
  level: 1 | 2 | 3;
  levelLabel: string;
  problemCount: number;
  tolerance: "half" | "full";
  points: number;
};

export type TeacherAssignmentSummary = {
  id: number;
  classId: number;
  title: string;
  status: "draft" | "published";
  /** Once set, the items and tries are fixed even after unpublishing: students' variants depend on them. */
  publishedAt: string | null;
  opensAt: string;
  dueAt: string;
  itemCount: number;
  problemCount: number;
  totalPoints: number;
};

export type TeacherAssignment = TeacherAssignmentSummary & {
  className: string;
  instructions: string;
  latePolicy: "none" | "until" | "penalty";
  lateUntil: string | null;
  latePenaltyPercent: number | null;
  attemptsAllowed: number;
  reveal: "when-final" | "after-due";
  locked: boolean;
  /** Students who would be e-mailed on publishing. */
  activeStudents: number;
  items: TeacherItem[];
};

export type TeachingClass = { id: number; name: string; term: string; activeStudents: number };

export const ASSIGNMENTS_PER_PAGE = 20;

/** A class for someone who teaches it: 404 when it does not exist (or is archived), 403 when not theirs. */
/** The class an instructor builds assignments in: the classes module's check, then archived classes are closed. */
export async function classForTeacher(user: SessionUser, classId: number): Promise<TeachingClass> {
  const summary = Number.isSafeInteger(classId) ? await teachingClass(user, classId) : null;
  if (!summary || summary.archivedAt) throw new AppError("not_found", "There is no such class.");
  return { id: summary.id, name: summary.name, term: summary.term, activeStudents: summary.studentCount };
}

export function itemView(item: AssignmentItemRecord): TeacherItem {
  const kind = findKind(item.kind);
  return {
    id: item.id,
    position: item.position,
    kind: item.kind,
    kindTitle: kind?.title ?? item.kind,
    skillTitle: kind ? SKILL_TITLES[kind.skill] : "",
    level: item.level,
    levelLabel: kind?.levels.find((l) => l.level === item.level)?.label ?? `Level ${item.level}`,
    problemCount: item.problemCount,
    tolerance: item.tolerance,
    points: item.points,
  };
}

type Totals = { itemCount: number; problemCount: number; totalPoints: number };

/** Item counts and points of many assignments in one grouped query. */
async function totalsOf(assignmentIds: number[]): Promise<Map<number, Totals>> {
  if (assignmentIds.length === 0) return new Map();
  const rows = (await db().models.AssignmentItem.findAll({
    attributes: ["assignmentId", [fn("COUNT", col("id")), "itemCount"], [fn("SUM", col("problem_count")), "problemCount"], [fn("SUM", literal("problem_count * points")), "totalPoints"]],
    where: { assignmentId: assignmentIds },
    group: ["assignmentId"],
    raw: true,
  })) as unknown as { assignmentId: number; itemCount: number; problemCount: number; totalPoints: number }[];
  return new Map(rows.map((r) => [Number(r.assignmentId), { itemCount: Number(r.itemCount), problemCount: Number(r.problemCount), totalPoints: Number(r.totalPoints) }]));
}

function summaryOf(a: Pick<AssignmentRecord, "id" | "classId" | "title" | "status" | "publishedAt" | "opensAt" | "dueAt">, totals: Totals | undefined): TeacherAssignmentSummary {
  return {
    id: a.id,
    classId: a.classId,
    title: a.title,
    status: a.status,
    publishedAt: a.publishedAt ? a.publishedAt.toISOString() : null,
    opensAt: a.opensAt.toISOString(),
    dueAt: a.dueAt.toISOString(),
    ...(totals ?? { itemCount: 0, problemCount: 0, totalPoints: 0 }),
  };
}

export type AssignmentPage = { klass: TeachingClass; assignments: TeacherAssignmentSummary[]; page: number; pageCount: number; total: number };

/** A class's assignments, drafts and published, the latest due first. */
export async function listClassAssignments(user: SessionUser, classId: number, page = 1): Promise<AssignmentPage> {
  const klass = await classForTeacher(user, classId);
  const { Assignment } = db().models;
  const total = await Assignment.count({ where: { classId } });
  const pageCount = Math.max(1, Math.ceil(total / ASSIGNMENTS_PER_PAGE));
  const current = Math.min(Math.max(1, page), pageCount);
  const rows = await Assignment.findAll({
    attributes: ["id", "classId", "title", "status", "publishedAt", "opensAt", "dueAt"],
    where: { classId },
    order: [["dueAt", "DESC"], ["id", "DESC"]],
    limit: ASSIGNMENTS_PER_PAGE,
    offset: (current - 1) * ASSIGNMENTS_PER_PAGE,
  });
  const totals = await totalsOf(rows.map((r) => r.id));
  return { klass, assignments: rows.map((r) => summaryOf(r, totals.get(r.id))), page: current, pageCount, total };
}

export function toTeacherAssignment(a: AssignmentRecord, items: AssignmentItemRecord[], klass: TeachingClass): TeacherAssignment {
  const totals = {
    itemCount: items.length,
    problemCount: items.reduce((n, i) => n + i.problemCount, 0),
    totalPoints: items.reduce((n, i) => n + i.problemCount * i.points, 0),
  };
  return {
    ...summaryOf(a, totals),
    className: klass.name,
    instructions: a.instructions,
    latePolicy: a.latePolicy,
    lateUntil: a.lateUntil ? a.lateUntil.toISOString() : null,
    latePenaltyPercent: a.latePenaltyPercent,
    attemptsAllowed: a.attemptsAllowed,
    reveal: a.reveal,
    locked: a.publishedAt !== null,
    activeStudents: klass.activeStudents,
    items: items.map(itemView),
  };
}

/** One assignment with its items, for the class's instructors and admins. */
export async function getTeacherAssignment(user: SessionUser, assignmentId: number): Promise<TeacherAssignment> {
  const assignment = await assignmentForTeacher(user, assignmentId);
  const [items, klass] = await Promise.all([itemsOf(assignmentId), classForTeacher(user, assignment.classId)]);
  return toTeacherAssignment(assignment, items, klass);
}

/** Every problem kind in course order, for the builder's select. */
export function kindCatalog(): KindOption[] {
  return PROBLEM_KINDS.map((k) => ({ key: k.key, title: k.title, summary: k.summary, skillTitle: SKILL_TITLES[k.skill], levels: k.levels.map((l) => ({ level: l.level, label: l.label, description: l.description })) }));
}

/** Other classes this user teaches, for "duplicate into…". */
export async function duplicateTargets(user: SessionUser): Promise<{ id: number; name: string; term: string }[]> {
  const classes = await listTeachingClasses(user);
  return classes.map((c) => ({ id: c.id, name: c.name, term: c.term }));
}
