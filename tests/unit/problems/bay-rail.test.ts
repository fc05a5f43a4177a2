import { describe, expect, it } from "vitest";
import { bayRail, bayRailSlips, type BayRailParams } from "@/lib/problems/bay-rail";
import { inchText, precisionFor, roundedAnswer } from "@/lib/problems/kit";
import { faceWidth } from "@/lib/problems/spacing-figures";
import { LEVELS } from "@/lib/problems/types";
import { expectSlipsNamed, f, hiddenAnswers, SEEDS, TIMEOUT } from "./support";

describe("bay-rail outside checks", () => {
  // common practice, no source: the accent wall of the wall-grid tests, 128 3/4" wide, six
  // 1x3 verticals (2 1/2" actual, PS 20 Table 3) flush at each end → five bays of 22 3/4",
  // and the row rails between them are 22 3/4" too.
  const p: BayRailParams = { level: 2, wallWidth: f("128.75"), wallHeight: f(96), topRail: "1x6", bottomRail: "1x3", baseTrim: f(4), vertical: "1x3", verticalCount: 6, rows: 2 };

  it("finds five bays of 22 3/4\"", () => {
    const s = bayRail.solve(p);
    expect(s.bays.equals(5)).toBe(true);
    expect(s.bay.equals("22.75")).toBe(true);
  });

  it("finds the hallway wall's 19 1/2\" bays", () => {
    // The wall-grid tests' demo hallway: 141 1/2" wide, seven 1x4 verticals (3 1/2") →
    // (141 1/2 − 24 1/2) / 6 = 19 1/2" (computed).
    const s = bayRail.solve({ ...p, wallWidth: f("141.5"), vertical: "1x4", verticalCount: 7 });
    expect(s.bays.equals(6)).toBe(true);
    expect(s.bay.equals("19.5")).toBe(true);
  });

  it("names the slips on the accent wall", () => {
    // 113 3/4 / 6 = 18.96 → 18 15/16; 128 3/4 / 5 = 25 3/4; 22 3/4 + 2 1/2 = 25 1/4.
    expect(bayRail.diagnose(p, "bay", f("18.9375"))).toBe("divided-by-members");
    expect(bayRail.diagnose(p, "bay", f("25.75"))).toBe("forgot-member-width");
    expect(bayRail.diagnose(p, "bay", f("25.25"))).toBe("on-center-for-gap");
    expect(bayRail.diagnose(p, "bays", f(6))).toBe("counted-members-not-spaces");
    expect(bayRail.diagnose(p, "bays", f(4))).toBeNull();
  });
});

describe("bay-rail over many seeds", () => {
  for (const level of LEVELS) {
    it(`level ${level}: deterministic, realistic, hidden, and every slip diagnosed`, () => {
      const precision = precisionFor(level);
      for (let seed = 0; seed < SEEDS; seed++) {
        const p = bayRail.generate(seed, level);
        expect(bayRail.generate(seed, level)).toEqual(p);
        const width = Number(p.wallWidth.valueOf());
        expect(width >= 72 && width <= 240).toBe(true);
        expect(p.verticalCount >= 4 && p.verticalCount <= 14 && p.rows >= 1 && p.rows <= 2).toBe(true);
        if (level === 1) expect(p.wallWidth.d).toBe(1n);

        const s = bayRail.solve(p);
        expect(s.bays.d).toBe(1n);
        expect(s.bays.equals(p.verticalCount - 1)).toBe(true);
        expect(s.bay.compare(8) >= 0 && s.bay.compare(30) <= 0).toBe(true);
        // The bays and the verticals fill the wall exactly.
        expect(s.bay.mul(s.bays).add(faceWidth(p.vertical).mul(p.verticalCount)).equals(p.wallWidth)).toBe(true);
        expect(hiddenAnswers(bayRail, p)).toBe(true);

        expect(bayRail.diagnose(p, "bays", s.bays)).toBeNull();
        expect(bayRail.diagnose(p, "bay", roundedAnswer(s.bay, precision))).toBeNull();
        expectSlipsNamed(bayRail, p, bayRailSlips(p));
        expect(bayRail.explain(p).at(-1)).toContain(inchText(roundedAnswer(s.bay, precision)));
      }
    }, TIMEOUT);
  }
});
