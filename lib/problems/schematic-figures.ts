// The drawings sent with an open problem. They are sketches, not scale drawings: members, verticals
// and rails are drawn at fixed widths and every space equal, whatever the real sizes, so that a
// student cannot measure an answer off the drawing (a to-scale gap between two battens IS the gap).
// Only the given numbers are written on them, and "?" where the answer goes.
import type { Fraction } from "@/lib/layout";
import { roundedAnswer } from "./kit";
import type { ProblemFigure, ProblemPart } from "./types";

/**
 * Drawn widths of a member and of a space, in drawing units (not inches). Units are small enough
 * that every number in a sketch, and every number the view derives from it, can be whole (a decimal
 * in the page could read as a decimal answer), and odd enough that distances are rarely round.
 */
type Proportion = { member: number; space: number };

/**
 * Tried in order. Any drawing's numbers, scaled by span over drawn span, land on some lengths by
 * chance; when one of them lands on an answer the next proportion is drawn instead. The first one
 * is clear for most problems, and a student cannot tell which were passed over.
 */
const PROPORTIONS: readonly Proportion[] = [123, 141, 109, 133, 151, 97, 162, 89, 171, 183, 201, 79, 223, 247].flatMap((space) =>
  [41, 53, 37, 59, 71, 29].map((member) => ({ member, space })),
);

/** Closer than this to an answer, a number in the drawing reads as the answer (twice the 1/64" a reader could hope for). */
const MARGIN = 1 / 32;

const NOT_TO_SCALE = "Not to scale.";

/** The length answers a drawing must not carry: each exactly and as the student would round it. */
export function lengthAnswers(parts: readonly ProblemPart[], solved: Record<string, Fraction>): number[] {
  return parts
    .filter((part) => part.answer !== "count")
    .flatMap((part) => [Number(solved[part.key].valueOf()), Number(roundedAnswer(solved[part.key], part.precision).valueOf())]);
}

function spread(values: number[]): number {
  return Math.max(...values) - Math.min(...values);
}

/**
 * Every number a reader could take from the drawing as a length: each coordinate, each distance
 * between two coordinates on one axis, and each distance scaled by a given length over the drawn
 * extent that might stand for it (a labelled dimension line across, the drawing's height down).
 */
function readings(figure: ProblemFigure, given: readonly number[]): number[] {
  const xs = [...new Set([0, figure.width, ...figure.rects.flatMap((r) => [r.x, r.x + r.w]), ...figure.dimensions.flatMap((d) => [d.x1, d.x2])])];
  const ys = [...new Set([0, figure.height, ...figure.rects.flatMap((r) => [r.y, r.y + r.h]), ...figure.dimensions.map((d) => d.y)])];
  const across = figure.dimensions.filter((d) => !d.label.includes("?")).map((d) => Math.abs(d.x2 - d.x1));
  const down = figure.rects.length > 0 ? [spread(figure.rects.flatMap((r) => [r.y, r.y + r.h]))] : [];
  const ratiosOf = (extents: number[]) => [...new Set(extents)].filter((e) => e > 0).flatMap((e) => given.map((g) => g / e));
  const out: number[] = [];
  for (const [values, ratios] of [
    [xs, ratiosOf(across)],
    [ys, ratiosOf([...across, ...down])],
  ] as const) {
    out.push(...values);
    for (const a of values) {
      for (const b of values) {
        if (a <= b) continue;
        out.push(a - b, ...ratios.map((r) => (a - b) * r));
      }
    }
  }
  return out;
}

function clearOf(figure: ProblemFigure, given: readonly number[], answers: readonly number[]): boolean {
  const read = readings(figure, given);
  return answers.every((answer) => read.every((value) => Math.abs(value - answer) > MARGIN));
}

/**
 * The first proportion whose drawing carries no answer; failing all, the first plain drawing
 * (members left out) that carries none; failing that too, the plainest there is.
 */
function firstClear(draw: (p: Proportion, members: boolean) => ProblemFigure, given: readonly number[], answers: readonly number[]): ProblemFigure {
  for (const members of [true, false]) {
    for (const proportion of PROPORTIONS) {
      const figure = draw(proportion, members);
      if (clearOf(figure, given, answers)) return figure;
    }
  }
  return draw(PROPORTIONS[0], false);
}

/** Dimension strings sit a few text heights apart; the view sizes its text from the drawing's width. */
const rowStep = (width: number) => tens(Math.max(80, width / 12));

/** Up to a whole ten of drawing units. */
const tens = (value: number) => Math.round(value / 10) * 10;

export type SpacingSketch = {
  description: string;
  /** The span's real length, only to keep the sketch's scaled distances off the answers. */
  span: Fraction;
  count: number;
  endCondition: "members" | "gaps";
  spanLabel: string;
  /** False leaves the members out, for when their count is the question. */
  show?: boolean;
  /** 1-based member drawn highlighted. */
  highlight?: number;
  /** The "?" dimension: the gap after the first member, or from the start of the span to a member's left edge. */
  ask?: { gap: true } | { toMember: number };
  answers: readonly number[];
};

