import { describe, expect, it } from "vitest";
import { battenLength, battenLengthSlips, type BattenLengthParams } from "@/lib/problems/batten-length";
import { inchText, precisionFor, roundedAnswer } from "@/lib/problems/kit";
import { faceWidth } from "@/lib/problems/spacing-figures";
import { LEVELS } from "@/lib/problems/types";
import { expectSlipsNamed, f, hiddenAnswers, SEEDS, TIMEOUT } from "./support";

describe("batten-length outside checks", () => {
  // common practice, no source: the accent wall of the wall-grid tests, 96" tall, a 1x6 top
  // board (5 1/2"), a 1x3 bottom rail (2 1/2", PS 20 Table 3) and 4" of base trim → 84" verticals.
  const p: BattenLengthParams = { level: 2, wallWidth: f("128.75"), wallHeight: f(96), topRail: "1x6", bottomRail: "1x3", baseTrim: f(4), vertical: "1x3", verticalCount: 6, rows: 0 };

  it("cuts the accent wall's verticals to 84\"", () => {
    const s = battenLength.solve(p);
    expect(s.deduction.equals(12)).toBe(true);
    expect(s.cut.equals(84)).toBe(true);
  });

  it("cuts the hallway wall's verticals to 87\" with no base trim", () => {
    // The wall-grid tests' demo hallway: 96" ceiling, 1x6 top rail, 1x4 bottom rail, no base
    // trim → 96 − 5 1/2 − 3 1/2 = 87" (computed).
    expect(battenLength.solve({ ...p, topRail: "1x6", bottomRail: "1x4", baseTrim: f(0) }).cut.equals(87)).toBe(true);
  });

  it("names the slips on the accent wall", () => {
    // The lesson's classic mistake: the base trim forgotten, verticals 4" too long.
    expect(battenLength.diagnose(p, "cut", f(88))).toBe("forgot-trim-deduction");
    expect(battenLength.diagnose(p, "deduction", f(8))).toBe("forgot-trim-deduction");
    // 96 − 6 − 3 − 4 = 83: the nominal widths of a 1x6 and a 1x3.
    expect(battenLength.diagnose(p, "cut", f(83))).toBe("nominal-for-actual");
    expect(battenLength.diagnose(p, "deduction", f(13))).toBe("nominal-for-actual");
    // 8' 1 1/4" taken as 81 1/4": 81 1/4 − 12 = 69 1/4.
    const tall: BattenLengthParams = { ...p, level: 3, wallHeight: f("97.25") };
    expect(battenLength.diagnose(tall, "cut", f("69.25"))).toBe("feet-inches-mixup");
    expect(battenLength.diagnose(p, "cut", f(80))).toBeNull();
  });
});

describe("batten-length over many seeds", () => {
  for (const level of LEVELS) {
    it(`level ${level}: deterministic, realistic, hidden, and every slip diagnosed`, () => {
      const precision = precisionFor(level);
      for (let seed = 0; seed < SEEDS; seed++) {
        const p = battenLength.generate(seed, level);
        expect(battenLength.generate(seed, level)).toEqual(p);
        const height = Number(p.wallHeight.valueOf());
        const width = Number(p.wallWidth.valueOf());
        expect(height >= 90 && height <= 144 && width >= 72 && width <= 240).toBe(true);
        expect(p.baseTrim.compare(3) >= 0 && p.baseTrim.compare(6) <= 0).toBe(true);
        expect(["1x4", "1x6", "1x8"]).toContain(p.topRail);
        expect(["1x3", "1x4", "1x6"]).toContain(p.bottomRail);
        if (level === 1) expect(p.wallHeight.d).toBe(1n);

        const s = battenLength.solve(p);
        expect(s.cut.compare(60) > 0 && s.deduction.compare(0) > 0 && s.cut.add(s.deduction).equals(p.wallHeight)).toBe(true);
        expect(s.deduction.equals(p.baseTrim.add(faceWidth(p.topRail)).add(faceWidth(p.bottomRail)))).toBe(true);
        expect(hiddenAnswers(battenLength, p)).toBe(true);

        for (const part of battenLength.parts(p)) {
          expect(part.precision).toBe(precision);
          expect(battenLength.diagnose(p, part.key, roundedAnswer(s[part.key], precision))).toBeNull();
        }
        const slips = battenLengthSlips(p);
        expect(slips.some((x) => x.pattern === "feet-inches-mixup")).toBe(level === 3);
        expectSlipsNamed(battenLength, p, slips);
        expect(battenLength.explain(p).at(-1)).toContain(inchText(roundedAnswer(s.cut, precision)));
      }
    }, TIMEOUT);
  }
});
