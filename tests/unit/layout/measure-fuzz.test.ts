// Fuzzing the tape-notation reader and the fraction bench with random text, and the
// round trips and rounding rules they rest on.
//
// Each random-text property has an everyday count that the unit suite runs (together about half
// a minute on a loaded two-core machine). FUZZ_RUNS replaces every one of those counts:
// `npm run fuzz` sets 100,000, which took minutes there, too long for every CI run.
// A failing case prints its seed and path: rerun with FUZZ_SEED/FUZZ_PATH to replay it.
import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { DENOMINATORS, Fraction, roundTo } from "@/lib/layout/core";
import { evaluateMeasureExpression, MAX_EXPRESSION_LENGTH } from "@/lib/layout/expression";
import { formatMeasure, MAX_MEASURE_LENGTH, parseMeasure } from "@/lib/layout/measure";

const FUZZ_RUNS = process.env.FUZZ_RUNS ? Number(process.env.FUZZ_RUNS) : undefined;
const replay = process.env.FUZZ_SEED ? { seed: Number(process.env.FUZZ_SEED), path: process.env.FUZZ_PATH } : {};
/** Options for a random-text property: its everyday count unless FUZZ_RUNS asks for another. */
function fuzzed(everyday: number) {
  return { numRuns: FUZZ_RUNS ?? everyday, ...replay };
}
// Tens of thousands of runs take seconds, the full count minutes; a hang still fails.
const SLOW = { timeout: FUZZ_RUNS ? 900_000 : 120_000 };
// A call takes microseconds; this catches a runaway loop, not a slow machine. A slow call is
// timed again and the fastest of a few tries counts, since a pause for garbage collection or a
// busy machine is not the reader's doing; a runaway is slow every time.
const PER_CALL_MS = 50;
// The mixed-text properties get more room, and so does text far over the length limits (up to a
// megabyte to scan before it is refused).
const ROOMY_CALL_MS = 250;
const TRIES = 3;

// Every UTF-16 unit, lone surrogates included, and every code point.
const anyUnit = fc.oneof(
  fc.integer({ min: 0, max: 0xffff }).map((code) => String.fromCharCode(code)),
  fc.integer({ min: 0, max: 0x10ffff }).map((code) => String.fromCodePoint(code)),
);
const tapeUnit = fc.constantFrom(
  ..."0123456789012345678901234567890123456789     //--..''\"\"′″“”‘’−–⁄½¾⅛,ftinmcmx×÷*+()eE".split(""),
  "ft",
  "in",
  "mm",
  "inches",
  "feet",
  " 3/4",
  "1'",
);
const anyText = fc.string({ unit: anyUnit, maxLength: 80 });
const tapeText = fc.string({ unit: tapeUnit, maxLength: 40 });

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
const units = fc.constantFrom("in" as const, "mm" as const);

function timed<T>(run: () => T, limitMs = PER_CALL_MS): T {
  let fastest = Infinity;
  let result: T | undefined;
  for (let attempt = 0; attempt < TRIES && fastest >= limitMs; attempt++) {
    const start = performance.now();
    result = run();
    fastest = Math.min(fastest, performance.now() - start);
  }
  expect(fastest).toBeLessThan(limitMs);
  return result as T;
}

type Answer = { ok: true; value: Fraction } | { ok: false; error: { message: string; index: number } };

/** Either a fraction or a refusal with a message and a place in the text, whatever the text. */
function wellFormed(text: string, answer: Answer, maxIndex: number) {
  if (answer.ok) {
    expect(answer.value).toBeInstanceOf(Fraction);
    expect(answer.value.d > 0n).toBe(true);
  } else {
    expect(answer.error.message.trim().length).toBeGreaterThan(0);
    expect(Number.isInteger(answer.error.index)).toBe(true);
    expect(answer.error.index).toBeGreaterThanOrEqual(0);
    expect(answer.error.index).toBeLessThanOrEqual(Math.max(text.length, maxIndex));
  }
}

