// The cut length of a vertical batten in a board-and-batten wall: the wall height less the
// base trim, the bottom rail sitting on it and the top rail. Above level 1 the rails are
// named by nominal size only, so the student has to know what a 1x4 really measures.
import { Fraction } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "./kit";
import { createRandom } from "./random";
import {
  diagnoseFrom,
  drawLength,
  echoesGiven,
  faceWidth,
  givenText,
  gridFor,
  levelInfo,
  nearestText,
  nominalWidth,
  redraw,
  slipsAreClear,
  wallFigureFor,
  type Nominal,
  type Slip,
  type WallParams,
} from "./spacing-figures";
import { lengthAnswers } from "./schematic-figures";
import type { Level, ProblemKind, ProblemPart } from "./types";

export type BattenLengthParams = WallParams;

/** Common base trim heights (colonial and ranch profiles): common practice, no source. */
const BASE_TRIM = [new Fraction(13, 4), new Fraction(7, 2), new Fraction(4), new Fraction(17, 4), new Fraction(21, 4)];
const HEIGHT: Record<Level, [number, number]> = { 1: [90, 120], 2: [90, 120], 3: [96, 144] };

function parts(p: BattenLengthParams): ProblemPart[] {
  const precision = precisionFor(p.level);
  return [
    { key: "deduction", label: "Total deduction (base trim and both rails)", answer: "length", precision },
    { key: "cut", label: "Vertical cut length", answer: "length", precision },
  ];
}

function solve(p: BattenLengthParams): Record<string, Fraction> {
  const cut = gridFor(p).verticalLength.exact;
  return { deduction: p.wallHeight.sub(cut), cut };
}

/** The wall height a student gets by taking a foot as 10 inches. */
function tenInchFeet(height: Fraction): Fraction {
  const feet = height.div(12).floor();
  return feet.mul(10).add(height.sub(feet.mul(12)));
}

export function battenLengthSlips(p: BattenLengthParams): Slip[] {
  const { deduction, cut } = solve(p);
  const top = faceWidth(p.topRail);
  const bottom = faceWidth(p.bottomRail);
  const nominalExtra = (rails: Nominal[]) => rails.reduce((sum, rail) => sum.add(nominalWidth(rail).sub(faceWidth(rail))), new Fraction(0));
  const slips: Slip[] = [];
  // Each deduction left out, one at a time: the base trim is the classic one.
  for (const left of [p.baseTrim, bottom, top]) {
    slips.push({ part: "deduction", pattern: "forgot-trim-deduction", value: deduction.sub(left) });
    slips.push({ part: "cut", pattern: "forgot-trim-deduction", value: cut.add(left) });
  }
  for (const rails of [[p.topRail], [p.bottomRail], [p.topRail, p.bottomRail]]) {
    slips.push({ part: "deduction", pattern: "nominal-for-actual", value: deduction.add(nominalExtra(rails)) });
    slips.push({ part: "cut", pattern: "nominal-for-actual", value: cut.sub(nominalExtra(rails)) });
  }
  if (p.level === 3) slips.push({ part: "cut", pattern: "feet-inches-mixup", value: tenInchFeet(p.wallHeight).sub(deduction) });
  return slips;
}

function generate(seed: number, level: Level): BattenLengthParams {
  const random = createRandom(seed);
  return redraw(() => {
    const wallWidth = new Fraction(random.int(72, 192));
    const vertical = random.pick(["1x2", "1x3", "1x4"] as const);
    const pitch = faceWidth(vertical).add(random.pick([16, 18, 20, 24]));
    const p: BattenLengthParams = {
      level,
      wallWidth,
      wallHeight: drawLength(random, level, ...HEIGHT[level]),
      topRail: random.pick(["1x4", "1x6", "1x8"] as const),
      bottomRail: random.pick(["1x3", "1x4", "1x6"] as const),
      baseTrim: random.pick(BASE_TRIM),
      vertical,
      // Roughly the chosen bay; the question is about height, so the count only shapes the drawing.
      verticalCount: Math.max(3, Math.round(Number(wallWidth.div(pitch).valueOf())) + 1),
      rows: 0,
    };
    const s = solve(p);
    const precision = precisionFor(level);
    const given = [p.wallWidth, p.wallHeight, p.baseTrim, faceWidth(p.topRail), faceWidth(p.bottomRail), faceWidth(p.vertical)];
    if (echoesGiven([s.deduction, s.cut].map((v) => roundedAnswer(v, precision)), given)) return null;
    return slipsAreClear(battenLengthSlips(p), s, () => precision) ? p : null;
  });
}

