// What each section of the fraction bench shows, worked out from the typed text by the
// layout engine. Pure functions, shared by the sections on screen and the printed sheet.
import { z } from "zod";
import { Fraction, roundTo, toMillimetres, type Denominator, type Unit } from "@/lib/layout/core";
import { evaluateMeasureExpression } from "@/lib/layout/expression";
import { boardFeet, parseNominal, type Lumber } from "@/lib/layout/lumber";
import { formatMeasure, parseMeasure, type MeasureStyle } from "@/lib/layout/measure";
import { denominatorSchema, unitSchema } from "@/lib/layout/schema";

export type FractionBenchValues = {
  unit: string;
  denominator: string;
  style: string; // "inches" | "feet-inches"
  expr: string;
  decimal: string;
  fraction: string;
  metric: string;
  round: string;
  tape: string;
  seed: string; // the tape practice's target seed; empty when not practising
  nominal: string;
  boardLength: string;
};

// Bench examples: the division from a span of 96" with three 1 1/2" members, a decimal from a
// phone calculator, and the demo hallway wall's gap (demo example): 141 1/2" with eight 1x4
// battens (3 1/2" actual, PS 20) leaves 113 1/2" for 7 gaps.
export const FRACTION_BENCH_DEFAULTS: FractionBenchValues = {
  unit: "in",
  denominator: "16",
  style: "inches",
  expr: "(96 - 3 × 1 1/2) ÷ 4",
  decimal: "22.78125",
  fraction: "22 3/4",
  metric: '3 1/2"',
  round: "113 1/2 ÷ 7",
  tape: "22",
  seed: "",
  nominal: "1x4",
  boardLength: "8'",
};

export type BenchDisplay = { unit: Unit; denominator: Denominator; style: MeasureStyle };

// Each setting falls back on its own, so one bad value in a shared link spoils nothing else.
const settingsSchema = z.object({
  unit: unitSchema.catch("in"),
  denominator: denominatorSchema.catch(16),
  style: z.enum(["inches", "feet-inches"]).catch("inches"),
});

export function benchDisplay(values: FractionBenchValues): BenchDisplay {
  return settingsSchema.parse(values);
}

/** What could not be read, and where (a 0-based index into the typed text) when known. */
export type Problem = { message: string; index?: number };

/** Exact decimals as typed on a calculator; a repeating one is cut at `places` and ends in "…". */
export function decimalText(value: Fraction, places = 6): string {
  const sign = value.s < 0n && value.n !== 0n ? "-" : "";
  const fixed = (q: bigint, p: number) => {
    const digits = q.toString().padStart(p + 1, "0");
    return p === 0 ? digits : `${digits.slice(0, -p)}.${digits.slice(-p)}`;
  };
  for (let p = 0; p <= places; p++) {
    const scaled = value.n * 10n ** BigInt(p);
    if (scaled % value.d === 0n) return sign + fixed(scaled / value.d, p);
  }
  const scale = 10n ** BigInt(places);
  const nearest = (2n * value.n * scale + value.d) / (2n * value.d);
  return `${sign}${fixed(nearest, places).replace(/\.?0+$/, "")}…`;
}

const isTapeFraction = (d: bigint) => d <= 1024n && (d & (d - 1n)) === 0n;

/** A rounding error as `+1/32"`; one that is no tape fraction also as a decimal: `−3/112" (−0.0268…")`. */
export function signedInches(error: Fraction): string {
  if (error.n === 0n) return '0"';
  const sign = error.s < 0n ? "−" : "+";
  const size = error.abs();
  const text = `${sign}${size.toFraction(true)}"`;
  return isTapeFraction(size.d) ? text : `${text} (${sign}${decimalText(size, 4)}")`;
}

export function errorWord(error: Fraction): string {
  return error.n === 0n ? "on the graduation" : error.s < 0n ? "the mark is short" : "the mark is long";
}

export type Calculation = { ok: false; problem: Problem } | { ok: true; kind: "length" | "number"; value: Fraction };

export function calculate(text: string, unit: Unit): Calculation {
  const result = evaluateMeasureExpression(text, unit);
  return result.ok ? result : { ok: false, problem: result.error };
}

