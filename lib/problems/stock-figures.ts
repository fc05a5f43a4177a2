// Shared pieces of the tape, fraction, lumber, cut-list and stair kinds: the slip table each
// kind diagnoses from (so the generator can prove every modelled slip is recognisable before
// it hands out a problem), the level table, and the tape drawing.
import { Fraction, roundTo } from "@/lib/layout";
import { matchesSlip, roundedAnswer, roundingSlip } from "./kit";
import type { ErrorPattern } from "./patterns";
import type { Level, LevelInfo, ProblemFigure, ProblemPart } from "./types";

/**
 * What a slip would produce, before the student rounds it. `optional` slips (the generic
 * rounding ones) are dropped from a problem when another slip or the right answer gives the
 * same number; the others must stay recognisable, or the generator draws again.
 */
export type Slip = { pattern: ErrorPattern; value: Fraction; optional?: boolean };

export type SlipModel<P> = {
  parts(params: P): ProblemPart[];
  solve(params: P): Record<string, Fraction>;
  /** Per part, in the order diagnose tries them. */
  slips(params: P): Record<string, Slip[]>;
};

export function toleranceFor(part: ProblemPart): Fraction {
  if (part.tolerance) return part.tolerance;
  return part.answer === "count" ? new Fraction(0) : new Fraction(1, 2 * part.precision);
}

/** The number a student who made the slip would type: counts as they are, the rest rounded as asked. */
export function slipAnswer(part: ProblemPart, value: Fraction): Fraction {
  return part.answer === "count" ? value : roundedAnswer(value, part.precision);
}

/**
 * The generic rounding slips on a length: the other neighbouring graduation and each coarser
 * rounding, named as the kit's roundingSlip names them (a coarser rounding first, since the
 * nearest 1/8 is always a neighbouring 1/16 too).
 */
export function roundingSlips(exact: Fraction, precision: number): Slip[] {
  const right = roundTo(exact, precision).rounded;
  const step = new Fraction(1, precision);
  const floor = exact.div(step).floor().mul(step);
  const ceil = exact.div(step).ceil().mul(step);
  const candidates = [right.equals(floor) ? ceil : floor];
  for (let coarser = precision / 2; coarser >= 1 && Number.isInteger(coarser); coarser /= 2) candidates.push(roundTo(exact, coarser).rounded);
  const out: Slip[] = [];
  for (const value of candidates) {
    const pattern = roundingSlip(exact, precision, value);
    if (pattern && !out.some((s) => s.value.equals(value))) out.push({ pattern, value, optional: true });
  }
  return out;
}

export function diagnoseWith<P>(model: SlipModel<P>, params: P, partKey: string, answer: Fraction): ErrorPattern | null {
  const part = model.parts(params).find((p) => p.key === partKey);
  if (!part) return null;
  const exact = model.solve(params)[partKey];
  if (answer.sub(exact).abs().compare(toleranceFor(part)) <= 0) return null;
  const precision = part.answer === "count" ? 1 : part.precision;
  for (const slip of model.slips(params)[partKey] ?? []) {
    if (matchesSlip(slip.value, precision, answer)) return slip.pattern;
  }
  return part.answer === "length" ? roundingSlip(exact, part.precision, answer) : null;
}

export type ModelledSlip = { part: string; pattern: ErrorPattern; value: Fraction; answer: Fraction; optional: boolean };

/** Every slip the problem models, with the answer it gives; optional ones only when recognisable. */
export function modelledSlips<P>(model: SlipModel<P>, params: P): ModelledSlip[] {
  const out: ModelledSlip[] = [];
  const slips = model.slips(params);
  for (const part of model.parts(params)) {
    const listed = [...(slips[part.key] ?? [])];
    if (part.answer === "length") listed.push(...roundingSlips(model.solve(params)[part.key], part.precision));
    for (const slip of listed) {
      const answer = slipAnswer(part, slip.value);
      const clear = diagnoseWith(model, params, part.key, answer) === slip.pattern;
      if (clear || !slip.optional) out.push({ part: part.key, pattern: slip.pattern, value: slip.value, answer, optional: Boolean(slip.optional) });
    }
  }
  return out;
}

/** True when every required slip gives an answer outside tolerance that diagnose names as that slip. */
export function slipsAreClear<P>(model: SlipModel<P>, params: P): boolean {
  return modelledSlips(model, params).every((s) => diagnoseWith(model, params, s.part, s.answer) === s.pattern);
}

/** Draws until the problem is unambiguous; a bounded loop, so a bad kind fails loudly instead of hanging. */
export function drawUntil<P>(draw: () => P | null, ok: (params: P) => boolean, what: string): P {
  for (let attempt = 0; attempt < 500; attempt++) {
    const params = draw();
    if (params !== null && ok(params)) return params;
  }
  throw new Error(`could not draw an unambiguous ${what} problem`);
}

export function levelInfo(descriptions: [string, string, string]): readonly LevelInfo[] {
  const labels = ["Eighths", "Sixteenths", "Thirty-seconds"];
  return ([1, 2, 3] as Level[]).map((level) => ({ level, label: labels[level - 1], description: descriptions[level - 1] }));
}

/** A whole-foot length in words a carpenter uses: `16'`. */
export function feetText(feet: number): string {
  return `${feet}'`;
}

/**
 * A stretch of tape from `from` to `from + inches`, graduated to 1/`finest`. Tick heights
 * step down with the graduation, as on a real blade; the mark is a narrow highlight.
 */
export function tapeFigure(from: number, inches: number, finest: number, mark: Fraction, description: string): ProblemFigure {
  const top = 0.1;
  const heightOf = (k: number) => {
    if (k % finest === 0) return 0.55;
    let size = finest;
    let level = 0;
    while (k % 2 === 0 && size > 1) {
      k /= 2;
      size /= 2;
      level++;
    }
    // level 0 = the finest tick; each coarser graduation is a little taller.
    return 0.14 + 0.07 * level;
  };
  const rects: ProblemFigure["rects"] = [{ x: 0, y: top, w: inches, h: 0.7, tone: "stock" }];
  const tick = 0.012;
  for (let k = 0; k <= inches * finest; k++) {
    const x = k / finest;
    const inch = k % finest === 0;
    rects.push({ x: x - tick / 2, y: top, w: tick, h: heightOf(k), tone: "member", ...(inch && { label: String(from + k / finest) }) });
  }
  const at = mark.sub(from).valueOf();
  rects.push({ x: at - 0.008, y: 0, w: 0.016, h: 0.9, tone: "highlight", label: "mark" });
  return { description, width: inches, height: 1, rects, dimensions: [] };
}
