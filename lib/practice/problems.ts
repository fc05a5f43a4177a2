import "server-only";
import { randomUUID } from "node:crypto";
import { Transaction } from "sequelize";
import { db, queuedWrite } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { gradeValue, readAnswer, type PartGrade } from "@/lib/grading/grade";
import { recordProgress } from "@/lib/lessons/progress";
import { lessonSlugs } from "@/lib/lessons/catalog";
import { findKind, type Level } from "@/lib/problems";
import { newSeed } from "@/lib/problems/random";
import { ATTEMPTS_PER_PROBLEM, MAX_ANSWER_LENGTH } from "./limits";
import { buildView, kindOrThrow, partResult, type PartResult, type ProblemView, type StoredAttempt, type StoredProblem } from "./view";


/** Who is practising: a signed-in user, or an anonymous visitor known only by a cookie. */
export type PracticeOwner = { user: SessionUser | null; visitorId: string | null };

function ownerWhere(owner: PracticeOwner) {
  if (owner.user) return { userId: owner.user.id };
  if (owner.visitorId) return { userId: null, visitorId: owner.visitorId };
  return null;
}

function stored(row: { id: string; kind: string; level: number; seed: number; status: string; attemptsAllowed: number; attemptsUsed: number }): StoredProblem {
  return { id: row.id, kind: row.kind, level: row.level, seed: row.seed, status: row.status as StoredProblem["status"], attemptsAllowed: row.attemptsAllowed, attemptsUsed: row.attemptsUsed };
}

export async function createProblem(owner: PracticeOwner, kindKey: string, level: Level): Promise<ProblemView> {
  const kind = findKind(kindKey);
  if (!kind) throw new AppError("bad_request", "There is no problem kind by that name.", { kind: "Choose a problem kind from the list." });
  if (!owner.user && !owner.visitorId) throw new AppError("bad_request", "Practice needs cookies turned on, so your problem can find you again.");
  const row = await db().models.PracticeProblem.create({
    id: randomUUID(),
    userId: owner.user?.id ?? null,
    visitorId: owner.user ? null : owner.visitorId,
    kind: kind.key,
    level,
    seed: newSeed(),
    attemptsAllowed: ATTEMPTS_PER_PROBLEM,
  });
  return buildView(stored(row), {});
}

async function findOwned(owner: PracticeOwner, id: string) {
  const where = ownerWhere(owner);
  // Someone else's problem answers exactly like a missing one: ids are not confirmed to strangers.
  const row = where && /^[0-9a-f-]{36}$/.test(id) ? await db().models.PracticeProblem.findOne({ where: { id, ...where } }) : null;
  if (!row) throw new AppError("not_found", "That problem is not here. Start a new one from the practice page.");
  return row;
}

/** Re-grades the stored answers (they hold exact values), so messages never need storing. */
function latestResults(problem: StoredProblem, rows: StoredAttempt[]): Record<string, PartResult | null> {
  const kind = kindOrThrow(problem.kind);
  const params = kind.generate(problem.seed, problem.level as Level);
  const parts = kind.parts(params);
  const expected = kind.solve(params);
  const results: Record<string, PartResult | null> = {};
  for (const part of parts) {
    const latest = rows.filter((r) => r.part === part.key).sort((a, b) => b.submission - a.submission)[0];
    if (!latest) continue;
    const read = readAnswer(part, latest.raw);
    if (!read.ok) continue;
    const grade = gradeValue(part, expected[part.key], read.value, read.readAs, (v) => kind.diagnose(params, part.key, v));
    results[part.key] = partResult(latest, grade.readAs, grade.message);
  }
  return results;
}

async function attemptsOf(problemId: string): Promise<StoredAttempt[]> {
  const rows = await db().models.Attempt.findAll({ where: { problemId }, attributes: ["part", "raw", "value", "verdict", "pattern", "submission"], raw: true });
  return rows as StoredAttempt[];
}

