import "server-only";
import { randomUUID } from "node:crypto";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { recordProgress } from "@/lib/lessons/progress";
import { lessonSlugs } from "@/lib/lessons/catalog";
import { findKind, type Level } from "@/lib/problems";
import { newSeed } from "@/lib/problems/random";
import { ATTEMPTS_PER_PROBLEM } from "./limits";
import type { ReceiptClaim } from "./receipts";
import { gradeTry, latestResults, loadProblem, storedProblem, type ProblemWithAttempts, type Submission } from "./tries";
import { buildUpdate, buildView, workOut, type ProblemUpdate, type ProblemView } from "./view";

export type { Submission } from "./tries";

/** Who is practising: a signed-in user, or an anonymous visitor known only by a cookie. */
export type PracticeOwner = { user: SessionUser | null; visitorId: string | null };

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
  return buildView(storedProblem(row), {});
}

// Assignment problems are answered only through their assignment's routes, which check the dates:
// the practice routes treat them as not there, or a student could answer after the due date.
async function findOwned(owner: PracticeOwner, id: string): Promise<ProblemWithAttempts> {
  const scope = owner.user
    ? { sql: "p.user_id = ? AND p.assignment_item_id IS NULL", values: [owner.user.id] }
    : owner.visitorId
      ? { sql: "p.user_id IS NULL AND p.visitor_id = ? AND p.assignment_item_id IS NULL", values: [owner.visitorId] }
      : null;
  const found = scope ? await loadProblem(id, scope) : null;
  if (!found) throw new AppError("not_found", "That problem is not here. Start a new one from the practice page.");
  return found;
}

export async function getProblem(owner: PracticeOwner, id: string): Promise<ProblemView> {
  const { problem, attempts } = await findOwned(owner, id);
  const work = workOut(problem);
  return buildView(problem, latestResults(work, attempts), work);
}

/** Grades one try (lib/practice/tries.ts); a solved problem counts as practice on its lesson. */
export async function submitAnswers(owner: PracticeOwner, id: string, submission: Submission, receipt: ReceiptClaim | null = null): Promise<ProblemUpdate> {
  const found = await findOwned(owner, id);
  if (found.problem.status !== "open") throw new AppError("conflict", "This problem is finished. Start a new one to keep practising.");
  const work = workOut(found.problem);
  const graded = await gradeTry(found, work, submission, { userId: owner.user?.id ?? null, assignmentItemId: null, now: new Date(), receipt }, (g) => buildUpdate(g.problem, g.results, work));
  if (graded.solved && owner.user && lessonSlugs().includes(work.kind.lesson.slug)) {
    await recordProgress(owner.user, work.kind.lesson.slug, "practised", lessonSlugs());
  }
  return graded.response;
}
