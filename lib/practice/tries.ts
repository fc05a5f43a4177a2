// The one path every graded try takes, practice or assignment: read the problem and its earlier
// answers in one plain-SQL query, grade with lib/grading, and store the try through the group
// commit's compare-and-set. Callers add only their own checks (who owns it, whether it is open).
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import { guardedWrite, sqliteDate } from "@/lib/group-commit";
import { AppError } from "@/lib/errors";
import { gradeValue, readAnswer, type PartGrade } from "@/lib/grading/grade";
import { MAX_ANSWER_LENGTH } from "./limits";
import { claimColumns, ReceiptTaken, type ReceiptClaim } from "./receipts";
import { partResult, type PartResult, type StoredAttempt, type StoredProblem, type WorkedProblem } from "./view";

/** `assignmentItemId` is set when the problem is a student's variant of an assignment item. */
export type ProblemWithAttempts = { problem: StoredProblem; attempts: StoredAttempt[]; assignmentItemId: number | null };
type JoinedRow = StoredProblem & { assignmentItemId: number | null } & { [K in keyof StoredAttempt as `a_${K}`]: StoredAttempt[K] | null };

/** Extra conditions on `p` (practice_problems) that make the problem the caller's; values bind in order. */
export type ProblemScope = { sql: string; values: (string | number)[] };

export const PROBLEM_ID = /^[0-9a-f-]{36}$/;

export function storedProblem(row: { id: string; kind: string; level: number; seed: number; status: string; attemptsAllowed: number; attemptsUsed: number }): StoredProblem {
  return { id: row.id, kind: row.kind, level: row.level, seed: row.seed, status: row.status as StoredProblem["status"], attemptsAllowed: row.attemptsAllowed, attemptsUsed: row.attemptsUsed };
}

/**
 * The problem and its earlier answers in one plain-SQL read: this is the busiest route, and
 * building the query through the models cost more than running it. Null when the id is not a
 * problem in `scope`: someone else's problem answers exactly like a missing one.
 */
export async function loadProblem(id: string, scope: ProblemScope): Promise<ProblemWithAttempts | null> {
  if (!PROBLEM_ID.test(id)) return null;
  const rows = await db().sequelize.query<JoinedRow>(
    `SELECT p.id, p.kind, p.level, p.seed, p.status, p.attempts_allowed AS attemptsAllowed, p.attempts_used AS attemptsUsed,
            p.assignment_item_id AS assignmentItemId, a.part AS a_part, a.raw AS a_raw, a.value AS a_value, a.verdict AS a_verdict, a.pattern AS a_pattern, a.submission AS a_submission,
            a.created_at AS a_createdAt
     FROM practice_problems p LEFT JOIN attempts a ON a.problem_id = p.id
     WHERE p.id = ? AND ${scope.sql}`,
    { replacements: [id, ...scope.values], type: QueryTypes.SELECT },
  );
  if (rows.length === 0) return null;
  const [first] = rows;
  return {
    problem: storedProblem(first),
    assignmentItemId: first.assignmentItemId,
    attempts: rows
      .filter((r) => r.a_part !== null)
      .map((r) => ({ part: r.a_part!, raw: r.a_raw!, value: r.a_value!, verdict: r.a_verdict!, pattern: r.a_pattern, submission: r.a_submission!, createdAt: r.a_createdAt! })),
  };
}

/** Re-grades the stored answers (they hold exact values), so messages never need storing. */
export function latestResults({ kind, params, parts, expected }: WorkedProblem, rows: StoredAttempt[]): Record<string, PartResult | null> {
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

export type Submission = { answers: Record<string, string>; timeMs?: number };

/**
 * Who the try is stored for, (for an assignment) which item it counts toward, and the client's
 * idempotency key when it sent one.
 */
export type TryContext = { userId: number | null; assignmentItemId: number | null; now: Date; receipt?: ReceiptClaim | null };

/** The problem after the try, the latest result per part, and the rows this try stored. */
export type GradedTry = { problem: StoredProblem; results: Record<string, PartResult | null>; stored: StoredAttempt[]; solved: boolean };

/**
 * Grades one try at an open problem. Every part still open must be answered and readable, or
 * nothing is stored and the error says what to fix per part. The try is stored as one row per part,
 * together with the problem's new count and status, in one transaction; a second try racing the
 * first is refused. Resolves only after that transaction has committed.
 *
 * `respond` builds the caller's reply from the graded try before anything is written, so that with
 * a receipt the reply is stored in the same transaction as the try: a retry gets exactly the reply
 * the first request was given, even when the server died before sending it. If a twin request
 * with the same key committed first, nothing is written and `ReceiptTaken` carries its reply.
 */
export async function gradeTry<R>(
  { problem, attempts }: ProblemWithAttempts,
  work: WorkedProblem,
  submission: Submission,
  context: TryContext,
  respond: (graded: GradedTry) => R,
): Promise<GradedTry & { response: R }> {
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
  const at = sqliteDate(context.now);
  const results: Record<string, PartResult | null> = { ...previous };
  const stored: StoredAttempt[] = [];
  for (const part of open) {
    const grade = grades[part.key];
    const row = { part: part.key, raw: submission.answers[part.key].trim().slice(0, MAX_ANSWER_LENGTH), value: grade.value.toFraction(), verdict: grade.verdict, pattern: grade.pattern, submission: used, createdAt: at };
    stored.push(row);
    results[part.key] = partResult(row, grade.readAs, grade.message);
  }
  const graded: GradedTry = { problem: { ...problem, attemptsUsed: used, status }, results, stored, solved };
  const response = respond(graded);
  const { receipt } = context;

  const outcome = await guardedWrite({
    table: "practice_problems",
    id: problem.id,
    // The try count read above must still hold: a second try racing this one is refused.
    expect: { status: "open", attempts_used: problem.attemptsUsed },
    set: { attempts_used: used, status, finished_at: status === "open" ? null : at, last_try_at: at, updated_at: at },
    into: {
      // Practice and assignment tries share one column list, so they share a commit batch.
      table: "attempts",
      columns: ["problem_id", "user_id", "assignment_item_id", "kind", "level", "seed", "submission", "part", "raw", "value", "expected", "verdict", "pattern", "time_ms", "created_at"],
      rows: open.map((part) => [
        problem.id,
        context.userId,
        context.assignmentItemId,
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
        at,
      ]),
    },
    once: receipt
      ? {
          table: "answer_receipts",
          unique: claimColumns(receipt),
          values: { problem_id: problem.id, submission: used, fingerprint: receipt.fingerprint, status: 200, response: JSON.stringify(response), created_at: at },
        }
      : undefined,
  });
  if (outcome.kind === "claimed") {
    throw new ReceiptTaken({ fingerprint: String(outcome.row.fingerprint), status: Number(outcome.row.status), response: String(outcome.row.response) });
  }
  if (outcome.kind === "refused") throw new AppError("conflict", "These answers crossed with another try at the same problem. Reload to see where it stands.");
  return { ...graded, response };
}
