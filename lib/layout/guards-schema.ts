// The guard-spacing form and API body, read into the engine's exact input.
import { z } from "zod";
import type { Fraction, Unit } from "./core";
import { GUARD_MAX_OPENING, type GuardSpacingInput } from "./guards";
import { denominatorSchema, measureInput, readMeasure, unitSchema } from "./schema";
import { MAX_MEMBERS, optionalMeasureInput, readOptionalMeasure } from "./spacing-schema";

export type GuardSpacingRequest = GuardSpacingInput & { unit: Unit; denominator: number; maxOpening: Fraction };

export const guardSpacingSchema = z
  .object({
    unit: unitSchema,
    denominator: denominatorSchema,
    span: measureInput,
    balusterWidth: measureInput,
    /** Blank means the code's 4" (IRC 2018 R312.1.3). */
    maxOpening: optionalMeasureInput,
  })
  .transform((raw, ctx): GuardSpacingRequest => {
    const span = readMeasure(ctx, raw.span, raw.unit, ["span"], { label: "Span between posts", positive: true });
    const balusterWidth = readMeasure(ctx, raw.balusterWidth, raw.unit, ["balusterWidth"], { label: "Baluster width", positive: true });
    const maxOpening = readOptionalMeasure(ctx, raw.maxOpening, raw.unit, ["maxOpening"], { label: "Largest opening", positive: true });
    if (span === null || balusterWidth === null || maxOpening === null) return z.NEVER;
    const limit = maxOpening ?? GUARD_MAX_OPENING;
    if (span.div(balusterWidth.add(limit)).compare(MAX_MEMBERS) > 0) {
      ctx.addIssue({ code: "custom", message: `That span needs more than ${MAX_MEMBERS.toLocaleString("en-US")} balusters; check the span and the units.`, path: ["span"] });
      return z.NEVER;
    }
    return { unit: raw.unit, denominator: raw.denominator, span, balusterWidth, maxOpening: limit };
  });

export type GuardSpacingBody = z.input<typeof guardSpacingSchema>;
