import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { Fraction, ZERO, fromMillimetres, sum } from "@/lib/layout/core";
import { cutList, type CutListInput, type CutListResult } from "@/lib/layout/cut-list";
import { exactPacking, bestPossible, lowerBoundL2 } from "@/lib/layout/cut-list-exact";
import { StockChooser, heuristicPacking } from "@/lib/layout/cut-list-heuristic";
import { cutListSchema } from "@/lib/layout/cut-list-schema";
import { exactFromNumber } from "@/lib/layout/measure";

const F = (value: number | string) => new Fraction(value);
const inch = (text: string) => new Fraction(text);

function boardsOf(result: CutListResult) {
  return result.boards.map((board) => ({ stock: board.stockLength.toFraction(), cuts: board.cuts.map((cut) => cut.length.toFraction()) }));
}

describe("the kerf model", () => {
  // REFERENCES.md, saw kerf (common practice, no source): four 24" pieces from a 96" board
  // with a 1/8" kerf do not fit — three kerfs make the last piece 3/8" short.
  it("does not fit four 24\" pieces on a 96\" board with a 1/8\" kerf", () => {
    const result = cutList({ pieces: [{ label: "shelf", length: F(24), quantity: 4 }], stock: [{ length: F(96) }], kerf: inch("1/8") });
    expect(result.boardCount).toBe(2);
    expect(result.optimal).toBe(true);
    const full = result.boards.find((board) => board.cuts.length === 3)!;
    // What is left for the fourth piece after three pieces and three kerfs: 3/8" short of 24".
    expect(full.offcut.equals(F(24).sub(inch("3/8")))).toBe(true);
    expect(full.cuts.map((cut) => cut.start.toFraction())).toEqual(["0", "193/8", "193/4"]); // 0, 24 1/8, 48 1/4
  });

  it("fits them with no kerf, the last piece ending at the board's end", () => {
    const result = cutList({ pieces: [{ label: "shelf", length: F(24), quantity: 4 }], stock: [{ length: F(96) }], kerf: ZERO });
    expect(result.boardCount).toBe(1);
    expect(result.boards[0].offcut.equals(ZERO)).toBe(true);
    expect(result.wastePercent).toBe(0);
  });

  it("needs no kerf after a last piece that ends exactly at the board's end", () => {
    // 47 15/16 + 1/16 kerf + 48 = 96 exactly.
    const result = cutList({ pieces: [{ label: "a", length: inch("767/16"), quantity: 1 }, { label: "b", length: F(48), quantity: 1 }], stock: [{ length: F(96) }], kerf: inch("1/16") });
    expect(result.boardCount).toBe(1);
    const [board] = result.boards;
    expect(board.offcut.equals(ZERO)).toBe(true);
    expect(board.used.equals(F(96))).toBe(true);
    expect(board.cuts.map((cut) => [cut.length.toFraction(), cut.start.toFraction()])).toEqual([["48", "0"], ["767/16", "769/16"]]);
  });

  it("takes the parting cut's kerf out of the offcut, and a sliver thinner than a kerf is dust", () => {
    const offcutOf = (piece: string) => cutList({ pieces: [{ label: "p", length: inch(piece), quantity: 1 }], stock: [{ length: F(96) }], kerf: inch("1/8") }).boards[0];
    const wide = offcutOf("90"); // 6" left, the cut takes 1/8"
    expect(wide.offcut.equals(inch("47/8"))).toBe(true);
    expect(wide.used.add(wide.offcut).equals(F(96))).toBe(true);
    const sliver = offcutOf("1535/16"); // 1/16" left, less than the kerf
    expect(sliver.offcut.equals(ZERO)).toBe(true);
    expect(sliver.used.equals(F(96))).toBe(true);
  });

  it("cuts the end trim off first and measures the cuts from the trimmed end", () => {
    // Usable 95 1/2": two 47 11/16" pieces + one kerf = 95 1/2" exactly.
    const result = cutList({ pieces: [{ label: "rail", length: inch("763/16"), quantity: 2 }], stock: [{ length: F(96) }], kerf: inch("1/8"), trim: inch("1/2") });
    expect(result.boardCount).toBe(1);
    const [board] = result.boards;
    expect(board.cuts.map((cut) => cut.start.toFraction())).toEqual(["0", "765/16"]);
    expect(board.offcut.equals(ZERO)).toBe(true);
    // With the trim, one more sixteenth no longer fits.
    const longer = cutList({ pieces: [{ label: "rail", length: inch("764/16"), quantity: 2 }], stock: [{ length: F(96) }], kerf: inch("1/8"), trim: inch("1/2") });
    expect(longer.boardCount).toBe(2);
  });

  it("works the same in millimetres: four 600 mm pieces with a 3 mm kerf do not fit 2400 mm", () => {
    // The inch example above, in metric (common practice, no source).
    const mm = (n: number) => fromMillimetres(n);
    const result = cutList({ pieces: [{ label: "shelf", length: mm(600), quantity: 4 }], stock: [{ length: mm(2400) }], kerf: mm(3), unit: "mm" });
    expect(result.boardCount).toBe(2);
    const full = result.boards.find((board) => board.cuts.length === 3)!;
    expect(full.offcut.equals(mm(600 - 9))).toBe(true);
  });
});

