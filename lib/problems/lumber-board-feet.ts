// Nominal size → dressed size (PS 20), and the board feet of an order (Navy board-measure
// rule on the nominal size). Board feet are asked to the nearest twelfth: with whole-inch
// nominal sizes and whole-foot lengths, T × W × L / 12 is always a whole number of twelfths,
// so the exact value is the answer and 9 1/3 or 9.33 both read within the tolerance.
import { actualSize, boardFeet, Fraction, type ActualSize } from "@/lib/layout";
import { inchTex, inchText, precisionFor } from "./kit";
import type { ErrorPattern } from "./patterns";
import { createRandom } from "./random";
import { diagnoseWith, drawUntil, levelInfo, slipsAreClear, type SlipModel } from "./stock-figures";
import type { Level, ProblemKind } from "./types";

export type LumberBoardFeetParams = {
  level: Level;
  /** Nominal thickness and width, in inches, as in the name "2x6". */
  t: number;
  w: number;
  lengthFeet: number;
  quantity: number;
};

export const BOARD_FEET_PRECISION = 12;

const SIZES: Record<Level, readonly string[]> = {
  1: ["2x4", "2x6", "2x8", "2x10", "2x12"],
  2: ["1x4", "1x6", "1x8", "1x10", "1x12", "2x4", "2x6", "2x8", "2x10", "2x12"],
  3: ["1x2", "1x3", "1x4", "1x6", "1x8", "1x10", "1x12", "2x2", "2x3", "2x4", "2x6", "2x8", "2x10", "2x12"],
};
const LENGTHS: Record<Level, readonly number[]> = { 1: [8, 10, 12, 14, 16], 2: [8, 10, 12, 14, 16], 3: [8, 10, 12, 14, 16, 18, 20] };
const QUANTITY: Record<Level, [number, number]> = { 1: [1, 6], 2: [2, 12], 3: [5, 24] };

const nominalText = (p: LumberBoardFeetParams) => `${p.t}x${p.w}`;

function dressed(p: LumberBoardFeetParams): ActualSize {
  const size = actualSize({ t: p.t, w: p.w });
  if (!size) throw new RangeError(`PS 20 has no dressed size for ${nominalText(p)}`);
  return size;
}

/** Board feet of one board, then of the order as one long run of the same section. */
function measure(p: LumberBoardFeetParams) {
  const each = boardFeet({ nominalThickness: p.t, nominalWidth: p.w, lengthFeet: p.lengthFeet });
  const total = boardFeet({ nominalThickness: p.t, nominalWidth: p.w, lengthFeet: p.lengthFeet * p.quantity });
  return { each, total };
}

/** `9 1/3`: board feet as a mixed number. */
export function numberText(value: Fraction): string {
  const whole = value.floor();
  const rest = value.sub(whole);
  if (rest.n === 0n) return whole.toString();
  return whole.n === 0n ? rest.toFraction() : `${whole.toString()} ${rest.toFraction()}`;
}

function numberTex(value: Fraction): string {
  const whole = value.floor();
  const rest = value.sub(whole);
  if (rest.n === 0n) return whole.toString();
  return `${whole.n === 0n ? "" : whole.toString()}\\tfrac{${rest.n}}{${rest.d}}`;
}

const model: SlipModel<LumberBoardFeetParams> = {
  parts: (p) => {
    const precision = precisionFor(p.level);
    return [
      { key: "thickness", label: `Actual thickness of a ${nominalText(p)}`, answer: "length", precision },
      { key: "width", label: `Actual width of a ${nominalText(p)}`, answer: "length", precision },
      { key: "boardFeet", label: "Board feet in the order", answer: "number", precision: BOARD_FEET_PRECISION },
    ];
  },
  solve: (p) => {
    const size = dressed(p);
    return { thickness: size.thickness, width: size.width, boardFeet: measure(p).total };
  },
  slips: (p) => {
    const size = dressed(p);
    const run = new Fraction(p.lengthFeet * p.quantity);
    return {
      thickness: [{ pattern: "nominal-for-actual", value: new Fraction(p.t) }],
      width: [{ pattern: "nominal-for-actual", value: new Fraction(p.w) }],
      boardFeet: [
        // Dressed sizes straight into T × W × L / 12, with no 1" floor on thin stock…
        { pattern: "actual-for-board-feet", value: size.thickness.mul(size.width).mul(run).div(12) },
        // …and with it, as the rule would give for a board that really measured that.
        { pattern: "actual-for-board-feet", value: boardFeet({ nominalThickness: size.thickness, nominalWidth: size.width, lengthFeet: run }) },
      ],
    };
  },
};

function generate(seed: number, level: Level): LumberBoardFeetParams {
  const random = createRandom(seed);
  return drawUntil(
    () => {
      const [t, w] = random.pick(SIZES[level]).split("x").map(Number);
      return { level, t, w, lengthFeet: random.pick(LENGTHS[level]), quantity: random.int(...QUANTITY[level]) };
    },
    (p) => slipsAreClear(model, p),
    "lumber-board-feet",
  );
}

export const lumberBoardFeet: ProblemKind<LumberBoardFeetParams> = {
  key: "lumber-board-feet",
  skill: "lumber",
  title: "Dressed sizes and board feet",
  summary: "Give a board's actual size from its nominal name, and the board feet of an order.",
  levels: levelInfo([
    "Framing sizes (2x) and a few boards.",
    "Boards and framing (1x and 2x), larger orders.",
    "Every common size, long lengths and big orders.",
  ]),
  lesson: { slug: "lumber-sizes", section: "the-name-is-not-the-size" },
  generate,
  render(p) {
    const boards = p.quantity === 1 ? "one" : `$${p.quantity}$`;
    const pieces = p.quantity === 1 ? "piece" : "pieces";
    return {
      text: [
        `The order is ${boards} ${pieces} of dry ${nominalText(p)}, each ${p.lengthFeet}' long.`,
        `Give the actual (dressed) thickness and width of a ${nominalText(p)}, from the softwood lumber standard.`,
        "Then give the board feet in the whole order, to the nearest twelfth of a board foot: a whole number and twelfths (or thirds, quarters, halves), or a decimal to two places.",
      ].join("\n\n"),
    };
  },
  parts: model.parts,
  solve: model.solve,
  diagnose: (p, part, answer): ErrorPattern | null => diagnoseWith(model, p, part, answer),
  explain(p) {
    const size = dressed(p);
    const { each, total } = measure(p);
    return [
      `A ${nominalText(p)} is named for its rough size. Dressed dry, PS 20 gives a ${p.t}x thickness of $${inchTex(size.thickness)}$ and a ${p.w}" nominal width of $${inchTex(size.width)}$.`,
      `Board feet use the nominal size (stock under 1" thick counts as 1"): $\\text{bf} = \\frac{T \\times W \\times L}{12}$ with $T$ and $W$ in inches and $L$ in feet.`,
      `One board: $\\frac{${p.t} \\times ${p.w} \\times ${p.lengthFeet}}{12} = ${numberTex(each)}$ bf.`,
      `The order: $${p.quantity} \\times ${numberTex(each)} = ${numberTex(total)}$ bf.`,
      `Thickness ${inchText(size.thickness)}, width ${inchText(size.width)}, ${numberText(total)} board feet.`,
    ];
  },
};

export const LUMBER_BOARD_FEET_MODEL = model;
