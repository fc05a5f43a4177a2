// What an answer looks like on the wire, in every form it could take, so a response can be searched
// for one: the rounded tape reading ("23 7/16"), the exact rational ("375/16", "23 7/16"), decimal
// inches ("23.4375") and the worked-steps text the solution shows.
import { formatMeasure, type Fraction } from "@/lib/layout";
import { findKind, type Level } from "@/lib/problems";
import { roundedAnswer } from "@/lib/problems/kit";

export type AnswerForm = { what: string; pattern: RegExp };

const escape = (text: string) => text.replace(/[.*+?^${}()|[\]\\]/g, "\\$&");

/**
 * A reading as a whole: "3/8" inside "13/8" or "1 3/8" is another number. The text is searched after
 * `plainText`, so the inch mark may be a quote, an escaped quote or an entity alike.
 */
const whole = (text: string) => new RegExp(`(?<![\\d/.]|\\d )${escape(text)}(?![\\d/])`);

/** Decimal inches as a pattern: whole when short, and only its first four decimals when longer. */
function decimalForms(value: number): { text: string; pattern: RegExp }[] {
  if (Number.isInteger(value)) return [];
  const full = String(value);
  const [, decimals = ""] = full.split(".");
  // A long decimal may be cut short or rounded anywhere past the fourth place; its first four decimals are enough.
  if (decimals.length > 4) {
    const cut = full.slice(0, full.indexOf(".") + 5);
    return [{ text: cut, pattern: new RegExp(`(?<![\\d.])${escape(cut)}`) }];
  }
  // A short one is a number of its own: 20.5 is not inside 20.55.
  return [{ text: full, pattern: new RegExp(`(?<![\\d.])${escape(full)}(?!\\d)`) }];
}

/** Every form of every answer of one problem, and the solution's steps that carry numbers. */
export function answerForms(kindKey: string, params: unknown, label: string): AnswerForm[] {
  const kind = findKind(kindKey)!;
  const expected = kind.solve(params as never) as Record<string, Fraction>;
  const forms: AnswerForm[] = [];
  for (const part of kind.parts(params as never)) {
    // A count ("5 spaces") is a small whole number that appears all over any page; its step text covers it.
    if (part.answer === "count") continue;
    const exact = expected[part.key];
    const rounded = roundedAnswer(exact, part.precision);
    const texts = new Set([formatMeasure(exact, { denominator: part.precision }).text.replace(/"$/, ""), rounded.toFraction(true), exact.toFraction(true), exact.toFraction()]);
    for (const text of texts) if (text.includes("/")) forms.push({ what: `${label} ${part.key} as ${text}`, pattern: whole(text) });
    const decimals = new Map([...decimalForms(exact.valueOf()), ...decimalForms(rounded.valueOf())].map((d) => [d.text, d.pattern]));
    for (const [value, pattern] of decimals) forms.push({ what: `${label} ${part.key} as ${value} in.`, pattern });
  }
  // Steps in plain words (no typeset math) are searched whole: "…, 5 spaces, gap 17 3/8"."
  for (const step of kind.explain(params as never)) {
    if (!step.includes("$") && /\d/.test(step) && step.length >= 30) forms.push({ what: `${label} worked step "${step}"`, pattern: new RegExp(escape(step)) });
  }
  return forms;
}

export function problemForms(kindKey: string, seed: number, level: Level, label: string): AnswerForm[] {
  const kind = findKind(kindKey)!;
  return answerForms(kindKey, kind.generate(seed, level), label);
}

/** A body with JSON escapes and HTML entities undone (twice: the page payload nests JSON in a script). */
export function plainText(body: string): string {
  let text = body;
  for (let i = 0; i < 2; i++) {
    text = text
      .replace(/\\u0026/g, "&")
      .replace(/\\u003c/gi, "<")
      .replace(/\\u003e/gi, ">")
      .replace(/\\"/g, '"')
      .replace(/\\\\/g, "\\")
      .replace(/&quot;|&#34;|&#x22;/g, '"')
      .replace(/&#39;|&#x27;/g, "'")
      .replace(/&lt;/g, "<")
      .replace(/&gt;/g, ">")
      .replace(/&amp;/g, "&");
  }
  return text;
}

/**
 * The forms found in `body`, less those already in `baseline` (the same page before any problem
 * existed). The whole body is searched, the problem's drawing included: a drawing is part of the prompt.
 */
export function leaksIn(body: string, forms: AnswerForm[], baseline?: string): string[] {
  const text = plainText(body);
  const before = baseline === undefined ? "" : plainText(baseline);
  return forms.filter((f) => f.pattern.test(text) && !f.pattern.test(before)).map((f) => f.what);
}
