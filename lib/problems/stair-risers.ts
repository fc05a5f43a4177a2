// Stair layout from a total rise: riser count and height, tread count and total run. The
// generated problems use the engine's default rule, the fewest risers that keep each one at
// or under the code's 7 3/4", and the prompt says so; a hand-built problem may give a
// comfortable target riser instead (the handbooks' 7"), and then the prompt states that rule.
import { CODE_MAX_RISER, fewestRisers, Fraction, stairLayout } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "./kit";
import type { ErrorPattern } from "./patterns";
import { createRandom, type Random } from "./random";
import { diagnoseWith, drawUntil, levelInfo, slipsAreClear, type Slip, type SlipModel } from "./stock-figures";
import type { Level, ProblemKind } from "./types";

export type StairRisersParams = {
  level: Level;
  totalRise: Fraction;
  treadDepth: Fraction;
  /** When set, the count is rise ÷ target rounded to the nearest whole riser (raised if over the limit). */
  targetRiser?: Fraction;
};

const style = (level: Level) => (level === 3 ? "feet-inches" : "inches");

const layouts = new WeakMap<StairRisersParams, ReturnType<typeof stairLayout>>();

function layout(p: StairRisersParams) {
  let result = layouts.get(p);
  if (!result) {
    result = stairLayout({ totalRise: p.totalRise, treadDepth: p.treadDepth, denominator: precisionFor(p.level), ...(p.targetRiser && { targetRiser: p.targetRiser }) });
    layouts.set(p, result);
  }
  return result;
}

/** The rise a student gets reading each foot as 10". */
function riseWithTenInchFeet(p: StairRisersParams): Fraction {
  return p.totalRise.sub(p.totalRise.div(12).floor().mul(2));
}

const model: SlipModel<StairRisersParams> = {
  parts: (p) => {
    const precision = precisionFor(p.level);
    return [
      { key: "risers", label: "Risers", answer: "count", precision: 1 },
      { key: "riserHeight", label: "Riser height", answer: "length", precision },
      { key: "treads", label: "Treads", answer: "count", precision: 1 },
      { key: "totalRun", label: "Total run", answer: "length", precision, style: style(p.level) },
    ];
  },
  solve: (p) => {
    const r = layout(p);
    return { risers: new Fraction(r.riserCount), riserHeight: r.riserHeight.exact, treads: new Fraction(r.treadCount), totalRun: r.totalRun.exact };
  },
  slips: (p) => {
    const n = layout(p).riserCount;
    const slips: Record<string, Slip[]> = {
      risers: [{ pattern: "rounded-count-down", value: new Fraction(n - 1) }],
      riserHeight: [{ pattern: "rounded-count-down", value: p.totalRise.div(n - 1) }],
      treads: [
        { pattern: "treads-equal-risers", value: new Fraction(n) },
        { pattern: "rounded-count-down", value: new Fraction(n - 2), optional: true },
      ],
      totalRun: [
        { pattern: "treads-equal-risers", value: p.treadDepth.mul(n) },
        { pattern: "rounded-count-down", value: p.treadDepth.mul(n - 2), optional: true },
      ],
    };
    if (p.level === 3) {
      const rise = riseWithTenInchFeet(p);
      const m = fewestRisers(rise, CODE_MAX_RISER);
      slips.risers.push({ pattern: "feet-inches-mixup", value: new Fraction(m), optional: true });
      // With the count redone from the short rise, and with the right count kept.
      slips.riserHeight.push({ pattern: "feet-inches-mixup", value: rise.div(m) }, { pattern: "feet-inches-mixup", value: rise.div(n), optional: true });
      slips.treads.push({ pattern: "feet-inches-mixup", value: new Fraction(m - 1), optional: true });
      slips.totalRun.push({ pattern: "feet-inches-mixup", value: p.treadDepth.mul(m - 1), optional: true });
    }
    return slips;
  },
};

/** Level 1 whole inches; level 2 odd sixteenths; level 3 odd thirty-seconds. */
function drawRise(random: Random, level: Level): Fraction {
  if (level === 1) return new Fraction(random.int(24, 110));
  const den = level === 2 ? 16 : 32;
  const whole = level === 2 ? random.int(30, 119) : random.int(40, 129);
  return new Fraction(whole * den + 2 * random.int(0, den / 2 - 1) + 1, den);
}

function drawTread(random: Random, level: Level): Fraction {
  if (level === 1) return random.pick([new Fraction(10), new Fraction(41, 4), new Fraction(21, 2), new Fraction(11)]);
  return new Fraction(random.int(80, 92), 8);
}