/** Well formed, and a length that was read prints to sixteenths and reads back to the same mark. */
function checkAnswer(text: string, answer: Answer, maxLength: number) {
  wellFormed(text, answer, maxLength);
  if (!answer.ok) return;
  // Rounded once to sixteenths, a length is a whole number of sixteenths.
  const printed = formatMeasure(answer.value, { denominator: 16, style: "feet-inches" });
  expect(printed.rounded.mul(16).d).toBe(1n);
  expect(printed.error.abs().compare(new Fraction(1, 32))).toBeLessThanOrEqual(0);
  // What the formatter prints, the reader reads back to the same mark.
  const again = parseMeasure(printed.text);
  expect(again.ok && again.value.equals(printed.rounded), `${text} → ${printed.text}`).toBe(true);
}

// Refusals may point anywhere up to the longest text either reader accepts.
const ANY_INDEX = 200;

describe("readers never throw and always answer", SLOW, () => {
  for (const [name, arbitrary] of [
    ["any unicode", anyText],
    ["tape-ish", tapeText],
  ] as const) {
    it(`parseMeasure on ${name} text`, () => {
      fc.assert(
        fc.property(arbitrary, units, (text, unit) => {
          wellFormed(text, timed(() => parseMeasure(text, unit)), ANY_INDEX);
        }),
        fuzzed(20_000),
      );
    });

    it(`evaluateMeasureExpression on ${name} text`, () => {
      fc.assert(
        fc.property(arbitrary, units, (text, unit) => {
          wellFormed(text, timed(() => evaluateMeasureExpression(text, unit)), ANY_INDEX);
        }),
        fuzzed(20_000),
      );
    });
  }

  it("survives hostile shapes", () => {
    for (const text of ["(".repeat(10_000), "-".repeat(10_000) + "1", "1/".repeat(5000), "9".repeat(100_000), "1'".repeat(1000)]) {
      wellFormed(text, timed(() => parseMeasure(text)), ANY_INDEX);
      wellFormed(text, timed(() => evaluateMeasureExpression(text)), ANY_INDEX);
    }
  });
});

describe("parseMeasure on random, alphabet-built and near-valid text", SLOW, () => {
  it(`never throws, never hangs, and answers in one of its two shapes (${FUZZ_RUNS ?? 5_000} strings)`, () => {
    fc.assert(
      fc.property(anyMeasureText, units, (text, unit) => {
        checkAnswer(text, timed(() => parseMeasure(text, unit), ROOMY_CALL_MS), MAX_MEASURE_LENGTH);
      }),
      fuzzed(5_000),
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
      fuzzed(5_000),
    );
  });

  it("refuses text over its length limit with a message, whatever it holds", () => {
    fc.assert(
      fc.property(fc.string({ minLength: MAX_MEASURE_LENGTH + 1, maxLength: 10_000 }), (text) => {
        const answer = timed(() => parseMeasure(text), ROOMY_CALL_MS);
        expect(answer.ok).toBe(false);
        if (!answer.ok) expect(answer.error.message).toMatch(/too long/i);
      }),
      { ...fuzzed(5_000), numRuns: Math.min(FUZZ_RUNS ?? 5_000, 2_000) },
    );
    for (const huge of ["9".repeat(1_000_000), "1/".repeat(500_000), "'".repeat(1_000_000)]) {
      const answer = timed(() => parseMeasure(huge), ROOMY_CALL_MS);
      expect(answer.ok).toBe(false);
    }
  });
});

describe("the fraction bench on random text", SLOW, () => {
  const expressionText = fc.oneof(
    anyMeasureText,
    fc.array(fc.oneof(validMeasure.map((m) => m.text), fc.constantFrom(" + ", " - ", " × ", " ÷ ", " / ", "(", ")", "*", "x", "2", "0")), { maxLength: 12 }).map((parts) => parts.join("")),
  );

  it(`never throws, never hangs, and answers in one of its shapes (${FUZZ_RUNS ?? 5_000} strings)`, () => {
    fc.assert(
      fc.property(expressionText, units, (text, unit) => {
        const answer = timed(() => evaluateMeasureExpression(text, unit), ROOMY_CALL_MS);
        if (answer.ok) {
          expect(["length", "number"]).toContain(answer.kind);
          if (answer.kind === "number") expect(answer.value).toBeInstanceOf(Fraction);
          else checkAnswer(text, answer, MAX_EXPRESSION_LENGTH);
        } else {
          checkAnswer(text, answer, MAX_EXPRESSION_LENGTH);
        }
      }),
      fuzzed(5_000),
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
      fuzzed(5_000),
    );
  });

  it("refuses a calculation over its length limit with a message", () => {
    const answer = timed(() => evaluateMeasureExpression("1 + ".repeat(250_000) + "1"), ROOMY_CALL_MS);
    expect(answer.ok).toBe(false);
    if (!answer.ok) expect(answer.error.message).toMatch(/too long/i);
  });
});
// Lengths on a 1/64" grid within ±10,000".
const sixtyFourths = fc.integer({ min: -640_000, max: 640_000 }).map((n) => new Fraction(n, 64));

