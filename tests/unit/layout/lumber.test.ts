import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout/core";
import { actualSize, boardFeet, LUMBER_SIZE_TABLE, parseNominal } from "@/lib/layout/lumber";
import { parseMeasure } from "@/lib/layout/measure";

const inches = (text: string) => {
  const result = parseMeasure(text);
  if (!result.ok) throw new Error(result.error.message);
  return result.value;
};

describe("PS 20 dressed sizes", () => {
  // American Softwood Lumber Standard PS 20, Table 3, dry dressed sizes.
  it.each([
    ["1x2", "3/4", "1 1/2"],
    ["1x3", "3/4", "2 1/2"],
    ["1x4", "3/4", "3 1/2"],
    ["1x6", "3/4", "5 1/2"],
    ["1x8", "3/4", "7 1/4"],
    ["1x10", "3/4", "9 1/4"],
    ["1x12", "3/4", "11 1/4"],
    ["2x4", "1 1/2", "3 1/2"],
    ["2x6", "1 1/2", "5 1/2"],
    ["2x8", "1 1/2", "7 1/4"],
    ["2x10", "1 1/2", "9 1/4"],
    ["2x12", "1 1/2", "11 1/4"],
  ])("%s is %s × %s", (nominal, thickness, width) => {
    const lumber = parseNominal(nominal);
    expect(lumber).not.toBeNull();
    expect(lumber?.actual.thickness.equals(inches(thickness))).toBe(true);
    expect(lumber?.actual.width.equals(inches(width))).toBe(true);
  });

  it("reads the ways a size is written", () => {
    for (const text of ["1x4", "1 x 4", "1X4", "1×4", " 1x4 "]) {
      expect(parseNominal(text)?.nominal).toEqual({ t: 1, w: 4 });
    }
    expect(parseNominal("2X6")?.nominal).toEqual({ t: 2, w: 6 });
  });

  it("returns null for what is not a size in the table", () => {
    for (const text of ["", "1x5", "3x4", "2x", "x4", "2x4x8", "1/2x4", "abc", "constructor", "9".repeat(1000), `1x4${" ".repeat(13)}junk`]) {
      expect(parseNominal(text)).toBeNull();
    }
    expect(actualSize({ t: 2, w: 7 })).toBeNull();
  });

  it("keeps the green sizes beside the dry ones for the teaching note", () => {
    // PS 20 green sizes: 1x 25/32"; widths 1 9/16, 2 9/16, 3 9/16, 5 5/8, 7 1/2, 9 1/2, 11 1/2.
    const one = LUMBER_SIZE_TABLE.thickness.find((row) => row.nominal === 1);
    expect(one?.green.equals(new Fraction(25, 32))).toBe(true);
    expect(LUMBER_SIZE_TABLE.width.map((row) => row.green.toFraction(true))).toEqual([
      "1 9/16",
      "2 9/16",
      "3 9/16",
      "5 5/8",
      "7 1/2",
      "9 1/2",
      "11 1/2",
    ]);
    // A green board is always fuller than the dry one it becomes.
    for (const row of [...LUMBER_SIZE_TABLE.thickness, ...LUMBER_SIZE_TABLE.width]) expect(row.green.gt(row.dry)).toBe(true);
  });
});

describe("board feet", () => {
  // US Navy Engineering Aid manual: bf = T(in) × W(in) × L(ft) / 12, nominal sizes.
  it("a 14' 2x4 is 9 1/3 board feet", () => {
    // computed from the manual's rule: 2 × 4 × 14 / 12 = 28/3.
    expect(boardFeet({ nominalThickness: 2, nominalWidth: 4, lengthFeet: 14 }).toFraction(true)).toBe("9 1/3");
  });

  it("14' × 11\" × 1\" is 12 10/12 board feet", () => {
    // Board-measure table of the steel square, older manual-training handbooks.
    expect(boardFeet({ nominalThickness: 1, nominalWidth: 11, lengthFeet: 14 }).equals(new Fraction(12 * 12 + 10, 12))).toBe(true);
  });

  it.each([
    [4, "2/3"],
    [6, "1"],
    [8, "1 1/3"],
  ])("per linear foot a 2x%i is %s bf", (width, expected) => {
    // US Navy manual: per linear foot 2x4 = 2/3, 2x6 = 1, 2x8 = 1 1/3 bf.
    expect(boardFeet({ nominalThickness: 2, nominalWidth: width, lengthFeet: 1 }).toFraction(true)).toBe(expected);
  });

  it("counts stock under 1 inch thick as 1 inch", () => {
    // US Navy manual: stock under 1" thick counts as 1".
    const half = boardFeet({ nominalThickness: new Fraction(1, 2), nominalWidth: 12, lengthFeet: 1 });
    expect(half.equals(1)).toBe(true);
  });

  it("is exact for fractional lengths and refuses nonsense", () => {
    // 2 × 4 × 14.5 / 12 = 116/12 = 29/3 (computed from the same rule).
    expect(boardFeet({ nominalThickness: 2, nominalWidth: 4, lengthFeet: 14.5 }).equals(new Fraction(29, 3))).toBe(true);
    expect(() => boardFeet({ nominalThickness: 0, nominalWidth: 4, lengthFeet: 8 })).toThrow(RangeError);
    expect(() => boardFeet({ nominalThickness: 2, nominalWidth: 4, lengthFeet: -1 })).toThrow(RangeError);
  });
});
