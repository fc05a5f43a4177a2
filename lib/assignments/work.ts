// The student's side of an assignment: their own variants, answered through the practice grader
// (lib/practice/tries.ts) into the same attempts table, within the dates the assignment sets, with
// answers revealed only as the instructor chose.
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import type { Verdict } from "@/lib/grading/grade";
import { recordProgress } from "@/lib/lessons/progress";
import { lessonSlugs } from "@/lib/lessons/catalog";
import { ERROR_PATTERNS, isErrorPattern } from "@/lib/problems";
import { gradeTry, latestResults, loadProblem, storedProblem, type ProblemWithAttempts, type Submission } from "@/lib/practice/tries";
import type { ReceiptClaim } from "@/lib/practice/receipts";
import { buildUpdate, buildView, workOut, type ProblemUpdate, type ProblemView, type StoredAttempt, type WorkedProblem } from "@/lib/practice/view";
import { assignmentForStudent, itemsOf, type AssignmentItemRecord, type AssignmentRecord } from "./access";
import { acceptsWork, closesAt, effectiveDue, isLate, type StudentExtension } from "./policy";
import { latePolicyText, mayReveal, percentOf, problemCredit, roundPoints, workedLate, workStatus, workWindow, type WorkStatus, type WorkWindow } from "./student-status";
import { ensureVariants } from "./variants";
import { overridesInForce } from "@/lib/gradebook/overrides";
import type { OverrideNotice } from "@/lib/gradebook/types";

export type TryView = { number: number; at: string; late: boolean; answers: { part: string; label: string; raw: string; verdict: Verdict; slip: string | null }[] };

/** What one of the student's problems adds to a practice problem's view. */
export type AssignmentProblemExtras = {
  /** 1, 2, 3 … across the whole assignment. */
  number: number;
  points: number;
  earned: number;
  /** False once the problem is final or the student's window is closed. */
  accepting: boolean;
  tries: TryView[];
  /** Set while a finished problem's solution waits for the due date ("after-due"). */
  solutionAfter: string | null;
};
export type AssignmentProblemView = ProblemView & AssignmentProblemExtras;
export type AssignmentProblemUpdate = ProblemUpdate & AssignmentProblemExtras;

export type StudentAssignmentView = {
  assignment: { id: number; classId: number; className: string; title: string; instructions: string; reveal: AssignmentRecord["reveal"]; latePolicyText: string; attemptsAllowed: number };
  timing: { window: WorkWindow; opensAt: string; dueAt: string; originalDueAt: string; closesAt: string; lateUntil: string | null; extended: boolean; extraAttempts: number };
  status: WorkStatus;
  late: boolean;
  progress: { finished: number; total: number };
  /** The score in force; `override` says when the instructor set it by hand, and why. */
  score: { earned: number; possible: number; percent: number; override: OverrideNotice | null };
  problems: AssignmentProblemView[];
};

export type Variant = ProblemWithAttempts & { item: AssignmentItemRecord; number: number };
export type Context = { assignment: AssignmentRecord; extension: StudentExtension; now: Date };

const dateText = (date: Date) =>
  new Intl.DateTimeFormat("en-US", { weekday: "short", month: "short", day: "numeric", year: "numeric", hour: "numeric", minute: "2-digit", timeZone: "UTC", timeZoneName: "short" }).format(date);
const at = (text: string) => new Date(text);

