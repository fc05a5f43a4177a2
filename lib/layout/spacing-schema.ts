// The even-spacing form and API body, read into the engine's exact input. Also the small
// readers the other spacing-type schemas share: optional lengths (a blank box means "not
// given") and whole-number counts typed as text or sent as numbers.
import { z } from "zod";
import { ZERO, type Fraction, type Unit } from "./core";
import { denominatorSchema, measureInput, readMeasure, unitSchema, type MeasureRules } from "./schema";
import type { EvenSpacingInput } from "./spacing";

/** Counts above this are no layout anyone marks out, and they bound the work a request can ask for. */
export const MAX_MEMBERS = 10_000;

/** A length box that may be left empty. */
export const optionalMeasureInput = measureInput.optional().nullable();

export const countInput = z
  .union([z.number(), z.string().max(12, "That is too long to be a count.")], {
    error: (issue) => (issue.input === undefined ? "Enter a count." : "A count must be a whole number, like 6."),
  })
  .optional()
  .nullable();

export function isBlank(raw: unknown): raw is undefined | null | "" {
  return raw === undefined || raw === null || (typeof raw === "string" && raw.trim() === "");
}

/** Reads a length box that may be blank: undefined when blank, null when it was wrong. */
export function readOptionalMeasure(
  ctx: z.RefinementCtx,
  raw: string | number | null | undefined,
  unit: Unit,
  path: (string | number)[],
  rules: MeasureRules = {},
): Fraction | undefined | null {
  if (isBlank(raw)) return undefined;
  return readMeasure(ctx, raw, unit, path, rules);
}

/** Reads a whole number between `min` and `max`; adds an issue naming `label` and returns null when it is not. */
export function readCount(
  ctx: z.RefinementCtx,
  raw: string | number,
  path: (string | number)[],
  label: string,
  min: number,
  max: number,
): number | null {
  const text = typeof raw === "number" ? String(raw) : raw.trim();
  const value = /^[-+]?\d+$/.test(text) ? Number(text) : typeof raw === "number" ? raw : NaN;
  const fail = (message: string) => {
    ctx.addIssue({ code: "custom", message, path });
    return null;
  };
  if (!Number.isInteger(value)) return fail(`${label} must be a whole number, like ${Math.max(min, 2)}.`);
  if (value < min) return fail(`${label} must be at least ${min}.`);
  if (value > max) return fail(`${label} must be at most ${max.toLocaleString("en-US")}.`);
  return value;
}

export const endConditionSchema = z
  .enum(["members", "gaps"], { error: 'End condition must be "members" (a member flush at each end) or "gaps" (a gap at each end, as between posts).' })
  .default("members");

export type EvenSpacingRequest = EvenSpacingInput & { unit: Unit; denominator: number };

export const evenSpacingSchema = z
  .object({
    unit: unitSchema,
    denominator: denominatorSchema,
    span: measureInput,
    memberWidth: measureInput,
    count: countInput,
    maxGap: optionalMeasureInput,
    endCondition: endConditionSchema,
  })
  .transform((raw, ctx): EvenSpacingRequest => {
    const span = readMeasure(ctx, raw.span, raw.unit, ["span"], { label: "Span", positive: true });
    const memberWidth = readMeasure(ctx, raw.memberWidth, raw.unit, ["memberWidth"], { label: "Member width", min: ZERO });
    const maxGap = readOptionalMeasure(ctx, raw.maxGap, raw.unit, ["maxGap"], { label: "Maximum gap", positive: true });
    const least = raw.endCondition === "members" ? 2 : 1;
    const count = isBlank(raw.count) ? undefined : readCount(ctx, raw.count, ["count"], "Member count", least, MAX_MEMBERS);
    const hasCount = !isBlank(raw.count);
    const hasMaxGap = !isBlank(raw.maxGap);
    if (hasCount === hasMaxGap) {
      const message = hasCount ? "Give either a member count or a maximum gap, not both." : "Give a member count or a maximum gap.";
      ctx.addIssue({ code: "custom", message, path: ["count"] });
      return z.NEVER;
    }
    if (span === null || memberWidth === null || maxGap === null || count === null) return z.NEVER;
    // A maximum gap far under the member width asks for more members than anyone could mark.
    if (maxGap !== undefined && span.div(memberWidth.add(maxGap)).compare(MAX_MEMBERS) > 0) {
      ctx.addIssue({ code: "custom", message: `That maximum gap needs more than ${MAX_MEMBERS.toLocaleString("en-US")} members; make it larger.`, path: ["maxGap"] });
      return z.NEVER;
    }
    return {
      unit: raw.unit,
      denominator: raw.denominator,
      span,
      memberWidth,
      endCondition: raw.endCondition,
      ...(count !== undefined ? { count } : { maxGap: maxGap! }),
    };
  });

export type EvenSpacingBody = z.input<typeof evenSpacingSchema>;
