import { describe, expect, it } from "vitest";
import type { LateRules } from "@/lib/assignments/policy";
import { latePolicyText, mayReveal, percentOf, problemCredit, workStatus, workWindow } from "@/lib/assignments/student-status";

const DAY = 24 * 3600 * 1000;
const due = new Date("2027-03-10T17:00:00Z");
const opens = new Date("2027-03-01T08:00:00Z");
const penalty: LateRules = { dueAt: due, latePolicy: "penalty", lateUntil: null, latePenaltyPercent: 10 };
const none: LateRules = { dueAt: due, latePolicy: "none", lateUntil: null, latePenaltyPercent: null };
const until: LateRules = { dueAt: due, latePolicy: "until", lateUntil: new Date(due.getTime() + 3 * DAY), latePenaltyPercent: null };
const before = new Date(due.getTime() - DAY);
const after = (days: number) => new Date(due.getTime() + days * DAY);

describe("problem credit", () => {
  it("splits the points among the parts and keeps each at the share of the try that got it right", () => {
    expect(problemCredit(3, 3, [before, before, before], penalty, null)).toBe(3);
    expect(problemCredit(3, 3, [before], penalty, null)).toBe(1);
    expect(problemCredit(4, 2, [before, after(0.5)], penalty, null)).toBeCloseTo(2 + 2 * 0.9, 10);
    expect(problemCredit(4, 2, [], penalty, null)).toBe(0);
    // Without a penalty late work keeps full credit; the flag is kept elsewhere.
    expect(problemCredit(4, 2, [after(1), after(2)], until, null)).toBe(4);
  });

  it("measures lateness from the student's own extended due date", () => {
    expect(problemCredit(5, 1, [after(1)], penalty, { dueAt: after(2), extraAttempts: 0 })).toBe(5);
    expect(problemCredit(5, 1, [after(2.5)], penalty, { dueAt: after(2), extraAttempts: 0 })).toBeCloseTo(4.5, 10);
  });
});

describe("work status", () => {
  const facts = (tries: number, lastTryAt: Date | null, finished: number, total = 4) => ({ tries, lastTryAt, finished, total });
  it("names each state by the rules written beside workStatus", () => {
    expect(workStatus(facts(0, null, 0), before, penalty, null)).toBe("not-started");
    expect(workStatus(facts(0, null, 0), after(1), penalty, null)).toBe("missing");
    expect(workStatus(facts(2, before, 1), before, penalty, null)).toBe("in-progress");
    expect(workStatus(facts(6, before, 4), before, penalty, null)).toBe("submitted");
    expect(workStatus(facts(6, after(0.2), 4), after(1), penalty, null)).toBe("late");
    expect(workStatus(facts(2, after(0.2), 1), after(1), penalty, null)).toBe("late");
    // Some on time, window still open for late work: still in progress; once closed, what was in stands.
    expect(workStatus(facts(2, before, 1), after(1), penalty, null)).toBe("in-progress");
    expect(workStatus(facts(2, before, 1), after(1), none, null)).toBe("submitted");
    expect(workStatus(facts(0, null, 0), after(1), penalty, { dueAt: after(2), extraAttempts: 0 })).toBe("not-started");
  });
});

describe("reveal and window", () => {
  it("reveals only final problems, and under after-due only past the student's due date", () => {
    expect(mayReveal("open", before, "when-final", penalty, null)).toBe(false);
    expect(mayReveal("solved", before, "when-final", penalty, null)).toBe(true);
    expect(mayReveal("solved", before, "after-due", penalty, null)).toBe(false);
    expect(mayReveal("failed", after(0.1), "after-due", penalty, null)).toBe(true);
    expect(mayReveal("solved", after(0.1), "after-due", penalty, { dueAt: after(1), extraAttempts: 0 })).toBe(false);
    // Open but the window has closed: final for the student.
    expect(mayReveal("open", after(0.1), "when-final", none, null)).toBe(true);
    expect(mayReveal("open", after(0.1), "when-final", penalty, null)).toBe(false);
  });

  it("knows when work is taken", () => {
    expect(workWindow(new Date(opens.getTime() - 1), opens, penalty, null)).toBe("upcoming");
    expect(workWindow(before, opens, penalty, null)).toBe("open");
    expect(workWindow(after(1), opens, penalty, null)).toBe("late-window");
    expect(workWindow(after(11), opens, penalty, null)).toBe("closed");
    expect(workWindow(after(0.01), opens, none, null)).toBe("closed");
  });

  it("says the policy in plain words and rounds percents to a tenth", () => {
    expect(latePolicyText(penalty)).toContain("10%");
    expect(latePolicyText(none)).toContain("not taken");
    expect(percentOf(2, 3)).toBe(66.7);
    expect(percentOf(0, 0)).toBe(0);
  });
});
