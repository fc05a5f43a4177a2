import { describe, expect, it } from "vitest";
import { unit as mathUnit } from "mathjs";
import { Fraction } from "@/lib/layout/core";
import { z } from "zod";
import { exactFromNumber, formatMeasure, measureJson, parseMeasure, roundingJson } from "@/lib/layout/measure";
import { denominatorSchema, measureInput, readMeasure, unitSchema } from "@/lib/layout/schema";

const f = (n: number, d = 1) => new Fraction(n, d);

function read(text: string, unit: "in" | "mm" = "in"): string {
  const result = parseMeasure(text, unit);
  if (!result.ok) throw new Error(`expected ${JSON.stringify(text)} to parse: ${result.error.message}`);
  return result.value.toFraction(true);
}

function failure(text: string, unit: "in" | "mm" = "in") {
  const result = parseMeasure(text, unit);
  if (result.ok) throw new Error(`expected ${JSON.stringify(text)} to fail, got ${result.value.toFraction(true)}`);
  return result.error;
}

describe("parseMeasure: tape notation", () => {
  // 1' = 12" (definition of the foot); the rest is the notation read as written.
  it.each([
    ["22 3/4", "22 3/4"],
    ['22-3/4"', "22 3/4"],
    ["22 3/4 in", "22 3/4"],
    ["22 3/4 inches", "22 3/4"],
    [`1' 10 3/4"`, "22 3/4"],
    [`1'-10-3/4"`, "22 3/4"],
    ["1 ft 10.75 in", "22 3/4"],
    ["22.75", "22 3/4"],
    ["5/8", "5/8"],
    ["3'", "36"],
    ["3 ft", "36"],
    ["-1/16", "-1/16"],
    [`1'10"`, "22"],
    ["  22   3/4  ", "22 3/4"],
    [`1 ' 10 3/4 "`, "22 3/4"],
    ["1′ 10 3/4″", "22 3/4"], // prime and double prime
    ["1’ 10 3/4”", "22 3/4"], // typographic quotes
    ["22¾″", "22 3/4"], // vulgar fraction
    ["22''", "22"], // two apostrophes for an inch mark
    ["−1/16", "-1/16"], // unicode minus
    ["1 foot 6 inches", "18"],
    ["1' 0 3/8\"", "12 3/8"],
    ["1 1/2'", "18"],
    [".5", "1/2"],
    ["0", "0"],
    ["7/4", "1 3/4"],
  ])("%s → %s", (text, expected) => {
    expect(read(text)).toBe(expected);
  });

  it("reads decimals from their digits, exactly", () => {
    const value = parseMeasure("22.75");
    expect(value.ok && value.value.equals(f(91, 4))).toBe(true);
    // 0.1 has no exact binary float; the digits give exactly 1/10.
    const tenth = parseMeasure("0.1");
    expect(tenth.ok && tenth.value.equals(f(1, 10))).toBe(true);
    const long = parseMeasure("0.3333333333333333333333");
    expect(long.ok && long.value.equals(new Fraction(3333333333333333333333n, 10n ** 22n))).toBe(true);
  });
});

describe("parseMeasure: metric", () => {
  // 1 in = 25.4 mm exactly (international inch, 1959).
  it("reads a bare number as millimetres in mm mode, and explicit units in either mode", () => {
    expect(read("600", "mm")).toBe(f(600).div(f(127, 5)).toFraction(true));
    for (const unit of ["in", "mm"] as const) {
      expect(read("600 mm", unit)).toBe("23 79/127"); // 600 / 25.4 = 3000/127
      expect(read("0.6 m", unit)).toBe("23 79/127");
      expect(read("60 cm", unit)).toBe("23 79/127");
      expect(read('22 3/4"', unit)).toBe("22 3/4");
      expect(read("1' 10 3/4\"", unit)).toBe("22 3/4");
    }
  });

  it("agrees with mathjs's unit conversion on many values", () => {
    // mathjs units: an independent implementation of the same definitions (float).
    for (let mm = -500; mm <= 5000; mm += 37.3) {
      const text = `${mm.toFixed(1)} mm`;
      const ours = parseMeasure(text);
      expect(ours.ok).toBe(true);
      if (ours.ok) expect(ours.value.valueOf()).toBeCloseTo(mathUnit(Number(mm.toFixed(1)), "mm").toNumber("inch"), 9);
    }
    for (const [text, amount, name] of [["2.5 m", 2.5, "m"], ["91.44 cm", 91.44, "cm"], ["8 ft", 8, "ft"], ["3.5 in", 3.5, "inch"]] as const) {
      const ours = parseMeasure(text, "mm");
      expect(ours.ok && ours.value.valueOf()).toBeCloseTo(mathUnit(amount, name).toNumber("inch"), 9);
    }
    for (let sixteenths = -160; sixteenths <= 20_000; sixteenths += 97) {
      const inches = f(sixteenths, 16);
      const json = measureJson(inches, { unit: "mm", denominator: 16 });
      expect(json.value).toBeCloseTo(mathUnit(inches.valueOf(), "inch").toNumber("mm"), 9);
    }
  });
});

