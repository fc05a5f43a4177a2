// Reading and writing lengths the way a tape measure and a carpenter's pencil do.
// Every value read is an exact Fraction of an inch: decimals are built from their digits,
// never through a float, and millimetres are converted with the exact 25.4.
import { Fraction, fromMillimetres, roundTo, toMillimetres, toNumber, type Unit } from "./core";

export type MeasureError = { message: string; index: number };
export type ParseResult = { ok: true; value: Fraction } | { ok: false; error: MeasureError };

/** Longer than any length a person types; bounds the work done on pasted junk. */
export const MAX_MEASURE_LENGTH = 64;

/** Thrown inside the readers and caught at their public edge; never escapes to callers. */
export class MeasureTextError extends Error {
  constructor(
    message: string,
    readonly index: number,
  ) {
    super(message);
  }
}

type UnitWord = "ft" | "in" | "mm" | "cm" | "m";
type Operator = "slash" | "dash" | "plus" | "times" | "divide" | "open" | "close";
export type MeasureToken = { start: number; end: number; spaceBefore: boolean; text: string } & (
  | { kind: "number"; value: Fraction; integer: boolean }
  | { kind: "vulgar"; value: Fraction }
  | { kind: "unit"; unit: UnitWord }
  | { kind: Operator }
);

const SYMBOLS: Record<string, Operator | UnitWord> = {
  "/": "slash", "⁄": "slash", "∕": "slash",
  "-": "dash", "−": "dash", "–": "dash", "—": "dash", "‐": "dash", "‑": "dash",
  "+": "plus", "*": "times", "×": "times", "·": "times", "⋅": "times", "÷": "divide", "(": "open", ")": "close",
  "'": "ft", "′": "ft", "‘": "ft", "’": "ft", "ʹ": "ft",
  '"': "in", "″": "in", "“": "in", "”": "in", "ʺ": "in", "〃": "in",
};
const WORDS: Record<string, UnitWord | "times"> = {
  ft: "ft", foot: "ft", feet: "ft", in: "in", inch: "in", inches: "in",
  mm: "mm", millimetre: "mm", millimetres: "mm", millimeter: "mm", millimeters: "mm",
  cm: "cm", centimetre: "cm", centimetres: "cm", centimeter: "cm", centimeters: "cm",
  m: "m", metre: "m", metres: "m", meter: "m", meters: "m", x: "times",
};
const VULGAR: Record<string, [number, number]> = {
  "½": [1, 2], "⅓": [1, 3], "⅔": [2, 3], "¼": [1, 4], "¾": [3, 4], "⅕": [1, 5], "⅖": [2, 5], "⅗": [3, 5], "⅘": [4, 5],
  "⅙": [1, 6], "⅚": [5, 6], "⅐": [1, 7], "⅛": [1, 8], "⅜": [3, 8], "⅝": [5, 8], "⅞": [7, 8], "⅑": [1, 9], "⅒": [1, 10],
};
const NUMBER = /\d+(?:\.\d*)?|\.\d+/y;
const WORD = /[A-Za-z]+/y;

