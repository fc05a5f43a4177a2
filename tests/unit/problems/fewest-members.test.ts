import { describe, expect, it } from "vitest";
import { fewestMembers, fewestMembersSlips, type FewestMembersParams } from "@/lib/problems/fewest-members";
import { inchText, precisionFor, roundedAnswer } from "@/lib/problems/kit";

import { LEVELS } from "@/lib/problems/types";
import { expectSlipsNamed, f, hiddenAnswers, SEEDS, TIMEOUT } from "./support";

describe("fewest-members outside checks", () => {
  it("matches the baluster examples", () => {
    // IRC 2018 R312.1.3 and the baluster example in REFERENCES.md: 72" between posts, 1 1/2"
    // balusters, every opening under 4" → 13 balusters, gap 52 1/2 / 14 = 3 3/4".
    const p: FewestMembersParams = { level: 2, variant: "balusters", span: f(72), nominal: "2x2", maxGap: f(4) };
    const s = fewestMembers.solve(p);
    expect(s.count.equals(13)).toBe(true);
    expect(s.gap.equals("3.75")).toBe(true);
    // The same source, computed: 52" span → fewest 9 balusters, gap 38 1/2 / 10 = 3.85".
    const q = fewestMembers.solve({ ...p, span: f(52) });
    expect(q.count.equals(9)).toBe(true);
    expect(q.gap.equals("3.85")).toBe(true);
    // (52 − 4) / 5 1/2 = 8.73: rounding down gives 8; 10 is the number of openings.
    expect(fewestMembers.diagnose({ ...p, span: f(52) }, "count", f(8))).toBe("rounded-count-down");
    expect(fewestMembers.diagnose({ ...p, span: f(52) }, "count", f(10))).toBe("counted-members-not-spaces");
    // Eight balusters leave (52 − 12) / 9 = 4 4/9", which fails the sphere test.
    expect(fewestMembers.diagnose({ ...p, span: f(52) }, "gap", f("4.4375"))).toBe("rounded-count-down");
  });

  it("finds the fewest verticals for a 24\" maximum bay", () => {
    // common practice, no source: the 128 3/4" accent wall with 1x3 verticals (2 1/2" actual,
    // PS 20 Table 3) and bays no wider than 24" needs six, leaving 22 3/4" bays.
    const p: FewestMembersParams = { level: 2, variant: "battens", span: f("128.75"), nominal: "1x3", maxGap: f(24) };
    const s = fewestMembers.solve(p);
    expect(s.count.equals(6)).toBe(true);
    expect(s.gap.equals("22.75")).toBe(true);
    // (128 3/4 + 24) / 26 1/2 = 5.76 → 5 rounded down; five leave (128 3/4 − 12 1/2) / 4 = 29 1/16".
    expect(fewestMembers.diagnose(p, "count", f(5))).toBe("rounded-count-down");
    expect(fewestMembers.diagnose(p, "gap", f("29.0625"))).toBe("rounded-count-down");
    expect(fewestMembers.diagnose(p, "gap", f("25.25"))).toBe("on-center-for-gap");
  });
});

describe("fewest-members over many seeds", () => {
  for (const level of LEVELS) {
    it(`level ${level}: deterministic, realistic, hidden, and every slip diagnosed`, () => {
      const precision = precisionFor(level);
      for (let seed = 0; seed < SEEDS; seed++) {
        const p = fewestMembers.generate(seed, level);
        expect(fewestMembers.generate(seed, level)).toEqual(p);
        const inches = Number(p.span.valueOf());
        if (p.variant === "battens") expect(inches >= 72 && inches <= 240 && p.maxGap.compare(8) >= 0 && p.maxGap.compare(24) <= 0).toBe(true);
        else expect(inches >= 36 && inches <= 120 && p.maxGap.equals(4)).toBe(true);
        if (level === 1) expect(p.span.d).toBe(1n);

        const s = fewestMembers.solve(p);
        expect(s.count.d).toBe(1n);
        expect(s.count.compare(2) >= 0 && s.count.compare(40) <= 0).toBe(true);
        expect(s.gap.compare(0) > 0 && Number.isFinite(s.gap.valueOf())).toBe(true);
        if (p.variant === "balusters") expect(roundedAnswer(s.gap, precision).compare(4) < 0).toBe(true);
        else expect(s.gap.compare(p.maxGap) <= 0).toBe(true);
        expect(hiddenAnswers(fewestMembers, p)).toBe(true);

        expect(fewestMembers.diagnose(p, "count", s.count)).toBeNull();
        expect(fewestMembers.diagnose(p, "gap", roundedAnswer(s.gap, precision))).toBeNull();
        expectSlipsNamed(fewestMembers, p, fewestMembersSlips(p));
        expect(fewestMembers.explain(p).at(-1)).toContain(inchText(roundedAnswer(s.gap, precision)));
      }
    }, TIMEOUT);
  }
});
