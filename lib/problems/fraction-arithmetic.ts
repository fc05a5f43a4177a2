// Adding and subtracting mixed measurements, then splitting the result into equal parts and
// rounding once. Level 3 writes the lengths in feet and inches, where the slip to catch is
// a foot counted as 10".
import { evaluateMeasureExpression, Fraction } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "./kit";
import type { ErrorPattern } from "./patterns";
import { createRandom, type Random } from "./random";
import { diagnoseWith, drawUntil, levelInfo, slipsAreClear, type SlipModel } from "./stock-figures";
import type { Level, ProblemKind } from "./types";

export type FractionArithmeticParams = {
  level: Level;
  /** Added, added, subtracted: a + b − c. */
  terms: [Fraction, Fraction, Fraction];
  /** The result is split into this many equal parts. */
  parts: number;
};

const style = (level: Level) => (level === 3 ? "feet-inches" : "inches");

/** How the prompt and the engine both read a term: `22 3/4"` or `6' 3 1/2"`. */
function termText(value: Fraction, level: Level): string {
  return inchText(value, style(level));
}

/** TeX for a term; feet and inches keep a thin space between them, as written on a tape. */
function termTex(value: Fraction, level: Level): string {
  if (level !== 3 || value.compare(12) < 0) return inchTex(value);
  const feet = value.div(12).floor();
  return `${feet.toString()}'\\,${inchTex(value.sub(feet.mul(12)))}`;
}

function evaluate(text: string): Fraction {
  const result = evaluateMeasureExpression(text);
  if (!result.ok) throw new Error(`${text}: ${result.error.message}`);
  return result.value;
}

function sumText(p: FractionArithmeticParams): string {
  const [a, b, c] = p.terms.map((t) => termText(t, p.level));
  return `${a} + ${b} - ${c}`;
}

// Diagnosis and the generator's ambiguity check ask for the same answers many times over.
const computed = new WeakMap<FractionArithmeticParams, { result: Fraction; piece: Fraction }>();

function compute(p: FractionArithmeticParams) {
  let answers = computed.get(p);
  if (!answers) {
    answers = { result: evaluate(sumText(p)), piece: evaluate(`(${sumText(p)}) ÷ ${p.parts}`) };
    computed.set(p, answers);
  }
  return answers;
}

/** A foot read as 10": each foot in a term comes out 2" short. */
function feetAsTen(p: FractionArithmeticParams): Fraction {
  const feet = (t: Fraction) => t.div(12).floor();
  const [a, b, c] = p.terms.map((t) => t.sub(feet(t).mul(2)));
  return a.add(b).sub(c);
}

const model: SlipModel<FractionArithmeticParams> = {
  parts: (p) => {
    const precision = precisionFor(p.level);
    return [
      { key: "result", label: "Result of the sum", answer: "length", precision, style: style(p.level) },
      { key: "piece", label: `Each of the ${p.parts} equal parts`, answer: "length", precision, style: style(p.level) },
    ];
  },
  solve: (p) => ({ ...compute(p) }),
  slips: (p) => {
    if (p.level !== 3) return { result: [], piece: [] };
    const mixed = feetAsTen(p);
    return {
      result: [{ pattern: "feet-inches-mixup", value: mixed }],
      piece: [{ pattern: "feet-inches-mixup", value: mixed.div(p.parts) }],
    };
  },
};

/** A length from min to max inches, on the level's finest graduation and never a whole inch. */
function drawTerm(random: Random, level: Level, min: number, max: number): Fraction {
  const den = precisionFor(level);
  return new Fraction(random.int(min, max - 1) * den + random.int(1, den - 1), den);
}