function generate(seed: number, level: Level): StairRisersParams {
  const random = createRandom(seed);
  return drawUntil(
    () => ({ level, totalRise: drawRise(random, level), treadDepth: drawTread(random, level) }),
    (p) => {
      const precision = precisionFor(p.level);
      const r = layout(p);
      // Keep the answers out of the prompt: no run or riser that reads as the rise or the tread.
      const given = [p.totalRise, p.treadDepth];
      const answers = [roundedAnswer(r.riserHeight.exact, precision), r.totalRun.exact];
      return r.riserCount >= 3 && !answers.some((a) => given.some((g) => g.equals(a))) && slipsAreClear(model, p);
    },
    "stair-risers",
  );
}

function ruleText(p: StairRisersParams): string {
  if (p.targetRiser) {
    return `Aim for risers of about $${inchTex(p.targetRiser)}$: divide the rise by that and round to the nearest whole riser (one more if a riser would then be over the code's $7\\tfrac34''$).`;
  }
  return "Use the fewest risers that keep every riser at or under the code's $7\\tfrac34''$ (IRC R311.7.5.1), all the same height.";
}

export const stairRisers: ProblemKind<StairRisersParams> = {
  key: "stair-risers",
  skill: "stairs",
  title: "Risers, treads and run",
  summary: "From a total rise, find the risers and their height, then the treads and the total run.",
  levels: levelInfo([
    "A rise in whole inches; riser height to 1/8\".",
    "A rise to 1/16\"; riser height to 1/16\".",
    "A rise in feet and inches to 1/32\"; riser height to 1/32\".",
  ]),
  lesson: { slug: "stair-layout", section: "risers" },
  generate,
  render(p) {
    const precision = precisionFor(p.level);
    const rise = p.level === 3 ? inchText(p.totalRise, "feet-inches") : `$${inchTex(p.totalRise)}$`;
    return {
      text: [
        `A straight stair climbs a total rise of ${rise}, finished floor to finished floor. Each tread is $${inchTex(p.treadDepth)}$ deep.`,
        ruleText(p),
        `Find the number of risers, the riser height to the nearest $\\tfrac{1}{${precision}}''$, the number of treads, and the total run.`,
      ].join("\n\n"),
    };
  },
  parts: model.parts,
  solve: model.solve,
  diagnose: (p, part, answer): ErrorPattern | null => diagnoseWith(model, p, part, answer),
  explain(p) {
    const r = layout(p);
    const precision = precisionFor(p.level);
    const n = r.riserCount;
    const rise = inchTex(p.totalRise);
    const steps: string[] = [];
    if (p.level === 3) steps.push(`Change the rise to inches (12" to the foot): ${inchText(p.totalRise, "feet-inches")} $= ${rise}$.`);
    if (p.targetRiser) {
      const q = p.totalRise.div(p.targetRiser);
      steps.push(`Risers: $${rise} \\div ${inchTex(p.targetRiser)} \\approx ${q.valueOf().toFixed(2)}$, to the nearest whole riser and never over $7\\tfrac34''$: ${n} risers.`);
    } else {
      const q = p.totalRise.div(CODE_MAX_RISER);
      steps.push(`Risers: $${rise} \\div 7\\tfrac34'' \\approx ${q.valueOf().toFixed(2)}$. A part of a riser means one more, so round up: ${n} risers.`);
    }
    const exact = r.riserHeight.exact;
    steps.push(`Riser height: $${rise} \\div ${n} \\approx ${exact.valueOf().toFixed(4)}''$, which is $${inchTex(r.riserHeight.rounded, precision)}$ to the nearest $\\tfrac{1}{${precision}}''$.`);
    steps.push(`Treads: one fewer than the risers, because the top riser lands on the upper floor: $${n} - 1 = ${r.treadCount}$.`);
    steps.push(`Total run: $${r.treadCount} \\times ${inchTex(p.treadDepth)} = ${inchTex(r.totalRun.exact)}$${p.level === 3 ? ` (${inchText(r.totalRun.exact, "feet-inches")})` : ""}.`);
    steps.push(`${n} risers of ${inchText(roundedAnswer(exact, precision))}, ${r.treadCount} treads, total run ${inchText(roundedAnswer(r.totalRun.exact, precision), style(p.level))}.`);
    return steps;
  },
};

export const STAIR_RISERS_MODEL = model;