/** Splits text into tokens; the caller bounds the length. Throws MeasureTextError. */
export function lexMeasureText(text: string): MeasureToken[] {
  const tokens: MeasureToken[] = [];
  let i = 0;
  let spaceBefore = false;
  const push = (token: MeasureToken) => {
    tokens.push(token);
    i = token.end;
    spaceBefore = false;
  };
  while (i < text.length) {
    const char = text[i];
    if (/\s/.test(char)) {
      i++;
      spaceBefore = true;
      continue;
    }
    NUMBER.lastIndex = i;
    WORD.lastIndex = i;
    const digits = NUMBER.exec(text)?.[0];
    const word = WORD.exec(text)?.[0];
    if (digits !== undefined) {
      const end = i + digits.length;
      if (/^[.,]\d/.test(text.slice(end, end + 2))) {
        const what = text[end] === "," ? "write decimals with a point, like 22.75, and no thousands commas" : "a number has one decimal point";
        const written = /^[\d.,]+/.exec(text.slice(i, i + 24))?.[0] ?? digits;
        throw new MeasureTextError(`"${written}": ${what}.`, end);
      }
      push({ kind: "number", start: i, end, spaceBefore, text: digits, value: decimal(digits), integer: !digits.includes(".") });
    } else if (word !== undefined) {
      const meaning = own(WORDS, word.toLowerCase());
      if (meaning === undefined) throw new MeasureTextError(couldNotRead(text, i), i);
      const base = { start: i, end: i + word.length, spaceBefore, text: word };
      push(meaning === "times" ? { ...base, kind: "times" } : { ...base, kind: "unit", unit: meaning });
    } else if (own(VULGAR, char)) {
      const [n, d] = VULGAR[char];
      push({ kind: "vulgar", start: i, end: i + 1, spaceBefore, text: char, value: new Fraction(n, d) });
    } else if (own(SYMBOLS, char)) {
      const meaning = SYMBOLS[char];
      // Two primes or apostrophes written for an inch mark.
      const doubled = meaning === "ft" && own(SYMBOLS, text[i + 1] ?? "") === "ft";
      const base = { start: i, end: i + (doubled ? 2 : 1), spaceBefore, text: text.slice(i, i + (doubled ? 2 : 1)) };
      if (meaning === "ft" || meaning === "in") push({ ...base, kind: "unit", unit: doubled ? "in" : meaning });
      else push({ ...base, kind: meaning as Operator });
    } else {
      throw new MeasureTextError(couldNotRead(text, i), i);
    }
  }
  return tokens;
}

/** The decimal a JS number prints as (its shortest round-trip form), as an exact Fraction. */
export function exactFromNumber(value: number): Fraction {
  if (!Number.isFinite(value)) throw new RangeError(`not a finite number: ${value}`);
  const [mantissa, exponentText = "0"] = String(value).toLowerCase().split("e");
  const negative = mantissa.startsWith("-");
  const [whole, part = ""] = mantissa.replace("-", "").split(".");
  const exponent = Number(exponentText) - part.length;
  const digits = BigInt(`${whole}${part}`);
  const magnitude = exponent >= 0 ? new Fraction(digits * 10n ** BigInt(exponent), 1n) : new Fraction(digits, 10n ** BigInt(-exponent));
  return negative ? magnitude.neg() : magnitude;
}

// Typed words like "constructor" must not find Object.prototype's members.
function own<T>(table: Record<string, T>, key: string): T | undefined {
  return Object.hasOwn(table, key) ? table[key] : undefined;
}

/** "22.75" → 91/4 from the digits themselves. */
function decimal(digits: string): Fraction {
  const [whole, part = ""] = digits.split(".");
  return new Fraction(BigInt(`${whole || "0"}${part}`), 10n ** BigInt(part.length));
}

// The lexer and literal reader below are shared with expression.ts; callers want parseMeasure.
export type MeasureReadMode = "single" | "expression";

/** One length literal: `value` is inches when `explicitUnit`, else the bare number as typed. */
export type MeasureLiteral = { value: Fraction; explicitUnit: boolean; next: number };

/**
 * Reads one length literal starting at token `p`. The two modes differ only in spacing:
 * inside a calculation a `/` or `-` with a space on either side is arithmetic, so the
 * fraction bar and the tape's dash (`22-3/4`, `1'-10"`) must touch the digits there.
 */
export function readMeasureLiteral(text: string, tokens: MeasureToken[], p: number, mode: MeasureReadMode): MeasureLiteral {
  const reader = new LiteralReader(text, tokens, mode);
  return reader.literal(p);
}

class LiteralReader {
  constructor(
    private readonly text: string,
    private readonly tokens: MeasureToken[],
    private readonly mode: MeasureReadMode,
  ) {}

  private fail(message: string, index: number): never {
    throw new MeasureTextError(message, index);
  }

  private span(from: MeasureToken, to: MeasureToken | undefined): string {
    return this.text.slice(from.start, (to ?? from).end);
  }

  private touches(i: number): boolean {
    const t = this.tokens[i];
    const after = this.tokens[i + 1];
    return this.mode === "single" || (t !== undefined && !t.spaceBefore && after !== undefined && !after.spaceBefore);
  }

  private isFractionBar(i: number): boolean {
    return this.tokens[i]?.kind === "slash" && this.touches(i);
  }