function generate(seed: number, level: Level): FractionArithmeticParams {
  const random = createRandom(seed);
  const precision = precisionFor(level);
  return drawUntil(
    () => {
      const terms: [Fraction, Fraction, Fraction] =
        level === 3
          ? [drawTerm(random, level, 48, 192), drawTerm(random, level, 12, 48), drawTerm(random, level, 1, 12)]
          : [drawTerm(random, level, 12, 96), drawTerm(random, level, 1, 30), drawTerm(random, level, 1, 12)];
      const parts = level === 1 ? random.int(2, 5) : level === 2 ? random.int(2, 7) : random.int(3, 9);
      const p: FractionArithmeticParams = { level, terms, parts };
      const { result, piece } = compute(p);
      // Off a graduation, so the rounding is a real step; and not midway, where both
      // neighbours are within the grading tolerance and the wrong way is no slip.
      if (roundedAnswer(piece, precision).equals(piece) || piece.mul(2 * precision).d === 1n) return null;
      const answers = [result, roundedAnswer(piece, precision)];
      return answers.some((x) => terms.some((t) => t.equals(x))) ? null : p;
    },
    (p) => slipsAreClear(model, p),
    "fraction-arithmetic",
  );
}

function nearest(precision: number): string {
  return `the nearest $\\tfrac{1}{${precision}}''$`;
}

export const fractionArithmetic: ProblemKind<FractionArithmeticParams> = {
  key: "fraction-arithmetic",
  skill: "fractions",
  title: "Add, subtract and split measurements",
  summary: "Add and subtract mixed measurements, then split the result into equal parts and round once.",
  levels: levelInfo([
    "Inches and eighths; answers to 1/8\".",
    "Inches and sixteenths; answers to 1/16\".",
    "Feet, inches and thirty-seconds; answers to 1/32\".",
  ]),
  lesson: { slug: "fractions-for-layout", section: "work-in-sixteenths" },
  generate,
  render(p) {
    const [a, b, c] = p.terms.map((t) => termTex(t, p.level));
    const precision = precisionFor(p.level);
    return {
      text: [
        `Work out $${a} + ${b} - ${c}$ exactly.`,
        `Then split that length into ${p.parts} equal parts and give the length of one part to ${nearest(precision)}.`,
        p.level === 3 ? "Give the sum in feet and inches or in inches, as you prefer." : "",
      ]
        .filter(Boolean)
        .join("\n\n"),
    };
  },
  parts: model.parts,
  solve: model.solve,
  diagnose: (p, part, answer): ErrorPattern | null => diagnoseWith(model, p, part, answer),
  explain(p) {
    const { result, piece } = compute(p);
    const precision = precisionFor(p.level);
    const [a, b, c] = p.terms;
    const steps: string[] = [];
    if (p.level === 3) {
      const converted = p.terms.filter((t) => t.compare(12) >= 0).map((t) => `$${termTex(t, 3)} = ${inchTex(t)}$`);
      steps.push(`Change feet to inches first (12" to the foot): ${converted.join(", ")}.`);
    }
    const den = BigInt(precision);
    const over = (t: Fraction) => {
      const whole = t.floor();
      const n = t.sub(whole).mul(precision);
      return `${whole.toString()}\\tfrac{${n.toString()}}{${den}}`;
    };
    steps.push(`Put every fraction over ${precision}: $${over(a)} + ${over(b)} - ${over(c)}$.`);
    steps.push(`Add and subtract, carrying or borrowing whole inches: $${inchTex(result)}$${p.level === 3 ? ` (${inchText(result, "feet-inches")})` : ""}.`);
    steps.push(`Split into ${p.parts} parts: $${inchTex(result)} \\div ${p.parts} = ${piece.floor().toString()}\\tfrac{${piece.sub(piece.floor()).n}}{${piece.sub(piece.floor()).d}}''$ exactly.`);
    const decimal = piece.sub(piece.floor()).mul(precision);
    steps.push(
      `The fraction part times ${precision} is $${decimal.valueOf().toFixed(3)}$; round to the nearest whole ${precision === 8 ? "eighth" : precision === 16 ? "sixteenth" : "thirty-second"} (.5 or more rounds up).`,
    );
    steps.push(`Sum ${inchText(result, style(p.level))}; each part ${inchText(roundedAnswer(piece, precision), style(p.level))}.`);
    return steps;
  },
};

export const FRACTION_ARITHMETIC_MODEL = model;
