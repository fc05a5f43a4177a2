// Shared pieces of the spacing, marking, guard and wall-grid kinds: stock sizes, spans drawn
// per level, words for counts, the slip table every kind diagnoses from, and the wall's drawing.
import { actualSize, Fraction, wallGrid, type WallGridResult } from "@/lib/layout";
import { inchText, matchesSlip, precisionFor, roundingSlip } from "./kit";
import type { ErrorPattern } from "./patterns";
import type { Random } from "./random";
import { wallSketch } from "./schematic-figures";
import type { Level, LevelInfo, ProblemFigure } from "./types";

export type Nominal = "1x2" | "1x3" | "1x4" | "1x6" | "1x8" | "2x2";

function parseNominal(nominal: Nominal): { t: number; w: number } {
  const [t, w] = nominal.split("x").map(Number);
  return { t, w };
}

/** The dressed face width of a board laid flat (PS 20 through the engine's table). */
export function faceWidth(nominal: Nominal): Fraction {
  const size = actualSize(parseNominal(nominal));
  if (!size) throw new RangeError(`no dressed size for ${nominal}`);
  return size.width;
}

/** The width in the board's name, the number a student wrongly uses for the nominal-for-actual slip. */
export function nominalWidth(nominal: Nominal): Fraction {
  return new Fraction(parseNominal(nominal).w);
}

/** Finer tape readings at higher levels: whole inches, then sixteenths, then thirty-seconds. */
export function spanDenominator(level: Level): number {
  return level === 1 ? 1 : level === 2 ? 16 : 32;
}

/** A length from `min` to `max` inches; above level 1 it always carries an awkward fraction. */
export function drawLength(random: Random, level: Level, min: number, max: number): Fraction {
  const whole = random.int(min, max - 1);
  const den = spanDenominator(level);
  if (den === 1) return new Fraction(whole);
  // Odd numerators only, so the fraction never reduces to a round half or quarter.
  const k = 2 * random.int(0, den / 2 - 1) + 1;
  return new Fraction(whole * den + k, den);
}

/** How a length is written in a prompt: feet and inches at level 3, inches below. */
export function givenText(value: Fraction, level: Level): string {
  return inchText(value, level === 3 ? "feet-inches" : "inches");
}

/** "a" or "an" before a written length: an 8' wall, an 11' wall, an 84" wall, a 96" wall. */
export function article(text: string): "a" | "an" {
  return /^(8|11|18|8\d)(?!\d)/.test(text) ? "an" : "a";
}

const WORDS = ["zero", "one", "two", "three", "four", "five", "six", "seven", "eight", "nine", "ten", "eleven", "twelve", "thirteen", "fourteen", "fifteen", "sixteen", "seventeen", "eighteen", "nineteen", "twenty"];
const ORDINALS = ["zeroth", "first", "second", "third", "fourth", "fifth", "sixth", "seventh", "eighth", "ninth", "tenth", "eleventh", "twelfth", "thirteenth", "fourteenth", "fifteenth", "sixteenth", "seventeenth", "eighteenth", "nineteenth", "twentieth"];

export function countWord(n: number): string {
  return WORDS[n] ?? String(n);
}

export function ordinalWord(n: number): string {
  return ORDINALS[n] ?? `${n}th`;
}

/** Up to 20 the words; the test for hidden answers reads both forms. */
export const NUMBER_WORDS: readonly string[] = WORDS;

export function levelInfo(descriptions: [string, string, string]): readonly LevelInfo[] {
  return [
    { level: 1, label: "Eighths", description: descriptions[0] },
    { level: 2, label: "Sixteenths", description: descriptions[1] },
    { level: 3, label: "Thirty-seconds", description: descriptions[2] },
  ];
}

/** Draws until `draw` returns a value; the same Random keeps the re-draws deterministic. */
export function redraw<T>(draw: () => T | null, tries = 2000): T {
  for (let i = 0; i < tries; i++) {
    const value = draw();
    if (value !== null) return value;
  }
  throw new Error("no unambiguous problem found; widen the generator's ranges");
}

/** What a modelled slip makes of one part. */
export type Slip = { part: string; pattern: ErrorPattern; value: Fraction };

/**
 * A slip is only worth modelling when it lands at least two graduations from the right value
 * (so the right answer and its neighbouring graduation, rounded the wrong way, never read as
 * the slip) and more than one graduation from every other slip of the same part (so each
 * slip's own rounding is nearest to that slip). `precision` is 1 for counts: distinct whole
 * numbers are always told apart.
 */