describe("parseMeasure: errors say what and where", () => {
  it.each([
    ["", "Enter a length.", 0],
    ["   ", "Enter a length.", 0],
    ["3/0", '"3/0": a fraction cannot have 0 below the line.', 2],
    ["abc", `Could not read "abc" at character 1 — type a length like 22 3/4 or 1' 10 3/4".`, 0],
    ["22 3/4 abc", `Could not read "abc" at character 8 — type a length like 22 3/4 or 1' 10 3/4".`, 7],
    ["1/2/3", '"1/2/3" has two fraction bars.', 3],
    ["12 3/", '"3/" needs a number below the fraction line.', 5],
    ["/4", '"/4" needs a number above the fraction line.', 0],
    ["1.5/2", '"1.5/2": a fraction needs whole numbers above and below the line, like 3/4.', 0],
    ["10.5 1/4", '"10.5 1/4": a mixed number needs a whole number before the fraction.', 0],
    ["1,5", '"1,5": write decimals with a point, like 22.75, and no thousands commas.', 1],
    ["1.2.3", '"1.2.3": a number has one decimal point.', 3],
    ["1,200", '"1,200": write decimals with a point, like 22.75, and no thousands commas.', 1],
    ["-", '"-" needs a number after it.', 1],
    ["'", "A foot mark at character 1 needs a number before it.", 0],
    ['"', "An inch mark at character 1 needs a number before it.", 0],
    ["mm", '"mm" at character 1 needs a number before it.', 0],
    ["1' 2'", `Feet are given twice in "1' 2'".`, 4],
    ["1'-", `Expected inches after "1'-".`, 3],
    ["1' 20 mm", `"1' 20 mm" mixes feet with metric units; write one or the other.`, 6],
    [`10" 1'`, `Write feet before inches, like 1' 10".`, 4],
    ["3'/4", '"/4" needs a number above the fraction line.', 2],
    ['3"/4', "The fraction bar at character 3 needs a number just before it.", 2],
    ["22 in mm", "Two units in a row at character 7; give one.", 6],
  ])("%j", (text, message, index) => {
    expect(failure(text)).toEqual({ message, index });
  });

  it("says two numbers in a row, pointing at the second", () => {
    const error = failure("22 3");
    expect(error.index).toBe(3);
    expect(error.message).toMatch(/^"22 3": two numbers in a row/);
  });

  it("points arithmetic at the bench", () => {
    const error = failure("2 + 2");
    expect(error.index).toBe(2);
    expect(error.message).toMatch(/fraction bench/);
  });

  it("bounds the length and names unprintable characters by code", () => {
    expect(failure("1".repeat(65))).toEqual({ message: "That is too long to be a length.", index: 64 });
    expect(parseMeasure("1".repeat(64)).ok).toBe(true);
    expect(failure("\u0000").message).toMatch(/"U\+0000"/);
    expect(failure("constructor").index).toBe(0); // not a member of Object.prototype
  });
});

