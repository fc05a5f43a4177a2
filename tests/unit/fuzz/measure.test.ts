// Fuzzing the tape-notation reader and the fraction bench with random text.
//
// The unit suite runs FUZZ_RUNS strings per property, 5,000 by default (about 15 s in all on
// a loaded two-core machine). The full 100,000 per property took about four and a half minutes there,
// too long for every CI run, so `npm run fuzz` runs them on its own.
// A failing case prints its seed and path: rerun with FUZZ_SEED/FUZZ_PATH to replay it.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { Fraction } from "@/lib/layout/core";
import { evaluateMeasureExpression, MAX_EXPRESSION_LENGTH } from "@/lib/layout/expression";
import { formatMeasure, MAX_MEASURE_LENGTH, parseMeasure } from "@/lib/layout/measure";

const RUNS = Number(process.env.FUZZ_RUNS ?? 5_000);
const replay = process.env.FUZZ_SEED ? { seed: Number(process.env.FUZZ_SEED), path: process.env.FUZZ_PATH } : {};
const options = { numRuns: RUNS, ...replay };
// Seconds of work at the full count on a loaded two-core machine; a hang still fails.
const SLOW = { timeout: 600_000 };
// A single read takes microseconds; a call this slow is a runaway, not a busy machine. A slow
// call is timed again and the fastest try counts: a pause for garbage collection or a busy
// machine is not the reader's doing, whereas a runaway is slow every time.
const PER_CALL_MS = 250;
const TRIES = 3;

const anyUnicode = fc.string({ unit: "binary", maxLength: 120 });
const measureAlphabet = fc.constantFrom(
  ..."0123456789 /-'\".".split(""),
  ..."0123456789 /-".split(""),
  "ft", "in", "feet", "inch", "inches", "foot", "mm", "cm", "m", "′", "″", "⁄", "½", "¾", "⅛", "−",
);
const alphabetText = fc.string({ unit: measureAlphabet, maxLength: 40 });

/** A length on the 1/64" grid and the several ways a carpenter might write it. */
const validMeasure = fc
  .record({
    feet: fc.integer({ min: 0, max: 40 }),
    inches: fc.integer({ min: 0, max: 11 }),
    sixtyFourths: fc.integer({ min: 0, max: 63 }),
    negative: fc.boolean(),
    style: fc.constantFrom("inches", "feet-dash", "feet-space", "words", "decimal"),
  })
  .map(({ feet, inches, sixtyFourths, negative, style }) => {
    const part = new Fraction(sixtyFourths, 64);
    const totalInches = new Fraction(feet * 12 + inches).add(part);
    const fractionText = part.n === 0n ? "" : ` ${part.n}/${part.d}`;
    const sign = negative ? "-" : "";
    let text: string;
    switch (style) {
      case "inches":
        text = `${sign}${feet * 12 + inches}${fractionText}"`;
        break;
      case "feet-dash":
        text = `${sign}${feet}'-${inches}${fractionText.replace(" ", "-")}"`;
        break;
      case "feet-space":
        text = `${sign}${feet}' ${inches}${fractionText}"`;
        break;
      case "words":
        text = `${sign}${feet} ft ${inches}${fractionText} in`;
        break;
      case "decimal":
        // Every 64th has a finite decimal: k/64 = k·15625/1000000.
        text = `${sign}${totalInches.toString(6)}`;
        break;
    }
    return { text, value: negative ? totalInches.neg() : totalInches };
  });

/** A valid measure with one character inserted, deleted or replaced. */
const nearValid = fc
  .tuple(validMeasure, fc.nat(), fc.constantFrom("insert", "delete", "replace"), fc.constantFrom(..."0123456789 /-'\".,xa½⁄\u00a0\u200b".split("")))
  .map(([{ text }, at, edit, char]) => {
    const i = at % (text.length + 1);
    if (edit === "insert") return text.slice(0, i) + char + text.slice(i);
    if (edit === "delete") return text.slice(0, i) + text.slice(i + 1);
    return text.slice(0, i) + char + text.slice(i + 1);
  });

const anyMeasureText = fc.oneof(anyUnicode, alphabetText, nearValid, validMeasure.map((m) => m.text));

function timed<T>(run: () => T): T {
  let fastest = Infinity;
  let result: T | undefined;
  for (let attempt = 0; attempt < TRIES && fastest >= PER_CALL_MS; attempt++) {
    const start = performance.now();
    result = run();
    fastest = Math.min(fastest, performance.now() - start);
  }
  expect(fastest).toBeLessThan(PER_CALL_MS);
  return result as T;
}

type Answer = { ok: true; value: Fraction } | { ok: false; error: { message: string; index: number } };

