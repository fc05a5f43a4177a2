// Zod pieces every calculator schema shares, so forms and the API read lengths alike.
//
// Example:
//
//   const spacingSchema = z
//     .object({ unit: unitSchema, denominator: denominatorSchema, span: measureInput, memberWidth: measureInput })
//     .transform((raw, ctx) => {
//       const span = readMeasure(ctx, raw.span, raw.unit, ["span"], { label: "Span", positive: true });
//       const memberWidth = readMeasure(ctx, raw.memberWidth, raw.unit, ["memberWidth"], { label: "Member width", positive: true });
//       if (span === null || memberWidth === null) return z.NEVER;
//       return { unit: raw.unit, denominator: raw.denominator, span, memberWidth };
//     });
//
//   spacingSchema.safeParse({ span: "96", memberWidth: "1 1/2" }) // → span 96", width 3/2", unit "in", 16ths
import { z } from "zod";
import { DENOMINATORS, Fraction, fromMillimetres, type Denominator, type Unit } from "./core";
import { exactFromNumber, formatMeasure, MAX_MEASURE_LENGTH, parseMeasure } from "./measure";

export const unitSchema = z.enum(["in", "mm"], { error: 'Unit must be "in" (inches) or "mm" (millimetres).' }).default("in");

const DENOMINATOR_MESSAGE = "Round to halves, quarters, eighths, sixteenths, 32nds or 64ths: 2, 4, 8, 16, 32 or 64.";

/** 2, 4, 8, 16, 32 or 64 (default 16); a numeric string from a URL is accepted too. */
export const denominatorSchema = z
  .union([z.number(), z.string()], { error: DENOMINATOR_MESSAGE })
  .transform((raw, ctx): Denominator => {
    const n = typeof raw === "number" ? raw : /^\s*\d{1,2}\s*$/.test(raw) ? Number(raw) : NaN;
    const found = DENOMINATORS.find((d) => d === n);
    if (found === undefined) {
      ctx.addIssue({ code: "custom", message: DENOMINATOR_MESSAGE });
      return z.NEVER;
    }
    return found;
  })
  .default(16);

/** A length as typed (tape notation) or as a number in the chosen unit. */
export const measureInput = z.union([z.string().max(MAX_MEASURE_LENGTH, "That is too long to be a length."), z.number()], {
  error: (issue) =>
    issue.input === undefined || issue.input === null
      ? "Enter a length."
      : typeof issue.input === "number"
        ? "A length must be a finite number."
        : `A length must be text like 22 3/4 or 1' 10 3/4", or a number; got ${typeof issue.input}.`,
});

export type MeasureRules = { min?: Fraction; max?: Fraction; positive?: boolean; allowZero?: boolean; label?: string };

/**
 * Parses one field (a number is in `unit`), converts it to exact inches and checks the
 * rules (`min`/`max` in inches, both inclusive; `positive` means more than 0; `allowZero:
 * false` rejects 0 only). On failure adds an issue at `path` naming the field by its label
 * and returns null, so the caller returns z.NEVER once every field has been read.
 */
export function readMeasure(
  ctx: z.RefinementCtx,
  raw: string | number,
  unit: Unit,
  path: (string | number)[],
  rules: MeasureRules = {},
): Fraction | null {
  const label = rules.label ?? (typeof path.at(-1) === "string" ? String(path.at(-1)) : "Length");
  const fail = (message: string) => {
    ctx.addIssue({ code: "custom", message, path });
    return null;
  };
  let value: Fraction;
  if (typeof raw === "number") {
    if (!Number.isFinite(raw)) return fail(`${label} must be a finite number.`);
    const exact = exactFromNumber(raw);
    value = unit === "mm" ? fromMillimetres(exact) : exact;
  } else {
    const parsed = parseMeasure(raw, unit);
    if (!parsed.ok) return fail(`${label}: ${lowerFirst(parsed.error.message)}`);
    value = parsed.value;
  }
  const show = (bound: Fraction) => formatMeasure(bound, { unit, denominator: 64, style: "feet-inches", mmDecimals: 1 }).text;
  if (rules.positive && value.compare(0) <= 0) return fail(`${label} must be more than 0.`);
  if (rules.allowZero === false && value.n === 0n) return fail(`${label} cannot be 0.`);
  if (rules.min !== undefined && value.compare(rules.min) < 0) return fail(`${label} must be at least ${show(rules.min)}.`);
  if (rules.max !== undefined && value.compare(rules.max) > 0) return fail(`${label} must be at most ${show(rules.max)}.`);
  return value;
}

function lowerFirst(message: string): string {
  // Keep a leading quote or capitalised unit as written; only soften a sentence's first word.
  return /^[A-Z][a-z]/.test(message) ? message[0].toLowerCase() + message.slice(1) : message;
}
