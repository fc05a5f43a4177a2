// Reading a mark on a tape: whole inches plus a count of the smallest graduations, said as a
// reduced measurement. The precision asked is the tape's finest graduation, not the level's
// usual 1/8": one graduation off must never fall inside the grading tolerance.
import { Fraction, parseMeasure } from "@/lib/layout";
import { inchTex, inchText } from "./kit";
import type { ErrorPattern } from "./patterns";
import { createRandom } from "./random";
import { diagnoseWith, drawUntil, levelInfo, slipsAreClear, tapeFigure, type Slip, type SlipModel } from "./stock-figures";
import type { Level, ProblemKind } from "./types";

export type TapeReadingParams = {
  level: Level;
  /** The tape's smallest graduation, 1/finest of an inch. */
  finest: 16 | 32;
  /** The inch line just before the mark. */
  whole: number;
  /** Smallest graduations from that inch line to the mark. */
  count: number;
  /** The inch the drawn stretch of tape starts at; it shows two inches. */
  from: number;
};

const SPAN = 2;
const sizeWord = (finest: number) => (finest === 16 ? "sixteenths" : "thirty-seconds");

function at(whole: number, count: number, finest: number): Fraction {
  const parsed = parseMeasure(`${whole} ${count}/${finest}`);
  if (!parsed.ok) throw new Error(parsed.error.message);
  return parsed.value;
}

const model: SlipModel<TapeReadingParams> = {
  parts: (p) => [{ key: "reading", label: "Reading at the mark", answer: "length", precision: p.finest }],
  solve: (p) => ({ reading: at(p.whole, p.count, p.finest) }),
  slips: (p) => {
    const slips: Slip[] = [
      { pattern: "miscounted-graduations", value: at(p.whole, p.count - 1, p.finest) },
      { pattern: "miscounted-graduations", value: at(p.whole, p.count + 1, p.finest) },
    ];
    // The count named in the next coarser graduation ("five eighths" for five sixteenths).
    if (2 * p.count < p.finest) slips.push({ pattern: "misnamed-graduations", value: at(p.whole, p.count, p.finest / 2) });
    return { reading: slips };
  },
};

function generate(seed: number, level: Level): TapeReadingParams {
  const random = createRandom(seed);
  const finest = level === 3 ? 32 : 16;
  return drawUntil(
    () => {
      // Level 1 sits on the ticks the tape names by length (eighths and coarser); above it,
      // on the odd finest ticks that have to be counted from a longer one.
      const count = level === 1 ? 2 * random.int(1, 7) : 2 * random.int(0, finest / 2 - 1) + 1;
      const whole = level === 3 ? random.int(12, 143) : random.int(1, 95);
      const from = random.chance(1, 2) ? whole : whole - 1;
      return { level, finest, whole, count, from };
    },
    (p) => slipsAreClear(model, p),
    "tape-reading",
  );
}

export const tapeReading: ProblemKind<TapeReadingParams> = {
  key: "tape-reading",
  skill: "tape-reading",
  title: "Read the tape",
  summary: "Read a pencil mark on a tape as whole inches and a reduced fraction.",
  levels: levelInfo([
    "A tape in sixteenths; the mark sits on a half, quarter or eighth line.",
    "A tape in sixteenths; the mark sits on an odd sixteenth.",
    "A tape in thirty-seconds; the mark sits on an odd thirty-second, further along the blade.",
  ]),
  lesson: { slug: "reading-a-tape", section: "reading-a-mark-step-by-step" },
  generate,
  render(p) {
    const mark = at(p.whole, p.count, p.finest);
    const graduations = p.count === 1 ? "graduation" : "graduations";
    return {
      text: [
        `This tape is graduated in ${sizeWord(p.finest)}: the shortest lines are $\\tfrac{1}{${p.finest}}''$ apart.`,
        `The pencil mark is $${p.count}$ of the smallest ${graduations} past the ${p.whole}-inch line, as drawn.`,
        "Read the mark as a measurement: whole inches and a fraction in lowest terms.",
      ].join("\n\n"),
      figure: tapeFigure(
        p.from,
        SPAN,
        p.finest,
        mark,
        `Two inches of tape from the ${p.from}-inch line to the ${p.from + SPAN}-inch line, graduated in ${sizeWord(p.finest)}, with a pencil mark ${p.count} of the smallest graduations past the ${p.whole}-inch line.`,
      ),
    };
  },
  parts: model.parts,
  solve: model.solve,
  diagnose: (p, part, answer): ErrorPattern | null => diagnoseWith(model, p, part, answer),
  explain(p) {
    const reading = model.solve(p).reading;
    const fraction = reading.sub(p.whole);
    const steps = [
      `The last inch line before the mark is the ${p.whole}-inch line: the whole-number part is $${p.whole}''$.`,
      `The mark is $${p.count}$ of the smallest graduations past it, and each is $\\tfrac{1}{${p.finest}}''$: that is $\\tfrac{${p.count}}{${p.finest}}''$.`,
    ];
    if (fraction.d === BigInt(p.finest)) {
      steps.push(`$${p.count}$ is odd, so $\\tfrac{${p.count}}{${p.finest}}$ is already in lowest terms.`);
    } else {
      const chain: string[] = [];
      for (let n = p.count, d = p.finest; ; n /= 2, d /= 2) {
        chain.push(`\\tfrac{${n}}{${d}}`);
        if (n % 2 !== 0) break;
      }
      steps.push(`Halve the top and the bottom while the top is even: $${chain.join(" = ")}$.`);
    }
    steps.push(`The reading is $${inchTex(reading)}$, written ${inchText(reading)}.`);
    return steps;
  },
};

export const TAPE_READING_MODEL = model;
