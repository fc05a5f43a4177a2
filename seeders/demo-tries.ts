// How a demo student answers one problem. Every answer is graded by lib/grading with the kind's
// own diagnosis, exactly as the answer route does, so the stored verdicts and slips are the ones
// the grader would give; the student's profile only decides what they type.
import type { Fraction } from "@/lib/layout";
import { gradeValue, readAnswer, type PartGrade } from "@/lib/grading/grade";
import { findKind, type AnyProblemKind, type ErrorPattern, type Level, type ProblemPart } from "@/lib/problems";
import { roundedAnswer } from "@/lib/problems/kit";
import type { Random } from "@/lib/problems/random";
import { roundingSlips, slipAnswer } from "@/lib/problems/stock-figures";
import { battenLengthSlips } from "@/lib/problems/batten-length";
import { bayRailSlips } from "@/lib/problems/bay-rail";
import { evenGapSlips } from "@/lib/problems/even-gap";
import { markPositionSlips } from "@/lib/problems/mark-position";

/** How a student works: the chance in 100 that a part is right on the first try and on a retry, their slip, their pace. */
export type Profile = {
  name: "strong" | "steady" | "struggling";
  firstTry: number;
  retry: number;
  slip: ErrorPattern | null;
  /** Seconds spent on one try, lowest and highest. */
  seconds: [number, number];
};

export const PROFILES = {
  strong: { name: "strong", firstTry: 90, retry: 95, slip: null, seconds: [45, 110] },
  steady: { name: "steady", firstTry: 68, retry: 80, slip: null, seconds: [80, 200] },
  struggling: { name: "struggling", firstTry: 40, retry: 55, slip: "divided-by-members", seconds: [150, 380] },
} satisfies Record<string, Profile>;

/** The slips each kind models, with the value each leads to (the spacing kinds list them per part). */
function modelledSlips(kind: AnyProblemKind, params: unknown, part: ProblemPart, exact: Fraction): { pattern: ErrorPattern; value: Fraction }[] {
  const listed = (() => {
    switch (kind.key) {
      case "even-gap":
        return evenGapSlips(params as Parameters<typeof evenGapSlips>[0]);
      case "mark-position":
        return markPositionSlips(params as Parameters<typeof markPositionSlips>[0]);
      case "batten-length":
        return battenLengthSlips(params as Parameters<typeof battenLengthSlips>[0]);
      case "bay-rail":
        return bayRailSlips(params as Parameters<typeof bayRailSlips>[0]);
      default:
        return [];
    }
  })().filter((slip) => slip.part === part.key);
  const rounding = part.answer === "count" ? [] : roundingSlips(exact, part.precision);
  return [...listed, ...rounding];
}

/** What a carpenter writes in the box: a whole count, or a mixed number like 12 3/8. */
function written(value: Fraction): string {
  return value.toFraction(true);
}

export type Problem = { kind: AnyProblemKind; params: unknown; parts: ProblemPart[]; expected: Record<string, Fraction> };

export function workProblem(kindKey: string, level: number, seed: number): Problem {
  const kind = findKind(kindKey);
  if (!kind) throw new Error(`unknown problem kind ${kindKey}`);
  const params = kind.generate(seed, level as Level);
  // Demo items use the half-graduation tolerance, so the kind's own parts are the graded ones.
  return { kind, params, parts: kind.parts(params), expected: kind.solve(params) };
}

/** The right answer as a student would type it: rounded to the graduation asked. */
export function rightAnswer(part: ProblemPart, exact: Fraction): string {
  return written(part.answer === "count" ? exact : roundedAnswer(exact, part.precision));
}

/** The values the student's own slip leads to on this part (none when the part cannot show it). */
function favouriteSlips(problem: Problem, part: ProblemPart, profile: Profile): Fraction[] {
  if (!profile.slip) return [];
  return modelledSlips(problem.kind, problem.params, part, problem.expected[part.key]).filter((s) => s.pattern === profile.slip).map((s) => s.value);
}

/**
 * A wrong answer: the student's own slip when the part can show it, otherwise mostly a slip the
 * kind models (its rounding slips less often), otherwise a miscount or a mis-measure a few graduations off.
 */
export function wrongAnswer(problem: Problem, part: ProblemPart, profile: Profile, random: Random): string {
  const exact = problem.expected[part.key];
  const favourite = favouriteSlips(problem, part, profile);
  if (favourite.length > 0 && random.chance(4, 5)) return written(slipAnswer(part, random.pick(favourite)));
  const slips = modelledSlips(problem.kind, problem.params, part, exact);
  const named = slips.filter((s) => s.pattern !== "wrong-precision" && s.pattern !== "rounded-wrong-way");
  const pool = named.length > 0 && random.chance(3, 4) ? named : slips;
  if (pool.length > 0 && random.chance(3, 4)) return written(slipAnswer(part, random.pick(pool).value));
  if (part.answer === "count") return written(exact.add(random.pick([-1, 1, 2])).abs());
  const step = roundedAnswer(exact, part.precision);
  const off = random.int(2, 6) * (random.chance(1, 2) ? 1 : -1);
  const value = step.add(off / part.precision);
  return written(value.compare(0) > 0 ? value : step.add(-off / part.precision));
}

export type GradedPart = { part: string; raw: string; value: string; expected: string; grade: PartGrade };

/** Grades one answer the way the try path does: read it, then gradeValue with the kind's diagnosis. */
export function gradePart(problem: Problem, part: ProblemPart, raw: string): GradedPart {
  const read = readAnswer(part, raw);
  if (!read.ok) throw new Error(`demo answer "${raw}" for ${problem.kind.key}/${part.key} is unreadable: ${read.message}`);
  const exact = problem.expected[part.key];
  const grade = gradeValue(part, exact, read.value, read.readAs, (v) => problem.kind.diagnose(problem.params, part.key, v));
  return { part: part.key, raw, value: grade.value.toFraction(), expected: exact.toFraction(), grade };
}

/**
 * One try: every part not yet right gets an answer (right with the profile's chance, else a
 * wrong one), graded. The first try is the student's cold attempt; retries go better.
 */
export function attemptParts(problem: Problem, open: readonly ProblemPart[], profile: Profile, tryNumber: number, random: Random): GradedPart[] {
  const chance = tryNumber === 1 ? profile.firstTry : profile.retry;
  return open.map((part) => {
    // A habit shows first time round: where their slip can happen, it mostly does.
    const habit = tryNumber === 1 && favouriteSlips(problem, part, profile).length > 0 && random.chance(7, 10);
    const raw = !habit && random.chance(chance, 100) ? rightAnswer(part, problem.expected[part.key]) : wrongAnswer(problem, part, profile, random);
    return gradePart(problem, part, raw);
  });
}