describe("choosing the stock", () => {
  const pieces46 = (quantity: number) => [{ label: "stile", length: F(46), quantity }];
  const eightAndSixteen = [{ length: F(96), price: 6 }, { length: F(192), price: 14 }];

  it("puts fewest boards first, even when more boards would cost less", () => {
    // Four 46" pieces: two 8' boards ($12) or one 16' ($14); the plan buys one board.
    const result = cutList({ pieces: pieces46(4), stock: eightAndSixteen, kerf: inch("1/8") });
    expect(result.byStock).toEqual([{ stockIndex: 1, stockLength: F(192), count: 1, price: 14 }]);
    expect(result.totalCost).toBe(14);
  });

  it("among plans with as few boards, buys the cheapest mix", () => {
    // Five 46" pieces need two boards: 16' + 8' ($20) beats two 16' ($28).
    const result = cutList({ pieces: pieces46(5), stock: eightAndSixteen, kerf: inch("1/8") });
    expect(result.boardCount).toBe(2);
    expect(result.byStock.map((row) => [row.stockIndex, row.count])).toEqual([[0, 1], [1, 1]]);
    expect(result.totalCost).toBe(20);
    expect(result.optimal).toBe(true);
  });

  it("buys a longer board when it is cheaper, and the shortest when nothing is priced", () => {
    const stock = [{ length: F(96), price: 7 }, { length: F(120), price: 6.5 }];
    const piece = [{ label: "rail", length: F(50), quantity: 1 }];
    expect(cutList({ pieces: piece, stock, kerf: inch("1/8") }).byStock[0].stockIndex).toBe(1);
    expect(cutList({ pieces: piece, stock: stock.map(({ length }) => ({ length })), kerf: inch("1/8") }).byStock[0].stockIndex).toBe(0);
  });

  it("adds prices exactly", () => {
    // In floating point 0.1 + 0.2 is 0.30000000000000004.
    const result = cutList({ pieces: [{ label: "a", length: F(90), quantity: 1 }, { label: "b", length: F(100), quantity: 1 }], stock: [{ length: F(96), price: 0.1 }, { length: F(120), price: 0.2 }], kerf: ZERO });
    expect(result.totalCost).toBe(0.3);
  });

  it("ignores cost, and says so, when only some stock is priced", () => {
    const result = cutList({ pieces: [{ label: "a", length: F(50), quantity: 1 }], stock: [{ length: F(96), price: 9 }, { length: F(120) }], kerf: ZERO });
    expect(result.warnings.map((w) => w.code)).toContain("price-missing");
    expect(result.byStock[0].stockIndex).toBe(0);
    expect(result.totalCost).toBe(9);
  });

  it("never uses stock the trim leaves nothing of", () => {
    const result = cutList({ pieces: [{ label: "a", length: F(10), quantity: 2 }], stock: [{ length: F(2) }, { length: F(96) }], kerf: ZERO, trim: F(3) });
    expect(result.warnings.map((w) => w.code)).toContain("stock-shorter-than-trim");
    expect(result.boards.every((board) => board.stockIndex === 1)).toBe(true);
  });
});

