// Small shared pieces for writing problem kinds: precision by level, measurement text, and the
// rounding slips every kind can show.
import { Fraction, roundTo } from "@/lib/layout/core";
import { formatMeasure } from "@/lib/layout/measure";
import type { ErrorPattern } from "./patterns";
import type { Level as ProblemLevel } from "./types";

/** 1/8" at level 1, 1/16" at level 2, 1/32" at level 3. */
export function precisionFor(level: ProblemLevel): 8 | 16 | 32 {
  return level === 1 ? 8 : level === 2 ? 16 : 32;
}

/** A length as a carpenter writes it, exact when it falls on a 1/64 graduation: `22 3/4"`, `11' 9 1/2"`. */
export function inchText(value: Fraction, style: "inches" | "feet-inches" = "inches", denominator = 64): string {
  return formatMeasure(value, { denominator, style }).text;
}

/** TeX for a length in inches, e.g. `22\tfrac{3}{4}''`, for the `$…$` parts of prompts and steps. */
export function inchTex(value: Fraction, denominator = 64): string {
  const r = roundTo(value, denominator).rounded;
  const negative = r.s < 0n;
  const n = negative ? -r.n : r.n;
  const whole = n / r.d;
  const rest = n % r.d;
  const frac = rest === 0n ? "" : `\\tfrac{${rest}}{${r.d}}`;
  const body = whole === 0n && frac ? frac : `${whole}${frac}`;
  return `${negative ? "-" : ""}${body}''`;
}

/** The nearest graduation to `exact` at the precision asked (half away from zero). */
export function roundedAnswer(exact: Fraction, precision: number): Fraction {
  return roundTo(exact, precision).rounded;
}

/**
 * The rounding slips, judged against the exact value: the other neighbouring graduation
 * (`rounded-wrong-way`), or the value rounded to a coarser denominator (`wrong-precision`).
 * Null when the answer is the right rounding or neither slip.
 */
export function roundingSlip(exact: Fraction, precision: number, answer: Fraction): ErrorPattern | null {
  const right = roundTo(exact, precision).rounded;
  if (answer.equals(right)) return null;
  // A coarser rounding is checked first: the nearest 1/8 is always a neighbouring 1/16 too,
  // and "rounded to eighths" is the more useful thing to tell the student.
  for (let coarser = precision / 2; coarser >= 1 && Number.isInteger(coarser); coarser /= 2) {
    if (answer.equals(roundTo(exact, coarser).rounded)) return "wrong-precision";
  }
  const step = new Fraction(1, precision);
  const floor = exact.div(step).floor().mul(step);
  const ceil = exact.div(step).ceil().mul(step);
  if ((answer.equals(floor) || answer.equals(ceil)) && !floor.equals(ceil)) return "rounded-wrong-way";
  return null;
}

/**
 * True when `answer` equals `candidate` to the precision asked — how a kind recognises that the
 * student's number is what a given slip would have produced (rounded either way).
 */
export function matchesSlip(candidate: Fraction, precision: number, answer: Fraction): boolean {
  // Strictly within one graduation: the candidate rounded either way, but not a graduation further.
  return answer.sub(candidate).abs().compare(new Fraction(1, precision)) < 0;
}
