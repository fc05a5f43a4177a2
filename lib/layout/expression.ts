// Arithmetic on measurements for the fraction bench: `(96 - 3 × 1 1/2) ÷ 4`, `22 3/4" ÷ 2`.
//
// Reading rules, for the bench to state:
// - Operators: + and - (or −), × or * or x, ÷ or a / with a space on at least one side.
// - A / touching digits on both sides is a fraction bar: `2 1/2 / 2` is 2 1/2 divided by 2.
// - A dash touching both sides joins a mixed number or feet to inches, as on a tape:
//   `22-3/4` is 22 3/4 and `1'-10"` is 1' 10"; with a space (`22 - 3/4`) it subtracts.
// - A number with no unit takes the kind of what it meets: beside + or − it is a length
//   in the chosen unit (or a plain number, beside one); beside × or as the divisor of a
//   length it is a count: `3 × 2 1/2"` is 7 1/2". A calculation with no units at all is a
//   length in the chosen unit, as a single number typed in a length box is.
// - A length ÷ a length is a plain number (how many fit). Length × length, and adding a
//   plain number to a length, are errors: this bench has no square inches.
import { Fraction, fromMillimetres, toMillimetres, type Unit } from "./core";
import { lexMeasureText, MeasureTextError, readMeasureLiteral, unitWithoutNumber, type MeasureError, type MeasureToken } from "./measure";

export const MAX_EXPRESSION_LENGTH = 200;
export const MAX_BRACKET_DEPTH = 20;

export type ExpressionResult =
  | { ok: true; kind: "length" | "number"; value: Fraction }
  | { ok: false; error: MeasureError };

// "bare" is a number typed without a unit: it becomes whichever kind its neighbour needs.
type Kind = "length" | "number" | "bare";
/** `value` is in the working unit (inches or millimetres), so a bare number needs no conversion. */
type Value = { kind: Kind; value: Fraction };

/**
 * Evaluates a calculation on lengths exactly. A length result is in inches; a plain number
 * (a length ÷ a length) is returned as is. Never throws on any text.
 */
export function evaluateMeasureExpression(text: string, unit: Unit = "in"): ExpressionResult {
  try {
    const result = evaluate(String(text), unit);
    if (result.kind === "number") return { ok: true, kind: "number", value: result.value };
    return { ok: true, kind: "length", value: unit === "mm" ? fromMillimetres(result.value) : result.value };
  } catch (error) {
    if (error instanceof MeasureTextError) return { ok: false, error: { message: error.message, index: error.index } };
    throw error;
  }
}

function evaluate(text: string, unit: Unit): Value {
  if (text.length > MAX_EXPRESSION_LENGTH) {
    throw new MeasureTextError(`That is too long for the bench (at most ${MAX_EXPRESSION_LENGTH} characters).`, MAX_EXPRESSION_LENGTH);
  }
  const tokens = lexMeasureText(text);
  if (tokens.length === 0) throw new MeasureTextError("Enter a calculation, like 22 3/4 ÷ 2.", 0);
  const parser = new ExpressionParser(text, tokens, unit);
  const value = parser.expression(0);
  parser.expectEnd();
  return value;
}

class ExpressionParser {
  private p = 0;

  constructor(
    private readonly text: string,
    private readonly tokens: MeasureToken[],
    private readonly unit: Unit,
  ) {}

  private fail(message: string, index: number): never {
    throw new MeasureTextError(message, index);
  }

  private at(n: number): string {
    return `at character ${n + 1}`;
  }

  expression(depth: number): Value {
    let left = this.term(depth);
    for (let t = this.tokens[this.p]; t?.kind === "plus" || t?.kind === "dash"; t = this.tokens[this.p]) {
      this.p++;
      left = add(left, this.term(depth), t);
    }
    return left;
  }

  private term(depth: number): Value {
    let left = this.unary(depth);
    for (let t = this.tokens[this.p]; t?.kind === "times" || t?.kind === "divide" || t?.kind === "slash"; t = this.tokens[this.p]) {
      this.p++;
      const right = this.unary(depth);
      left = t.kind === "times" ? multiply(left, right, t) : divide(left, right, t);
    }
    return left;
  }

  private unary(depth: number): Value {
    let negative = false;
    for (let t = this.tokens[this.p]; t?.kind === "plus" || t?.kind === "dash"; t = this.tokens[this.p]) {
      if (t.kind === "dash") negative = !negative;
      this.p++;
    }
    const operand = this.primary(depth);
    return negative ? { kind: operand.kind, value: operand.value.neg() } : operand;
  }