describe("pieces that no stock holds", () => {
  it("leaves them off the plan with a warning that says what would do", () => {
    const result = cutList({
      pieces: [{ label: "rail", length: F(110), quantity: 2 }, { label: "stile", length: F(30), quantity: 2 }],
      stock: [{ length: F(96) }],
      kerf: inch("1/8"),
    });
    expect(result.unplaced).toEqual([{ label: "rail", length: F(110), quantity: 2 }]);
    expect(result.boards.flatMap((board) => board.cuts.map((cut) => cut.label))).toEqual(["stile", "stile"]);
    const [warning] = result.warnings;
    expect(warning.code).toBe("piece-longer-than-stock");
    // Lumber comes in 2' steps (common practice, no source): 9' 2" needs a 10' board.
    expect(warning.message).toBe("The 9' 2\" rail is longer than every stock length (8' 0\" is the longest); a 10' board would do. All 2 are left off the plan.");
  });

  it("counts the trim against the stock", () => {
    const result = cutList({ pieces: [{ label: "rail", length: F(96), quantity: 1 }], stock: [{ length: F(96) }], kerf: ZERO, trim: inch("1/2") });
    expect(result.unplaced).toHaveLength(1);
    expect(result.warnings[0].message).toMatch(/once the 1\/2" trim is cut off \(the longest leaves 7' 11 1\/2"\); a 10' board would do/);
    expect(result.boardCount).toBe(0);
    expect(result.wastePercent).toBe(0);
  });
});

describe("edge cases and bad engine input", () => {
  it("plans nothing for no pieces", () => {
    const result = cutList({ pieces: [], stock: [{ length: F(96) }], kerf: inch("1/8") });
    expect(result).toMatchObject({ boardCount: 0, lowerBound: 0, optimal: true, wastePercent: 0, boards: [], byStock: [] });
  });

  it("throws RangeError on input the schema would have refused", () => {
    const base: CutListInput = { pieces: [{ label: "a", length: F(10), quantity: 1 }], stock: [{ length: F(96) }], kerf: ZERO };
    expect(() => cutList({ ...base, stock: [] })).toThrow(RangeError);
    expect(() => cutList({ ...base, kerf: F(-1) })).toThrow(RangeError);
    expect(() => cutList({ ...base, pieces: [{ label: "a", length: ZERO, quantity: 1 }] })).toThrow(RangeError);
    expect(() => cutList({ ...base, pieces: [{ label: "a", length: F(1), quantity: 1.5 }] })).toThrow(RangeError);
  });

  it("plans lengths divided absurdly finely on a millionth-of-an-inch grid, and the plan still fits", () => {
    // Found by the request-body fuzzer: a kerf sent as the JSON number 5e-324 made the exact
    // common denominator too big for the packers, and the route answered 500.
    const tiny = exactFromNumber(5e-324);
    const raw = {
      pieces: [
        { length: F(48).sub(tiny), quantity: 2 },
        { length: F(30).add(new Fraction(1n, 9999991n)), quantity: 3 },
      ],
      stock: [{ length: F(96) }, { length: F(120) }],
      kerf: tiny,
      trim: ZERO,
    };
    checkInvariants(raw);
    const result = cutList({ ...raw, pieces: raw.pieces.map((piece, row) => ({ label: `row ${row}`, ...piece })) });
    expect(result.boardCount).toBe(2);
    expect(result.optimal).toBe(false);
    expect(result.warnings.map((w) => w.code)).toEqual(["planned-on-a-grid"]);
  });

  it("gives the same plan every time", () => {
    const input: CutListInput = { pieces: [{ label: "a", length: inch("31 5/16"), quantity: 9 }, { label: "b", length: inch("17 3/4"), quantity: 13 }], stock: [{ length: F(96) }, { length: F(144) }], kerf: inch("1/8") };
    expect(boardsOf(cutList(input))).toEqual(boardsOf(cutList(input)));
  });
});

describe("the exact search", () => {
  // 55, 40, 25, 23, 21, 19, 17 total 200" = two 100" boards by length, but no set holding the
  // 55 makes exactly 100 (55 needs 45 more: no two of the rest make 45, any three make 57 or
  // more), so three boards are needed — computed by hand.
  const lengths = [55, 40, 25, 23, 21, 19, 17];

  it("proves a count above the lower bound", () => {
    const result = cutList({ pieces: lengths.map((n) => ({ label: `${n}`, length: F(n), quantity: 1 })), stock: [{ length: F(100) }], kerf: ZERO });
    expect(result.lowerBound).toBe(2);
    expect(result.boardCount).toBe(3);
    expect(result.optimal).toBe(true);
    expect(result.method).toBe("exact");
    expect(result.warnings).toEqual([]);
  });

  it("keeps the plan in hand, unproven, when its budget runs out", () => {
    const chooser = new StockChooser([{ capacity: 100, cost: 0, length: 100, index: 0 }]);
    const incumbent = heuristicPacking(lengths, chooser);
    const bound = bestPossible(chooser, lowerBoundL2(lengths, 100), 200);
    const starved = exactPacking(lengths, chooser, incumbent, bound, 1);
    expect(starved).toMatchObject({ complete: false, packing: incumbent });
    expect(exactPacking(lengths, chooser, incumbent, bound, 100_000)).toMatchObject({ complete: true, score: { count: 3 } });
  });
});

