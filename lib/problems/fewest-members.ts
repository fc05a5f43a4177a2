// The fewest members that keep every gap within a limit: battens on a wall with a chosen
// maximum gap (a gap at the maximum is fine), or guard balusters whose every opening must be
// strictly less than 4" (IRC 2018 R312.1.3). The count always rounds up.
import { evenSpacing, Fraction, GUARD_MAX_OPENING, guardSpacing } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "./kit";
import { createRandom } from "./random";
import {
  article,
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

export type FewestMembersParams = {
  level: Level;
  variant: "battens" | "balusters";
  span: Fraction;
  nominal: Nominal;
  /** The largest gap allowed; for balusters the opening must stay strictly under it. */
  maxGap: Fraction;
};

const WALL: Record<Level, { span: [number, number]; maxGap: number[] }> = {
  1: { span: [72, 144], maxGap: [12, 16, 18, 20, 24] },
  2: { span: [96, 192], maxGap: [10, 12, 14, 16, 18] },
  3: { span: [120, 240], maxGap: [8, 10, 12, 14, 16] },
};
const POSTS: Record<Level, [number, number]> = { 1: [36, 72], 2: [48, 96], 3: [60, 120] };

type Solved = { count: number; spaces: number; gap: Fraction; freeSpace: Fraction; oneFewerGap: Fraction | null; quotient: Fraction };

function layout(p: FewestMembersParams): Solved {
  const w = faceWidth(p.nominal);
  const denominator = precisionFor(p.level);
  if (p.variant === "balusters") {
    const g = guardSpacing({ span: p.span, balusterWidth: w, maxOpening: p.maxGap, denominator });
    return { count: g.count, spaces: g.spaces, gap: g.gap, freeSpace: g.freeSpace, oneFewerGap: g.oneFewer?.opening ?? null, quotient: p.span.sub(p.maxGap).div(w.add(p.maxGap)) };
  }
  const r = evenSpacing({ span: p.span, memberWidth: w, maxGap: p.maxGap, endCondition: "members", denominator });
  const fewer = r.count > 2 ? evenSpacing({ span: p.span, memberWidth: w, count: r.count - 1, endCondition: "members", denominator }).gap : null;
  return { count: r.count, spaces: r.spaces, gap: r.gap, freeSpace: r.freeSpace, oneFewerGap: fewer, quotient: p.span.add(p.maxGap).div(w.add(p.maxGap)) };
}

const memberName = (p: FewestMembersParams) => (p.variant === "battens" ? "batten" : "baluster");

function parts(p: FewestMembersParams): ProblemPart[] {
  return [
    { key: "count", label: `Fewest ${memberName(p)}s`, answer: "count", precision: 1 },
    { key: "gap", label: p.variant === "battens" ? "Gap between battens" : "Opening between balusters", answer: "length", precision: precisionFor(p.level) },
  ];
}

function solve(p: FewestMembersParams): Record<string, Fraction> {
  const r = layout(p);
  return { count: new Fraction(r.count), gap: r.gap };
}

export function fewestMembersSlips(p: FewestMembersParams): Slip[] {
  const r = layout(p);
  const w = faceWidth(p.nominal);
  const slips: Slip[] = [
    { part: "count", pattern: "rounded-count-down", value: r.quotient.floor() },
    { part: "gap", pattern: "divided-by-members", value: r.freeSpace.div(r.count) },
    { part: "gap", pattern: "forgot-member-width", value: p.span.div(r.spaces) },
    { part: "gap", pattern: "on-center-for-gap", value: r.gap.add(w) },
  ];
  // The gap a count rounded down leaves: what the student lays out after the count slip.
  if (r.oneFewerGap) slips.push({ part: "gap", pattern: "rounded-count-down", value: r.oneFewerGap });
  // Between posts the spaces are one more than the balusters; with battens they are one fewer,
  // which is the rounded-down count again, so only balusters tell the two apart.
  if (p.variant === "balusters") slips.push({ part: "count", pattern: "counted-members-not-spaces", value: new Fraction(r.spaces) });
  return slips;
}

const precisionOf = (p: FewestMembersParams) => (part: string) => (part === "count" ? 1 : precisionFor(p.level));

function generate(seed: number, level: Level): FewestMembersParams {
  const random = createRandom(seed);
  const variant = random.pick(["battens", "balusters"] as const);
  return redraw(() => {
    const p: FewestMembersParams =
      variant === "battens"
        ? { level, variant, span: drawLength(random, level, ...WALL[level].span), nominal: random.pick(["1x2", "1x3", "1x4"] as const), maxGap: new Fraction(random.pick(WALL[level].maxGap)) }
        : { level, variant, span: drawLength(random, level, ...POSTS[level]), nominal: random.pick(["2x2", "2x2", "1x3", "1x4"] as const), maxGap: GUARD_MAX_OPENING };
    const s = solve(p);
    const gap = roundedAnswer(s.gap, precisionFor(level));
    // An opening that rounds up to the limit reads as failing it: a confusing answer to grade.
    if (p.variant === "balusters" && gap.compare(p.maxGap) >= 0) return null;
    if (echoesGiven([gap], [p.span, faceWidth(p.nominal), p.maxGap])) return null;
    return slipsAreClear(fewestMembersSlips(p), s, precisionOf(p)) ? p : null;
  });
}

function render(p: FewestMembersParams) {
  const w = faceWidth(p.nominal);
  const span = givenText(p.span, p.level);
  const nearest = nearestText(precisionFor(p.level));
  const text =
    p.variant === "battens"
      ? `${article(span) === "an" ? "An" : "A"} ${span} wall gets ${p.nominal} battens (${inchText(w)} wide), one flush at each end of the wall and the rest evenly spaced. The design allows no gap wider than ${inchText(p.maxGap)} between battens.\n\nWhat is the fewest number of battens, and what is the clear gap between them, ${nearest}?`
      : `A porch guard has a clear span of ${span} between two posts, face to face. It gets ${p.nominal} balusters (${inchText(w)} wide), evenly spaced with the same opening against each post as between the balusters. Every opening must be strictly less than ${inchText(p.maxGap)}, so that a sphere of that size cannot pass through.\n\nWhat is the fewest number of balusters, and what is the opening, ${nearest}?`;
  return {
    text,
    figure: spacingSketch({
      description: `A span of ${span} ${p.variant === "battens" ? "across a wall" : "between two posts"}; the ${memberName(p)}s are not drawn, since their number is asked.`,
      span: p.span,
      count: 0,
      endCondition: p.variant === "battens" ? "members" : "gaps",
      spanLabel: span,
      show: false,
      answers: lengthAnswers(parts(p), solve(p)),
    }),
  };
}

function explain(p: FewestMembersParams): string[] {
  const r = layout(p);
  const w = faceWidth(p.nominal);
  const precision = precisionFor(p.level);
  const name = memberName(p);
  const g = inchTex(p.maxGap);
  const countStep =
    p.variant === "battens"
      ? `With a batten at each end, $n$ battens leave $n - 1$ gaps, so $n \\ge \\frac{S + g}{w + g} = \\frac{${inchTex(p.span)} + ${g}}{${inchTex(w)} + ${g}} = ${exactTex(r.quotient, "")}$. Round up: $n = ${r.count}$ (a gap at the maximum is allowed).`
      : `With an opening at each post, $n$ balusters leave $n + 1$ openings, and each must be under the limit: $n \\gt \\frac{S - 4}{w + 4} = \\frac{${inchTex(p.span)} - ${g}}{${inchTex(w)} + ${g}} = ${exactTex(r.quotient, "")}$. Take the next whole number above it: $n = ${r.count}$.`;
  const check = r.oneFewerGap
    ? [`Check one fewer: ${r.count - 1} ${name}s would leave gaps of $${exactTex(r.oneFewerGap)}$, ${p.variant === "battens" ? "wider than the maximum" : "not under the limit"}.`]
    : [];
  return [
    ...(p.level === 3 ? [`Convert the span to inches: ${givenText(p.span, 3)} $= ${inchTex(p.span)}$.`] : []),
    countStep,
    `Spaces: ${p.variant === "battens" ? `$${r.count} - 1 = ${r.spaces}$` : `$${r.count} + 1 = ${r.spaces}$`}. Gap: $(${inchTex(p.span)} - ${r.count} \\times ${inchTex(w)}) \\div ${r.spaces} = ${inchTex(r.freeSpace)} \\div ${r.spaces} = ${exactTex(r.gap)}$.`,
    ...check,
    `Answer: ${r.count} ${name}s, gap ${inchText(roundedAnswer(r.gap, precision))} ${nearestText(precision)}.`,
  ];
}

export const fewestMembers: ProblemKind<FewestMembersParams> = {
  key: "fewest-members",
  skill: "guards",
  title: "Fewest members for a maximum gap",
  summary: "Find the fewest battens for a maximum gap, or the fewest balusters for openings under 4\", and the gap they leave.",
  levels: levelInfo([
    "Round spans in inches, gaps to 1/8\".",
    "Awkward spans to 1/16\", balusters or pickets, gaps to 1/16\".",
    "Spans in feet and inches, gaps to 1/32\".",
  ]),
  lesson: { slug: "guards-and-balusters", section: "spacing-balusters-between-posts" },
  generate,
  render,
  parts,
  solve,
  diagnose: (p, part, answer) => {
    const exact = solve(p)[part];
    return exact ? diagnoseFrom(fewestMembersSlips(p), part, exact, precisionOf(p)(part), answer) : null;
  },
  explain,
};
