import { describe, expect, it } from "vitest";
import { evenGap, evenGapSlips, type EvenGapParams } from "@/lib/problems/even-gap";
import { inchText, precisionFor, roundedAnswer, roundingSlip } from "@/lib/problems/kit";
import { faceWidth } from "@/lib/problems/spacing-figures";
import { LEVELS } from "@/lib/problems/types";
import { expectSlipsNamed, f, hiddenAnswers, SEEDS, TIMEOUT } from "./support";

describe("even-gap outside checks", () => {
  it("finds the baluster example's gap", () => {
    // IRC 2018 R312.1.3 and the baluster example in REFERENCES.md: 72" between posts, thirteen
    // 1 1/2" balusters, a gap at each post → 14 spaces, 52 1/2" free, gap 3 3/4".
    const p: EvenGapParams = { level: 2, endCondition: "gaps", span: f(72), nominal: "2x2", count: 13 };
    const s = evenGap.solve(p);
    expect(s.total.equals("19.5")).toBe(true);
    expect(s.free.equals("52.5")).toBe(true);
    expect(s.spaces.equals(14)).toBe(true);
    expect(s.gap.equals("3.75")).toBe(true);
  });

  it("finds the accent wall's gap and names the slips on it", () => {
    // common practice, no source: 128 3/4" wall, six 1x3 battens (2 1/2" actual, PS 20 Table 3)
    // flush at each end → 15" of battens, 113 3/4" free, 5 spaces, gap 22 3/4".
    const p: EvenGapParams = { level: 2, endCondition: "members", span: f("128.75"), nominal: "1x3", count: 6 };
    const s = evenGap.solve(p);
    expect([s.total, s.free, s.spaces, s.gap].map((v) => v.toFraction())).toEqual(["15", "455/4", "5", "91/4"]);
    // 113 3/4 / 6 = 18.958 → 18 15/16; 128 3/4 / 5 = 25 3/4; 22 3/4 + 2 1/2 = 25 1/4 on centre.
    expect(evenGap.diagnose(p, "gap", f("18.9375"))).toBe("divided-by-members");
    expect(evenGap.diagnose(p, "gap", f("25.75"))).toBe("forgot-member-width");
    expect(evenGap.diagnose(p, "gap", f("25.25"))).toBe("on-center-for-gap");
    expect(evenGap.diagnose(p, "spaces", f(6))).toBe("counted-members-not-spaces");
    // 22 3/4 lies on a graduation, so a sixteenth off is no rounding slip, just wrong.
    expect(evenGap.diagnose(p, "gap", f("22.8125"))).toBeNull();
    expect(evenGap.diagnose(p, "gap", f(30))).toBeNull();
  });
});

describe("even-gap over many seeds", () => {
  for (const level of LEVELS) {
    it(`level ${level}: deterministic, realistic, hidden, and every slip diagnosed`, () => {
      const precision = precisionFor(level);
      for (let seed = 0; seed < SEEDS; seed++) {
        const p = evenGap.generate(seed, level);
        expect(evenGap.generate(seed, level)).toEqual(p);
        expect(p.level).toBe(level);
        const inches = Number(p.span.valueOf());
        if (p.endCondition === "members") expect(inches >= 72 && inches <= 240).toBe(true);
        else expect(inches >= 36 && inches <= 120).toBe(true);
        expect(Number.isInteger(p.count) && p.count >= 3 && p.count <= 16).toBe(true);
        expect(faceWidth(p.nominal).compare(f("1.5")) >= 0).toBe(true);
        if (level === 1) expect(p.span.d).toBe(1n);

        const s = evenGap.solve(p);
        for (const value of Object.values(s)) expect(value.compare(0) > 0 && Number.isFinite(value.valueOf())).toBe(true);
        expect(s.spaces.d).toBe(1n);
        expect(s.free.add(s.total).equals(p.span)).toBe(true);
        expect(hiddenAnswers(evenGap, p)).toBe(true);
        expect(evenGap.parts(p).map((part) => part.precision)).toEqual([precision, precision, 1, precision]);

        for (const part of evenGap.parts(p)) {
          const right = part.answer === "count" ? s[part.key] : roundedAnswer(s[part.key], precision);
          expect(evenGap.diagnose(p, part.key, right)).toBeNull();
        }
        expectSlipsNamed(evenGap, p, evenGapSlips(p));
        const gapUp = s.gap.mul(precision).ceil().div(precision);
        const gapDown = s.gap.mul(precision).floor().div(precision);
        if (!gapUp.equals(gapDown)) {
          const wrong = roundedAnswer(s.gap, precision).equals(gapUp) ? gapDown : gapUp;
          // The neighbouring graduation; when it is also the coarser rounding, that is the name.
          expect(evenGap.diagnose(p, "gap", wrong)).toBe(roundingSlip(s.gap, precision, wrong));
          expect(["rounded-wrong-way", "wrong-precision"]).toContain(evenGap.diagnose(p, "gap", wrong));
        }
        const steps = evenGap.explain(p);
        expect(steps.at(-1)).toContain(inchText(roundedAnswer(s.gap, precision)));
      }
    }, TIMEOUT);
  }
});
