// Nominal lumber sizes ("2x4") and what they measure once dressed, per the American
// Softwood Lumber Standard PS 20 (Table 3), and board measure for pricing stock.
import { Fraction } from "./core";
import { exactFromNumber } from "./measure";

export type NominalSize = { t: number; w: number };
export type ActualSize = { thickness: Fraction; width: Fraction };
export type Lumber = { nominal: NominalSize; actual: ActualSize };

const f = (n: number, d = 1) => new Fraction(n, d);

/** PS 20 dry dressed thickness by nominal thickness, in inches. */
export const DRY_THICKNESS: Readonly<Record<number, Fraction>> = { 1: f(3, 4), 2: f(3, 2) };

/** PS 20 dry dressed width by nominal width, in inches. */
export const DRY_WIDTH: Readonly<Record<number, Fraction>> = {
  2: f(3, 2),
  3: f(5, 2),
  4: f(7, 2),
  6: f(11, 2),
  8: f(29, 4),
  10: f(37, 4),
  12: f(45, 4),
};

/**
 * Green (unseasoned) dressed sizes, for the note that explains why a green board is
 * fuller: it shrinks to about the dry size as it dries. 1x thickness and every width are
 * PS 20's; the 2x green thickness is taken as the 2" green width (1 9/16"), from memory
 * that PS 20 gives nominal 2 the same size as a thickness and as a width.
 */
export const GREEN_THICKNESS: Readonly<Record<number, Fraction>> = { 1: f(25, 32), 2: f(25, 16) };
export const GREEN_WIDTH: Readonly<Record<number, Fraction>> = {
  2: f(25, 16),
  3: f(41, 16),
  4: f(57, 16),
  6: f(45, 8),
  8: f(15, 2),
  10: f(19, 2),
  12: f(23, 2),
};

export type SizeRow = { nominal: number; dry: Fraction; green: Fraction };

function rows(dry: Readonly<Record<number, Fraction>>, green: Readonly<Record<number, Fraction>>): SizeRow[] {
  return Object.keys(dry).map((key) => ({ nominal: Number(key), dry: dry[Number(key)], green: green[Number(key)] }));
}

/** The dry-versus-green table, thicknesses and widths in nominal order, for the lesson note. */
export const LUMBER_SIZE_TABLE = {
  thickness: rows(DRY_THICKNESS, GREEN_THICKNESS),
  width: rows(DRY_WIDTH, GREEN_WIDTH),
} as const;

const NOMINAL = /^\s*(\d{1,2})\s*[x×X]\s*(\d{1,2})\s*$/;

function lookup(table: Readonly<Record<number, Fraction>>, key: number): Fraction | undefined {
  return Object.hasOwn(table, key) ? table[key] : undefined;
}

/** The dry dressed size of a nominal size, or null when PS 20's table here has no row for it. */
export function actualSize(nominal: NominalSize): ActualSize | null {
  const thickness = lookup(DRY_THICKNESS, nominal.t);
  const width = lookup(DRY_WIDTH, nominal.w);
  return thickness && width ? { thickness, width } : null;
}

/** Reads `1x4`, `1 x 4`, `2X6` or `1×4`; null when it is not a size in the table. */
export function parseNominal(text: string): Lumber | null {
  const value = String(text);
  const match = value.length <= 16 ? NOMINAL.exec(value) : null;
  if (!match) return null;
  const nominal = { t: Number(match[1]), w: Number(match[2]) };
  const actual = actualSize(nominal);
  return actual ? { nominal, actual } : null;
}

export type BoardFeetInput = {
  nominalThickness: number | Fraction;
  nominalWidth: number | Fraction;
  lengthFeet: number | Fraction;
};

/**
 * Board feet by the board-measure rule: thickness (in) × width (in) × length (ft) / 12,
 * on nominal sizes, with stock under 1" thick counted as 1" (one board foot is 144 cubic
 * inches). Exact; a 14' 2x4 is 9 1/3 board feet.
 */
export function boardFeet({ nominalThickness, nominalWidth, lengthFeet }: BoardFeetInput): Fraction {
  const [t, w, l] = [nominalThickness, nominalWidth, lengthFeet].map((x) => (typeof x === "number" ? exactFromNumber(x) : x));
  if (t.compare(0) <= 0 || w.compare(0) <= 0 || l.compare(0) < 0) {
    throw new RangeError("board feet need a positive thickness and width and a length of 0 or more");
  }
  const countedThickness = t.compare(1) < 0 ? new Fraction(1) : t;
  return countedThickness.mul(w).mul(l).div(12);
}
