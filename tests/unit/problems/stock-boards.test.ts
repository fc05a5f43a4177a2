import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { inchTex, inchText, roundedAnswer } from "@/lib/problems/kit";
import { modelledSlips, toleranceFor } from "@/lib/problems/stock-figures";
import { STOCK_BOARDS_MODEL, stockBoards, type StockBoardsParams } from "@/lib/problems/stock-boards";
import { LEVELS } from "@/lib/problems/types";

const SEEDS = 200;
const SLOW = 120_000;

function containsMeasure(text: string, value: Fraction): boolean {
  const escape = (m: string) => m.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");
  return [inchText(value), inchText(value, "feet-inches"), inchTex(value)].some((m) => new RegExp(`(?<![\\d/.{])(?<!\\d )(?<!' )${escape(m)}`).test(text));
}

describe("stock-boards: the kerf example", () => {
  it("fits only three 24\" pieces on a 96\" board with a 1/8\" kerf", () => {
    // REFERENCES.md saw kerf (common practice, no source): four 24" pieces from 96" with a 1/8"
    // kerf need three kerfs, 3/8" more than the board, so the fourth piece comes up short.
    const p: StockBoardsParams = { level: 1, stockFeet: 8, kerf: new Fraction(1, 8), pieces: [{ label: "rail", length: new Fraction(24), quantity: 4 }] };
    const answer = stockBoards.solve(p);
    expect(answer.perBoard.equals(3)).toBe(true);
    expect(answer.boards.equals(2)).toBe(true);
    // Three rails and three kerfs (the last parts the offcut off): 96 − 72 − 3/8 = 23 5/8
    expect(answer.offcut.equals(new Fraction(189, 8))).toBe(true);
    expect(stockBoards.diagnose(p, "perBoard", new Fraction(4))).toBe("forgot-kerf");
    expect(stockBoards.diagnose(p, "boards", new Fraction(1))).toBe("forgot-kerf");
    expect(stockBoards.diagnose(p, "offcut", new Fraction(24))).toBe("forgot-kerf");
  });
});

describe("stock-boards: every seed", () => {
  for (const level of LEVELS) {
    it(
      `level ${level}: deterministic, realistic, no answer in the prompt, slips recognised`,
      () => {
        for (let seed = 0; seed < SEEDS; seed++) {
          const p = stockBoards.generate(seed, level);
          expect(stockBoards.generate(seed, level)).toEqual(p);
          expect([8, 10, 12, 16]).toContain(p.stockFeet);
          expect(p.kerf.equals(new Fraction(1, 8)) || p.kerf.equals(new Fraction(3, 32))).toBe(true);
          expect(p.pieces.length).toBeGreaterThanOrEqual(2);
          expect(p.pieces.length).toBeLessThanOrEqual(3);
          expect(p.pieces.reduce((t, x) => t + x.quantity, 0)).toBeLessThanOrEqual(30);
          for (const piece of p.pieces) {
            expect(piece.length.compare(8)).toBeGreaterThanOrEqual(0);
            expect(piece.length.compare(p.stockFeet * 12)).toBeLessThan(0);
            expect(piece.quantity).toBeGreaterThanOrEqual(2);
          }

          const expected = stockBoards.solve(p);
          expect(expected.perBoard.compare(2)).toBeGreaterThanOrEqual(0);
          expect(expected.boards.compare(1)).toBeGreaterThanOrEqual(0);
          expect(expected.perBoard.d === 1n && expected.boards.d === 1n).toBe(true);
          expect(expected.offcut.compare(0)).toBeGreaterThan(0);
          const parts = stockBoards.parts(p);
          const prompt = stockBoards.render(p);
          for (const part of parts) {
            const right = part.answer === "count" ? expected[part.key] : roundedAnswer(expected[part.key], part.precision);
            if (part.answer === "length") expect(containsMeasure(prompt.text, right)).toBe(false);
            expect(stockBoards.diagnose(p, part.key, right)).toBeNull();
          }
          const slips = modelledSlips(STOCK_BOARDS_MODEL, p);
          for (const slip of slips) {
            const part = parts.find((x) => x.key === slip.part)!;
            expect(slip.answer.sub(expected[slip.part]).abs().compare(toleranceFor(part))).toBeGreaterThan(0);
            expect(stockBoards.diagnose(p, slip.part, slip.answer)).toBe(slip.pattern);
          }
          // A forgotten kerf shows in every part.
          expect(new Set(slips.filter((s) => s.pattern === "forgot-kerf").map((s) => s.part))).toEqual(new Set(["perBoard", "offcut", "boards"]));
          expect(stockBoards.explain(p).at(-1)).toContain(`${expected.boards.toString()} boards`);
        }
      },
      SLOW,
    );
  }
});
