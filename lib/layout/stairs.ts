// Stair layout: how many risers a total rise needs, how tall each one is, the treads, the
// run and the stringer, checked against the residential code and the trade's rules of
// thumb. Heights and runs are exact; only the stringer length and the angle involve a
// square root or an arctangent, so those two are given as approximations and say so.
import { Fraction, gt, lt, roundTo, type Length, type Rounded, type Unit, type Warning } from "./core";
import { lengthText } from "./spacing";

/** IRC 2018 R311.7.5.1: riser height not more than 7 3/4". */
export const CODE_MAX_RISER = new Fraction(31, 4);
/** IRC 2018 R311.7.5.2: tread depth not less than 10". */
export const CODE_MIN_TREAD = new Fraction(10);
/** IRC 2018 R311.7.5.1/.2: in a flight, largest minus smallest riser (or tread) ≤ 3/8". */
export const CODE_MAX_VARIATION = new Fraction(3, 8);
/** IRC 2018 R311.7.5.3: where treads are under 11", a nosing of 3/4" to 1 1/4". */
export const NOSING_REQUIRED_BELOW = new Fraction(11);
export const NOSING_MIN = new Fraction(3, 4);
export const NOSING_MAX = new Fraction(5, 4);

export type StairLayoutInput = {
  totalRise: Length;
  /** At most one of `totalRun` and `treadDepth`; with neither, treads are `minTread` deep. */
  totalRun?: Length;
  treadDepth?: Length;
  /** Defaults to the code's 7 3/4". */
  maxRiser?: Length;
  /** Defaults to the code's 10". */
  minTread?: Length;
  /**
   * A comfortable riser to aim for (the handbooks use 7"): the count is rise ÷ target rounded
   * to the nearest whole riser, raised if that would put a riser over the maximum. Without
   * it, the count is simply the fewest risers that keep each one under the maximum.
   */
  targetRiser?: Length;
  nosing?: Length;
  denominator: number;
  unit?: Unit;
};

export type StairStep = {
  /** 1-based from the bottom. */
  index: number;
  /** Height of the top of this riser above the lower floor, marked from the floor. */
  height: Rounded;
  /** Horizontal distance of this riser's face from the face of the first riser. */
  run: Rounded;
};

/**
 * `ok` is decided on the exact riser and tread; `value` is for display only. Plain numbers of
 * inches (square inches for R × T), since the rules are stated in inches whatever the unit.
 */
export type RuleOfThumb = { key: "2R+T" | "R+T" | "RxT"; value: number; low: number; high: number; ok: boolean; text: string };

export type StairLayoutResult = {
  denominator: number;
  totalRise: Length;
  riserCount: number;
  riserHeight: Rounded;
  treadCount: number;
  treadDepth: Rounded;
  treadDepthFrom: "given" | "total-run" | "minimum";
  totalRun: Rounded;
  /** Tread board front to back: tread depth plus the nosing, when a nosing was given. */
  treadBoardDepth: Rounded | null;
  steps: StairStep[];
  /** Largest minus smallest riser when each is cut between rounded marks. */
  riserVariation: Fraction;
  stringerLength: {
    /** Nearest 1/denominator to the square root, decided without floating point. */
    rounded: Fraction;
    approx: number;
    approximate: true;
    note: string;
  };
  angleDegrees: { approx: number; approximate: true; note: string };
  rulesOfThumb: RuleOfThumb[];
  variationNote: string;
  warnings: Warning[];
};

function positive(name: string, value: Length | undefined) {
  if (value !== undefined && (value.s < 0n || value.n === 0n)) throw new RangeError(`${name} must be more than zero`);
}

function bigintSquareRoot(value: bigint): bigint {
  if (value < 2n) return value;
  // One Newton step from any positive guess lands at or above the root; from there the
  // steps only go down and stop at the floor of the root.
  let x = BigInt(Math.floor(Math.sqrt(Number(value)))) + 1n;
  x = (x + value / x) >> 1n;
  for (;;) {
    const next = (x + value / x) >> 1n;
    if (next >= x) return x;
    x = next;
  }
}