/** The student's problems for these items, with every stored answer, in one read, in assignment order. */
export async function loadVariants(studentId: number, items: AssignmentItemRecord[]): Promise<Variant[]> {
  if (items.length === 0) return [];
  type Row = { id: string; kind: string; level: number; seed: number; status: string; attemptsAllowed: number; attemptsUsed: number; itemId: number; variant: number } & {
    [K in keyof StoredAttempt as `a_${K}`]: StoredAttempt[K] | null;
  };
  const rows = await db().sequelize.query<Row>(
    `SELECT p.id, p.kind, p.level, p.seed, p.status, p.attempts_allowed AS attemptsAllowed, p.attempts_used AS attemptsUsed,
            p.assignment_item_id AS itemId, p.variant,
            a.part AS a_part, a.raw AS a_raw, a.value AS a_value, a.verdict AS a_verdict, a.pattern AS a_pattern, a.submission AS a_submission, a.created_at AS a_createdAt
     FROM practice_problems p LEFT JOIN attempts a ON a.problem_id = p.id
     WHERE p.user_id = ? AND p.assignment_item_id IN (${items.map(() => "?").join(", ")})
     ORDER BY p.variant, a.submission`,
    { replacements: [studentId, ...items.map((i) => i.id)], type: QueryTypes.SELECT },
  );
  const byId = new Map<string, Variant & { variant: number }>();
  for (const row of rows) {
    const item = items.find((i) => i.id === row.itemId)!;
    if (row.variant >= item.problemCount) continue;
    let v = byId.get(row.id);
    if (!v) byId.set(row.id, (v = { problem: storedProblem(row), attempts: [], assignmentItemId: item.id, item, number: 0, variant: row.variant }));
    if (row.a_part !== null) v.attempts.push({ part: row.a_part, raw: row.a_raw!, value: row.a_value!, verdict: row.a_verdict!, pattern: row.a_pattern, submission: row.a_submission!, createdAt: row.a_createdAt! });
  }
  const ordered = [...byId.values()].sort((a, b) => a.item.position - b.item.position || a.variant - b.variant);
  ordered.forEach((v, i) => (v.number = i + 1));
  return ordered;
}

function triesOf(attempts: StoredAttempt[], work: WorkedProblem, ctx: Context): TryView[] {
  const tries = new Map<number, TryView>();
  for (const a of [...attempts].sort((x, y) => x.submission - y.submission)) {
    let t = tries.get(a.submission);
    if (!t) tries.set(a.submission, (t = { number: a.submission, at: at(a.createdAt).toISOString(), late: isLate(at(a.createdAt), ctx.assignment, ctx.extension), answers: [] }));
    t.answers.push({ part: a.part, label: work.parts.find((p) => p.key === a.part)?.label ?? a.part, raw: a.raw, verdict: a.verdict as Verdict, slip: a.pattern && isErrorPattern(a.pattern) ? ERROR_PATTERNS[a.pattern].name : null });
  }
  return [...tries.values()];
}

/** When each part first came out right (one date per part that has). */
export function firstCorrectTimes(attempts: readonly StoredAttempt[]): Date[] {
  const first = new Map<string, Date>();
  for (const a of attempts) {
    if (a.verdict !== "correct") continue;
    const when = at(a.createdAt);
    const kept = first.get(a.part);
    if (!kept || when < kept) first.set(a.part, when);
  }
  return [...first.values()];
}

function extrasOf(v: Variant, work: WorkedProblem, ctx: Context): AssignmentProblemExtras & { revealed: boolean } {
  const { assignment, extension, now } = ctx;
  const revealed = mayReveal(v.problem.status, now, assignment.reveal, assignment, extension);
  const finalForStudent = v.problem.status !== "open" || now > closesAt(assignment, extension);
  return {
    number: v.number,
    points: v.item.points,
    earned: roundPoints(problemCredit(v.item.points, work.parts.length, firstCorrectTimes(v.attempts), assignment, extension)),
    accepting: v.problem.status === "open" && acceptsWork(now, assignment.opensAt, assignment, extension),
    tries: triesOf(v.attempts, work, ctx),
    solutionAfter: finalForStudent && !revealed ? effectiveDue(assignment, extension).toISOString() : null,
    revealed,
  };
}

