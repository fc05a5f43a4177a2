// Shared ground for the layout engine. Pure TypeScript: no React, no database, no Next.
// Every length inside the engine is an exact Fraction of an inch; millimetres are
// converted at the edges (1 in = 25.4 mm exactly, so the conversion stays rational).
import Fraction from "fraction.js";

export { Fraction };

/** An exact length in inches. */
export type Length = Fraction;

export type Unit = "in" | "mm";

/** Warnings are data, never thrown: the calculators show them, the grader ignores them. */
export type Warning = { code: string; message: string };

export const MM_PER_INCH = new Fraction(127, 5);

/** Denominators a tape or a rule is read to; 2…64 in inches. */
export const DENOMINATORS = [2, 4, 8, 16, 32, 64] as const;
export type Denominator = (typeof DENOMINATORS)[number];

export const ZERO = new Fraction(0);

export function inches(value: number | string | Fraction): Fraction {
  return new Fraction(value);
}

export function fromMillimetres(mm: Fraction | number): Fraction {
  return new Fraction(mm).div(MM_PER_INCH);
}

export function toMillimetres(inchesValue: Fraction): Fraction {
  return inchesValue.mul(MM_PER_INCH);
}

export type Rounded = { exact: Fraction; rounded: Fraction; error: Fraction };

/**
 * Nearest multiple of 1/denominator, ties away from zero (a half-sixteenth rounds up on a
 * positive length). `error` is rounded − exact: positive means the mark is long.
 */
export function roundTo(value: Fraction, denominator: number): Rounded {
  if (!Number.isInteger(denominator) || denominator < 1) throw new RangeError(`denominator must be a positive integer, got ${denominator}`);
  // On the magnitude n/d: units = floor(n·den/d + 1/2) = floor((2·n·den + d) / (2·d)), i.e.
  // round half up on the magnitude, which is half away from zero overall. Done in bigint
  // because this runs for every mark of every layout.
  const den = BigInt(denominator);
  const units = (2n * value.n * den + value.d) / (2n * value.d);
  const rounded = new Fraction(value.s < 0n ? -units : units, den);
  return { exact: value, rounded, error: rounded.sub(value) };
}

/** Exact comparison helpers, so call sites read as sentences. */
export const lt = (a: Fraction, b: Fraction) => a.compare(b) < 0;
export const lte = (a: Fraction, b: Fraction) => a.compare(b) <= 0;
export const gt = (a: Fraction, b: Fraction) => a.compare(b) > 0;
export const gte = (a: Fraction, b: Fraction) => a.compare(b) >= 0;
export const eq = (a: Fraction, b: Fraction) => a.equals(b);

/**
 * The nearest double. Fraction's own valueOf divides Number(n) by Number(d), which is NaN once both
 * pass 1e308 (lengths typed or derived to absurdly fine fractions); rounding to 12 decimal places
 * first keeps the number within reach, far finer than any length shown.
 */
export function toNumber(value: Fraction): number {
  const direct = value.valueOf();
  return Number.isNaN(direct) ? value.round(12).valueOf() : direct;
}

export function sum(values: Iterable<Fraction>): Fraction {
  let total = ZERO;
  for (const v of values) total = total.add(v);
  return total;
}
