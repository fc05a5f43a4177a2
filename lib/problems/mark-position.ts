// Marking from one end: the left edge and the centre of the n-th member, measured from the
// left end with the tape hooked once. The member asked is always one where adding a rounded
// gap over and over would land visibly off, so that slip shows in the answer.
import { evenSpacing, fewestBalusters, Fraction, GUARD_MAX_OPENING, type EndCondition } from "@/lib/layout";
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
  ordinalWord,
  redraw,
  slipsAreClear,
  type Nominal,
  type Slip,
} from "./spacing-figures";
import { lengthAnswers, spacingSketch } from "./schematic-figures";
import type { Level, ProblemKind, ProblemPart } from "./types";

export type MarkPositionParams = {
  level: Level;
  /** Battens flush at the ends of a wall, or balusters between two posts. */
  endCondition: EndCondition;
  span: Fraction;
  nominal: Nominal;
  count: number;
  /** 1-based from the left end. */
  index: number;
};

const WALL: Record<Level, { span: [number, number]; count: [number, number] }> = {
  1: { span: [72, 144], count: [6, 10] },
  2: { span: [96, 192], count: [7, 12] },
  3: { span: [120, 240], count: [9, 16] },
};
const POSTS: Record<Level, [number, number]> = { 1: [36, 72], 2: [48, 96], 3: [60, 120] };

const layout = (p: MarkPositionParams) =>
  evenSpacing({ span: p.span, memberWidth: faceWidth(p.nominal), count: p.count, endCondition: p.endCondition, denominator: precisionFor(p.level) });

const memberName = (p: MarkPositionParams) => (p.endCondition === "members" ? "batten" : "baluster");

function parts(p: MarkPositionParams): ProblemPart[] {
  const precision = precisionFor(p.level);
  const name = memberName(p);
  return [
    { key: "onCenter", label: "On-centre spacing", answer: "length", precision },
    { key: "edge", label: `Mark for the left edge of ${name} ${p.index}`, answer: "length", precision },
    { key: "centre", label: `Mark for the centre of ${name} ${p.index}`, answer: "length", precision },
  ];
}

type Layout = ReturnType<typeof layout>;

function solve(p: MarkPositionParams, r: Layout = layout(p)): Record<string, Fraction> {
  const member = r.members[p.index - 1];
  return { onCenter: r.onCenter, edge: member.start, centre: member.center };
}

/** Where member n's left edge lands when every step is a gap (exact or rounded) plus a member. */
function edgeFrom(p: MarkPositionParams, gap: Fraction): Fraction {
  const steps = gap.add(faceWidth(p.nominal)).mul(p.index - 1);
  return p.endCondition === "members" ? steps : gap.add(steps);
}

export function markPositionSlips(p: MarkPositionParams, r: Layout = layout(p)): Slip[] {
  const half = r.memberWidth.div(2);
  const { edge, centre } = solve(p, r);
  const byMembers = r.freeSpace.div(r.count);
  const added = edgeFrom(p, r.roundedGap.rounded);
  return [
    { part: "onCenter", pattern: "on-center-for-gap", value: r.gap },
    { part: "onCenter", pattern: "divided-by-members", value: byMembers.add(r.memberWidth) },
    { part: "edge", pattern: "added-rounded-gaps", value: added },
    { part: "edge", pattern: "centre-for-edge", value: centre },
    { part: "edge", pattern: "divided-by-members", value: edgeFrom(p, byMembers) },
    { part: "centre", pattern: "added-rounded-gaps", value: added.add(half) },
    { part: "centre", pattern: "centre-for-edge", value: edge },
    { part: "centre", pattern: "divided-by-members", value: edgeFrom(p, byMembers).add(half) },
  ];
}

// The layout is shared across the candidate members, so a draw lays out the span only once.
const clear = (p: MarkPositionParams, r: Layout) => {
  const s = solve(p, r);
  const precision = precisionFor(p.level);
  const rounded = Object.values(s).map((v) => roundedAnswer(v, precision));
  return !echoesGiven(rounded, [p.span, faceWidth(p.nominal)]) && slipsAreClear(markPositionSlips(p, r), s, () => precision);
};

function generate(seed: number, level: Level): MarkPositionParams {
  const random = createRandom(seed);
  const endCondition: EndCondition = level === 1 || random.chance(2, 3) ? "members" : "gaps";
  return redraw(() => {
    let base: Omit<MarkPositionParams, "index">;
    if (endCondition === "members") {
      const range = WALL[level];
      base = { level, endCondition, span: drawLength(random, level, ...range.span), nominal: random.pick(["1x2", "1x3", "1x4"] as const), count: random.int(...range.count) };
    } else {
      const span = drawLength(random, level, ...POSTS[level]);
      const nominal: Nominal = "2x2";
      base = { level, endCondition, span, nominal, count: fewestBalusters(span, faceWidth(nominal), GUARD_MAX_OPENING) };
    }
    // Past the third member, so the drift of added gaps has room to show.
    const r = layout({ ...base, index: 1 });
    if (endCondition === "members" && (r.gap.compare(4) < 0 || r.gap.compare(30) > 0)) return null;
    const candidates = Array.from({ length: base.count - 2 }, (_, i) => ({ ...base, index: i + 3 })).filter((p) => clear(p, r));
    return candidates.length > 0 ? random.pick(candidates) : null;
  });
}

