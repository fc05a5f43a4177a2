import { describe, expect, it } from "vitest";
import { all, create } from "mathjs";
import { Fraction } from "@/lib/layout/core";
import { evaluateMeasureExpression } from "@/lib/layout/expression";

// mathjs in Fraction mode: an independent parser and evaluator for the same arithmetic.
const math = create(all, { number: "Fraction" });

function mathjsFraction(expression: string): Fraction {
  const result = math.evaluate(expression) as { s: bigint; n: bigint; d: bigint };
  return new Fraction(result.s * result.n, result.d);
}

function evaluate(text: string, unit: "in" | "mm" = "in") {
  const result = evaluateMeasureExpression(text, unit);
  if (!result.ok) throw new Error(`expected ${JSON.stringify(text)} to evaluate: ${result.error.message}`);
  return result;
}

function failure(text: string, unit: "in" | "mm" = "in") {
  const result = evaluateMeasureExpression(text, unit);
  if (result.ok) throw new Error(`expected ${JSON.stringify(text)} to fail, got ${result.value.toFraction(true)}`);
  return result.error;
}

describe("evaluateMeasureExpression: arithmetic", () => {
  // Each pair: the bench's text, and the same sum written for mathjs by hand (inches; 1' = 12").
  it.each([
    ['3 × 2 1/2"', "3 * (2 + 1/2)", "length"],
    ['22 3/4" ÷ 2', "(22 + 3/4) / 2", "length"],
    ["(96 - 3 × 1 1/2) ÷ 4", "(96 - 3 * (1 + 1/2)) / 4", "length"],
    ["96 - 3 × 1 1/2 ÷ 4", "96 - 3 * (1 + 1/2) / 4", "length"],
    ["1 + 2 × 3", "1 + 2 * 3", "length"],
    ["(1 + 2) × 3", "(1 + 2) * 3", "length"],
    ["10 - 4 - 3", "(10 - 4) - 3", "length"],
    ["64 ÷ 4 ÷ 2", "(64 / 4) / 2", "length"],
    ["22-3/4 + 1/16", "22 + 3/4 + 1/16", "length"],
    ["22 - 3/4", "22 - 3/4", "length"],
    ["5-3", "5 - 3", "length"],
    [`1'-10" + 3/4`, "12 + 10 + 3/4", "length"],
    [`1' - 10"`, "12 - 10", "length"],
    ["2 1/2 / 2", "(2 + 1/2) / 2", "length"],
    ["3/ 4", "3 / 4", "length"],
    ["3 x 4", "3 * 4", "length"],
    ["3 * 4", "3 * 4", "length"],
    ["- - 3", "-(-3)", "length"],
    ["-(1/2 - 3/4)", "-(1/2 - 3/4)", "length"],
    ['8\' ÷ 5', "96 / 5", "length"], // 19.2" joist layout
    ['96" ÷ 16"', "96 / 16", "number"], // how many 16" bays fit in 8'
    ['96 ÷ 16"', "96 / 16", "number"],
    ['(96" ÷ 16") × 2', "96 / 16 * 2", "number"],
    ['(96" ÷ 16") + 1', "96 / 16 + 1", "number"],
    ['52 1/2" ÷ 14', "(52 + 1/2) / 14", "length"], // baluster gap 3 3/4"
    ["0.1 + 0.2", "1/10 + 2/10", "length"],
  ])("%s", (text, mathjsText, kind) => {
    const result = evaluate(text);
    expect(result.kind).toBe(kind);
    expect(result.value.toFraction(true)).toBe(mathjsFraction(mathjsText).toFraction(true));
  });

  it("works in the chosen unit: bare numbers are millimetres in mm mode", () => {
    // 1 in = 25.4 mm exactly; mathjs gives the expected millimetres.
    const result = evaluate("100 mm + 5", "mm");
    expect(result.kind).toBe("length");
    expect(result.value.equals(mathjsFraction("105 / (254/10)"))).toBe(true);
    const mixed = evaluate('1" + 1', "mm");
    expect(mixed.value.equals(mathjsFraction("1 + 1 / (254/10)"))).toBe(true);
    const count = evaluate("2400 ÷ 600 mm", "mm");
    expect(count.kind).toBe("number");
    expect(count.value.equals(4)).toBe(true);
  });
});

describe("evaluateMeasureExpression: dimensions and errors", () => {
  it("refuses a length times a length", () => {
    expect(failure('2" × 3"')).toEqual({
      message: `Cannot multiply a length by a length — this bench has no square inches. Multiply a length by a plain number, like 3 × 2 1/2".`,
      index: 3,
    });
  });

  it("refuses to add a plain number to a length, and says why", () => {
    const added = failure('(10" ÷ 2") + 3"');
    expect(added.index).toBe(11);
    expect(added.message).toMatch(/^Cannot add a length to a plain number\./);
    expect(failure('3" + (10" ÷ 2")').message).toMatch(/^Cannot add a plain number to a length\./);
    expect(failure('3" - (10" ÷ 2")').message).toMatch(/^Cannot subtract a plain number from a length\./);
    expect(failure('(10" ÷ 2") ÷ 5"').message).toBe("Cannot divide a plain number by a length.");
  });

  it("refuses division by zero, whatever the zero is made of", () => {
    expect(failure("3 ÷ 0")).toEqual({ message: "Cannot divide by zero.", index: 2 });
    expect(failure('3" ÷ (1/2 - 2/4)').message).toBe("Cannot divide by zero.");
    expect(failure("3 / 0 mm").message).toBe("Cannot divide by zero.");
  });

  it.each([
    ["", "Enter a calculation, like 22 3/4 ÷ 2.", 0],
    ["3 +", '"+" needs a length or a number after it.', 3],
    ["× 3", '"×" at character 1 needs a length or a number before it.', 0],
    ["((1)", 'The "(" at character 1 is never closed.', 0],
    ["1)", 'There is a ")" at character 2 with no "(" before it.', 1],
    ["()", "The brackets at character 1 have nothing inside.", 0],
    ["2(3)", 'Put an operator (+ − × ÷) before the "(" at character 2.', 1],
    ["1/2/3", '"1/2/3" has two fraction bars.', 3],
    ["3/0", '"3/0": a fraction cannot have 0 below the line.', 2],
    ["ft", '"ft" at character 1 needs a number before it.', 0],
    ['3 + "', "An inch mark at character 5 needs a number before it.", 4],
  ])("%j", (text, message, index) => {
    expect(failure(text)).toEqual({ message, index });
  });

  it("asks for an operator between two numbers, with the mixed-number hint", () => {
    const error = failure("22 3 / 4");
    expect(error.index).toBe(3);
    expect(error.message).toMatch(/^Put an operator \(\+ − × ÷\) before "3" at character 4 — or, for a mixed number/);
  });

  it("suggests ÷ when a fraction has a decimal in it", () => {
    expect(failure("2.5/2").message).toMatch(/To divide, put spaces around \/ or use ÷\./);
  });

  it("bounds brackets and length without deep recursion", () => {
    const nested = (n: number) => `${"(".repeat(n)}1${")".repeat(n)}`;
    expect(evaluate(nested(20)).value.equals(1)).toBe(true);
    expect(failure(nested(21)).message).toBe("Too many brackets inside each other (at most 20).");
    expect(failure("(".repeat(200)).index).toBe(20);
    expect(failure("1+".repeat(101)).message).toMatch(/too long for the bench/);
    expect(evaluate("-".repeat(150) + "1").value.equals(1)).toBe(true); // 150 signs: even
  });
});
