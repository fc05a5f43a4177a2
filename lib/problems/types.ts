// What a problem kind is. Every kind is pure (the layout engine and the seeded generator only):
// the browser never runs `solve`, the grader on the server does.
import type { Fraction } from "@/lib/layout";
import type { ErrorPattern } from "./patterns";

/** Skills are what mastery is kept per; they match the lessons' `skill` metadata. */
export type Skill = "tape-reading" | "fractions" | "lumber" | "even-spacing" | "marking" | "wall-grid" | "cut-list" | "guards" | "stairs";

export type Level = 1 | 2 | 3;
export const LEVELS: readonly Level[] = [1, 2, 3];

export type LevelInfo = { level: Level; label: string; description: string };

/**
 * One answer box. `length` answers are read with parseMeasure (tape notation) and expected to
 * the nearest 1/`precision`; `count` answers are whole numbers (members, spaces, risers,
 * boards); `number` answers are plain numbers read to 1/`precision` (board feet).
 */
export type ProblemPart = {
  key: string;
  label: string;
  answer: "length" | "count" | "number";
  /** Denominator asked: 8, 16 or 32 for lengths; for numbers, e.g. 4 = to the nearest quarter. Ignored for counts. */
  precision: number;
  /** How the worked solution prints the length: plain inches or feet and inches. */
  style?: "inches" | "feet-inches";
  /** Accepted error either way; the default is half of 1/precision (zero for counts). */
  tolerance?: Fraction;
};

/**
 * A simple elevation for the prompt. Drawing units are inches only for a drawing that is the
 * question itself (a tape to read); the others are sketches, `schematic`, shown as not to scale.
 */
export type ProblemFigure = {
  /** The drawing's text for screen readers. */
  description: string;
  /** Proportions are made up so that nothing can be measured off the drawing. */
  schematic?: boolean;
  width: number;
  height: number;
  rects: { x: number; y: number; w: number; h: number; tone: "member" | "rail" | "trim" | "stud" | "stock" | "post" | "tread" | "highlight"; label?: string }[];
  /** Horizontal dimension strings at height y (y grows downward); a "?" label marks what is asked. */
  dimensions: { x1: number; x2: number; y: number; label: string }[];
};

/**
 * The prompt. `text` is plain sentences in which `$…$` is KaTeX math (rendered on the server);
 * paragraphs are separated by a blank line. It never contains an answer.
 */
export type ProblemPrompt = { text: string; figure?: ProblemFigure };

/** One numbered step of the worked solution; the same `$…$` math convention as the prompt. */
export type SolutionStep = string;

export type ProblemKind<P = unknown> = {
  key: string;
  skill: Skill;
  title: string;
  /** One sentence for the practice menu. */
  summary: string;
  levels: readonly LevelInfo[];
  /** The lesson that teaches it: /lessons/{slug}#{section}. */
  lesson: { slug: string; section?: string };
  /** Same seed and level → same parameters, always. Parameters are plain data (Fractions allowed). */
  generate(seed: number, level: Level): P;
  render(params: P): ProblemPrompt;
  parts(params: P): ProblemPart[];
  /** The expected value of every part, computed by lib/layout — never by a second formula. */
  solve(params: P): Record<string, Fraction>;
  /** The slip that produces this wrong answer, or null when it is none the kind models. */
  diagnose(params: P, part: string, answer: Fraction): ErrorPattern | null;
  explain(params: P): SolutionStep[];
};

/** The erased type the registry and the grader hold: params are opaque to them. */
export type AnyProblemKind = ProblemKind<any>; // eslint-disable-line @typescript-eslint/no-explicit-any
