import { describe, expect, it } from "vitest";
import fc from "fast-check";
import { DENOMINATORS, Fraction, roundTo } from "@/lib/layout/core";
import { evaluateMeasureExpression } from "@/lib/layout/expression";
import { formatMeasure, parseMeasure } from "@/lib/layout/measure";

const RUNS = 20_000;
// Generous: a call takes microseconds; this catches a runaway loop, not a slow machine.
// A slow call is timed again and the fastest of a few tries counts, since a pause for
// garbage collection or a busy machine is not the reader's doing; a runaway is slow every time.
const PER_CALL_MS = 50;
const TRIES = 3;
// Tens of thousands of runs take seconds; leave room on a busy machine.
const SLOW = { timeout: 120_000 };

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

function wellFormed(text: string, result: ReturnType<typeof parseMeasure> | ReturnType<typeof evaluateMeasureExpression>) {
  if (result.ok) {
    expect(result.value).toBeInstanceOf(Fraction);
  } else {
    expect(result.error.message.length).toBeGreaterThan(0);
    expect(result.error.index).toBeGreaterThanOrEqual(0);
    expect(result.error.index).toBeLessThanOrEqual(Math.max(text.length, 200));
  }
}

describe("readers never throw and always answer", SLOW, () => {
  for (const [name, arbitrary] of [
    ["any unicode", anyText],
    ["tape-ish", tapeText],
  ] as const) {
    it(`parseMeasure on ${name} text`, () => {
      fc.assert(
        fc.property(arbitrary, fc.constantFrom("in" as const, "mm" as const), (text, unit) => {
          wellFormed(text, timed(() => parseMeasure(text, unit)));
        }),
        { numRuns: RUNS },
      );
    });

    it(`evaluateMeasureExpression on ${name} text`, () => {
      fc.assert(
        fc.property(arbitrary, fc.constantFrom("in" as const, "mm" as const), (text, unit) => {
          wellFormed(text, timed(() => evaluateMeasureExpression(text, unit)));
        }),
        { numRuns: RUNS },
      );
    });
  }

  it("survives hostile shapes", () => {
    for (const text of ["(".repeat(10_000), "-".repeat(10_000) + "1", "1/".repeat(5000), "9".repeat(100_000), "1'".repeat(1000)]) {
      wellFormed(text, timed(() => parseMeasure(text)));
      wellFormed(text, timed(() => evaluateMeasureExpression(text)));
    }
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
