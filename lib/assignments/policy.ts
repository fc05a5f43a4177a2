// When an assignment takes work from one student, and what lateness costs. Pure: the answer
// route, the uploads route, the reminders and the gradebook all decide lateness here.

export type LateRules = {
  dueAt: Date;
  latePolicy: "none" | "until" | "penalty";
  lateUntil: Date | null;
  latePenaltyPercent: number | null;
};

export type StudentExtension = { dueAt: Date | null; extraAttempts: number } | null;

const DAY_MS = 24 * 60 * 60 * 1000;

/** The due date for this student: their extension's, when they have one. */
export function effectiveDue(rules: LateRules, extension: StudentExtension): Date {
  return extension?.dueAt ?? rules.dueAt;
}

/**
 * The last moment this student's work is taken. "No late work" closes at the due date; "until"
 * at its date (or a later extended due date); a daily penalty closes once it has taken every point.
 */
export function closesAt(rules: LateRules, extension: StudentExtension): Date {
  const due = effectiveDue(rules, extension);
  if (rules.latePolicy === "until" && rules.lateUntil) return new Date(Math.max(rules.lateUntil.getTime(), due.getTime()));
  if (rules.latePolicy === "penalty" && rules.latePenaltyPercent) return new Date(due.getTime() + Math.ceil(100 / rules.latePenaltyPercent) * DAY_MS);
  return due;
}

export function isLate(at: Date, rules: LateRules, extension: StudentExtension): boolean {
  return at.getTime() > effectiveDue(rules, extension).getTime();
}

/** Days late, counting any part of a day as a day (0 when on time). */
export function daysLate(at: Date, rules: LateRules, extension: StudentExtension): number {
  const over = at.getTime() - effectiveDue(rules, extension).getTime();
  return over <= 0 ? 0 : Math.ceil(over / DAY_MS);
}

/** The share of the points kept for work done at `at`: 1 on time, less per day under a penalty, never below 0. */
export function creditShare(at: Date, rules: LateRules, extension: StudentExtension): number {
  if (rules.latePolicy !== "penalty" || !rules.latePenaltyPercent) return 1;
  return Math.max(0, 1 - (daysLate(at, rules, extension) * rules.latePenaltyPercent) / 100);
}

export function acceptsWork(at: Date, opensAt: Date, rules: LateRules, extension: StudentExtension): boolean {
  return at.getTime() >= opensAt.getTime() && at.getTime() <= closesAt(rules, extension).getTime();
}
