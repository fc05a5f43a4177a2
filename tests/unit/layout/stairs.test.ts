import { describe, expect, it } from "vitest";
import { all, create } from "mathjs";
import { Fraction } from "@/lib/layout/core";
import { fewestRisers, roundedSquareRoot, stairLayout } from "@/lib/layout/stairs";
import { stairLayoutSchema } from "@/lib/layout/stairs-schema";

const f = (value: number | string) => new Fraction(value);
const codes = (warnings: { code: string }[]) => warnings.map((w) => w.code);
// mathjs BigNumbers (decimal.js) give an independent square root to 60 digits.
const math = create(all, { number: "BigNumber", precision: 60 });

describe("stairLayout against the handbooks", () => {
  it("reproduces the US Army carpentry manual's 94-inch stair", () => {
    // US Army EN5156 §2-19/20: total rise 94" → 13 risers, 94 / 13 = 7.23 → 7 1/4";
    // 12 treads at 10 1/2" → total run 126". 94 / 7 3/4 = 12.1 → 13 is also the fewest
    // risers the code limit allows (IRC 2018 R311.7.5.1), so both methods agree.
    const stair = stairLayout({ totalRise: f(94), treadDepth: f("10.5"), denominator: 16 });
    expect(stair.riserCount).toBe(13);
    expect(stair.riserHeight.exact.equals(new Fraction(94, 13))).toBe(true);
    expect(stair.riserHeight.rounded.equals("7.25")).toBe(true);
    expect(stair.treadCount).toBe(12);
    expect(stair.treadDepthFrom).toBe("given");
    expect(stair.totalRun.exact.equals(126)).toBe(true);
    // EN5156's rules of thumb all hold for this stair: 2R + T ≈ 25, R + T in 17–19, R × T ≈ 75.
    expect(stair.rulesOfThumb.map((r) => r.ok)).toEqual([true, true, true]);
    expect(codes(stair.warnings)).toEqual(["nosing-required"]);
    const withTarget = stairLayout({ totalRise: f(94), treadDepth: f("10.5"), targetRiser: f(7), denominator: 16 });
    expect(withTarget.riserCount).toBe(13);
  });

  it("reproduces the US Navy Builder manual's 8' 11\" stair when aiming for 7-inch risers", () => {
    // US Navy NAVEDTRA 14044: total rise 8' 11" = 107", 107 / 7 → 15 risers; 107 / 15 = 7.133
    // → 7 1/8" (computed).
    const stair = stairLayout({ totalRise: f(107), targetRiser: f(7), denominator: 16 });
    expect(stair.riserCount).toBe(15);
    expect(stair.riserHeight.rounded.equals("7.125")).toBe(true);
    expect(stair.treadCount).toBe(14);
  });

  it("uses the fewest risers under the code limit when no target is given", () => {
    // IRC 2018 R311.7.5.1: ≤ 7 3/4". 107 / 7 3/4 = 13.8 → 14 risers of 7 9/14 → 7 5/8" (computed):
    // one riser fewer than the Navy's comfortable 7" stair, still within the code.
    const stair = stairLayout({ totalRise: f(107), denominator: 16 });
    expect(stair.riserCount).toBe(14);
    expect(stair.riserHeight.rounded.equals("7.625")).toBe(true);
    expect(stair.treadDepth.exact.equals(10)).toBe(true);
    expect(stair.treadDepthFrom).toBe("minimum");
    expect(fewestRisers(f("7.75").mul(13), f("7.75"))).toBe(13);
    expect(fewestRisers(f("7.75").mul(13).add(new Fraction(1, 64)), f("7.75"))).toBe(14);
  });

  it("lays out the demo's 104 3/4 total rise", () => {
    // Invented demo: 104 3/4" rise → 104.75 / 7.75 = 13.5 → 14 risers of 7.482 → 7 1/2";
    // 13 treads at the 10" minimum → 130" of run (computed).
    const stair = stairLayout({ totalRise: f("104.75"), nosing: f(1), denominator: 16 });
    expect(stair.riserCount).toBe(14);
    expect(stair.riserHeight.rounded.equals("7.5")).toBe(true);
    expect(stair.totalRun.exact.equals(130)).toBe(true);
    expect(stair.treadBoardDepth!.exact.equals(11)).toBe(true);
    expect(stair.warnings).toEqual([]);
  });
});