describe("formatMeasure", () => {
  // Expected texts are the carpenter's notation (common practice, no source); values are exact.
  it.each([
    [f(91, 4), {}, '22 3/4"'],
    [f(91, 4), { style: "feet-inches" }, `1' 10 3/4"`],
    [f(3, 8), {}, '3/8"'],
    [f(0), {}, '0"'],
    [f(-1, 16), {}, '-1/16"'],
    [f(24), { style: "feet-inches" }, `2' 0"`],
    [f(-18), { style: "feet-inches" }, `-1' 6"`],
    [f(97, 8), { style: "feet-inches" }, `1' 0 1/8"`],
    [f(11), { style: "feet-inches" }, '11"'],
    [f(767, 64), {}, '12"'], // 11 63/64 at sixteenths carries into a whole inch
    [f(767, 64), { style: "feet-inches" }, `1' 0"`],
    [f(-1, 64), {}, '0"'], // rounds to zero: no "-0"
    [f(91, 4), { denominator: 2 }, '23"'], // 22.75 is midway between 22 1/2 and 23: away from zero
    [f(5, 32), { denominator: 64 }, '5/32"'],
  ] as const)("%s %j → %s", (value, opts, text) => {
    expect(formatMeasure(value, opts).text).toBe(text);
  });

  it("returns the rounded value and the error rounded − exact", () => {
    const out = formatMeasure(f(767, 64));
    expect(out.rounded.equals(12)).toBe(true);
    expect(out.error.equals(f(1, 64))).toBe(true);
  });

  it("prints millimetres to the whole or the tenth, with the error in inches", () => {
    // 22 3/4" × 25.4 = 577.85 mm exactly (1 in = 25.4 mm).
    expect(formatMeasure(f(91, 4), { unit: "mm" }).text).toBe("578 mm");
    expect(formatMeasure(f(91, 4), { unit: "mm", mmDecimals: 1 }).text).toBe("577.9 mm"); // 577.85 is a tie: away from zero
    expect(formatMeasure(f(-1, 16), { unit: "mm", mmDecimals: 1 }).text).toBe("-1.6 mm"); // -1.5875
    expect(formatMeasure(f(1, 64), { unit: "mm", mmDecimals: 1 }).text).toBe("0.4 mm"); // 0.396875
    const out = formatMeasure(f(91, 4), { unit: "mm" });
    expect(out.error.equals(f(3, 20).div(f(127, 5)))).toBe(true); // 578 − 577.85 = 0.15 mm, in inches
  });

  it("refuses a denominator it cannot print", () => {
    expect(() => formatMeasure(f(1), { denominator: 0 })).toThrow(RangeError);
    expect(() => formatMeasure(f(1), { denominator: 128 })).toThrow(RangeError);
  });
});

describe("rounding rule against the handbooks", () => {
  it("matches the Navy manual's decimal × 16, .5 rounds up", () => {
    // US Navy Builder manual: multiply the decimal by 16; .5 or more rounds up (computed).
    expect(formatMeasure(f(223, 10)).text).toBe('22 5/16"'); // .3 × 16 = 4.8 → 5
    expect(formatMeasure(f(17, 32)).text).toBe('9/16"'); // .53125 × 16 = 8.5 → 9
    expect(formatMeasure(f(1, 32)).text).toBe('1/16"'); // .03125 × 16 = 0.5 → 1
  });

  it("differs from NIST HB44 §10.3's even graduation at exactly midway", () => {
    // HB44 §10.3 reads the even graduation at a midway indication: 1/32 lies midway between
    // 0 and 1/16, and 0 is the even one (0/16), so HB44 reads 0"; our half-away rule reads 1/16".
    const hb44Reading = '0"';
    const ours = formatMeasure(f(1, 32)).text;
    expect(ours).toBe('1/16"');
    expect(ours).not.toBe(hb44Reading);
    // Off the midway point the two agree: 3/64 is nearer 1/16 either way.
    expect(formatMeasure(f(3, 64)).text).toBe('1/16"');
  });
});

describe("measureJson and roundingJson", () => {
  it("gives the exact ratio in the unit asked", () => {
    expect(measureJson(f(91, 4), { unit: "in", denominator: 16 })).toEqual({ exact: "91/4", value: 22.75, text: '22 3/4"' });
    // 23" × 25.4 = 584.2 mm = 2921/5 (computed, 1 in = 25.4 mm).
    expect(measureJson(f(23), { unit: "mm", denominator: 16 })).toEqual({ exact: "2921/5", value: 584.2, text: "584 mm" });
    expect(measureJson(f(-1, 16), { unit: "in", denominator: 16, style: "feet-inches" }).exact).toBe("-1/16");
  });

  it("reports exact, rounded and error together", () => {
    const json = roundingJson(f(767, 64), { unit: "in", denominator: 16, style: "feet-inches" });
    expect(json.exact.exact).toBe("767/64");
    expect(json.rounded).toEqual({ exact: "12", value: 12, text: `1' 0"` });
    expect(json.error).toEqual({ exact: "1/64", value: 1 / 64 });
  });
});