function render(p: MarkPositionParams) {
  const w = faceWidth(p.nominal);
  const name = memberName(p);
  const span = givenText(p.span, p.level);
  const setup =
    p.endCondition === "members"
      ? `${cap(article(span))} ${span} wall gets ${countWord(p.count)} ${p.nominal} battens (${inchText(w)} wide), one flush at each end of the wall, with equal gaps between them. You hook the tape on the left end of the wall and mark every batten from there.`
      : `${cap(countWord(p.count))} ${p.nominal} balusters (${inchText(w)} square) are spaced evenly between two posts ${span} apart, face to face, with the same opening against each post as between the balusters. You hook the tape on the face of the left post and mark every baluster from there.`;
  const ask = `Give the on-centre spacing, then the marks for the left edge and for the centre of the ${ordinalWord(p.index)} ${name} from the left, each ${nearestText(precisionFor(p.level))}.`;
  return {
    text: `${setup}\n\n${ask}`,
    figure: spacingSketch({
      description: `${cap(countWord(p.count))} ${name}s across ${span}; the distance from the left end to the left edge of the ${ordinalWord(p.index)} ${name} is asked.`,
      span: p.span,
      count: p.count,
      endCondition: p.endCondition,
      spanLabel: span,
      highlight: p.index,
      ask: { toMember: p.index },
      answers: lengthAnswers(parts(p), solve(p)),
    }),
  };
}

function cap(text: string): string {
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function explain(p: MarkPositionParams): string[] {
  const r = layout(p);
  const precision = precisionFor(p.level);
  const { edge, centre } = solve(p);
  const name = memberName(p);
  const steps = p.index - 1;
  const edgeWork =
    p.endCondition === "members"
      ? `$${steps} \\times ${exactTex(r.onCenter)} = ${exactTex(edge)}$`
      : `$${exactTex(r.gap)} + ${steps} \\times ${exactTex(r.onCenter)} = ${exactTex(edge)}$ (the first opening, then ${steps} on-centre steps)`;
  const drift = markPositionSlips(p).find((s) => s.part === "edge" && s.pattern === "added-rounded-gaps")!.value;
  return [
    ...(p.level === 3 ? [`Convert the span to inches: ${span3(p)} $= ${inchTex(p.span)}$.`] : []),
    `Gap: $(${inchTex(r.span)} - ${r.count} \\times ${inchTex(r.memberWidth)}) \\div ${r.spaces} = ${inchTex(r.freeSpace)} \\div ${r.spaces} = ${exactTex(r.gap)}$.`,
    `On-centre spacing: gap plus one ${name}, $${exactTex(r.gap)} + ${inchTex(r.memberWidth)} = ${exactTex(r.onCenter)}$.`,
    `Left edge of ${name} ${p.index}, from the left end: ${edgeWork}.`,
    `Centre of ${name} ${p.index}: half a ${name} further, $${exactTex(edge)} + ${inchTex(r.memberWidth.div(2))} = ${exactTex(centre)}$.`,
    `Round each exact position once. Adding the rounded gap ${inchText(r.roundedGap.rounded)} again and again would put the edge at ${inchText(drift)} instead.`,
    `Rounded ${nearestText(precision)}: on centre ${inchText(roundedAnswer(r.onCenter, precision))}, left edge ${inchText(roundedAnswer(edge, precision))}, centre ${inchText(roundedAnswer(centre, precision))}.`,
  ];
}

const span3 = (p: MarkPositionParams) => givenText(p.span, 3);

export const markPosition: ProblemKind<MarkPositionParams> = {
  key: "mark-position",
  skill: "marking",
  title: "Mark a member from one end",
  summary: "Find the mark for a member's left edge and centre, measured from the left end and rounded once.",
  levels: levelInfo([
    "Round wall widths in inches, marks to 1/8\".",
    "Awkward spans to 1/16\", battens or balusters, marks to 1/16\".",
    "Spans in feet and inches, many members, marks to 1/32\".",
  ]),
  lesson: { slug: "mark-from-one-end", section: "hook-the-tape-once" },
  generate,
  render,
  parts,
  solve,
  diagnose: (p, part, answer) => {
    const exact = solve(p)[part];
    return exact ? diagnoseFrom(markPositionSlips(p), part, exact, precisionFor(p.level), answer) : null;
  },
  explain,
};