describe("stairLayout details", () => {
  it("marks every riser from the floor, the top one at the full rise", () => {
    const stair = stairLayout({ totalRise: f(94), treadDepth: f("10.5"), denominator: 16 });
    expect(stair.steps).toHaveLength(13);
    expect(stair.steps[12].height.rounded.equals(94)).toBe(true);
    expect(stair.steps[1].height.exact.equals(new Fraction(188, 13))).toBe(true);
    expect(stair.steps[12].run.exact.equals(126)).toBe(true);
    expect(stair.riserVariation.compare(new Fraction(1, 16))).toBeLessThanOrEqual(0);
  });

  it("gives the stringer length as an approximation, its rounding decided exactly", () => {
    // √(94² + 126²) = √24712 = 157.2005…, independently in mathjs → 157 3/16 at sixteenths.
    const stair = stairLayout({ totalRise: f(94), treadDepth: f("10.5"), denominator: 16 });
    const root = math.sqrt(math.bignumber(24712)) as unknown as { toNumber(): number; times(n: number): { round(): { toNumber(): number } } };
    expect(stair.stringerLength.approximate).toBe(true);
    expect(stair.stringerLength.approx).toBeCloseTo(root.toNumber(), 9);
    expect(stair.stringerLength.rounded.equals(new Fraction(root.times(16).round().toNumber(), 16))).toBe(true);
    expect(stair.stringerLength.rounded.equals(new Fraction(2515, 16))).toBe(true);
    // atan(7.23 / 10.5) ≈ 34.55° (computed with mathjs).
    expect(stair.angleDegrees.approx).toBeCloseTo((Number(math.atan(math.bignumber(94 / 13 / 10.5))) * 180) / Math.PI, 6);
  });

  it("rounds a square root to the nearest 1/d without floating point", () => {
    expect(roundedSquareRoot(f(3600), 16).equals(60)).toBe(true);
    // √2 = 1.41421…: ×16 = 22.63 → 23/16; ×64 = 90.51 → 91/64 (computed).
    expect(roundedSquareRoot(f(2), 16).equals(new Fraction(23, 16))).toBe(true);
    expect(roundedSquareRoot(f(2), 64).equals(new Fraction(91, 64))).toBe(true);
    // The root of (1 1/32)² is 1 1/32, exactly midway between 1 and 1 1/16: ties go up.
    expect(roundedSquareRoot(new Fraction(33, 32).pow(2), 16).equals(new Fraction(17, 16))).toBe(true);
    for (const square of [f("24712.5"), f(10 ** 12 + 7), new Fraction(1, 3)]) {
      const expected = (math.sqrt(math.bignumber(square.valueOf())) as unknown as { times(n: number): { round(): { toNumber(): number } } })
        .times(64)
        .round()
        .toNumber();
      expect(roundedSquareRoot(square, 64).equals(new Fraction(expected, 64))).toBe(true);
    }
  });

  it("takes the tread depth from the total run", () => {
    // 94" rise, 13 risers, 12 treads in 126" of run → 10 1/2" each (computed, as EN5156).
    const stair = stairLayout({ totalRise: f(94), totalRun: f(126), denominator: 16 });
    expect(stair.treadDepthFrom).toBe("total-run");
    expect(stair.treadDepth.exact.equals("10.5")).toBe(true);
  });
});

