// The exact search against an independent computation: yalps (an integer-programming
// package from npm) solves the same small cut lists as a pattern model, and the board
// count, cost and stock length it proves best must be what cutList returns.
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { solve, type Model } from "yalps";
import { Fraction } from "@/lib/layout/core";
import { cutList, type CutListInput } from "@/lib/layout/cut-list";
import { bestPossible, exactPacking, lowerBoundL2 } from "@/lib/layout/cut-list-exact";
import { StockChooser } from "@/lib/layout/cut-list-heuristic";

// Everything in the model is in 32nds of an inch: pieces are in 16ths, kerfs 3/32 or 1/8.
const UNIT = 32;

type Case = { pieces: { length: number; quantity: number }[]; stock: { length: number; price?: number }[]; kerf: number; trim: number };

/**
 * Every "full" way to cut one board: a count of each piece (within what is needed) such
 * that pieces + kerf × (cuts − 1) ≤ stock − trim — the documented kerf rule, written
 * out here on its own — and no further piece would fit. Covering the demand (≥) with full
 * patterns has the same optimum as an exact assignment: extra pieces can be left uncut.
 */
function fullPatterns(c: Case, usable: number): number[][] {
  const patterns: number[][] = [];
  const counts = c.pieces.map(() => 0);
  const fits = (extraType: number) => {
    let total = 0;
    let cuts = 0;
    counts.forEach((count, t) => {
      const n = count + (t === extraType ? 1 : 0);
      total += n * c.pieces[t].length;
      cuts += n;
    });
    return cuts === 0 || total + c.kerf * (cuts - 1) <= usable;
  };
  const walk = (t: number) => {
    if (t === c.pieces.length) {
      const full = c.pieces.every((piece, u) => counts[u] === piece.quantity || !fits(u));
      if (full && counts.some((n) => n > 0)) patterns.push([...counts]);
      return;
    }
    for (let n = 0; n <= c.pieces[t].quantity; n++) {
      counts[t] = n;
      if (n > 0 && !fits(-1)) break;
      walk(t + 1);
    }
    counts[t] = 0;
  };
  walk(0);
  return patterns;
}

type Optimum = { count: number; cost?: number; length: number };

/** Fewest boards; then, holding that, least cost (when priced); then least stock length. */
function yalpsOptimum(c: Case): Optimum {
  const variables = new Map<string, Record<string, number>>();
  c.stock.forEach((stock, j) => {
    fullPatterns(c, stock.length - c.trim).forEach((pattern, p) => {
      const coefficients: Record<string, number> = { boards: 1, cost: stock.price ?? 0, length: stock.length / UNIT };
      pattern.forEach((n, t) => {
        if (n > 0) coefficients[`piece${t}`] = n;
      });
      variables.set(`s${j}p${p}`, coefficients);
    });
  });
  const demand: Record<string, { min: number }> = {};
  c.pieces.forEach((piece, t) => (demand[`piece${t}`] = { min: piece.quantity }));
  const run = (objective: string, fixed: Record<string, { equal: number }>) => {
    const model: Model = { direction: "minimize", objective, constraints: { ...demand, ...fixed }, variables, integers: true };
    const solution = solve(model, { maxIterations: 1_000_000 });
    expect(solution.status).toBe("optimal");
    return Math.round(solution.result);
  };
  const count = run("boards", {});
  const priced = c.stock.every((stock) => stock.price !== undefined);
  const cost = priced ? run("cost", { boards: { equal: count } }) : undefined;
  const length = run("length", { boards: { equal: count }, ...(cost !== undefined && { cost: { equal: cost } }) });
  return { count, cost, length };
}

const toInput = (c: Case): CutListInput => ({
  pieces: c.pieces.map((piece, t) => ({ label: `piece ${t + 1}`, length: new Fraction(piece.length, UNIT), quantity: piece.quantity })),
  stock: c.stock.map((stock) => ({ length: new Fraction(stock.length, UNIT), price: stock.price })),
  kerf: new Fraction(c.kerf, UNIT),
  trim: new Fraction(c.trim, UNIT),
});