function railText(p: BattenLengthParams, nominal: Nominal): string {
  return p.level === 1 ? `${nominal} (${inchText(faceWidth(nominal))} wide)` : nominal;
}

function render(p: BattenLengthParams) {
  const height = givenText(p.wallHeight, p.level);
  const text =
    `A board-and-batten wall is ${givenText(p.wallWidth, p.level)} wide and ${height} from the floor to the ceiling. ` +
    `The existing base trim, ${inchText(p.baseTrim)} tall, stays on the wall. A ${railText(p, p.bottomRail)} bottom rail sits on top of the base trim, ` +
    `a ${railText(p, p.topRail)} top rail runs along the ceiling, and ${p.vertical} vertical battens stand between the two rails.` +
    `${p.level === 1 ? "" : " The rails are dressed lumber."}\n\n` +
    `What is the total height taken by the base trim and the two rails, and what is the cut length of each vertical, ${nearestText(precisionFor(p.level))}?`;
  return {
    text,
    figure: wallFigureFor(p, `A wall ${height} tall with base trim, a bottom rail and a top rail; the length of the verticals between the rails is asked.`, { vertical: true }, lengthAnswers(parts(p), solve(p))),
  };
}

function explain(p: BattenLengthParams): string[] {
  const { deduction, cut } = solve(p);
  const precision = precisionFor(p.level);
  const top = faceWidth(p.topRail);
  const bottom = faceWidth(p.bottomRail);
  const feet = p.wallHeight.div(12).floor();
  return [
    ...(p.level === 3 ? [`Convert the height to inches, 12 to the foot: $${feet} \\times 12 + ${inchTex(p.wallHeight.sub(feet.mul(12)))} = ${inchTex(p.wallHeight)}$.`] : []),
    `Use actual sizes: a ${p.topRail} is ${inchText(top)} wide and a ${p.bottomRail} is ${inchText(bottom)} wide, not ${inchText(nominalWidth(p.topRail))} and ${inchText(nominalWidth(p.bottomRail))}.`,
    `Total deduction: base trim + bottom rail + top rail $= ${inchTex(p.baseTrim)} + ${inchTex(bottom)} + ${inchTex(top)} = ${inchTex(deduction)}$.`,
    `Vertical cut length: $${inchTex(p.wallHeight)} - ${inchTex(deduction)} = ${inchTex(cut)}$.`,
    `Answer ${nearestText(precision)}: deduction ${inchText(roundedAnswer(deduction, precision))}, verticals ${inchText(roundedAnswer(cut, precision))}.`,
  ];
}

export const battenLength: ProblemKind<BattenLengthParams> = {
  key: "batten-length",
  skill: "wall-grid",
  title: "Vertical batten cut length",
  summary: "Find how long to cut the verticals of a board-and-batten wall between the rails, above the base trim.",
  levels: levelInfo([
    "Heights in whole inches, actual rail sizes given, answers to 1/8\".",
    "Awkward heights to 1/16\", rails named by nominal size, answers to 1/16\".",
    "Heights in feet and inches, rails by nominal size, answers to 1/32\".",
  ]),
  lesson: { slug: "board-and-batten-wall", section: "the-vertical-cut-length" },
  generate,
  render,
  parts,
  solve,
  diagnose: (p, part, answer) => {
    const exact = solve(p)[part];
    return exact ? diagnoseFrom(battenLengthSlips(p), part, exact, precisionFor(p.level), answer) : null;
  },
  explain,
};