  private primary(depth: number): Value {
    const t = this.tokens[this.p];
    if (t === undefined) {
      const last = this.tokens[this.p - 1];
      this.fail(`"${last.text}" needs a length or a number after it.`, this.text.length);
    }
    if (t.kind === "open") {
      if (depth >= MAX_BRACKET_DEPTH) this.fail(`Too many brackets inside each other (at most ${MAX_BRACKET_DEPTH}).`, t.start);
      if (this.tokens[this.p + 1]?.kind === "close") this.fail(`The brackets ${this.at(t.start)} have nothing inside.`, t.start);
      this.p++;
      const inner = this.expression(depth + 1);
      if (this.tokens[this.p]?.kind !== "close") {
        if (this.p >= this.tokens.length) this.fail(`The "(" ${this.at(t.start)} is never closed.`, t.start);
        this.expectEnd();
      }
      this.p++;
      return inner;
    }
    if (t.kind === "close") this.fail(`")" ${this.at(t.start)} has nothing before it inside its brackets.`, t.start);
    if (t.kind === "times" || t.kind === "divide") this.fail(`"${t.text}" ${this.at(t.start)} needs a length or a number before it.`, t.start);
    const literal = readMeasureLiteral(this.text, this.tokens, this.p, "expression");
    this.p = literal.next;
    if (!literal.explicitUnit) return { kind: "bare", value: literal.value };
    return { kind: "length", value: this.unit === "mm" ? toMillimetres(literal.value) : literal.value };
  }

  /** Anything left where an operator or the end belongs. */
  expectEnd(): void {
    const t = this.tokens[this.p];
    if (t === undefined) return;
    if (t.kind === "close") this.fail(`There is a ")" ${this.at(t.start)} with no "(" before it.`, t.start);
    if (t.kind === "open") this.fail(`Put an operator (+ − × ÷) before the "(" ${this.at(t.start)}.`, t.start);
    if (t.kind === "number" || t.kind === "vulgar") {
      this.fail(
        `Put an operator (+ − × ÷) before "${t.text}" ${this.at(t.start)} — or, for a mixed number, write 2 1/2 with no spaces around the fraction bar.`,
        t.start,
      );
    }
    if (t.kind === "unit") this.fail(unitWithoutNumber(t), t.start);
    this.fail(`Could not read "${t.text}" ${this.at(t.start)}.`, t.start);
  }
}

function adopt(a: Kind, b: Kind): Kind | null {
  if (a === "bare") return b;
  if (b === "bare" || a === b) return a;
  return null;
}

function add(left: Value, right: Value, op: MeasureToken): Value {
  const kind = adopt(left.kind, right.kind);
  const subtract = op.kind === "dash";
  if (kind === null) {
    const message = subtract
      ? left.kind === "length"
        ? "Cannot subtract a plain number from a length."
        : "Cannot subtract a length from a plain number."
      : left.kind === "length"
        ? "Cannot add a plain number to a length."
        : "Cannot add a length to a plain number.";
    throw new MeasureTextError(`${message} (A length ÷ a length is a plain number: how many fit.)`, op.start);
  }
  return { kind, value: subtract ? left.value.sub(right.value) : left.value.add(right.value) };
}

function multiply(left: Value, right: Value, op: MeasureToken): Value {
  if (left.kind === "length" && right.kind === "length") {
    throw new MeasureTextError(
      `Cannot multiply a length by a length — this bench has no square inches. Multiply a length by a plain number, like 3 × 2 1/2".`,
      op.start,
    );
  }
  return { kind: strongest(left.kind, right.kind), value: left.value.mul(right.value) };
}

function divide(left: Value, right: Value, op: MeasureToken): Value {
  if (right.value.n === 0n) throw new MeasureTextError("Cannot divide by zero.", op.start);
  if (left.kind === "number" && right.kind === "length") {
    throw new MeasureTextError("Cannot divide a plain number by a length.", op.start);
  }
  const quotient = left.value.div(right.value);
  if (right.kind === "length") return { kind: "number", value: quotient };
  if (left.kind === "length") return { kind: "length", value: quotient };
  return { kind: strongest(left.kind, right.kind), value: quotient };
}

/** The kind a product (or a quotient by a count) keeps: a length, else a plain number. */
function strongest(a: Kind, b: Kind): Kind {
  if (a === "length" || b === "length") return "length";
  if (a === "number" || b === "number") return "number";
  return "bare";
}
