// Grading one answer box: read the student's text, compare it with the exact expected value,
// and name the slip. Pure, so the unit tests and the benchmark run it without a server; the
// API is the only caller that ever holds expected values next to a student.
import { Fraction } from "@/lib/layout/core";
import { formatMeasure, parseMeasure } from "@/lib/layout/measure";
import { ERROR_PATTERNS, type ErrorPattern } from "@/lib/problems/patterns";
import { roundingSlip } from "@/lib/problems/kit";
import type { ProblemPart } from "@/lib/problems/types";

export type Verdict = "correct" | "imprecise" | "incorrect";
export const VERDICTS: readonly Verdict[] = ["correct", "imprecise", "incorrect"];

export type ReadResult = { ok: true; value: Fraction; readAs: string } | { ok: false; message: string };

export type PartGrade = {
  verdict: Verdict;
  value: Fraction;
  readAs: string;
  pattern: ErrorPattern | null;
  message: string;
};

const UNIT_MARKS = /['"′″]|\b(?:ft|feet|foot|in|inch|inches|mm|cm|m)\b/i;

export function precisionText(precision: number): string {
  return precision === 1 ? "the nearest whole number" : `the nearest 1/${precision}`;
}

/** Reads an answer box. Unreadable text is not an attempt: the message says what to fix. */
export function readAnswer(part: ProblemPart, raw: string): ReadResult {
  const text = raw.trim();
  if (text === "") return { ok: false, message: "Enter an answer." };
  if (part.answer === "count") {
    if (!/^\d{1,6}$/.test(text)) return { ok: false, message: `Enter a whole number, like 12 — "${text.slice(0, 20)}" is not one.` };
    return { ok: true, value: new Fraction(Number(text)), readAs: text };
  }
  if (part.answer === "number" && UNIT_MARKS.test(text)) return { ok: false, message: "Enter a plain number, like 9 1/3 or 9.33, without units." };
  const parsed = parseMeasure(text, "in");
  if (!parsed.ok) return { ok: false, message: parsed.error.message };
  const readAs = part.answer === "number" ? numberText(parsed.value) : formatMeasure(parsed.value, { denominator: 64, style: part.style ?? "inches" }).text;
  return { ok: true, value: parsed.value, readAs };
}

function numberText(value: Fraction): string {
  const whole = value.floor();
  const rest = value.sub(whole);
  if (rest.equals(0)) return whole.toString();
  return whole.equals(0) ? rest.toFraction() : `${whole.toString()} ${rest.toFraction()}`;
}

export function toleranceOf(part: ProblemPart): Fraction {
  if (part.tolerance) return part.tolerance;
  return part.answer === "count" ? new Fraction(0) : new Fraction(1, 2 * part.precision);
}

/**
 * Correct within the tolerance (half a graduation unless the part says otherwise); imprecise
 * when within one graduation of the asked precision, or exactly a rounding slip; otherwise
 * incorrect. The slip is named by the kind's own diagnosis first, then the generic rounding check.
 */
export function gradeValue(part: ProblemPart, expected: Fraction, value: Fraction, readAs: string, diagnose: (answer: Fraction) => ErrorPattern | null): PartGrade {
  const off = value.sub(expected).abs();
  if (off.compare(toleranceOf(part)) <= 0) return { verdict: "correct", value, readAs, pattern: null, message: `Right: ${readAs}.` };
  const pattern = diagnose(value) ?? (part.answer === "count" ? null : roundingSlip(expected, part.precision, value));
  const close = part.answer !== "count" && (off.compare(new Fraction(1, part.precision)) <= 0 || pattern === "rounded-wrong-way" || pattern === "wrong-precision");
  const verdict: Verdict = close ? "imprecise" : "incorrect";
  const precisionNote = part.answer === "length" ? `to ${precisionText(part.precision)}"` : `to ${precisionText(part.precision)}`;
  const message = pattern
    ? `${verdict === "imprecise" ? `Close, but not ${precisionNote}. ` : ""}${ERROR_PATTERNS[pattern].feedback}`
    : verdict === "imprecise"
      ? `Close, but not ${precisionNote}. Work the exact value, then round once.`
      : "Work it again one step at a time, from the numbers in the question.";
  return { verdict, value, readAs, pattern, message };
}

export function gradeAnswer(part: ProblemPart, expected: Fraction, raw: string, diagnose: (answer: Fraction) => ErrorPattern | null): PartGrade | { verdict: null; message: string } {
  const read = readAnswer(part, raw);
  if (!read.ok) return { verdict: null, message: read.message };
  return gradeValue(part, expected, read.value, read.readAs, diagnose);
}
