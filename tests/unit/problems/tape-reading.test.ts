import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { inchTex, inchText, roundedAnswer } from "@/lib/problems/kit";
import { modelledSlips, toleranceFor } from "@/lib/problems/stock-figures";
import { TAPE_READING_MODEL, tapeReading, type TapeReadingParams } from "@/lib/problems/tape-reading";
import { LEVELS } from "@/lib/problems/types";

const SEEDS = 500;
const SLOW = 60_000;

/** The answer written out as a measurement of its own (plain or TeX), not the tail of a longer one. */
function containsMeasure(text: string, value: Fraction): boolean {
  const escape = (m: string) => m.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return [inchText(value), inchTex(value)].some((m) => new RegExp(`(?<![\\d/.{])(?<!\\d )(?<!' )${escape(m)}`).test(text));
}

describe("tape-reading: readings from common practice", () => {
  const params = (whole: number, count: number, finest: 16 | 32 = 16): TapeReadingParams => ({ level: 2, finest, whole, count, from: whole });

  it("reads counts of sixteenths as reduced measurements", () => {
    // Twelve sixteenths past 22 is 22 3/4" (the reading lesson's own example); common practice, no source
    expect(tapeReading.solve(params(22, 12)).reading.equals(new Fraction(91, 4))).toBe(true);
    // Eight sixteenths is the half-inch line; common practice, no source
    expect(tapeReading.solve(params(5, 8)).reading.equals(new Fraction(11, 2))).toBe(true);
    // Odd sixteenths do not reduce: 23 5/16"; common practice, no source
    expect(tapeReading.solve(params(23, 5)).reading.equals(new Fraction(373, 16))).toBe(true);
    // On a 1/32 tape, 6 graduations is 3/16"; common practice, no source
    expect(tapeReading.solve(params(10, 6, 32)).reading.equals(new Fraction(163, 16))).toBe(true);
  });

  it("names the slips a student makes reading 23 5/16\"", () => {
    const p = params(23, 5);
    expect(tapeReading.diagnose(p, "reading", new Fraction(93, 4))).toBe("miscounted-graduations"); // 23 1/4: four counted
    expect(tapeReading.diagnose(p, "reading", new Fraction(187, 8))).toBe("miscounted-graduations"); // 23 3/8: six counted
    expect(tapeReading.diagnose(p, "reading", new Fraction(189, 8))).toBe("misnamed-graduations"); // 23 5/8: read as eighths
    expect(tapeReading.diagnose(p, "reading", new Fraction(373, 16))).toBeNull();
  });
});

describe("tape-reading: every seed", () => {
  for (const level of LEVELS) {
    it(`level ${level}: deterministic, realistic, no answer in the prompt, slips recognised`, () => {
      for (let seed = 0; seed < SEEDS; seed++) {
        const p = tapeReading.generate(seed, level);
        expect(tapeReading.generate(seed, level)).toEqual(p);
        expect(p.finest).toBe(level === 3 ? 32 : 16);
        expect(p.count).toBeGreaterThan(0);
        expect(p.count).toBeLessThan(p.finest);
        if (level === 1) expect(p.count % 2).toBe(0);
        else expect(p.count % 2).toBe(1);
        expect(p.from === p.whole || p.from === p.whole - 1).toBe(true);
        expect(p.whole).toBeGreaterThanOrEqual(1);

        const expected = tapeReading.solve(p);
        const [part] = tapeReading.parts(p);
        const exact = expected.reading;
        expect(exact.compare(p.whole)).toBeGreaterThan(0);
        expect(exact.compare(p.whole + 1)).toBeLessThan(0);
        const prompt = tapeReading.render(p);
        const right = roundedAnswer(exact, part.precision);
        expect(containsMeasure(prompt.text, right)).toBe(false);
        expect(prompt.figure!.description).not.toContain(inchText(right));
        expect(tapeReading.diagnose(p, part.key, right)).toBeNull();

        for (const slip of modelledSlips(TAPE_READING_MODEL, p)) {
          expect(slip.answer.sub(exact).abs().compare(toleranceFor(part))).toBeGreaterThan(0);
          expect(tapeReading.diagnose(p, slip.part, slip.answer)).toBe(slip.pattern);
        }
        expect(tapeReading.explain(p).at(-1)).toContain(inchText(right));
      }
    }, SLOW);
  }
});