/** `showAnswers` is for the class's instructors, who see the answers whatever the student may. */
export function problemView(v: Variant, ctx: Context, showAnswers = false): AssignmentProblemView {
  const work = workOut(v.problem, v.item.tolerance);
  const { revealed, ...extras } = extrasOf(v, work, ctx);
  return { ...buildView(v.problem, latestResults(work, v.attempts), work, revealed || showAnswers), ...extras };
}

async function className(classId: number): Promise<string> {
  return (await db().models.SchoolClass.findByPk(classId, { attributes: ["name"] }))?.name ?? "";
}

/**
 * The student's assignment page: their variants (made on first opening), progress and score.
 * `classId`, when given, must be the assignment's class (the page's address says which).
 */
export async function studentAssignment(user: SessionUser, assignmentId: number, classId?: number): Promise<StudentAssignmentView> {
  const { assignment, extension } = await assignmentForStudent(user, assignmentId);
  if (classId !== undefined && assignment.classId !== classId) throw new AppError("not_found", "There is no such assignment in your classes.");
  const items = await itemsOf(assignmentId);
  const now = new Date();
  const window = workWindow(now, assignment.opensAt, assignment, extension);
  const allowed = assignment.attemptsAllowed + (extension?.extraAttempts ?? 0);
  // Before it opens the student sees the dates but no problems: the numbers are not out early.
  if (window !== "upcoming") await ensureVariants(items, user.id, allowed);
  const variants = window === "upcoming" ? [] : await loadVariants(user.id, items);
  const ctx = { assignment, extension, now };
  const problems = variants.map((v) => problemView(v, ctx));

  const allTries = variants.flatMap((v) => v.attempts.map((a) => at(a.createdAt).getTime()));
  const lastTryAt = allTries.length > 0 ? new Date(Math.max(...allTries)) : null;
  const total = items.reduce((sum, i) => sum + i.problemCount, 0);
  const finished = variants.filter((v) => v.problem.status !== "open").length;
  const earned = roundPoints(problems.reduce((sum, p) => sum + p.earned, 0));
  const possible = items.reduce((sum, i) => sum + i.points * i.problemCount, 0);
  const due = effectiveDue(assignment, extension);
  const override = (await overridesInForce([assignment.id], user.id)).get(`${assignment.id}:${user.id}`) ?? null;
  const inForce = override ? (override.earned ?? 0) : earned;
  return {
    assignment: {
      id: assignment.id,
      classId: assignment.classId,
      className: await className(assignment.classId),
      title: assignment.title,
      instructions: assignment.instructions,
      reveal: assignment.reveal,
      latePolicyText: latePolicyText(assignment),
      attemptsAllowed: allowed,
    },
    timing: {
      window,
      opensAt: assignment.opensAt.toISOString(),
      dueAt: due.toISOString(),
      originalDueAt: assignment.dueAt.toISOString(),
      closesAt: closesAt(assignment, extension).toISOString(),
      lateUntil: assignment.latePolicy === "until" && assignment.lateUntil ? closesAt(assignment, extension).toISOString() : null,
      extended: extension?.dueAt != null && extension.dueAt.getTime() !== assignment.dueAt.getTime(),
      extraAttempts: extension?.extraAttempts ?? 0,
    },
    status: workStatus({ tries: new Set(variants.flatMap((v) => v.attempts.map((a) => `${v.problem.id}:${a.submission}`))).size, lastTryAt, finished, total }, now, assignment, extension),
    late: workedLate(lastTryAt, assignment, extension),
    progress: { finished, total },
    score: { earned: inForce, possible, percent: percentOf(inForce, possible), override },
    problems,
  };
}