  private fraction(p: number): { value: Fraction; next: number } {
    const top = this.tokens[p];
    const bar = this.tokens[p + 1];
    const bottom = this.tokens[p + 2];
    if (bottom?.kind !== "number") this.fail(`"${this.span(top, bar)}" needs a number below the fraction line.`, bar.end);
    if (top.kind !== "number" || !top.integer || !bottom.integer) {
      const hint = this.mode === "expression" ? " To divide, put spaces around / or use ÷." : "";
      const bad = top.kind === "number" && !top.integer ? top : bottom;
      this.fail(`"${this.span(top, bottom)}": a fraction needs whole numbers above and below the line, like 3/4.${hint}`, bad.start);
    }
    if (bottom.value.n === 0n) this.fail(`"${this.span(top, bottom)}": a fraction cannot have 0 below the line.`, bottom.start);
    if (this.isFractionBar(p + 3)) {
      this.fail(`"${this.span(top, this.tokens[p + 4] ?? this.tokens[p + 3])}" has two fraction bars.`, this.tokens[p + 3].start);
    }
    return { value: top.value.div(bottom.value), next: p + 3 };
  }

  /** Index of a fraction that completes a mixed number after a whole at `i - 1`, or -1. */
  private mixedFraction(i: number): number {
    let j = i;
    if (this.tokens[j]?.kind === "dash" && this.touches(j)) j++;
    const t = this.tokens[j];
    if (t?.kind === "vulgar") return j;
    if (t?.kind === "number" && this.isFractionBar(j + 1)) return j;
    return -1;
  }

  private amount(p: number): { value: Fraction; next: number } | null {
    const t = this.tokens[p];
    if (t === undefined) return null;
    if (t.kind === "vulgar") return { value: t.value, next: p + 1 };
    if (t.kind === "slash") this.fail(`"${this.span(t, this.tokens[p + 1])}" needs a number above the fraction line.`, t.start);
    if (t.kind !== "number") return null;
    if (this.isFractionBar(p + 1)) return this.fraction(p);
    const m = this.mixedFraction(p + 1);
    if (m < 0) return { value: t.value, next: p + 1 };
    if (!t.integer) this.fail(`"${this.span(t, this.tokens[m + 2] ?? this.tokens[m])}": a mixed number needs a whole number before the fraction.`, t.start);
    const part = this.tokens[m].kind === "vulgar" ? { value: this.tokens[m].value, next: m + 1 } : this.fraction(m);
    return { value: t.value.add(part.value), next: part.next };
  }

  literal(p: number): MeasureLiteral {
    const first = this.tokens[p];
    const head = this.amount(p);
    if (head === null) {
      if (first?.kind === "unit") this.fail(unitWithoutNumber(first), first.start);
      return this.fail(couldNotRead(this.text, first?.start ?? this.text.length), first?.start ?? this.text.length);
    }
    const unitToken = this.tokens[head.next];
    if (unitToken?.kind !== "unit") return { value: head.value, explicitUnit: false, next: head.next };
    const next = head.next + 1;
    switch (unitToken.unit) {
      case "in":
        return { value: head.value, explicitUnit: true, next };
      case "mm":
        return { value: fromMillimetres(head.value), explicitUnit: true, next };
      case "cm":
        return { value: fromMillimetres(head.value.mul(10)), explicitUnit: true, next };
      case "m":
        return { value: fromMillimetres(head.value.mul(1000)), explicitUnit: true, next };
      case "ft":
        return this.inchesAfterFeet(first, head.value.mul(12), next);
    }
  }

  private inchesAfterFeet(first: MeasureToken, feetInInches: Fraction, p: number): MeasureLiteral {
    let j = p;
    const dash = this.tokens[j];
    const dashed = dash?.kind === "dash" && this.touches(j);
    if (dashed) j++;
    const inchesPart = this.amount(j);
    if (inchesPart === null) {
      if (dashed) this.fail(`Expected inches after "${this.span(first, dash)}".`, dash.end);
      return { value: feetInInches, explicitUnit: true, next: p };
    }
    const unitToken = this.tokens[inchesPart.next];
    let next = inchesPart.next;
    if (unitToken?.kind === "unit") {
      if (unitToken.unit === "ft") this.fail(`Feet are given twice in "${this.span(first, unitToken)}".`, unitToken.start);
      if (unitToken.unit !== "in") this.fail(`"${this.span(first, unitToken)}" mixes feet with metric units; write one or the other.`, unitToken.start);
      next++;
    }
    return { value: feetInInches.add(inchesPart.value), explicitUnit: true, next };
  }
}

