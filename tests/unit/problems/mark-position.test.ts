import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { markPosition, markPositionSlips, type MarkPositionParams } from "@/lib/problems/mark-position";
import { inchText, precisionFor, roundedAnswer, roundingSlip } from "@/lib/problems/kit";
import { faceWidth } from "@/lib/problems/spacing-figures";
import { LEVELS } from "@/lib/problems/types";
import { expectSlipsNamed, f, hiddenAnswers, SEEDS, TIMEOUT } from "./support";

describe("mark-position outside checks", () => {
  // common practice, no source: the demo hallway wall of the mark-from-one-end lesson, 141 1/2"
  // wide, eight 1x4 battens (3 1/2" actual, PS 20 Table 3) flush at each end: gap 16 3/14",
  // on centre 19 5/7", fifth batten at 4 × 19 5/7 = 78 6/7" → 78 7/8" to the sixteenth.
  const p: MarkPositionParams = { level: 2, endCondition: "members", span: f("141.5"), nominal: "1x4", count: 8, index: 5 };

  it("marks the fifth batten from the left end", () => {
    const s = markPosition.solve(p);
    expect(s.onCenter.equals(new Fraction(138, 7))).toBe(true);
    expect(s.edge.equals(new Fraction(552, 7))).toBe(true);
    expect(s.centre.equals(new Fraction(552, 7).add("1.75"))).toBe(true);
    expect(roundedAnswer(s.edge, 16).equals("78.875")).toBe(true);
  });

  it("names added rounded gaps, and the lesson's drift at the last batten", () => {
    // The rounded gap 16 3/16" plus 3 1/2", four times: 78 3/4", a sixteenth-and-more short.
    expect(markPosition.diagnose(p, "edge", f("78.75"))).toBe("added-rounded-gaps");
    // The lesson: added seven times the last batten lands at 137 13/16" instead of 138".
    const last = markPositionSlips({ ...p, index: 8 }).find((s) => s.part === "edge" && s.pattern === "added-rounded-gaps")!;
    expect(last.value.equals("137.8125")).toBe(true);
    expect(markPosition.solve({ ...p, index: 8 }).edge.equals(138)).toBe(true);
    expect(markPosition.diagnose(p, "edge", roundedAnswer(markPosition.solve(p).centre, 16))).toBe("centre-for-edge");
    expect(markPosition.diagnose(p, "onCenter", f("16.25"))).toBe("on-center-for-gap");
  });
});

describe("mark-position over many seeds", () => {
  for (const level of LEVELS) {
    it(`level ${level}: deterministic, realistic, hidden, and every slip diagnosed`, () => {
      const precision = precisionFor(level);
      for (let seed = 0; seed < SEEDS; seed++) {
        const p = markPosition.generate(seed, level);
        expect(markPosition.generate(seed, level)).toEqual(p);
        const inches = Number(p.span.valueOf());
        if (p.endCondition === "members") expect(inches >= 72 && inches <= 240).toBe(true);
        else expect(inches >= 36 && inches <= 120 && p.nominal === "2x2").toBe(true);
        expect(p.index >= 3 && p.index <= p.count && p.count <= 30).toBe(true);
        if (level === 1) expect(p.span.d).toBe(1n);

        const s = markPosition.solve(p);
        for (const value of Object.values(s)) expect(value.compare(0) > 0 && Number.isFinite(value.valueOf())).toBe(true);
        expect(s.centre.sub(s.edge).equals(faceWidth(p.nominal).div(2))).toBe(true);
        expect(hiddenAnswers(markPosition, p)).toBe(true);

        for (const part of markPosition.parts(p)) {
          expect(part.precision).toBe(precision);
          expect(markPosition.diagnose(p, part.key, roundedAnswer(s[part.key], precision))).toBeNull();
        }
        const slips = markPositionSlips(p);
        const drift = slips.find((x) => x.part === "edge" && x.pattern === "added-rounded-gaps")!;
        // At least one graduation beyond the tolerance.
        expect(drift.value.sub(s.edge).abs().compare(new Fraction(3, 2 * precision)) >= 0).toBe(true);
        expectSlipsNamed(markPosition, p, slips);
        const up = s.edge.mul(precision).ceil().div(precision);
        const down = s.edge.mul(precision).floor().div(precision);
        if (!up.equals(down)) {
          // The neighbouring graduation; when it is also the coarser rounding, that is the name.
          const wrong = roundedAnswer(s.edge, precision).equals(up) ? down : up;
          expect(markPosition.diagnose(p, "edge", wrong)).toBe(roundingSlip(s.edge, precision, wrong));
          expect(["rounded-wrong-way", "wrong-precision"]).toContain(markPosition.diagnose(p, "edge", wrong));
        }
        expect(markPosition.explain(p).at(-1)).toContain(inchText(roundedAnswer(s.edge, precision)));
      }
    }, TIMEOUT);
  }
});