describe("stairLayout warnings", () => {
  it("flags a tread under the minimum from too short a run", () => {
    // 90" of run over 12 treads is 7 1/2", under IRC 2018 R311.7.5.2's 10".
    const stair = stairLayout({ totalRise: f(94), totalRun: f(90), denominator: 16 });
    expect(codes(stair.warnings)).toContain("tread-under-min");
  });

  it("flags the code limits when the user's own limits are looser", () => {
    const stair = stairLayout({ totalRise: f(24), maxRiser: f(8), minTread: f(9), treadDepth: f("9.5"), nosing: f(1), denominator: 16 });
    expect(stair.riserCount).toBe(3);
    expect(codes(stair.warnings)).toEqual(expect.arrayContaining(["riser-over-code", "tread-under-code"]));
    expect(codes(stair.warnings)).not.toContain("riser-over-max");
  });

  it("flags a riser that reads over the maximum once rounded to a coarse fraction", () => {
    // 93 / 12 = 7 3/4 exactly, at the limit; read to halves that is a tie and rounds up to 8.
    const stair = stairLayout({ totalRise: f(93), treadDepth: f(10), nosing: f(1), denominator: 2 });
    expect(stair.riserCount).toBe(12);
    expect(stair.riserHeight.rounded.equals(8)).toBe(true);
    expect(codes(stair.warnings)).toContain("riser-over-max");
    const quarters = stairLayout({ totalRise: f(93), treadDepth: f(10), nosing: f(1), denominator: 4 });
    expect(codes(quarters.warnings)).not.toContain("riser-over-max");
  });

  it("flags riser variation over 3/8 when the marks are too coarse", () => {
    // IRC 2018 R311.7.5.1: tallest minus shortest riser ≤ 3/8". 50" in 7 risers marked to
    // halves cuts risers of 7 and 7 1/2 (computed): 1/2 apart.
    const stair = stairLayout({ totalRise: f(50), denominator: 2 });
    expect(stair.riserCount).toBe(7);
    expect(stair.riserVariation.equals("0.5")).toBe(true);
    expect(codes(stair.warnings)).toContain("riser-variation");
    expect(stairLayout({ totalRise: f(50), denominator: 16 }).riserVariation.compare(new Fraction(3, 8))).toBeLessThan(0);
  });

  it("checks the nosing where treads are under 11", () => {
    // IRC 2018 R311.7.5.3: 3/4" to 1 1/4" where the tread depth is under 11".
    expect(codes(stairLayout({ totalRise: f(94), nosing: f(2), denominator: 16 }).warnings)).toContain("nosing-out-of-range");
    expect(codes(stairLayout({ totalRise: f(94), treadDepth: f(11), denominator: 16 }).warnings)).not.toContain("nosing-required");
  });

  it("flags a stair that breaks the rules of thumb", () => {
    // 7 1/4" risers with 14" treads: 2R + T = 28 1/2, R + T = 21 1/4, R × T = 101 1/2 — all off.
    const stair = stairLayout({ totalRise: f(94), treadDepth: f(14), denominator: 16 });
    expect(stair.rulesOfThumb.map((r) => r.ok)).toEqual([false, false, false]);
    expect(codes(stair.warnings).filter((c) => c === "rule-of-thumb")).toHaveLength(3);
  });

  it("handles a single step, which has no tread", () => {
    const stair = stairLayout({ totalRise: f(7), totalRun: f(10), denominator: 16 });
    expect(stair.riserCount).toBe(1);
    expect(stair.treadCount).toBe(0);
    expect(stair.totalRun.exact.equals(0)).toBe(true);
    expect(codes(stair.warnings)).toEqual(["run-ignored"]);
  });

  it("rejects a run and a tread depth given together", () => {
    expect(() => stairLayout({ totalRise: f(94), totalRun: f(126), treadDepth: f(10), denominator: 16 })).toThrow(RangeError);
    expect(() => stairLayout({ totalRise: f(0), denominator: 16 })).toThrow(/totalRise/);
  });
});

describe("stairLayoutSchema", () => {
  const issues = (body: unknown) => {
    const parsed = stairLayoutSchema.safeParse(body);
    return parsed.success ? [] : parsed.error.issues.map((issue) => ({ path: issue.path.join("."), message: issue.message }));
  };

  it("reads the Navy manual's 8' 11\" rise and fills in the code limits", () => {
    const parsed = stairLayoutSchema.parse({ totalRise: "8' 11\"", targetRiser: "7", totalRun: "" });
    expect(parsed.totalRise.equals(107)).toBe(true);
    expect(parsed.maxRiser.equals("7.75")).toBe(true);
    expect(parsed.minTread.equals(10)).toBe(true);
    expect(parsed.totalRun).toBeUndefined();
    expect(stairLayout(parsed).riserCount).toBe(15);
  });

  it("names the field of every rejection", () => {
    expect(issues({ totalRise: "94", totalRun: "126", treadDepth: "10 1/2" })).toEqual([
      { path: "treadDepth", message: "Give the total run or the tread depth, not both: the run is the treads times the depth." },
    ]);
    expect(issues({ totalRise: "-94" })).toEqual([{ path: "totalRise", message: "Total rise must be more than 0." }]);
    expect(issues({ totalRise: "94", maxRiser: "1/2" })).toEqual([{ path: "maxRiser", message: "Tallest riser allowed must be at least 1\"." }]);
    expect(issues({ totalRise: "200 ft" })).toEqual([{ path: "totalRise", message: "Total rise must be at most 100' 0\"." }]);
    expect(issues({ totalRise: "94", nosing: "1 1/4 mm", unit: "in" })).toEqual([]);
  });
});
