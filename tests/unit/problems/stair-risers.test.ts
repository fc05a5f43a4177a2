import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { inchTex, inchText, precisionFor, roundedAnswer } from "@/lib/problems/kit";
import { STAIR_RISERS_MODEL, stairRisers, type StairRisersParams } from "@/lib/problems/stair-risers";
import { modelledSlips, toleranceFor } from "@/lib/problems/stock-figures";
import { LEVELS } from "@/lib/problems/types";

const SEEDS = 500;
const SLOW = 60_000;

function containsMeasure(text: string, value: Fraction): boolean {
  const escape = (m: string) => m.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return [inchText(value), inchText(value, "feet-inches"), inchTex(value)].some((m) => new RegExp(`(?<![\\d/.{])(?<!\\d )(?<!' )${escape(m)}`).test(text));
}

describe("stair-risers: checks against outside sources", () => {
  it("works the Army EN5156 example", () => {
    // US Army carpentry manual EN5156 §2-19/20 (REFERENCES.md): total rise 94" → 13 risers of
    // 7 1/4"; 12 treads of 10 1/2" → total run 126". The fewest-risers rule gives the same 13.
    const p: StairRisersParams = { level: 2, totalRise: new Fraction(94), treadDepth: new Fraction(21, 2) };
    const answer = stairRisers.solve(p);
    expect(answer.risers.equals(13)).toBe(true);
    expect(roundedAnswer(answer.riserHeight, 16).equals(new Fraction(29, 4))).toBe(true);
    expect(answer.treads.equals(12)).toBe(true);
    expect(answer.totalRun.equals(126)).toBe(true);
    expect(stairRisers.diagnose(p, "risers", new Fraction(12))).toBe("rounded-count-down");
    expect(stairRisers.diagnose(p, "treads", new Fraction(13))).toBe("treads-equal-risers");
    expect(stairRisers.diagnose(p, "totalRun", new Fraction(273, 2))).toBe("treads-equal-risers"); // 13 × 10 1/2
  });

  it("works the Navy NAVEDTRA 14044 example with its 7\" target riser", () => {
    // US Navy Builder manual NAVEDTRA 14044 (REFERENCES.md): 8' 11" = 107", 107 / 7 → 15 risers;
    // 107 / 15 = 7.133 → 7 1/8" (computed).
    const p: StairRisersParams = { level: 3, totalRise: new Fraction(107), treadDepth: new Fraction(10), targetRiser: new Fraction(7) };
    const answer = stairRisers.solve(p);
    expect(answer.risers.equals(15)).toBe(true);
    expect(roundedAnswer(answer.riserHeight, 8).equals(new Fraction(57, 8))).toBe(true);
    expect(stairRisers.render(p).text).toContain("round to the nearest whole riser");
    // The same rise under the generated problems' rule, the fewest risers under 7 3/4": 14 of 7 9/14"
    const fewest = stairRisers.solve({ ...p, targetRiser: undefined });
    expect(fewest.risers.equals(14)).toBe(true);
    expect(fewest.riserHeight.equals(new Fraction(107, 14))).toBe(true);
  });

  it("catches a foot read as 10\" in a feet-and-inches rise", () => {
    // 12" to the foot; common practice, no source. 8' 11" read as 91" → 12 risers of 7 7/12"
    const p: StairRisersParams = { level: 3, totalRise: new Fraction(107), treadDepth: new Fraction(10) };
    expect(stairRisers.diagnose(p, "riserHeight", new Fraction(243, 32))).toBe("feet-inches-mixup");
  });
});

describe("stair-risers: every seed", () => {
  for (const level of LEVELS) {
    it(
      `level ${level}: deterministic, realistic, no answer in the prompt, slips recognised`,
      () => {
        for (let seed = 0; seed < SEEDS; seed++) {
          const p = stairRisers.generate(seed, level);
          expect(stairRisers.generate(seed, level)).toEqual(p);
          expect(p.targetRiser).toBeUndefined();
          expect(p.totalRise.compare(24)).toBeGreaterThanOrEqual(0);
          expect(p.totalRise.compare(130)).toBeLessThan(0);
          expect(p.totalRise.mul(precisionFor(level)).d).toBe(1n);
          expect(p.treadDepth.compare(10)).toBeGreaterThanOrEqual(0);
          expect(p.treadDepth.compare(new Fraction(23, 2))).toBeLessThanOrEqual(0);

          const expected = stairRisers.solve(p);
          expect(expected.risers.d === 1n && expected.treads.d === 1n).toBe(true);
          expect(expected.treads.equals(expected.risers.sub(1))).toBe(true);
          // IRC R311.7.5.1: no riser over 7 3/4", exact or as marked.
          expect(expected.riserHeight.compare(new Fraction(31, 4))).toBeLessThanOrEqual(0);
          expect(roundedAnswer(expected.riserHeight, precisionFor(level)).compare(new Fraction(31, 4))).toBeLessThanOrEqual(0);
          expect(expected.totalRun.compare(0)).toBeGreaterThan(0);

          const parts = stairRisers.parts(p);
          const prompt = stairRisers.render(p);
          for (const part of parts) {
            const right = part.answer === "count" ? expected[part.key] : roundedAnswer(expected[part.key], part.precision);
            if (part.answer === "length") expect(containsMeasure(prompt.text, right)).toBe(false);
            expect(stairRisers.diagnose(p, part.key, right)).toBeNull();
          }
          const slips = modelledSlips(STAIR_RISERS_MODEL, p);
          for (const slip of slips) {
            const part = parts.find((x) => x.key === slip.part)!;
            expect(slip.answer.sub(expected[slip.part]).abs().compare(toleranceFor(part))).toBeGreaterThan(0);
            expect(stairRisers.diagnose(p, slip.part, slip.answer)).toBe(slip.pattern);
          }
          const named = slips.map((s) => `${s.part}:${s.pattern}`);
          expect(named).toEqual(expect.arrayContaining(["risers:rounded-count-down", "riserHeight:rounded-count-down", "treads:treads-equal-risers", "totalRun:treads-equal-risers"]));
          if (level === 3) expect(named).toContain("riserHeight:feet-inches-mixup");
          expect(stairRisers.explain(p).at(-1)).toContain(`${expected.risers.toString()} risers`);
        }
      },
      SLOW,
    );
  }
});