/** Quoting a lone `"` would read as `"""`, so marks are named rather than quoted. */
export function unitWithoutNumber(token: MeasureToken): string {
  if (/^[A-Za-z]/.test(token.text)) return `"${token.text}" at character ${token.start + 1} needs a number before it.`;
  const mark = token.kind === "unit" && token.unit === "ft" ? "A foot mark" : "An inch mark";
  return `${mark} at character ${token.start + 1} needs a number before it.`;
}

function couldNotRead(text: string, index: number): string {
  const rest = text.slice(index);
  const word = /^[A-Za-z]+/.exec(rest)?.[0] ?? printable(String.fromCodePoint(rest.codePointAt(0) ?? 32));
  return `Could not read "${word}" at character ${index + 1} — type a length like 22 3/4 or 1' 10 3/4".`;
}

function printable(char: string): string {
  return /[\p{C}\p{Z}]/u.test(char) ? `U+${(char.codePointAt(0) ?? 0).toString(16).toUpperCase().padStart(4, "0")}` : char;
}

function leftoverMessage(text: string, tokens: MeasureToken[], p: number): string {
  const t = tokens[p];
  const before = tokens[p - 1];
  if (t.kind === "number" || t.kind === "vulgar") {
    if (tokens.slice(0, p).some((x) => x.kind === "unit" && x.unit === "in") && tokens[p + 1]?.kind === "unit") {
      return `Write feet before inches, like 1' 10".`;
    }
    return `"${text.slice(tokens[0].start, t.end)}": two numbers in a row — write a mixed number like 22 3/4, or mark feet and inches like 1' 10".`;
  }
  if (t.kind === "unit" && before?.kind === "unit") return `Two units in a row at character ${t.start + 1}; give one.`;
  if (t.kind === "slash") return `The fraction bar at character ${t.start + 1} needs a number just before it.`;
  if (t.kind !== "unit") return `${couldNotRead(text, t.start)} This box takes one length; the fraction bench adds, subtracts, multiplies and divides.`;
  return couldNotRead(text, t.start);
}

/**
 * Reads tape notation: `22 3/4`, `22-3/4"`, `1' 10 3/4"`, `1'-10-3/4"`, `1 ft 10.75 in`,
 * `22.75`, `5/8`, `3'`, `-1/16`, `600 mm`, `0.6 m`, `60 cm`, typographic quotes and primes.
 * A number without a unit is in `unit`; a written unit always wins. Never throws: an
 * error names what is wrong and the 0-based index (a UTF-16 offset, as String#slice uses).
 */
export function parseMeasure(text: string, unit: Unit = "in"): ParseResult {
  try {
    return { ok: true, value: parseOrThrow(String(text), unit) };
  } catch (error) {
    if (error instanceof MeasureTextError) return { ok: false, error: { message: error.message, index: error.index } };
    throw error;
  }
}

function parseOrThrow(text: string, unit: Unit): Fraction {
  if (text.length > MAX_MEASURE_LENGTH) throw new MeasureTextError("That is too long to be a length.", MAX_MEASURE_LENGTH);
  const tokens = lexMeasureText(text);
  if (tokens.length === 0) throw new MeasureTextError("Enter a length.", 0);
  let p = 0;
  let negative = false;
  const sign = tokens[0];
  if (sign.kind === "dash" || sign.kind === "plus") {
    negative = sign.kind === "dash";
    p = 1;
    if (tokens.length === 1) throw new MeasureTextError(`"${sign.text}" needs a number after it.`, sign.end);
  }
  const literal = readMeasureLiteral(text, tokens, p, "single");
  if (literal.next < tokens.length) {
    throw new MeasureTextError(leftoverMessage(text, tokens, literal.next), tokens[literal.next].start);
  }
  const value = literal.explicitUnit || unit === "in" ? literal.value : fromMillimetres(literal.value);
  return negative ? value.neg() : value;
}