export async function getProblem(owner: PracticeOwner, id: string): Promise<ProblemView> {
  const row = await findOwned(owner, id);
  const problem = stored(row);
  return buildView(problem, latestResults(problem, await attemptsOf(id)));
}

export type Submission = { answers: Record<string, string>; timeMs?: number };

/**
 * Grades one try. Every part still open must be answered and readable, or nothing is stored and
 * the reply says what to fix per part. A try is stored as one row per part, together with the
 * problem's new count and status, in one transaction; a second try racing the first is refused.
 */
export async function submitAnswers(owner: PracticeOwner, id: string, submission: Submission): Promise<ProblemView> {
  const row = await findOwned(owner, id);
  const problem = stored(row);
  if (problem.status !== "open") throw new AppError("conflict", "This problem is finished. Start a new one to keep practising.");
  const kind = kindOrThrow(problem.kind);
  const params = kind.generate(problem.seed, problem.level as Level);
  const parts = kind.parts(params);
  const expected = kind.solve(params);
  const previous = latestResults(problem, await attemptsOf(id));
  const open = parts.filter((p) => previous[p.key]?.verdict !== "correct");

  const unknown = Object.keys(submission.answers).filter((key) => !parts.some((p) => p.key === key));
  if (unknown.length > 0) throw new AppError("bad_request", `This problem has no part called "${unknown[0]}".`, { [unknown[0]]: "Not a part of this problem." });
  const fields: Record<string, string> = {};
  const grades: Record<string, PartGrade> = {};
  for (const part of open) {
    const raw = submission.answers[part.key] ?? "";
    const read = readAnswer(part, raw);
    if (!read.ok) {
      fields[part.key] = read.message;
      continue;
    }
    grades[part.key] = gradeValue(part, expected[part.key], read.value, read.readAs, (v) => kind.diagnose(params, part.key, v));
  }
  if (Object.keys(fields).length > 0) {
    throw new AppError("bad_request", "Some answers could not be read; nothing was counted. Fix them and send again.", fields);
  }

  const solved = parts.every((p) => previous[p.key]?.verdict === "correct" || grades[p.key]?.verdict === "correct");
  const used = problem.attemptsUsed + 1;
  const status = solved ? "solved" : used >= problem.attemptsAllowed ? "failed" : "open";
  const { sequelize, models } = db();
  // IMMEDIATE takes the write lock at BEGIN, so a try can never fail to upgrade a read lock;
  // the queue keeps this process's own tries from waiting on each other's locks.
  await queuedWrite(() => sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const [count] = await models.PracticeProblem.update(
      { attemptsUsed: used, status, finishedAt: status === "open" ? null : new Date() },
      { where: { id, status: "open", attemptsUsed: problem.attemptsUsed }, transaction },
    );
    if (count !== 1) throw new AppError("conflict", "These answers crossed with another try at the same problem. Reload to see where it stands.");
    await models.Attempt.bulkCreate(
      open.map((part) => ({
        problemId: id,
        userId: owner.user?.id ?? null,
        kind: kind.key,
        level: problem.level,
        seed: problem.seed,
        submission: used,
        part: part.key,
        raw: submission.answers[part.key].trim().slice(0, MAX_ANSWER_LENGTH),
        value: grades[part.key].value.toFraction(),
        expected: expected[part.key].toFraction(),
        verdict: grades[part.key].verdict,
        pattern: grades[part.key].pattern,
        timeMs: submission.timeMs ?? null,
      })),
      { transaction },
    );
  }));
  if (solved && owner.user && lessonSlugs().includes(kind.lesson.slug)) {
    await recordProgress(owner.user, kind.lesson.slug, "practised", lessonSlugs());
  }
  const results: Record<string, PartResult | null> = { ...previous };
  for (const part of open) {
    const grade = grades[part.key];
    results[part.key] = partResult({ part: part.key, raw: submission.answers[part.key].trim(), value: grade.value.toFraction(), verdict: grade.verdict, pattern: grade.pattern, submission: used }, grade.readAs, grade.message);
  }
  return buildView({ ...problem, attemptsUsed: used, status }, results);
}