/** An elevation of members across a span, flush at both ends ("members") or between two posts ("gaps"). */
export function spacingSketch(options: SpacingSketch): ProblemFigure {
  const show = (options.show ?? true) && options.count > 0;
  const draw = ({ member, space }: Proportion, members: boolean): ProblemFigure => {
    const post = options.endCondition === "gaps" ? member + 20 : 0;
    const spaces = options.endCondition === "members" ? options.count - 1 : options.count + 1;
    const span = members ? options.count * member + spaces * space : 10 * space;
    const width = span + 2 * post;
    const height = tens(Math.max(240, Math.min(600, width / 3)));
    const firstStart = post + (options.endCondition === "members" ? 0 : space);
    const startOf = (i: number) => firstStart + (i - 1) * (member + space);
    const rects: ProblemFigure["rects"] = [];
    if (post > 0) rects.push({ x: 0, y: 0, w: post, h: height, tone: "post" }, { x: post + span, y: 0, w: post, h: height, tone: "post" });
    // Without members or posts a wall would be a bare dimension line: its outline shows where the span is.
    else if (!members) rects.push({ x: 0, y: 0, w: span, h: height, tone: "stud" });
    if (members) {
      for (let i = 1; i <= options.count; i++) rects.push({ x: startOf(i), y: 0, w: member, h: height, tone: i === options.highlight ? "highlight" : "member" });
    }
    const step = rowStep(width);
    const dimensions = [{ x1: post, x2: post + span, y: height + step, label: options.spanLabel }];
    if (members && options.ask) {
      const ask = "gap" in options.ask ? { x1: startOf(1) + member, x2: startOf(1) + member + space } : { x1: post, x2: startOf(options.ask.toMember) };
      dimensions.push({ ...ask, y: height + 2 * step, label: "?" });
    }
    const description = `${options.description} ${NOT_TO_SCALE}`;
    return { description, width, height: height + dimensions.length * step, rects, dimensions, schematic: true };
  };
  const given = [Number(options.span.valueOf())];
  return firstClear((p, members) => draw(p, members && show), given, options.answers);
}

export type WallSketch = {
  description: string;
  /** The wall's real width and height, only to keep the sketch's scaled distances off the answers. */
  wallWidth: Fraction;
  wallHeight: Fraction;
  hasBaseTrim: boolean;
  verticals: number;
  rows: number;
  widthLabel: string;
  askVertical?: boolean;
  askBay?: boolean;
  answers: readonly number[];
};

/** A board-and-batten or grid wall: base trim, bottom rail, top rail, the verticals and any row rails. */
export function wallSketch(options: WallSketch): ProblemFigure {
  const draw = ({ member, space }: Proportion, verticals: boolean): ProblemFigure => {
    const width = options.verticals * member + (options.verticals - 1) * space;
    const top = member + 20;
    const bottom = member + 10;
    const trim = options.hasBaseTrim ? member + 10 : 0;
    // Whole panels between the row rails, so the wall's height follows from them.
    const panel = Math.round((Math.max(4 * space, width * 0.4) - top - bottom - trim - options.rows * member) / (options.rows + 1));
    const bottomTop = top + (options.rows + 1) * panel + options.rows * member;
    const wallHeight = bottomTop + bottom + trim;
    const rects: ProblemFigure["rects"] = [];
    if (trim > 0) rects.push({ x: 0, y: wallHeight - trim, w: width, h: trim, tone: "trim", label: "base trim" });
    rects.push({ x: 0, y: bottomTop, w: width, h: bottom, tone: "rail", label: "bottom rail" }, { x: 0, y: 0, w: width, h: top, tone: "rail", label: "top rail" });
    if (verticals) {
      for (let i = 0; i < options.verticals; i++) {
        const asked = options.askVertical && i === 1;
        rects.push({ x: i * (member + space), y: top, w: member, h: bottomTop - top, tone: asked ? "highlight" : "member", ...(asked ? { label: "?" } : {}) });
      }
      for (let r = 1; r <= options.rows; r++) {
        for (let i = 0; i + 1 < options.verticals; i++) {
          const asked = options.askBay && i === 0 && r === 1;
          rects.push({ x: i * (member + space) + member, y: top + r * panel + (r - 1) * member, w: space, h: member, tone: asked ? "highlight" : "rail" });
        }
      }
    }
    const step = rowStep(width);
    const dimensions = [{ x1: 0, x2: width, y: wallHeight + step, label: options.widthLabel }];
    if (verticals && options.askBay) dimensions.push({ x1: member, x2: member + space, y: wallHeight + 2 * step, label: "?" });
    const description = `${options.description} ${NOT_TO_SCALE}`;
    return { description, width, height: wallHeight + dimensions.length * step, rects, dimensions, schematic: true };
  };
  const given = [Number(options.wallWidth.valueOf()), Number(options.wallHeight.valueOf())];
  return firstClear(draw, given, options.answers);
}