export function slipsAreClear(slips: readonly Slip[], exact: Record<string, Fraction>, precisionOf: (part: string) => number): boolean {
  for (const [i, slip] of slips.entries()) {
    const p = precisionOf(slip.part);
    const fromRight = p === 1 ? new Fraction(1) : new Fraction(2, p);
    if (slip.value.sub(exact[slip.part]).abs().compare(fromRight) < 0) return false;
    for (const other of slips.slice(i + 1)) {
      if (other.part !== slip.part || other.pattern === slip.pattern) continue;
      const apart = other.value.sub(slip.value).abs();
      if (p === 1 ? apart.compare(1) < 0 : apart.compare(new Fraction(1, p)) <= 0) return false;
    }
  }
  return true;
}

/**
 * True when a rounded answer would read the same as a length the prompt gives (a gap that
 * rounds to the batten width, say): the student could copy it, so the generator re-draws.
 */
export function echoesGiven(answers: readonly Fraction[], given: readonly Fraction[]): boolean {
  return answers.some((a) => given.some((g) => a.equals(g)));
}

/** The modelled slip that gives this answer, else a rounding slip, else null. */
export function diagnoseFrom(slips: readonly Slip[], part: string, exact: Fraction, precision: number, answer: Fraction): ErrorPattern | null {
  // Nearest first: two slips of a part may both lie within a graduation of the answer.
  let best: { pattern: ErrorPattern; distance: Fraction } | null = null;
  for (const slip of slips) {
    if (slip.part !== part || !matchesSlip(slip.value, precision, answer)) continue;
    const distance = slip.value.sub(answer).abs();
    if (!best || distance.compare(best.distance) < 0) best = { pattern: slip.pattern, distance };
  }
  if (best) return best.pattern;
  return precision === 1 ? null : roundingSlip(exact, precision, answer);
}

/** TeX for an exact length whatever its denominator, e.g. `16\tfrac{3}{14}''`. */
export function exactTex(value: Fraction, unit = "''"): string {
  const negative = value.s < 0n;
  const num = negative ? -value.n : value.n;
  const whole = num / value.d;
  const rest = num % value.d;
  const frac = rest === 0n ? "" : `\\tfrac{${rest}}{${value.d}}`;
  return `${negative ? "-" : ""}${whole === 0n && frac ? "" : whole}${frac}${unit}`;
}

/** "to the nearest 1/16"" */
export function nearestText(precision: number): string {
  return `to the nearest 1/${precision}"`;
}

/** A board-and-batten or grid wall as the wall-grid kinds describe it. */
export type WallParams = {
  level: Level;
  wallWidth: Fraction;
  wallHeight: Fraction;
  topRail: Nominal;
  bottomRail: Nominal;
  /** Height of the base trim the bottom rail sits on. */
  baseTrim: Fraction;
  vertical: Nominal;
  verticalCount: number;
  /** Rows of horizontal rails between the top and bottom rails. */
  rows: number;
};

/** 8', 10', 12' and 16' boards, and a full-kerf blade: the shop the cut list assumes. */
const WALL_STOCK = [96, 120, 144, 192].map((length) => ({ length: new Fraction(length) }));
const grids = new WeakMap<WallParams, WallGridResult>();

/** The engine's layout of the wall, kept per params object: the grid's cut list is not free. */
export function gridFor(p: WallParams): WallGridResult {
  let grid = grids.get(p);
  if (!grid) {
    grid = wallGrid({
      wallWidth: p.wallWidth,
      wallHeight: p.wallHeight,
      topRailWidth: faceWidth(p.topRail),
      bottomRailWidth: faceWidth(p.bottomRail),
      baseTrimHeight: p.baseTrim,
      verticalWidth: faceWidth(p.vertical),
      verticalCount: p.verticalCount,
      rows: p.rows,
      stock: WALL_STOCK,
      kerf: new Fraction(1, 8),
      denominator: precisionFor(p.level),
    });
    grids.set(p, grid);
  }
  return grid;
}

/** The wall's sketch; `answers` are the lengths it must not let anyone measure off it. */
export function wallFigureFor(p: WallParams, description: string, ask: { vertical?: boolean; bay?: boolean }, answers: readonly number[]): ProblemFigure {
  return wallSketch({
    description,
    wallWidth: p.wallWidth,
    wallHeight: p.wallHeight,
    hasBaseTrim: p.baseTrim.compare(0) > 0,
    verticals: p.verticalCount,
    rows: p.rows,
    widthLabel: givenText(p.wallWidth, p.level),
    askVertical: ask.vertical,
    askBay: ask.bay,
    answers,
  });
}
