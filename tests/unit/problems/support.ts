// Shared checks for the problem-kind tests: what "the prompt hides its answers" and "every slip
// is named" mean, written once.
import { expect } from "vitest";
import { Fraction } from "@/lib/layout";
import { inchText, roundedAnswer } from "@/lib/problems/kit";
import type { ErrorPattern } from "@/lib/problems/patterns";
import { NUMBER_WORDS } from "@/lib/problems/spacing-figures";
import type { ProblemKind, ProblemPart } from "@/lib/problems/types";

/** Seeds per level in the property tests, and the time they may take on a loaded machine. */
export const SEEDS = 500;
export const TIMEOUT = 60_000;

export const f = (value: number | string) => new Fraction(value);

const MEASURE = /(\d+' )?(\d+ \d+\/\d+|\d+\/\d+|\d+)"|\d+x\d+/g;

/** Whole measurements written in a text, and the words left once they are taken out. */
function readText(text: string) {
  return { measures: Array.from(text.matchAll(MEASURE), (m) => m[0]), rest: text.replace(MEASURE, " ") };
}

/** The prompt (and figure) shows no expected value: no length token equal to one, no count in figures or words. */
export function hiddenAnswers<P>(kind: ProblemKind<P>, params: P): boolean {
  const prompt = kind.render(params);
  const text = [prompt.text, prompt.figure?.description ?? "", ...(prompt.figure?.dimensions.map((d) => d.label) ?? []), ...(prompt.figure?.rects.map((r) => r.label ?? "") ?? [])].join("\n");
  const { measures, rest } = readText(text);
  const expected = kind.solve(params);
  return kind.parts(params).every((part: ProblemPart) => {
    const value = expected[part.key];
    if (part.answer === "count") {
      const n = Number(value.valueOf());
      return !new RegExp(`\\b${n}\\b`).test(rest) && !(NUMBER_WORDS[n] && new RegExp(`\\b${NUMBER_WORDS[n]}\\b`, "i").test(rest));
    }
    const rounded = roundedAnswer(value, part.precision);
    return !measures.includes(inchText(rounded)) && !measures.includes(inchText(rounded, "feet-inches"));
  });
}

/**
 * Each modelled slip, answered as a student would write it (rounded to the precision asked),
 * lands outside the tolerance and is named by `diagnose` as that slip.
 */
export function expectSlipsNamed<P>(kind: ProblemKind<P>, params: P, slips: readonly { part: string; pattern: ErrorPattern; value: Fraction }[]): void {
  const expected = kind.solve(params);
  const parts = kind.parts(params);
  for (const slip of slips) {
    const part = parts.find((x) => x.key === slip.part)!;
    const isCount = part.answer === "count";
    const answer = isCount ? slip.value : roundedAnswer(slip.value, part.precision);
    const tolerance = isCount ? f(0) : new Fraction(1, 2 * part.precision);
    expect(answer.sub(expected[slip.part]).abs().compare(tolerance) > 0, `${slip.pattern} on ${slip.part} is within tolerance`).toBe(true);
    expect(kind.diagnose(params, slip.part, answer)).toBe(slip.pattern);
  }
}