/** What every answer must look like, whatever the text. */
function checkAnswer(text: string, answer: Answer, maxLength: number) {
  if (!answer.ok) {
    expect(answer.error.message.trim().length).toBeGreaterThan(0);
    expect(Number.isInteger(answer.error.index)).toBe(true);
    expect(answer.error.index).toBeGreaterThanOrEqual(0);
    expect(answer.error.index).toBeLessThanOrEqual(Math.max(text.length, maxLength));
    return;
  }
  const { value } = answer;
  expect(value).toBeInstanceOf(Fraction);
  expect(value.d > 0n).toBe(true);
  // Rounded once to sixteenths, a length is a whole number of sixteenths.
  const printed = formatMeasure(value, { denominator: 16, style: "feet-inches" });
  expect(printed.rounded.mul(16).d).toBe(1n);
  expect(printed.error.abs().compare(new Fraction(1, 32))).toBeLessThanOrEqual(0);
  // What the formatter prints, the reader reads back to the same mark.
  const again = parseMeasure(printed.text);
  expect(again.ok && again.value.equals(printed.rounded), `${text} → ${printed.text}`).toBe(true);
}

describe("parseMeasure on random text", SLOW, () => {
  it(`never throws, never hangs, and answers in one of its two shapes (${RUNS} strings)`, () => {
    fc.assert(
      fc.property(anyMeasureText, fc.constantFrom("in" as const, "mm" as const), (text, unit) => {
        checkAnswer(text, timed(() => parseMeasure(text, unit)), MAX_MEASURE_LENGTH);
      }),
      options,
    );
  });

  it("reads every well-formed measure to its exact value", () => {
    fc.assert(
      fc.property(validMeasure, ({ text, value }) => {
        const answer = parseMeasure(text);
        expect(answer.ok && answer.value.equals(value), text).toBe(true);
        // Already on the 1/64 grid, so printing at 64ths and reading back is exact.
        const back = parseMeasure(formatMeasure(value, { denominator: 64 }).text);
        expect(back.ok && back.value.equals(value)).toBe(true);
      }),
      options,
    );
  });

  it("refuses text over its length limit with a message, whatever it holds", () => {
    fc.assert(
      fc.property(fc.string({ minLength: MAX_MEASURE_LENGTH + 1, maxLength: 10_000 }), (text) => {
        const answer = timed(() => parseMeasure(text));
        expect(answer.ok).toBe(false);
        if (!answer.ok) expect(answer.error.message).toMatch(/too long/i);
      }),
      { ...options, numRuns: Math.min(RUNS, 2_000) },
    );
    for (const huge of ["9".repeat(1_000_000), "1/".repeat(500_000), "'".repeat(1_000_000)]) {
      const answer = timed(() => parseMeasure(huge));
      expect(answer.ok).toBe(false);
    }
  });
});

describe("the fraction bench on random text", SLOW, () => {
  const expressionText = fc.oneof(
    anyMeasureText,
    fc.array(fc.oneof(validMeasure.map((m) => m.text), fc.constantFrom(" + ", " - ", " × ", " ÷ ", " / ", "(", ")", "*", "x", "2", "0")), { maxLength: 12 }).map((parts) => parts.join("")),
  );

  it(`never throws, never hangs, and answers in one of its shapes (${RUNS} strings)`, () => {
    fc.assert(
      fc.property(expressionText, fc.constantFrom("in" as const, "mm" as const), (text, unit) => {
        const answer = timed(() => evaluateMeasureExpression(text, unit));
        if (answer.ok) {
          expect(["length", "number"]).toContain(answer.kind);
          if (answer.kind === "number") expect(answer.value).toBeInstanceOf(Fraction);
          else checkAnswer(text, answer, MAX_EXPRESSION_LENGTH);
        } else {
          checkAnswer(text, answer, MAX_EXPRESSION_LENGTH);
        }
      }),
      options,
    );
  });

  it("adds, subtracts and divides written lengths exactly", () => {
    fc.assert(
      fc.property(validMeasure, validMeasure, fc.integer({ min: 1, max: 64 }), (a, b, count) => {
        const sum = evaluateMeasureExpression(`(${a.text}) + (${b.text})`);
        expect(sum.ok && sum.kind === "length" && sum.value.equals(a.value.add(b.value)), `${a.text} + ${b.text}`).toBe(true);
        const difference = evaluateMeasureExpression(`(${a.text}) - (${b.text})`);
        expect(difference.ok && difference.kind === "length" && difference.value.equals(a.value.sub(b.value))).toBe(true);
        const share = evaluateMeasureExpression(`(${a.text}) ÷ ${count}`);
        expect(share.ok && share.kind === "length" && share.value.equals(a.value.div(count))).toBe(true);
      }),
      options,
    );
  });

  it("refuses a calculation over its length limit with a message", () => {
    const answer = timed(() => evaluateMeasureExpression("1 + ".repeat(250_000) + "1"));
    expect(answer.ok).toBe(false);
    if (!answer.ok) expect(answer.error.message).toMatch(/too long/i);
  });
});
