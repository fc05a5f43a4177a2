// The drawing sent with an open problem must not let a student measure the answer off it: no
// coordinate, no distance between two coordinates, and no such distance scaled up by the span's
// real length over its drawn length may equal an expected length.
import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { LEVELS, PROBLEM_KINDS, type AnyProblemKind, type Level, type ProblemFigure } from "@/lib/problems";
import { roundedAnswer } from "@/lib/problems/kit";
import { TIMEOUT } from "./support";

const SEEDS = 600;
const TOLERANCE = 1 / 64;

/**
 * Reading the mark off the tape is the tape-reading question itself: its drawing has to be to scale
 * and the mark has to sit where the reading is. Every other kind's drawing only illustrates.
 */
const DRAWING_IS_THE_QUESTION = new Set(["tape-reading"]);

type Axis = "x" | "y";

function coordinates(figure: ProblemFigure): Record<Axis, number[]> {
  const x = [0, figure.width, ...figure.rects.flatMap((r) => [r.x, r.x + r.w]), ...figure.dimensions.flatMap((d) => [d.x1, d.x2])];
  const y = [0, figure.height, ...figure.rects.flatMap((r) => [r.y, r.y + r.h]), ...figure.dimensions.map((d) => d.y)];
  return { x: [...new Set(x)], y: [...new Set(y)] };
}

function differences(values: number[]): number[] {
  const out = new Set<number>();
  for (const a of values) for (const b of values) if (a > b) out.add(a - b);
  return [...out];
}

/** Real length over drawn length: each given length over each labelled dimension line's drawn length. */
function scales(figure: ProblemFigure, given: number[]): number[] {
  const drawnLengths = figure.dimensions.filter((d) => !d.label.includes("?")).map((d) => Math.abs(d.x2 - d.x1));
  return [...new Set(drawnLengths.filter((d) => d > 0))].flatMap((d) => given.map((g) => g / d));
}

/** A given height over the drawn height of what is drawn, for distances up and down. */
function heightScales(figure: ProblemFigure, given: number[]): number[] {
  if (figure.rects.length === 0) return [];
  const drawn = Math.max(...figure.rects.map((r) => r.y + r.h)) - Math.min(...figure.rects.map((r) => r.y));
  return drawn > 0 ? given.map((g) => g / drawn) : [];
}

/** The given lengths a drawing could be scaled by: every length the prompt states (span, width, height). */
function givenLengths(params: Record<string, unknown>): number[] {
  return Object.values(params)
    .filter((v): v is Fraction => v instanceof Fraction)
    .map((v) => Number(v.valueOf()))
    .filter((v) => v > 12);
}

function answers(kind: AnyProblemKind, params: unknown): { key: string; value: number }[] {
  const expected = kind.solve(params as never) as Record<string, Fraction>;
  return kind
    .parts(params as never)
    // The drawing shows the members, so the spaces between them can be counted: a count is no leak.
    .filter((part) => part.answer !== "count")
    .flatMap((part) => [
      { key: part.key, value: Number(expected[part.key].valueOf()) },
      { key: `${part.key} rounded`, value: Number(roundedAnswer(expected[part.key], part.precision).valueOf()) },
    ]);
}

/** Every way the figure's numbers could be read as a length, each with how it was read. */
export function figureReadings(figure: ProblemFigure, given: number[]): { how: string; value: number }[] {
  const out: { how: string; value: number }[] = [];
  const across = scales(figure, given);
  const coords = coordinates(figure);
  for (const axis of ["x", "y"] as const) {
    const ratios = axis === "x" ? across : [...across, ...heightScales(figure, given)];
    for (const c of coords[axis]) out.push({ how: `${axis} = ${c}`, value: c });
    for (const d of differences(coords[axis])) {
      out.push({ how: `${axis} difference ${d}`, value: d });
      for (const r of ratios) out.push({ how: `${axis} difference ${d} × ${r.toFixed(4)}`, value: d * r });
    }
  }
  return out;
}

function leaks(kind: AnyProblemKind, seed: number, level: Level): string[] {
  const params = kind.generate(seed, level);
  const figure = kind.render(params as never).figure;
  if (!figure) return [];
  const found: string[] = [];
  if (!figure.schematic) found.push(`${kind.key} seed ${seed} level ${level}: drawing not marked as a sketch`);
  // A decimal anywhere in the page could read as a decimal answer; a sketch's numbers are whole.
  const fractional = Object.values(coordinates(figure)).flat().filter((v) => !Number.isInteger(v));
  if (fractional.length > 0) found.push(`${kind.key} seed ${seed} level ${level}: fractional drawing units ${fractional.slice(0, 3).join(", ")}`);
  const readings = figureReadings(figure, givenLengths(params as Record<string, unknown>));
  for (const answer of answers(kind, params)) {
    const hit = readings.find((r) => Math.abs(r.value - answer.value) <= TOLERANCE);
    if (hit) found.push(`${kind.key} seed ${seed} level ${level}: ${answer.key} ${answer.value} read as ${hit.how}`);
  }
  return found;
}

const drawn = PROBLEM_KINDS.filter((kind) => !DRAWING_IS_THE_QUESTION.has(kind.key) && LEVELS.some((level) => kind.render(kind.generate(1, level) as never).figure));

describe("prompt drawings hold no answer", () => {
  it("covers every kind that sends a drawing", () => {
    expect(drawn.map((k) => k.key).sort()).toEqual(["batten-length", "bay-rail", "even-gap", "fewest-members", "mark-position"]);
  });

  for (const kind of drawn) {
    it(
      `${kind.key}: no coordinate, distance or scaled distance equals an answer`,
      () => {
        const found: string[] = [];
        for (const level of LEVELS) for (let seed = 1; seed <= SEEDS; seed++) found.push(...leaks(kind, seed, level));
        expect(found.slice(0, 5), `${found.length} answers readable in ${SEEDS * LEVELS.length} drawings`).toEqual([]);
      },
      TIMEOUT * 2,
    );
  }

  it("reads a to-scale drawing as leaking, so its silence above means something", () => {
    const toScale: ProblemFigure = {
      description: "",
      width: 90,
      height: 30,
      rects: [0, 1, 2, 3, 4].map((i) => ({ x: i * 21.125, y: 0, w: 5.5, h: 30, tone: "member" as const })),
      dimensions: [{ x1: 0, x2: 90, y: 38, label: '90"' }],
    };
    const readings = figureReadings(toScale, [90]);
    expect(readings.some((r) => Math.abs(r.value - 15.625) <= TOLERANCE)).toBe(true);
    // Drawn at half size, the span's scale still gives the gap away.
    const half = { ...toScale, width: 45, rects: toScale.rects.map((r) => ({ ...r, x: r.x / 2, w: r.w / 2 })), dimensions: [{ x1: 0, x2: 45, y: 38, label: '90"' }] };
    expect(figureReadings(half, [90]).some((r) => Math.abs(r.value - 15.625) <= TOLERANCE && r.how.includes("×"))).toBe(true);
  });
});
