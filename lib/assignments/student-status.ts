// One student's standing on one assignment, decided from plain facts (pure: no database), so
// the student's page, the instructor's list and the gradebook all say the same thing.
import { closesAt, creditShare, effectiveDue, type LateRules, type StudentExtension } from "./policy";

export const WORK_STATUSES = ["not-started", "in-progress", "submitted", "late", "missing"] as const;
export type WorkStatus = (typeof WORK_STATUSES)[number];

export const WORK_STATUS_TEXT: Record<WorkStatus, string> = {
  "not-started": "Not started",
  "in-progress": "In progress",
  submitted: "Submitted",
  late: "Late",
  missing: "Missing",
};

/** When work is taken: before opening, on time, in the late window, or no longer. */
export type WorkWindow = "upcoming" | "open" | "late-window" | "closed";

export function workWindow(now: Date, opensAt: Date, rules: LateRules, extension: StudentExtension): WorkWindow {
  if (now.getTime() < opensAt.getTime()) return "upcoming";
  if (now.getTime() <= effectiveDue(rules, extension).getTime()) return "open";
  return now.getTime() <= closesAt(rules, extension).getTime() ? "late-window" : "closed";
}

/**
 * Whether a problem's expected values and worked steps may go to the student: only once it is final
 * for them (solved, out of tries, or their window has closed), and under "after-due" only once their
 * own due date has passed too.
 */
export function mayReveal(problemStatus: "open" | "solved" | "failed", now: Date, reveal: "when-final" | "after-due", rules: LateRules, extension: StudentExtension): boolean {
  const final = problemStatus !== "open" || now.getTime() > closesAt(rules, extension).getTime();
  if (!final) return false;
  return reveal === "when-final" || now.getTime() > effectiveDue(rules, extension).getTime();
}

/**
 * A problem's points: each part is worth an equal share, kept at the credit share of the try in
 * which that part first came out right (a late try under a daily penalty keeps less). Parts never
 * right earn nothing. `firstCorrectAt` has one date per part that has been right.
 */
export function problemCredit(points: number, partCount: number, firstCorrectAt: readonly Date[], rules: LateRules, extension: StudentExtension): number {
  if (partCount <= 0) return 0;
  const shares = firstCorrectAt.reduce((sum, at) => sum + creditShare(at, rules, extension), 0);
  return (points * shares) / partCount;
}

export type WorkFacts = {
  /** Stored tries at any of the student's problems (the gradebook passes the problems tried: only none vs some matters). */
  tries: number;
  lastTryAt: Date | null;
  /** Problems solved or out of tries, of all the student's problems (counted from the items). */
  finished: number;
  total: number;
};

/**
 * The status rules:
 * - no tries: "missing" once the student's due date has passed (even if late work is still taken,
 *   nothing was in by the date), otherwise "not started";
 * - any try after the due date: "late";
 * - every problem finished on time: "submitted";
 * - some work on time, the rest not done: "in progress" while work is still taken, "submitted"
 *   once the window has closed (what was in by then is what counts).
 */
export function workStatus(facts: WorkFacts, now: Date, rules: LateRules, extension: StudentExtension): WorkStatus {
  const due = effectiveDue(rules, extension).getTime();
  if (facts.tries === 0) return now.getTime() > due ? "missing" : "not-started";
  if (facts.lastTryAt && facts.lastTryAt.getTime() > due) return "late";
  if (facts.total > 0 && facts.finished >= facts.total) return "submitted";
  return now.getTime() > closesAt(rules, extension).getTime() ? "submitted" : "in-progress";
}

/** Whether any counted try came after the student's due date. */
export function workedLate(lastTryAt: Date | null, rules: LateRules, extension: StudentExtension): boolean {
  return lastTryAt !== null && lastTryAt.getTime() > effectiveDue(rules, extension).getTime();
}

/** Points rounded for display and storage of a total: two decimals, so 0.9 × 3 shows as 2.7. */
export function roundPoints(points: number): number {
  return Math.round(points * 100) / 100;
}

export function percentOf(earned: number, possible: number): number {
  return possible > 0 ? Math.round((earned / possible) * 1000) / 10 : 0;
}

/** The late policy in plain words for the student's page. */
export function latePolicyText(rules: LateRules): string {
  if (rules.latePolicy === "penalty" && rules.latePenaltyPercent) {
    return `Late work is taken, with ${rules.latePenaltyPercent}% of the points taken off for each day (or part of a day) late.`;
  }
  if (rules.latePolicy === "until" && rules.lateUntil) return "Late work is taken without a penalty until the date shown.";
  return "Late work is not taken: answers are closed at the due date.";
}
