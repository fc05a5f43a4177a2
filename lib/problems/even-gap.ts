// The clear gap between evenly spaced members, worked the way the trade does it: total member
// width, free space, number of spaces, gap. Both end conditions, because counting the spaces
// is the step students get wrong.
import { evenSpacing, Fraction, type EndCondition } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "./kit";
import { createRandom } from "./random";
import {
  article,
  countWord,
  diagnoseFrom,
  drawLength,
  echoesGiven,
  exactTex,
  faceWidth,
  givenText,
  levelInfo,
  nearestText,
  redraw,
  slipsAreClear,
  type Nominal,
  type Slip,
} from "./spacing-figures";
import { lengthAnswers, spacingSketch } from "./schematic-figures";
import type { Level, ProblemKind, ProblemPart } from "./types";

export type EvenGapParams = {
  level: Level;
  /** A wall has a batten flush at each end; a fence bay has a gap against each post. */
  endCondition: EndCondition;
  span: Fraction;
  nominal: Nominal;
  count: number;
};

type Range = { span: [number, number]; count: [number, number]; gap: [number, number] };
const RANGES: Record<EndCondition, Record<Level, Range>> = {
  members: {
    1: { span: [72, 120], count: [3, 6], gap: [4, 30] },
    2: { span: [84, 180], count: [5, 10], gap: [4, 30] },
    3: { span: [96, 240], count: [8, 16], gap: [4, 30] },
  },
  gaps: {
    1: { span: [36, 72], count: [3, 6], gap: [1, 6] },
    2: { span: [48, 96], count: [4, 10], gap: [1, 6] },
    3: { span: [60, 120], count: [6, 16], gap: [1, 6] },
  },
};
const STOCK: Record<EndCondition, Nominal[]> = { members: ["1x2", "1x3", "1x4"], gaps: ["1x3", "1x4"] };

const layout = (p: EvenGapParams) =>
  evenSpacing({ span: p.span, memberWidth: faceWidth(p.nominal), count: p.count, endCondition: p.endCondition, denominator: precisionFor(p.level) });

const memberName = (p: EvenGapParams) => (p.endCondition === "members" ? "batten" : "picket");

function parts(p: EvenGapParams): ProblemPart[] {
  const precision = precisionFor(p.level);
  const name = memberName(p);
  return [
    { key: "total", label: `Total width of the ${name}s`, answer: "length", precision },
    { key: "free", label: "Free space", answer: "length", precision },
    { key: "spaces", label: "Number of spaces", answer: "count", precision: 1 },
    { key: "gap", label: "Clear gap", answer: "length", precision },
  ];
}

function solve(p: EvenGapParams): Record<string, Fraction> {
  const r = layout(p);
  return { total: r.totalMemberWidth, free: r.freeSpace, spaces: new Fraction(r.spaces), gap: r.gap };
}

/** What each modelled slip makes of the answers. */
export function evenGapSlips(p: EvenGapParams): Slip[] {
  const r = layout(p);
  return [
    { part: "spaces", pattern: "counted-members-not-spaces", value: new Fraction(r.count) },
    { part: "gap", pattern: "divided-by-members", value: r.freeSpace.div(r.count) },
    { part: "gap", pattern: "forgot-member-width", value: r.span.div(r.spaces) },
    { part: "gap", pattern: "on-center-for-gap", value: r.onCenter },
  ];
}

const precisionOf = (p: EvenGapParams) => (part: string) => (part === "spaces" ? 1 : precisionFor(p.level));

function generate(seed: number, level: Level): EvenGapParams {
  const random = createRandom(seed);
  const endCondition: EndCondition = level === 1 ? (random.chance(2, 3) ? "members" : "gaps") : random.pick(["members", "gaps"] as const);
  const range = RANGES[endCondition][level];
  return redraw(() => {
    const p: EvenGapParams = {
      level,
      endCondition,
      span: drawLength(random, level, range.span[0], range.span[1]),
      nominal: random.pick(STOCK[endCondition]),
      count: random.int(range.count[0], range.count[1]),
    };
    const gap = layout(p).gap;
    if (gap.compare(range.gap[0]) < 0 || gap.compare(range.gap[1]) > 0) return null;
    const s = solve(p);
    const rounded = [s.total, s.free, s.gap].map((v) => roundedAnswer(v, precisionFor(level)));
    if (echoesGiven(rounded, [p.span, faceWidth(p.nominal)])) return null;
    return slipsAreClear(evenGapSlips(p), s, precisionOf(p)) ? p : null;
  });
}