// fast-check invariants on random lists: small ones take the exact path, long ones the heuristic.
const sixteenths = (min: number, max: number) => fc.integer({ min: min * 16, max: max * 16 }).map((n) => new Fraction(n, 16));
const listArbitrary = (maxRows: number, maxQuantity: number) =>
  fc.record({
    pieces: fc.array(fc.record({ length: sixteenths(1, 200), quantity: fc.integer({ min: 0, max: maxQuantity }) }), { minLength: 0, maxLength: maxRows }),
    stock: fc.array(fc.record({ length: sixteenths(24, 240), price: fc.option(fc.integer({ min: 0, max: 5000 }).map((c) => c / 100), { nil: undefined }) }), { minLength: 1, maxLength: 4 }),
    kerf: fc.constantFrom(ZERO, inch("3/32"), inch("1/8"), inch("1/4")),
    trim: fc.constantFrom(ZERO, inch("1/4"), inch("1/2"), F(2)),
  });

function checkInvariants(raw: { pieces: { length: Fraction; quantity: number }[]; stock: { length: Fraction; price?: number }[]; kerf: Fraction; trim: Fraction }) {
  const input: CutListInput = { ...raw, pieces: raw.pieces.map((piece, row) => ({ label: `row ${row}`, ...piece })) };
  const result = cutList(input);
  const { kerf, trim } = raw;

  // Every piece is cut exactly once, or listed as unplaced.
  const cutCount = new Map<string, number>();
  for (const board of result.boards) for (const cut of board.cuts) cutCount.set(cut.label, (cutCount.get(cut.label) ?? 0) + 1);
  input.pieces.forEach((piece) => {
    const unplaced = result.unplaced.filter((u) => u.label === piece.label).reduce((n, u) => n + u.quantity, 0);
    expect((cutCount.get(piece.label) ?? 0) + unplaced).toBe(piece.quantity);
  });
  // Unplaced means longer than every stock after the trim; everything else was placed.
  for (const u of result.unplaced) expect(input.stock.every((s) => u.length.compare(s.length.sub(trim)) > 0)).toBe(true);

  // No board over-filled; cuts in order, a kerf apart; used + offcut = stock.
  for (const board of result.boards) {
    const stock = input.stock[board.stockIndex];
    expect(board.stockLength.equals(stock.length)).toBe(true);
    const pieces = sum(board.cuts.map((cut) => cut.length));
    expect(pieces.add(kerf.mul(board.cuts.length - 1)).add(trim).compare(stock.length)).toBeLessThanOrEqual(0);
    board.cuts.forEach((cut, i) => {
      const expected = i === 0 ? ZERO : board.cuts[i - 1].start.add(board.cuts[i - 1].length).add(kerf);
      expect(cut.start.equals(expected)).toBe(true);
    });
    expect(board.used.add(board.offcut).equals(board.stockLength)).toBe(true);
    // The offcut is what the parting cut leaves past the last piece, or nothing.
    const past = stock.length.sub(trim).sub(pieces).sub(kerf.mul(board.cuts.length));
    expect(board.offcut.equals(past.compare(0) > 0 ? past : ZERO)).toBe(true);
    expect(board.offcut.compare(0)).toBeGreaterThanOrEqual(0);
    expect(board.cuts.length).toBeGreaterThan(0);
  }

  // What to buy matches the boards.
  expect(result.boardCount).toBe(result.boards.length);
  expect(result.byStock.reduce((n, row) => n + row.count, 0)).toBe(result.boardCount);
  for (const row of result.byStock) expect(result.boards.filter((board) => board.stockIndex === row.stockIndex)).toHaveLength(row.count);
  expect(result.boardCount).toBeGreaterThanOrEqual(result.lowerBound);
  if (result.boardCount > 0 && input.stock.every((s) => s.price !== undefined)) {
    expect(result.totalCost).toBeCloseTo(result.byStock.reduce((total, row) => total + row.price! * row.count, 0), 6);
  }

  expect(result.wastePercent).toBeGreaterThanOrEqual(0);
  expect(result.wastePercent).toBeLessThanOrEqual(100);
  expect(result.totalStockLength.equals(sum(result.boards.map((b) => b.stockLength)))).toBe(true);
  const pieceTotal = sum(result.boards.flatMap((b) => b.cuts.map((c) => c.length)));
  expect(result.totalPieceLength.equals(pieceTotal)).toBe(true);
}

