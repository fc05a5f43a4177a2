// The measurement endpoint's body: one length or a calculation on lengths, read with the
// engine's own parser, plus how to print the answer.
import { z } from "zod";
import { evaluateMeasureExpression } from "./expression";
import { denominatorSchema, unitSchema } from "./schema";
import type { Fraction, Unit } from "./core";

export type MeasureRequest = { unit: Unit; denominator: number; style: "inches" | "feet-inches"; kind: "length" | "number"; value: Fraction };

export const measureRequestSchema = z
  .object({
    text: z.string({ error: 'Send the length or calculation as "text", e.g. "22 3/4" or "(96 - 3 × 1 1/2) ÷ 4".' }).max(200, { error: "That is too long; keep it under 200 characters." }),
    unit: unitSchema,
    denominator: denominatorSchema,
    style: z.enum(["inches", "feet-inches"], { error: 'Style must be "inches" or "feet-inches".' }).default("inches"),
  })
  .transform((raw, ctx): MeasureRequest => {
    const result = evaluateMeasureExpression(raw.text, raw.unit);
    if (!result.ok) {
      ctx.addIssue({ code: "custom", path: ["text"], message: `${result.error.message} (at character ${result.error.index + 1})` });
      return z.NEVER;
    }
    return { unit: raw.unit, denominator: raw.denominator, style: raw.style, kind: result.kind, value: result.value };
  });
