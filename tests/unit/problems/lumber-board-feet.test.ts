import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { inchTex, inchText, roundedAnswer } from "@/lib/problems/kit";
import { LUMBER_BOARD_FEET_MODEL, lumberBoardFeet, numberText, type LumberBoardFeetParams } from "@/lib/problems/lumber-board-feet";
import { modelledSlips, toleranceFor } from "@/lib/problems/stock-figures";
import { LEVELS } from "@/lib/problems/types";

const SEEDS = 500;
const SLOW = 60_000;

function containsMeasure(text: string, value: Fraction): boolean {
  const escape = (m: string) => m.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return [inchText(value), inchTex(value)].some((m) => new RegExp(`(?<![\\d/.{])(?<!\\d )(?<!' )${escape(m)}`).test(text));
}

const order = (t: number, w: number, lengthFeet: number, quantity = 1): LumberBoardFeetParams => ({ level: 2, t, w, lengthFeet, quantity });

describe("lumber-board-feet: checks against outside sources", () => {
  it("gives PS 20 dry dressed sizes", () => {
    // American Softwood Lumber Standard PS 20, Table 3 (REFERENCES.md): 1x → 3/4", 2x → 1 1/2";
    // widths 2/3/4/6/8/10/12 → 1 1/2, 2 1/2, 3 1/2, 5 1/2, 7 1/4, 9 1/4, 11 1/4
    const table: [number, number, Fraction, Fraction][] = [
      [1, 4, new Fraction(3, 4), new Fraction(7, 2)],
      [2, 2, new Fraction(3, 2), new Fraction(3, 2)],
      [2, 3, new Fraction(3, 2), new Fraction(5, 2)],
      [2, 6, new Fraction(3, 2), new Fraction(11, 2)],
      [2, 8, new Fraction(3, 2), new Fraction(29, 4)],
      [1, 10, new Fraction(3, 4), new Fraction(37, 4)],
      [2, 12, new Fraction(3, 2), new Fraction(45, 4)],
    ];
    for (const [t, w, thickness, width] of table) {
      const answer = lumberBoardFeet.solve(order(t, w, 8));
      expect(answer.thickness.equals(thickness) && answer.width.equals(width)).toBe(true);
    }
  });

  it("gives the Navy board-measure values", () => {
    // US Navy Engineering Aid manual, board measure (REFERENCES.md): a 14' 2x4 is 9 1/3 bf (computed from the manual's rule)
    expect(lumberBoardFeet.solve(order(2, 4, 14)).boardFeet.equals(new Fraction(28, 3))).toBe(true);
    // Same manual, per linear foot: 2x4 = 2/3, 2x6 = 1, 2x8 = 1 1/3 bf — here as twelve feet of each
    expect(lumberBoardFeet.solve(order(2, 4, 1, 12)).boardFeet.equals(new Fraction(8))).toBe(true);
    expect(lumberBoardFeet.solve(order(2, 6, 12)).boardFeet.equals(new Fraction(12))).toBe(true);
    expect(lumberBoardFeet.solve(order(2, 8, 12)).boardFeet.equals(new Fraction(16))).toBe(true);
    // Same rule: stock under 1" counts as 1", so a 1x's nominal 1 stands; 10' of 1x6 is 5 bf
    expect(lumberBoardFeet.solve(order(1, 6, 10)).boardFeet.equals(new Fraction(5))).toBe(true);
  });

  it("names the nominal-for-actual and actual-for-board-feet slips on a 14' 2x4", () => {
    const p = order(2, 4, 14);
    expect(lumberBoardFeet.diagnose(p, "thickness", new Fraction(2))).toBe("nominal-for-actual");
    expect(lumberBoardFeet.diagnose(p, "width", new Fraction(4))).toBe("nominal-for-actual");
    // 1 1/2 × 3 1/2 × 14 / 12 = 6 1/8 bf
    expect(lumberBoardFeet.diagnose(p, "boardFeet", new Fraction(49, 8))).toBe("actual-for-board-feet");
    expect(lumberBoardFeet.diagnose(p, "boardFeet", new Fraction(933, 100))).toBeNull(); // 9.33 reads as right
  });
});

describe("lumber-board-feet: every seed", () => {
  for (const level of LEVELS) {
    it(
      `level ${level}: deterministic, realistic, no answer in the prompt, slips recognised`,
      () => {
        for (let seed = 0; seed < SEEDS; seed++) {
          const p = lumberBoardFeet.generate(seed, level);
          expect(lumberBoardFeet.generate(seed, level)).toEqual(p);
          expect([1, 2]).toContain(p.t);
          expect([2, 3, 4, 6, 8, 10, 12]).toContain(p.w);
          expect(p.lengthFeet % 2).toBe(0);
          expect(p.lengthFeet).toBeGreaterThanOrEqual(8);
          expect(p.lengthFeet).toBeLessThanOrEqual(20);
          expect(p.quantity).toBeGreaterThanOrEqual(1);
          expect(p.quantity).toBeLessThanOrEqual(24);

          const expected = lumberBoardFeet.solve(p);
          const parts = lumberBoardFeet.parts(p);
          const prompt = lumberBoardFeet.render(p);
          for (const part of parts) {
            const exact = expected[part.key];
            expect(exact.compare(0)).toBeGreaterThan(0);
            const right = roundedAnswer(exact, part.precision);
            // Exact at the precision asked: the twelfths of board measure, the quarters of PS 20.
            expect(right.equals(exact)).toBe(true);
            if (part.answer === "length") expect(containsMeasure(prompt.text, right)).toBe(false);
            else expect(prompt.text).not.toMatch(new RegExp(`(?<![\\d/.x])${numberText(right)}(?![\\d/.x'"])`));
            expect(lumberBoardFeet.diagnose(p, part.key, right)).toBeNull();
          }
          const slips = modelledSlips(LUMBER_BOARD_FEET_MODEL, p);
          for (const slip of slips) {
            const part = parts.find((x) => x.key === slip.part)!;
            expect(slip.answer.sub(expected[slip.part]).abs().compare(toleranceFor(part))).toBeGreaterThan(0);
            expect(lumberBoardFeet.diagnose(p, slip.part, slip.answer)).toBe(slip.pattern);
          }
          const named = slips.map((s) => `${s.part}:${s.pattern}`);
          expect(named).toEqual(expect.arrayContaining(["thickness:nominal-for-actual", "width:nominal-for-actual", "boardFeet:actual-for-board-feet"]));
          expect(lumberBoardFeet.explain(p).at(-1)).toContain(numberText(expected.boardFeet));
        }
      },
      SLOW,
    );
  }
});
