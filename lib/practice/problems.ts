import "server-only";
import { randomUUID } from "node:crypto";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import { guardedInsert, sqliteDate } from "@/lib/group-commit";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { gradeValue, readAnswer, type PartGrade } from "@/lib/grading/grade";
import { recordProgress } from "@/lib/lessons/progress";
import { lessonSlugs } from "@/lib/lessons/catalog";
import { findKind, type Level } from "@/lib/problems";
import { newSeed } from "@/lib/problems/random";
import { ATTEMPTS_PER_PROBLEM, MAX_ANSWER_LENGTH } from "./limits";
import { buildUpdate, buildView, partResult, workOut, type ProblemUpdate, type WorkedProblem, type PartResult, type ProblemView, type StoredAttempt, type StoredProblem } from "./view";


/** Who is practising: a signed-in user, or an anonymous visitor known only by a cookie. */
export type PracticeOwner = { user: SessionUser | null; visitorId: string | null };

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

type ProblemWithAttempts = { problem: StoredProblem; attempts: StoredAttempt[] };
type JoinedRow = StoredProblem & { [K in keyof StoredAttempt as `a_${K}`]: StoredAttempt[K] | null };

// The problem and its earlier answers in one plain-SQL read: this is the busiest route, and
// building the query through the models cost more than running it.
async function findOwned(owner: PracticeOwner, id: string): Promise<ProblemWithAttempts> {
  const mine = owner.user ? { sql: "p.user_id = ?", value: owner.user.id } : owner.visitorId ? { sql: "p.user_id IS NULL AND p.visitor_id = ?", value: owner.visitorId } : null;
  // Someone else's problem answers exactly like a missing one: ids are not confirmed to strangers.
  const rows =
    mine && /^[0-9a-f-]{36}$/.test(id)
      ? await db().sequelize.query<JoinedRow>(
          `SELECT p.id, p.kind, p.level, p.seed, p.status, p.attempts_allowed AS attemptsAllowed, p.attempts_used AS attemptsUsed,
                  a.part AS a_part, a.raw AS a_raw, a.value AS a_value, a.verdict AS a_verdict, a.pattern AS a_pattern, a.submission AS a_submission
           FROM practice_problems p LEFT JOIN attempts a ON a.problem_id = p.id
           WHERE p.id = ? AND ${mine.sql}`,
          { replacements: [id, mine.value], type: QueryTypes.SELECT },
        )
      : [];
  if (rows.length === 0) throw new AppError("not_found", "That problem is not here. Start a new one from the practice page.");
  const [first] = rows;
  return {
    problem: stored(first),
    attempts: rows
      .filter((r) => r.a_part !== null)
      .map((r) => ({ part: r.a_part!, raw: r.a_raw!, value: r.a_value!, verdict: r.a_verdict!, pattern: r.a_pattern, submission: r.a_submission! })),
  };
}

/** Re-grades the stored answers (they hold exact values), so messages never need storing. */
function latestResults({ kind, params, parts, expected }: WorkedProblem, rows: StoredAttempt[]): Record<string, PartResult | null> {
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

export async function getProblem(owner: PracticeOwner, id: string): Promise<ProblemView> {
  const { problem, attempts } = await findOwned(owner, id);
  const work = workOut(problem);
  return buildView(problem, latestResults(work, attempts), work);
}

export type Submission = { answers: Record<string, string>; timeMs?: number };

/**
 * Grades one try. Every part still open must be answered and readable, or nothing is stored and
 * the reply says what to fix per part. A try is stored as one row per part, together with the
 * problem's new count and status, in one transaction; a second try racing the first is refused.
 * The reply is sent only after that transaction has committed.
 */
export async function submitAnswers(owner: PracticeOwner, id: string, submission: Submission): Promise<ProblemUpdate> {
  const { problem, attempts } = await findOwned(owner, id);
  if (problem.status !== "open") throw new AppError("conflict", "This problem is finished. Start a new one to keep practising.");
  const work = workOut(problem);
  const { kind, params, parts, expected } = work;
  const previous = latestResults(work, attempts);
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
  const now = new Date();
  const written = await guardedInsert({
    table: "practice_problems",
    id,
    // The try count read above must still hold: a second try racing this one is refused.
    expect: { status: "open", attempts_used: problem.attemptsUsed },
    set: { attempts_used: used, status, finished_at: status === "open" ? null : sqliteDate(now), updated_at: sqliteDate(now) },
    into: {
      table: "attempts",
      columns: ["problem_id", "user_id", "kind", "level", "seed", "submission", "part", "raw", "value", "expected", "verdict", "pattern", "time_ms", "created_at"],
      rows: open.map((part) => [
        id,
        owner.user?.id ?? null,
        kind.key,
        problem.level,
        problem.seed,
        used,
        part.key,
        submission.answers[part.key].trim().slice(0, MAX_ANSWER_LENGTH),
        grades[part.key].value.toFraction(),
        expected[part.key].toFraction(),
        grades[part.key].verdict,
        grades[part.key].pattern,
        submission.timeMs ?? null,
        sqliteDate(now),
      ]),
    },
  });
  if (!written) throw new AppError("conflict", "These answers crossed with another try at the same problem. Reload to see where it stands.");
  if (solved && owner.user && lessonSlugs().includes(kind.lesson.slug)) {
    await recordProgress(owner.user, kind.lesson.slug, "practised", lessonSlugs());
  }
  const results: Record<string, PartResult | null> = { ...previous };
  for (const part of open) {
    const grade = grades[part.key];
    results[part.key] = partResult({ part: part.key, raw: submission.answers[part.key].trim(), value: grade.value.toFraction(), verdict: grade.verdict, pattern: grade.pattern, submission: used }, grade.readAs, grade.message);
  }
  return buildUpdate({ ...problem, attemptsUsed: used, status }, results, work);
}

