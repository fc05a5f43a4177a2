// The bay of a grid wall: the clear space between verticals flush at both wall ends, which is
// also the cut length of every row rail fitted between them.
import { Fraction } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "./kit";
import { createRandom } from "./random";
import {
  countWord,
  diagnoseFrom,
  drawLength,
  echoesGiven,
  exactTex,
  faceWidth,
  givenText,
  gridFor,
  levelInfo,
  nearestText,
  redraw,
  slipsAreClear,
  wallFigureFor,
  type Slip,
  type WallParams,
} from "./spacing-figures";
import { lengthAnswers } from "./schematic-figures";
import type { Level, ProblemKind, ProblemPart } from "./types";

export type BayRailParams = WallParams;

const RANGE: Record<Level, { width: [number, number]; count: [number, number] }> = {
  1: { width: [72, 144], count: [4, 7] },
  2: { width: [96, 192], count: [5, 10] },
  3: { width: [120, 240], count: [7, 14] },
};

function parts(p: BayRailParams): ProblemPart[] {
  return [
    { key: "bays", label: "Number of bays", answer: "count", precision: 1 },
    { key: "bay", label: "Bay width (row rail cut length)", answer: "length", precision: precisionFor(p.level) },
  ];
}

function solve(p: BayRailParams): Record<string, Fraction> {
  const grid = gridFor(p);
  return { bays: new Fraction(grid.bays.length), bay: grid.verticalLayout.gap };
}

export function bayRailSlips(p: BayRailParams): Slip[] {
  const layout = gridFor(p).verticalLayout;
  return [
    { part: "bays", pattern: "counted-members-not-spaces", value: new Fraction(layout.count) },
    { part: "bay", pattern: "divided-by-members", value: layout.freeSpace.div(layout.count) },
    { part: "bay", pattern: "forgot-member-width", value: layout.span.div(layout.spaces) },
    { part: "bay", pattern: "on-center-for-gap", value: layout.onCenter },
  ];
}

const precisionOf = (p: BayRailParams) => (part: string) => (part === "bays" ? 1 : precisionFor(p.level));

function generate(seed: number, level: Level): BayRailParams {
  const random = createRandom(seed);
  const range = RANGE[level];
  return redraw(() => {
    const p: BayRailParams = {
      level,
      wallWidth: drawLength(random, level, ...range.width),
      wallHeight: new Fraction(random.pick([96, 96, 108, 120])),
      topRail: random.pick(["1x4", "1x6"] as const),
      bottomRail: random.pick(["1x3", "1x4"] as const),
      baseTrim: new Fraction(random.pick([0, 13 / 4, 4])),
      vertical: random.pick(["1x2", "1x3", "1x4"] as const),
      verticalCount: random.int(...range.count),
      rows: random.int(1, 2),
    };
    const bay = gridFor(p).verticalLayout.gap;
    if (bay.compare(8) < 0 || bay.compare(30) > 0) return null;
    const s = solve(p);
    if (echoesGiven([roundedAnswer(s.bay, precisionFor(level))], [p.wallWidth, faceWidth(p.vertical)])) return null;
    return slipsAreClear(bayRailSlips(p), s, precisionOf(p)) ? p : null;
  });
}

function render(p: BayRailParams) {
  const width = givenText(p.wallWidth, p.level);
  const w = faceWidth(p.vertical);
  const rows = p.rows === 1 ? "one row" : `${countWord(p.rows)} rows`;
  const text =
    `A grid wall ${width} wide gets ${countWord(p.verticalCount)} ${p.vertical} verticals (${inchText(w)} wide), one flush at each end of the wall and the rest evenly spaced. ` +
    `Between the verticals, ${rows} of ${p.vertical} horizontal rails divide the wall into panels; each horizontal rail fits between two neighbouring verticals.\n\n` +
    `How many bays are there across the wall, and what is the bay width, which is the cut length of each horizontal rail, ${nearestText(precisionFor(p.level))}?`;
  return {
    text,
    figure: wallFigureFor(p, `A grid wall ${width} wide with verticals flush at both ends and ${rows} of horizontal rails; the width of a bay is asked.`, { bay: true }, lengthAnswers(parts(p), solve(p))),
  };
}

function explain(p: BayRailParams): string[] {
  const layout = gridFor(p).verticalLayout;
  const precision = precisionFor(p.level);
  return [
    ...(p.level === 3 ? [`Convert the width to inches: ${givenText(p.wallWidth, 3)} $= ${inchTex(p.wallWidth)}$.`] : []),
    `Bays: with a vertical flush at each end there is one fewer bay than verticals, $${layout.count} - 1 = ${layout.spaces}$.`,
    `Width taken by the verticals: $${layout.count} \\times ${inchTex(layout.memberWidth)} = ${inchTex(layout.totalMemberWidth)}$; left for the bays: $${inchTex(layout.span)} - ${inchTex(layout.totalMemberWidth)} = ${inchTex(layout.freeSpace)}$.`,
    `Bay: $${inchTex(layout.freeSpace)} \\div ${layout.spaces} = ${exactTex(layout.gap)}$. Every horizontal rail is cut to this length.`,
    `Answer: ${layout.spaces} bays, bay and rail cut length ${inchText(roundedAnswer(layout.gap, precision))} ${nearestText(precision)}.`,
  ];
}

export const bayRail: ProblemKind<BayRailParams> = {
  key: "bay-rail",
  skill: "wall-grid",
  title: "Bay width and rail cut length",
  summary: "Find the bays of a grid wall and the cut length of the horizontal rails between the verticals.",
  levels: levelInfo([
    "Round wall widths in inches, a few verticals, answers to 1/8\".",
    "Awkward widths to 1/16\", more verticals, answers to 1/16\".",
    "Widths in feet and inches, many verticals, answers to 1/32\".",
  ]),
  lesson: { slug: "board-and-batten-wall", section: "choosing-the-bay" },
  generate,
  render,
  parts,
  solve,
  diagnose: (p, part, answer) => {
    const exact = solve(p)[part];
    return exact ? diagnoseFrom(bayRailSlips(p), part, exact, precisionOf(p)(part), answer) : null;
  },
  explain,
};