/** Nearest multiple of 1/d to √square (ties up), compared exactly. */
export function roundedSquareRoot(square: Fraction, denominator: number): Fraction {
  const d = BigInt(denominator);
  const scaled = square.mul(denominator * denominator);
  const whole = scaled.floor();
  const k = bigintSquareRoot(whole.n);
  // √scaled ≥ k + 1/2  ⇔  scaled ≥ (2k + 1)² / 4
  const half = new Fraction((2n * k + 1n) * (2n * k + 1n), 4n);
  const units = scaled.compare(half) >= 0 ? k + 1n : k;
  return new Fraction(units, d);
}

export function fewestRisers(totalRise: Length, maxRiser: Length): number {
  return Math.max(1, Number(totalRise.div(maxRiser).ceil().valueOf()));
}

function riserCountFor(totalRise: Length, maxRiser: Length, targetRiser: Length | undefined): number {
  const fewest = fewestRisers(totalRise, maxRiser);
  if (targetRiser === undefined) return fewest;
  const nearTarget = Number(totalRise.div(targetRiser).add(new Fraction(1, 2)).floor().valueOf());
  return Math.max(fewest, nearTarget);
}

function rulesOfThumb(riser: Fraction, tread: Fraction): RuleOfThumb[] {
  // US Army EN5156: 2R + T = 25, R + T = 17 to 19, R × T about 75. The ±1" and ±5 bands
  // around 25 and 75 are this program's reading of "about", not the manual's.
  const rule = (key: RuleOfThumb["key"], value: Fraction, low: number, high: number, text: string): RuleOfThumb => ({
    key,
    value: value.round(4).valueOf(),
    low,
    high,
    ok: value.compare(low) >= 0 && value.compare(high) <= 0,
    text,
  });
  return [
    rule("2R+T", riser.mul(2).add(tread), 24, 26, "two risers plus one tread should be about 25\""),
    rule("R+T", riser.add(tread), 17, 19, "one riser plus one tread should be 17\" to 19\""),
    rule("RxT", riser.mul(tread), 70, 80, "riser times tread should be about 75"),
  ];
}