describe("format then parse gives the value back", SLOW, () => {
  it.each(["inches", "feet-inches"] as const)("exactly, at 64ths, %s style", (style) => {
    fc.assert(
      fc.property(sixtyFourths, (value) => {
        const text = formatMeasure(value, { denominator: 64, style }).text;
        const back = parseMeasure(text);
        expect(back.ok && back.value.equals(value), `${value.toFraction(true)} → ${text}`).toBe(true);
      }),
      { numRuns: 5_000 },
    );
  });

  it("to the printed tenth of a millimetre", () => {
    fc.assert(
      fc.property(sixtyFourths, (value) => {
        const out = formatMeasure(value, { unit: "mm", mmDecimals: 1 });
        const back = parseMeasure(out.text, "in");
        expect(back.ok && back.value.equals(out.rounded), out.text).toBe(true);
      }),
      { numRuns: 5_000 },
    );
  });

  it("and the bench adds two printed lengths exactly", () => {
    fc.assert(
      fc.property(sixtyFourths, sixtyFourths, (a, b) => {
        const text = `(${formatMeasure(a, { denominator: 64 }).text}) + (${formatMeasure(b, { denominator: 64, style: "feet-inches" }).text})`;
        const result = evaluateMeasureExpression(text);
        expect(result.ok && result.kind === "length" && result.value.equals(a.add(b)), text).toBe(true);
      }),
      { numRuns: 2_000 },
    );
  });
});

describe("roundTo invariants", SLOW, () => {
  const anyFraction = fc
    .tuple(fc.integer({ min: -10_000_000, max: 10_000_000 }), fc.integer({ min: 1, max: 10_000 }))
    .map(([n, d]) => new Fraction(n, d));

  it("lands on a multiple of 1/d within half a unit", () => {
    fc.assert(
      fc.property(anyFraction, fc.constantFrom(...DENOMINATORS), (value, d) => {
        const { rounded, error, exact } = roundTo(value, d);
        expect(exact.equals(value)).toBe(true);
        expect(rounded.mul(d).d).toBe(1n);
        expect(error.equals(rounded.sub(value))).toBe(true);
        expect(error.abs().lte(new Fraction(1, 2 * d))).toBe(true);
      }),
      { numRuns: 10_000 },
    );
  });

  it("sends an exact half away from zero", () => {
    fc.assert(
      fc.property(fc.integer({ min: -100_000, max: 100_000 }), fc.constantFrom(...DENOMINATORS), (k, d) => {
        const midway = new Fraction(2 * k + 1, 2 * d); // (k + 1/2) / d
        const expected = new Fraction(k >= 0 ? k + 1 : k, d);
        expect(roundTo(midway, d).rounded.equals(expected)).toBe(true);
      }),
      { numRuns: 5_000 },
    );
  });

  it("formatMeasure prints what roundTo rounded to", () => {
    fc.assert(
      fc.property(anyFraction, fc.constantFrom(...DENOMINATORS), (value, d) => {
        const out = formatMeasure(value, { denominator: d, style: "feet-inches" });
        expect(out.rounded.equals(roundTo(value, d).rounded)).toBe(true);
        const back = parseMeasure(out.text);
        expect(back.ok && back.value.equals(out.rounded)).toBe(true);
      }),
      { numRuns: 5_000 },
    );
  });
});