function render(p: EvenGapParams) {
  const w = faceWidth(p.nominal);
  const name = memberName(p);
  const setup =
    p.endCondition === "members"
      ? `${cap(article(givenText(p.span, p.level)))} ${givenText(p.span, p.level)} wall gets ${countWord(p.count)} ${p.nominal} battens (${inchText(w)} wide), one flush at each end of the wall, with equal gaps between them.`
      : `${cap(countWord(p.count))} ${p.nominal} pickets (${inchText(w)} wide) go between two fence posts ${givenText(p.span, p.level)} apart, face to face, with the same gap against each post as between the pickets.`;
  const ask = `Work out the total width of the ${name}s, the free space left for gaps, the number of spaces and the clear gap between ${name}s, ${nearestText(precisionFor(p.level))}.`;
  return {
    text: `${setup}\n\n${ask}`,
    figure: spacingSketch({
      description: `${cap(countWord(p.count))} ${name}s across a span of ${givenText(p.span, p.level)}, ${p.endCondition === "members" ? "one flush at each end" : "between two posts"}; the gap between two of them is asked.`,
      span: p.span,
      count: p.count,
      endCondition: p.endCondition,
      spanLabel: givenText(p.span, p.level),
      ask: { gap: true },
      answers: lengthAnswers(parts(p), solve(p)),
    }),
  };
}

function cap(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function explain(p: EvenGapParams): string[] {
  const r = layout(p);
  const precision = precisionFor(p.level);
  const name = memberName(p);
  const spacesWhy = p.endCondition === "members" ? `$${r.count} - 1 = ${r.spaces}$ (a ${name} at each end)` : `$${r.count} + 1 = ${r.spaces}$ (a gap against each post)`;
  return [
    ...(p.level === 3 ? [`Convert the span to inches: ${givenText(p.span, 3)} $= ${inchTex(p.span)}$.`] : []),
    `Total width of the ${name}s: $${r.count} \\times ${inchTex(r.memberWidth)} = ${inchTex(r.totalMemberWidth)}$.`,
    `Free space: $${inchTex(r.span)} - ${inchTex(r.totalMemberWidth)} = ${inchTex(r.freeSpace)}$.`,
    `Number of spaces: ${spacesWhy}. Divide by the spaces, not the ${name}s.`,
    `Gap: $${inchTex(r.freeSpace)} \\div ${r.spaces} = ${exactTex(r.gap)}$.`,
    `Rounded ${nearestText(precision)}: total ${inchText(roundedAnswer(r.totalMemberWidth, precision))}, free space ${inchText(roundedAnswer(r.freeSpace, precision))}, ${r.spaces} spaces, gap ${inchText(roundedAnswer(r.gap, precision))}.`,
  ];
}

export const evenGap: ProblemKind<EvenGapParams> = {
  key: "even-gap",
  skill: "even-spacing",
  title: "The gap between evenly spaced members",
  summary: "Find the clear gap between battens flush at the ends of a wall, or pickets between two posts.",
  levels: levelInfo([
    "Round spans in inches, a few members, answers to 1/8\".",
    "Awkward spans to 1/16\", more members, answers to 1/16\".",
    "Spans in feet and inches, many members, answers to 1/32\".",
  ]),
  lesson: { slug: "even-spacing", section: "the-formula" },
  generate,
  render,
  parts,
  solve,
  diagnose: (p, part, answer) => {
    const exact = solve(p)[part];
    return exact ? diagnoseFrom(evenGapSlips(p), part, exact, precisionOf(p)(part), answer) : null;
  },
  explain,
};