export function stairLayout(input: StairLayoutInput): StairLayoutResult {
  const { totalRise, totalRun: givenRun, treadDepth: givenTread, targetRiser, nosing, denominator, unit = "in" } = input;
  const maxRiser = input.maxRiser ?? CODE_MAX_RISER;
  const minTread = input.minTread ?? CODE_MIN_TREAD;
  positive("totalRise", totalRise);
  positive("totalRun", givenRun);
  positive("treadDepth", givenTread);
  positive("maxRiser", maxRiser);
  positive("minTread", minTread);
  positive("targetRiser", targetRiser);
  if (nosing !== undefined && nosing.s < 0n) throw new RangeError("nosing must be zero or more");
  if (givenRun !== undefined && givenTread !== undefined) throw new RangeError("give totalRun or treadDepth, not both");
  const s = (value: Fraction) => lengthText(value, denominator, unit);

  const riserCount = riserCountFor(totalRise, maxRiser, targetRiser);
  const riser = totalRise.div(riserCount);
  const treadCount = riserCount - 1;
  const treadDepthFrom: StairLayoutResult["treadDepthFrom"] =
    givenTread !== undefined ? "given" : givenRun !== undefined && treadCount > 0 ? "total-run" : "minimum";
  const tread = givenTread ?? (treadDepthFrom === "total-run" ? givenRun!.div(treadCount) : minTread);
  const run = tread.mul(treadCount);
  const warnings: Warning[] = [];

  const steps: StairStep[] = [];
  for (let index = 1; index <= riserCount; index++) {
    steps.push({ index, height: roundTo(riser.mul(index), denominator), run: roundTo(tread.mul(index - 1), denominator) });
  }
  let largest = steps[0].height.rounded;
  let smallest = largest;
  for (let i = 1; i < steps.length; i++) {
    const cut = steps[i].height.rounded.sub(steps[i - 1].height.rounded);
    if (gt(cut, largest)) largest = cut;
    if (lt(cut, smallest)) smallest = cut;
  }
  const riserVariation = largest.sub(smallest);

  const riserHeight = roundTo(riser, denominator);
  if (gt(riserHeight.rounded, maxRiser)) {
    warnings.push({ code: "riser-over-max", message: `Each riser is ${s(riserHeight.rounded)}, over the ${s(maxRiser)} maximum. Add a riser.` });
  }
  if (gt(riser, CODE_MAX_RISER)) {
    warnings.push({ code: "riser-over-code", message: `Each riser is ${s(riser)}, over the ${s(CODE_MAX_RISER)} the residential code allows (IRC R311.7.5.1).` });
  }
  if (treadCount > 0 && lt(tread, minTread)) {
    warnings.push({ code: "tread-under-min", message: `Each tread is ${s(tread)} deep, under the ${s(minTread)} minimum. The stair needs more run.` });
  } else if (treadCount > 0 && lt(tread, CODE_MIN_TREAD)) {
    warnings.push({ code: "tread-under-code", message: `Each tread is ${s(tread)} deep, under the ${s(CODE_MIN_TREAD)} the residential code requires (IRC R311.7.5.2).` });
  }
  if (gt(riserVariation, CODE_MAX_VARIATION)) {
    warnings.push({
      code: "riser-variation",
      message: `Cut between rounded marks, the tallest and shortest risers differ by ${s(riserVariation)}, more than ${s(CODE_MAX_VARIATION)}. Mark to a finer fraction.`,
    });
  }
  if (treadCount > 0 && lt(tread, NOSING_REQUIRED_BELOW)) {
    if (nosing === undefined || nosing.n === 0n) {
      warnings.push({ code: "nosing-required", message: `Treads under ${s(NOSING_REQUIRED_BELOW)} deep need a nosing of ${s(NOSING_MIN)} to ${s(NOSING_MAX)} (IRC R311.7.5.3).` });
    } else if (lt(nosing, NOSING_MIN) || gt(nosing, NOSING_MAX)) {
      warnings.push({ code: "nosing-out-of-range", message: `A nosing of ${s(nosing)} is outside ${s(NOSING_MIN)} to ${s(NOSING_MAX)} (IRC R311.7.5.3).` });
    }
  }
  if (treadDepthFrom === "minimum" && givenRun !== undefined) {
    warnings.push({ code: "run-ignored", message: "A single riser has no treads, so the total run was not used." });
  }

  const rules = treadCount > 0 ? rulesOfThumb(riser, tread) : [];
  for (const rule of rules.filter((r) => !r.ok)) {
    warnings.push({ code: "rule-of-thumb", message: `Rule of thumb: ${rule.text}; this stair gives ${Math.round(rule.value * 100) / 100} (in inches).` });
  }

  const squared = totalRise.mul(totalRise).add(run.mul(run));
  const approx = Math.sqrt(squared.valueOf());
  const angle = (Math.atan2(riser.valueOf(), tread.valueOf()) * 180) / Math.PI;

  return {
    denominator,
    totalRise,
    riserCount,
    riserHeight,
    treadCount,
    treadDepth: roundTo(tread, denominator),
    treadDepthFrom,
    totalRun: roundTo(run, denominator),
    treadBoardDepth: nosing === undefined ? null : roundTo(tread.add(nosing), denominator),
    steps,
    riserVariation,
    stringerLength: {
      rounded: roundedSquareRoot(squared, denominator),
      approx,
      approximate: true,
      note: "About: the length is a square root (rise² + run²), which no fraction gives exactly. It is the line from the foot to the top; buy a longer board for the cuts at each end.",
    },
    angleDegrees: { approx: angle, approximate: true, note: "About: the slope of the stair, riser over tread, as an angle from the floor." },
    rulesOfThumb: rules,
    variationNote:
      "In one flight the tallest riser may be no more than 3/8\" taller than the shortest (IRC R311.7.5.1). Mark each riser from the floor at its exact height so the risers stay within a graduation of each other, and check the top and bottom risers after the finished floors go down.",
    warnings,
  };
}
