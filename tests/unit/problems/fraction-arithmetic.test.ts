import { fraction as mathFraction, add, subtract, divide, type Fraction as MathFraction } from "mathjs";
import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { FRACTION_ARITHMETIC_MODEL, fractionArithmetic, type FractionArithmeticParams } from "@/lib/problems/fraction-arithmetic";
import { inchTex, inchText, precisionFor, roundedAnswer } from "@/lib/problems/kit";
import { modelledSlips, toleranceFor } from "@/lib/problems/stock-figures";
import { LEVELS } from "@/lib/problems/types";

const SEEDS = 500;
const SLOW = 60_000;

function containsMeasure(text: string, value: Fraction, style: "inches" | "feet-inches"): boolean {
  const escape = (m: string) => m.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return [inchText(value), inchText(value, style), inchTex(value)].some((m) => new RegExp(`(?<![\\d/.{])(?<!\\d )(?<!' )${escape(m)}`).test(text));
}

/** mathjs's own fractions, as an independent computation of a + b − c and of its k-th part. */
function mathjsSum(p: FractionArithmeticParams): { result: MathFraction; piece: MathFraction } {
  const [a, b, c] = p.terms.map((t) => mathFraction(Number(t.n) * (t.s < 0n ? -1 : 1), Number(t.d)));
  const result = subtract(add(a, b), c) as MathFraction;
  return { result, piece: divide(result, mathFraction(p.parts, 1)) as MathFraction };
}

const same = (ours: Fraction, theirs: MathFraction) => ours.equals(new Fraction(BigInt(theirs.s) * BigInt(theirs.n), BigInt(theirs.d)));

describe("fraction-arithmetic: checks against outside sources", () => {
  it("adds and carries as the fractions lesson does, agreeing with mathjs", () => {
    // 22 3/4 + 5 7/16 − 1 1/8 = 27 1/16; split in 3 → 9 1/48; mathjs fractions as the independent computation
    const p: FractionArithmeticParams = { level: 2, terms: [new Fraction(91, 4), new Fraction(87, 16), new Fraction(9, 8)], parts: 3 };
    const { result, piece } = fractionArithmetic.solve(p);
    expect(result.equals(new Fraction(433, 16))).toBe(true);
    expect(piece.equals(new Fraction(433, 48))).toBe(true);
    const theirs = mathjsSum(p);
    expect(same(result, theirs.result) && same(piece, theirs.piece)).toBe(true);
  });

  it("rounds a tie up, as the Navy Builder manual's .5-or-more rule does", () => {
    // US Navy Builder manual (REFERENCES.md): decimal part × 16, .5 or more rounds up.
    // 45 9/16 ÷ 2 = 22 25/32 = 22.78125; .78125 × 16 = 12.5 → 13 sixteenths → 22 13/16
    const p: FractionArithmeticParams = { level: 2, terms: [new Fraction(40), new Fraction(89, 16), new Fraction(0)], parts: 2 };
    const piece = fractionArithmetic.solve(p).piece;
    expect(piece.equals(new Fraction(729, 32))).toBe(true);
    const navy = Math.floor((piece.valueOf() - 22) * 16 + 0.5);
    expect(navy).toBe(13);
    expect(roundedAnswer(piece, 16).equals(new Fraction(22 * 16 + navy, 16))).toBe(true);
    // NIST Handbook 44 §10.3 would read the even graduation, 22 12/16 = 22 3/4: at a tie both
    // graduations are half a sixteenth off, so the grader's inclusive tolerance accepts either.
    const nist = new Fraction(22 * 16 + 12, 16);
    expect(nist.sub(piece).abs().compare(toleranceFor(fractionArithmetic.parts(p)[1]))).toBe(0);
    expect(fractionArithmetic.diagnose(p, "piece", nist)).toBeNull();
  });

  it("catches a foot taken as 10\" in feet-and-inches work", () => {
    // 12 inches to the foot; common practice, no source. 6' 3 1/2" + 2' 7 3/4" − 11 5/32" = 96 3/32"
    const p: FractionArithmeticParams = { level: 3, terms: [new Fraction(151, 2), new Fraction(127, 4), new Fraction(357, 32)], parts: 4 };
    expect(fractionArithmetic.solve(p).result.equals(new Fraction(3075, 32))).toBe(true);
    // with 10" feet: 63 1/2 + 27 3/4 − 11 5/32 = 80 3/32
    expect(fractionArithmetic.diagnose(p, "result", new Fraction(2563, 32))).toBe("feet-inches-mixup");
  });
});

describe("fraction-arithmetic: every seed", () => {
  for (const level of LEVELS) {
    it(`level ${level}: deterministic, realistic, no answer in the prompt, slips recognised`, () => {
      let wrongWay = 0;
      for (let seed = 0; seed < SEEDS; seed++) {
        const p = fractionArithmetic.generate(seed, level);
        expect(fractionArithmetic.generate(seed, level)).toEqual(p);
        const precision = precisionFor(level);
        for (const t of p.terms) {
          expect(t.compare(0)).toBeGreaterThan(0);
          expect(t.compare(192)).toBeLessThan(0);
          expect(t.mul(precision).d).toBe(1n);
        }
        expect(p.parts).toBeGreaterThanOrEqual(2);
        expect(p.parts).toBeLessThanOrEqual(9);

        const expected = fractionArithmetic.solve(p);
        const theirs = mathjsSum(p);
        expect(same(expected.result, theirs.result) && same(expected.piece, theirs.piece)).toBe(true);
        expect(expected.result.compare(0)).toBeGreaterThan(0);
        // The exact sum is representable at the precision asked.
        expect(expected.result.mul(precision).d).toBe(1n);

        const prompt = fractionArithmetic.render(p);
        for (const part of fractionArithmetic.parts(p)) {
          const right = roundedAnswer(expected[part.key], part.precision);
          expect(containsMeasure(prompt.text, right, part.style ?? "inches")).toBe(false);
          expect(fractionArithmetic.diagnose(p, part.key, right)).toBeNull();
          expect(fractionArithmetic.explain(p).at(-1)).toContain(inchText(right, part.style));
        }
        const parts = fractionArithmetic.parts(p);
        const slips = modelledSlips(FRACTION_ARITHMETIC_MODEL, p);
        for (const slip of slips) {
          const part = parts.find((x) => x.key === slip.part)!;
          expect(slip.answer.sub(expected[slip.part]).abs().compare(toleranceFor(part))).toBeGreaterThan(0);
          expect(fractionArithmetic.diagnose(p, slip.part, slip.answer)).toBe(slip.pattern);
        }
        // Every split lands between graduations, so a rounding slip is always there to catch.
        expect(slips.some((s) => s.part === "piece" && (s.pattern === "rounded-wrong-way" || s.pattern === "wrong-precision"))).toBe(true);
        if (slips.some((s) => s.pattern === "rounded-wrong-way")) wrongWay++;
        if (level === 3) expect(slips.filter((s) => s.pattern === "feet-inches-mixup")).toHaveLength(2);
      }
      // Often the other graduation is also the coarser rounding, and the kit names that first.
      expect(wrongWay).toBeGreaterThan(SEEDS / 4);
    }, SLOW);
  }
});