describe("invariants for any list", () => {
  it("holds on short lists (the exact search)", () => {
    fc.assert(fc.property(listArbitrary(6, 5), checkInvariants), { seed: 4242, numRuns: 300 });
  });

  it("holds on long lists, up to 300 pieces (the heuristic)", () => {
    const long = listArbitrary(30, 10).filter((list) => list.pieces.reduce((n, p) => n + p.quantity, 0) <= 300);
    fc.assert(fc.property(long, checkInvariants), { seed: 4343, numRuns: 120 });
  });
});

describe("cutListSchema", () => {
  const body = {
    unit: "in",
    pieces: [{ label: "Top rail", length: "8' 2\"", quantity: "2" }, { label: "Batten", length: "84 3/4", quantity: 6 }],
    stock: [{ length: "8'", price: "$4.25" }, { length: 120, price: "" }],
  };

  it("reads tape notation into the engine's input, with a 1/8\" kerf and no trim by default", () => {
    const parsed = cutListSchema.parse(body);
    expect(parsed.unit).toBe("in");
    expect(parsed.denominator).toBe(16);
    expect(parsed.kerf.equals(inch("1/8"))).toBe(true);
    expect(parsed.trim!.equals(ZERO)).toBe(true);
    expect(parsed.pieces).toEqual([{ label: "Top rail", length: F(98), quantity: 2 }, { label: "Batten", length: inch("339/4"), quantity: 6 }]);
    expect(parsed.stock).toEqual([{ length: F(96), price: 4.25 }, { length: F(120) }]);
    expect(cutList(parsed).boardCount).toBeGreaterThan(0);
  });

  it("reads millimetres", () => {
    const parsed = cutListSchema.parse({ unit: "mm", kerf: "3", pieces: [{ label: "", length: 600, quantity: 4 }], stock: [{ length: "2400" }] });
    expect(parsed.kerf.equals(fromMillimetres(3))).toBe(true);
    expect(parsed.pieces[0].length.equals(fromMillimetres(600))).toBe(true);
  });

  it("names the row of each error", () => {
    const result = cutListSchema.safeParse({
      ...body,
      pieces: [body.pieces[0], body.pieces[1], { label: "Stile", length: "22 3/", quantity: "0" }],
      stock: [{ length: "8'", price: "4.255" }],
    });
    expect(result.success).toBe(false);
    const issues = result.error!.issues.map((issue) => [issue.path.join("."), issue.message]);
    expect(issues).toContainEqual(["pieces.2.length", expect.stringMatching(/^Piece 3 length: /)]);
    expect(issues).toContainEqual(["pieces.2.quantity", "Piece 3 quantity must be at least 1."]);
    expect(issues).toContainEqual(["stock.0.price", "Stock 1 price: give it to the cent, like 4.25."]);
  });

  it("limits the list: rows, quantities and stock lengths", () => {
    const pieces = Array.from({ length: 201 }, () => ({ label: "a", length: "10", quantity: 1 }));
    expect(cutListSchema.safeParse({ ...body, pieces }).success).toBe(false);
    expect(cutListSchema.safeParse({ ...body, pieces: [{ label: "a", length: "10", quantity: 501 }] }).success).toBe(false);
    expect(cutListSchema.safeParse({ ...body, stock: Array.from({ length: 11 }, () => ({ length: "96" })) }).success).toBe(false);
    expect(cutListSchema.safeParse({ ...body, stock: [] }).success).toBe(false);
    expect(cutListSchema.safeParse({ ...body, trim: "8'" }).error!.issues[0].path).toEqual(["trim"]);
  });
});