// Stock from 4' to 16' in whole inches; pieces in whole inches or in sixteenths, at most 12
// in all; whole-dollar prices so the model's costs are exact.
const sixteenthLength = (min: number, max: number) => fc.integer({ min: min * 16, max: max * 16 }).map((n) => n * 2);
const inchLength = (min: number, max: number) => fc.integer({ min, max }).map((n) => n * UNIT);
const cases = (inSixteenths: boolean, priced: boolean): fc.Arbitrary<Case> =>
  fc.record({
    pieces: fc
      .array(fc.record({ length: inSixteenths ? sixteenthLength(6, 100) : inchLength(6, 100), quantity: fc.integer({ min: 1, max: 4 }) }), { minLength: 1, maxLength: 5 })
      .filter((pieces) => pieces.reduce((n, piece) => n + piece.quantity, 0) <= 12),
    stock: fc.uniqueArray(fc.record({ length: inchLength(48, 192), price: priced ? fc.integer({ min: 3, max: 40 }) : fc.constant(undefined) }), {
      minLength: 1,
      maxLength: 2,
      selector: (stock) => stock.length,
    }),
    kerf: fc.constantFrom(0, 3, 4),
    trim: fc.constantFrom(0, 16),
  }).filter((c) => c.pieces.every((piece) => piece.length <= Math.max(...c.stock.map((s) => s.length)) - c.trim));

let aboveBound = 0;

function agrees(c: Case) {
  const result = cutList(toInput(c));
  if (result.boardCount > result.lowerBound) aboveBound += 1;
  const optimum = yalpsOptimum(c);
  expect(result.method).toBe("exact");
  expect(result.optimal).toBe(true);
  expect(result.boardCount).toBe(optimum.count);
  if (optimum.cost !== undefined) expect(result.totalCost).toBe(optimum.cost);
  expect(result.totalStockLength.equals(optimum.length)).toBe(true);
  expect(result.lowerBound).toBeLessThanOrEqual(optimum.count);

  // The search on its own, from the worst start (a board per piece), so it cannot lean on
  // the heuristic having found the optimum already.
  const priced = optimum.cost !== undefined;
  const options = c.stock.map((stock, index) => ({ capacity: stock.length - c.trim + c.kerf, cost: priced ? stock.price! : 0, length: stock.length, index }));
  const sizes = c.pieces.flatMap((piece) => new Array<number>(piece.quantity).fill(piece.length + c.kerf)).sort((a, b) => b - a);
  const chooser = new StockChooser(options);
  const bound = bestPossible(chooser, lowerBoundL2(sizes, chooser.capacity), sizes.reduce((a, b) => a + b, 0));
  const search = exactPacking(sizes, chooser, sizes.map((_, item) => [item]), bound, 5_000_000);
  expect(search.complete).toBe(true);
  expect(search.score).toEqual({ count: optimum.count, cost: optimum.cost ?? 0, length: optimum.length * UNIT });
}

describe("cutList matches the optimum yalps proves", () => {
  it("on whole-inch lists, one or two stock lengths, no prices (fewest boards, then least stock)", () => {
    fc.assert(fc.property(cases(false, false), agrees), { seed: 1601, numRuns: 150 });
  });

  it("on lists in sixteenths", () => {
    fc.assert(fc.property(cases(true, false), agrees), { seed: 1602, numRuns: 150 });
  });

  it("on priced stock (fewest boards, then least cost, then least stock)", () => {
    fc.assert(fc.property(cases(true, true), agrees), { seed: 1603, numRuns: 150 });
  });

  // Pieces of a fifth to two thirds of a board: the bound is often short of the optimum, so
  // the search itself has to prove the count, and the choice of stock matters.
  const awkward = (priced: boolean): fc.Arbitrary<Case> =>
    fc.record({
      pieces: fc
        .array(fc.record({ length: sixteenthLength(18, 60), quantity: fc.integer({ min: 1, max: 3 }) }), { minLength: 3, maxLength: 6 })
        .filter((pieces) => pieces.reduce((n, piece) => n + piece.quantity, 0) <= 12),
      stock: fc.uniqueArray(fc.record({ length: fc.constantFrom(72, 96, 120, 144).map((n) => n * UNIT), price: priced ? fc.integer({ min: 3, max: 40 }) : fc.constant(undefined) }), {
        minLength: 1,
        maxLength: 2,
        selector: (stock) => stock.length,
      }),
      kerf: fc.constantFrom(0, 3, 4),
      trim: fc.constantFrom(0, 16),
    });

  it("on awkward lists, where the search must prove more than the bound", () => {
    aboveBound = 0;
    fc.assert(fc.property(awkward(false), agrees), { seed: 1604, numRuns: 150 });
    fc.assert(fc.property(awkward(true), agrees), { seed: 1605, numRuns: 150 });
    expect(aboveBound).toBeGreaterThan(10);
  });
});