/** A plain number as a carpenter says it: `27 3/7`, with its decimal. */
export function plainNumberText(value: Fraction): { fraction: string; decimal: string } {
  return { fraction: value.toFraction(true), decimal: decimalText(value) };
}

export type DecimalToFraction =
  | { ok: false; problem: Problem }
  | {
      ok: true;
      value: Fraction;
      text: string;
      error: Fraction;
      /** The Navy Builder manual's way: the decimal part × the denominator, rounded. */
      working: { whole: Fraction; part: Fraction; scaled: Fraction; units: Fraction; tie: boolean } | null;
    };

export function decimalToFraction(text: string, denominator: number): DecimalToFraction {
  const parsed = parseMeasure(text, "in");
  if (!parsed.ok) return { ok: false, problem: parsed.error };
  const value = parsed.value;
  const formatted = formatMeasure(value, { denominator });
  let working: Extract<DecimalToFraction, { ok: true }>["working"] = null;
  if (value.compare(0) >= 0) {
    const whole = value.floor();
    const part = value.sub(whole);
    const scaled = part.mul(denominator);
    const units = formatted.rounded.sub(whole).mul(denominator);
    working = { whole, part, scaled, units, tie: scaled.sub(scaled.floor()).equals(new Fraction(1, 2)) };
  }
  return { ok: true, value, text: formatted.text, error: formatted.error, working };
}

export type Reading = { ok: false; problem: Problem } | { ok: true; value: Fraction };

/** One length in tape notation; bare numbers are in `unit`, a written unit wins. */
export function readLength(text: string, unit: Unit): Reading {
  const parsed = parseMeasure(text, unit);
  return parsed.ok ? parsed : { ok: false, problem: parsed.error };
}

export function millimetresText(inches: Fraction): string {
  return `${decimalText(toMillimetres(inches), 4)} mm`;
}

export type RoundingRow = {
  denominator: 8 | 16 | 32;
  below: Fraction;
  above: Fraction;
  rounded: Fraction;
  error: Fraction;
  /** Exactly midway between two graduations: where the half rule decides. */
  tie: boolean;
};

export type RoundingLadder = { ok: false; problem: Problem } | { ok: true; value: Fraction; rows: RoundingRow[] };

/** A length (or a calculation giving one) rounded to 1/8, 1/16 and 1/32, with the graduations either side. */
export function roundingLadder(text: string): RoundingLadder {
  const result = evaluateMeasureExpression(text, "in");
  if (!result.ok) return { ok: false, problem: result.error };
  if (result.kind === "number") {
    return { ok: false, problem: { message: "That is a plain number (a length ÷ a length); give a length to round, like 16 7/32.", index: 0 } };
  }
  const value = result.value;
  const rows = ([8, 16, 32] as const).map((denominator) => {
    const { rounded, error } = roundTo(value, denominator);
    const below = value.mul(denominator).floor().div(denominator);
    const above = value.mul(denominator).ceil().div(denominator);
    const tie = value.sub(below).equals(above.sub(value)) && !below.equals(above);
    return { denominator, below, above, rounded, error, tie };
  });
  return { ok: true, value, rows };
}

export type LumberResult =
  | { ok: false; problems: { nominal?: Problem; length?: Problem } }
  | { ok: true; lumber: Lumber; length: Fraction; boardFeet: Fraction };

export function lumberResult(nominalText: string, lengthText: string, unit: Unit): LumberResult {
  const lumber = parseNominal(nominalText);
  const length = readLength(lengthText, unit);
  const problems: { nominal?: Problem; length?: Problem } = {};
  if (lumber === null) problems.nominal = { message: "Type a nominal size like 1x4 or 2x6: thickness 1 or 2; width 2, 3, 4, 6, 8, 10 or 12." };
  if (!length.ok) problems.length = length.problem;
  else if (length.value.compare(0) < 0) problems.length = { message: "A board's length cannot be less than 0." };
  if (lumber === null || !length.ok || problems.length) return { ok: false, problems };
  const feet = length.value.div(12);
  return { ok: true, lumber, length: length.value, boardFeet: boardFeet({ nominalThickness: lumber.nominal.t, nominalWidth: lumber.nominal.w, lengthFeet: feet }) };
}