export type MeasureStyle = "inches" | "feet-inches";
export type FormatOptions = { denominator?: number; style?: MeasureStyle; unit?: Unit; mmDecimals?: 0 | 1 };
export type Formatted = { text: string; rounded: Fraction; error: Fraction };

/**
 * Prints a length as a carpenter writes it, rounded once to the nearest 1/denominator
 * (inches) or to the whole or tenth millimetre. Ties round half away from zero: exactly
 * midway between two marks, a positive length reads the longer mark (1/32" at sixteenths
 * reads 1/16"). `error` is rounded − exact, in inches, whatever the unit shown.
 * Feet-inches style writes 12" and over as `1' 10 3/4"`; under 12" it writes inches.
 */
export function formatMeasure(value: Fraction, opts: FormatOptions = {}): Formatted {
  if ((opts.unit ?? "in") === "mm") {
    const decimals = opts.mmDecimals ?? 0;
    const mm = roundTo(toMillimetres(value), decimals === 1 ? 10 : 1).rounded;
    const rounded = fromMillimetres(mm);
    return { text: `${decimalText(mm, decimals)} mm`, rounded, error: rounded.sub(value) };
  }
  const denominator = opts.denominator ?? 16;
  if (!Number.isInteger(denominator) || denominator < 1 || denominator > 64) {
    throw new RangeError(`denominator must be a whole number from 1 to 64, got ${denominator}`);
  }
  const { rounded, error } = roundTo(value, denominator);
  const sign = rounded.s < 0n && rounded.n !== 0n ? "-" : "";
  const magnitude = rounded.abs();
  if (opts.style === "feet-inches" && magnitude.compare(12) >= 0) {
    const feet = magnitude.div(12).floor();
    const rest = magnitude.sub(feet.mul(12));
    return { text: `${sign}${feet.n}' ${mixedText(rest, true)}"`, rounded, error };
  }
  return { text: `${sign}${mixedText(magnitude, false)}"`, rounded, error };
}

/** `22 3/4`, `3/8`, `0`; with `keepZeroWhole`, `0 3/8` so feet-inches always shows inches. */
function mixedText(magnitude: Fraction, keepZeroWhole: boolean): string {
  const whole = magnitude.floor();
  const part = magnitude.sub(whole);
  if (part.n === 0n) return `${whole.n}`;
  if (whole.n === 0n && !keepZeroWhole) return `${part.n}/${part.d}`;
  return `${whole.n} ${part.n}/${part.d}`;
}

function decimalText(value: Fraction, decimals: 0 | 1): string {
  const scaled = value.abs().mul(decimals === 1 ? 10 : 1);
  const digits = `${scaled.n / scaled.d}`;
  const sign = value.s < 0n && value.n !== 0n ? "-" : "";
  if (decimals === 0) return `${sign}${digits}`;
  return `${sign}${digits.slice(0, -1) || "0"}.${digits.slice(-1)}`;
}

export type MeasureJsonOptions = { unit: Unit; denominator: number; style?: MeasureStyle; mmDecimals?: 0 | 1 };
export type MeasureJson = { exact: string; value: number; text: string };
export type RoundingJson = { exact: MeasureJson; rounded: MeasureJson; error: { exact: string; value: number } };

function inUnit(value: Fraction, unit: Unit): Fraction {
  return unit === "mm" ? toMillimetres(value) : value;
}

function ratio(value: Fraction): { exact: string; value: number } {
  return { exact: value.toFraction(), value: toNumber(value) };
}

/**
 * The API's shape for one length: `exact` is the reduced rational in the unit asked
 * (`"91/4"` inches, `"2921/5"` mm), `value` its decimal for display only, `text` as printed.
 */
export function measureJson(value: Fraction, opts: MeasureJsonOptions): MeasureJson {
  return { ...ratio(inUnit(value, opts.unit)), text: formatMeasure(value, opts).text };
}

/** Exact, rounded and the rounding error (rounded − exact), each in the unit asked. */
export function roundingJson(value: Fraction, opts: MeasureJsonOptions): RoundingJson {
  const formatted = formatMeasure(value, opts);
  return {
    exact: { ...ratio(inUnit(value, opts.unit)), text: formatted.text },
    rounded: { ...ratio(inUnit(formatted.rounded, opts.unit)), text: formatted.text },
    error: ratio(inUnit(formatted.error, opts.unit)),
  };
}