/** One of the student's problems in this assignment; anything else (another student's, another assignment's) is a 404. */
async function findVariant(user: SessionUser, assignmentId: number, problemId: string): Promise<{ found: ProblemWithAttempts; item: AssignmentItemRecord; items: AssignmentItemRecord[] }> {
  const found = await loadProblem(problemId, {
    sql: "p.user_id = ? AND EXISTS (SELECT 1 FROM assignment_items i WHERE i.id = p.assignment_item_id AND i.assignment_id = ? AND p.variant < i.problem_count)",
    values: [user.id, assignmentId],
  });
  const items = found ? await itemsOf(assignmentId) : [];
  const item = items.find((i) => i.id === found?.assignmentItemId);
  if (!found || !item) throw new AppError("not_found", "That problem is not part of your assignment.");
  return { found, item, items };
}

function numberOf(items: AssignmentItemRecord[], item: AssignmentItemRecord, variantIndex: number): number {
  return items.filter((i) => i.position < item.position).reduce((sum, i) => sum + i.problemCount, 0) + variantIndex + 1;
}

async function variantIndex(problemId: string): Promise<number> {
  return (await db().models.PracticeProblem.findByPk(problemId, { attributes: ["variant"] }))?.variant ?? 0;
}

export async function studentProblem(user: SessionUser, assignmentId: number, problemId: string): Promise<AssignmentProblemView> {
  const { assignment, extension } = await assignmentForStudent(user, assignmentId);
  const { found, item, items } = await findVariant(user, assignmentId, problemId);
  const ctx = { assignment, extension, now: new Date() };
  return problemView({ ...found, item, number: numberOf(items, item, await variantIndex(problemId)) }, ctx);
}

/**
 * Grades one try at a student's assignment problem: only within the assignment's dates for this
 * student, with the item's tolerance, stored with the item's id. The reply says whether it was late.
 */
export async function answerProblem(user: SessionUser, assignmentId: number, problemId: string, submission: Submission, receipt: ReceiptClaim | null = null): Promise<{ problem: AssignmentProblemUpdate; late: boolean }> {
  const { assignment, extension } = await assignmentForStudent(user, assignmentId);
  let { found, item, items } = await findVariant(user, assignmentId, problemId);
  const now = new Date();
  if (now < assignment.opensAt) throw new AppError("conflict", `This assignment opens on ${dateText(assignment.opensAt)}.`);
  if (!acceptsWork(now, assignment.opensAt, assignment, extension)) {
    const closed = closesAt(assignment, extension);
    throw new AppError(
      "conflict",
      assignment.latePolicy === "none" || closed.getTime() === effectiveDue(assignment, extension).getTime()
        ? `This assignment closed on ${dateText(closed)}; late work is not taken.`
        : `This assignment closed on ${dateText(effectiveDue(assignment, extension))}; late work was taken until ${dateText(closed)}.`,
    );
  }
  const allowed = assignment.attemptsAllowed + (extension?.extraAttempts ?? 0);
  if (found.problem.attemptsAllowed !== allowed) {
    // An extension was granted (or tries changed) since the page was opened: settle that first.
    await ensureVariants(items, user.id, allowed);
    ({ found, item, items } = await findVariant(user, assignmentId, problemId));
  }
  if (found.problem.status !== "open") throw new AppError("conflict", "This problem is finished; its answers are in.");

  const work = workOut(found.problem, item.tolerance);
  const number = numberOf(items, item, await variantIndex(problemId));
  // The reply is built before the write so it can be stored with the try (see gradeTry).
  const graded = await gradeTry(found, work, submission, { userId: user.id, assignmentItemId: item.id, now, receipt }, (g) => {
    const after: Variant = { problem: g.problem, attempts: [...found.attempts, ...g.stored], assignmentItemId: item.id, item, number };
    const { revealed, ...extras } = extrasOf(after, work, { assignment, extension, now });
    return { problem: { ...buildUpdate(g.problem, g.results, work, revealed), ...extras }, late: isLate(now, assignment, extension) };
  });
  if (graded.solved && lessonSlugs().includes(work.kind.lesson.slug)) {
    await recordProgress(user, work.kind.lesson.slug, "practised", lessonSlugs());
  }
  return graded.response;
}