describe("exactFromNumber", () => {
  it("takes the decimal a number prints as", () => {
    expect(exactFromNumber(0.1).equals(f(1, 10))).toBe(true);
    expect(exactFromNumber(22.75).equals(f(91, 4))).toBe(true);
    expect(exactFromNumber(1e-7).equals(new Fraction(1n, 10_000_000n))).toBe(true);
    expect(exactFromNumber(-2.5e21).equals(new Fraction(-25n * 10n ** 20n, 1n))).toBe(true);
    expect(() => exactFromNumber(Number.NaN)).toThrow(RangeError);
  });
});

describe("schema helpers", () => {
  const spacing = z
    .object({ unit: unitSchema, denominator: denominatorSchema, span: measureInput, memberWidth: measureInput })
    .transform((raw, ctx) => {
      const span = readMeasure(ctx, raw.span, raw.unit, ["span"], { label: "Span", positive: true, max: f(1200) });
      const memberWidth = readMeasure(ctx, raw.memberWidth, raw.unit, ["memberWidth"], { label: "Member width", positive: true });
      if (span === null || memberWidth === null) return z.NEVER;
      return { ...raw, span, memberWidth };
    });
  const issues = (input: unknown) => {
    const result = spacing.safeParse(input);
    return result.success ? [] : result.error.issues.map((issue) => [issue.path.join("."), issue.message]);
  };

  it("defaults the unit and denominator and reads text and numbers exactly", () => {
    const result = spacing.parse({ span: "8'", memberWidth: 1.5 });
    expect(result.unit).toBe("in");
    expect(result.denominator).toBe(16);
    expect(result.span.equals(96)).toBe(true);
    expect(result.memberWidth.equals(f(3, 2))).toBe(true);
  });

  it("reads numbers in millimetres in mm mode", () => {
    // 1 in = 25.4 mm exactly: 38.1 mm = 1 1/2".
    const result = spacing.parse({ unit: "mm", span: 2438.4, memberWidth: "38.1", denominator: "32" });
    expect(result.span.equals(96)).toBe(true);
    expect(result.memberWidth.equals(f(3, 2))).toBe(true);
    expect(result.denominator).toBe(32);
  });

  it("names the field and the problem", () => {
    expect(issues({ span: "12 3/", memberWidth: 0 })).toEqual([
      ["span", 'Span: "3/" needs a number below the fraction line.'],
      ["memberWidth", "Member width must be more than 0."],
    ]);
    expect(issues({ span: 1300, memberWidth: "abc" })).toEqual([
      ["span", "Span must be at most 100' 0\"."],
      ["memberWidth", `Member width: could not read "abc" at character 1 — type a length like 22 3/4 or 1' 10 3/4".`],
    ]);
    expect(issues({ span: "", memberWidth: 1 })).toEqual([["span", "Span: enter a length."]]);
  });

  it("explains missing and wrong-typed fields", () => {
    expect(issues({ memberWidth: true, unit: "cm", denominator: 5 })).toEqual([
      ["unit", 'Unit must be "in" (inches) or "mm" (millimetres).'],
      ["denominator", "Round to halves, quarters, eighths, sixteenths, 32nds or 64ths: 2, 4, 8, 16, 32 or 64."],
      ["span", "Enter a length."],
      ["memberWidth", `A length must be text like 22 3/4 or 1' 10 3/4", or a number; got boolean.`],
    ]);
    expect(issues({ span: Number.NaN, memberWidth: "x".repeat(65) })).toEqual([
      ["span", "A length must be a finite number."],
      ["memberWidth", "That is too long to be a length."],
    ]);
  });

  it("checks min, max and zero rules in the order given", () => {
    const ctxIssues: string[] = [];
    const ctx = { addIssue: (issue: { message?: string }) => ctxIssues.push(issue.message ?? "") } as unknown as z.RefinementCtx;
    expect(readMeasure(ctx, "1/4", "in", ["kerf"], { label: "Kerf", min: f(1, 16), max: f(1, 2) })?.equals(f(1, 4))).toBe(true);
    expect(readMeasure(ctx, "1/32", "in", ["kerf"], { label: "Kerf", min: f(1, 16) })).toBeNull();
    expect(readMeasure(ctx, 0, "in", ["offset"], { label: "Offset", allowZero: false })).toBeNull();
    expect(readMeasure(ctx, -2, "in", ["offset"], { label: "Offset", allowZero: false })?.equals(-2)).toBe(true);
    expect(readMeasure(ctx, 700, "mm", ["rise"], { label: "Rise", max: f(24) })).toBeNull();
    expect(ctxIssues).toEqual(["Kerf must be at least 1/16\".", "Offset cannot be 0.", "Rise must be at most 609.6 mm."]);
  });
});
