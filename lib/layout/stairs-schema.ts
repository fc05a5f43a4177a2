// The stair-layout form and API body, read into the engine's exact input.
import { z } from "zod";
import { Fraction, type Unit } from "./core";
import { denominatorSchema, measureInput, readMeasure, unitSchema } from "./schema";
import { isBlank, optionalMeasureInput, readOptionalMeasure } from "./spacing-schema";
import { CODE_MAX_RISER, CODE_MIN_TREAD, type StairLayoutInput } from "./stairs";

/** Far taller than any flight; it bounds the number of steps a request can ask for. */
export const MAX_TOTAL_RISE = new Fraction(1200);
/** A riser limit under an inch is a typing slip, and it would ask for thousands of steps. */
export const MIN_RISER_LIMIT = new Fraction(1);

export type StairLayoutRequest = StairLayoutInput & { unit: Unit; denominator: number; maxRiser: Fraction; minTread: Fraction };

export const stairLayoutSchema = z
  .object({
    unit: unitSchema,
    denominator: denominatorSchema,
    totalRise: measureInput,
    totalRun: optionalMeasureInput,
    treadDepth: optionalMeasureInput,
    /** Blank means the code's 7 3/4" (IRC 2018 R311.7.5.1). */
    maxRiser: optionalMeasureInput,
    /** Blank means the code's 10" (IRC 2018 R311.7.5.2). */
    minTread: optionalMeasureInput,
    targetRiser: optionalMeasureInput,
    nosing: optionalMeasureInput,
  })
  .transform((raw, ctx): StairLayoutRequest => {
    const u = raw.unit;
    const totalRise = readMeasure(ctx, raw.totalRise, u, ["totalRise"], { label: "Total rise", positive: true, max: MAX_TOTAL_RISE });
    const totalRun = readOptionalMeasure(ctx, raw.totalRun, u, ["totalRun"], { label: "Total run", positive: true });
    const treadDepth = readOptionalMeasure(ctx, raw.treadDepth, u, ["treadDepth"], { label: "Tread depth", positive: true });
    const maxRiser = readOptionalMeasure(ctx, raw.maxRiser, u, ["maxRiser"], { label: "Tallest riser allowed", min: MIN_RISER_LIMIT });
    const minTread = readOptionalMeasure(ctx, raw.minTread, u, ["minTread"], { label: "Shallowest tread allowed", positive: true });
    const targetRiser = readOptionalMeasure(ctx, raw.targetRiser, u, ["targetRiser"], { label: "Riser to aim for", min: MIN_RISER_LIMIT });
    const nosing = readOptionalMeasure(ctx, raw.nosing, u, ["nosing"], { label: "Nosing", min: new Fraction(0) });
    if (!isBlank(raw.totalRun) && !isBlank(raw.treadDepth)) {
      ctx.addIssue({ code: "custom", message: "Give the total run or the tread depth, not both: the run is the treads times the depth.", path: ["treadDepth"] });
      return z.NEVER;
    }
    if ([totalRise, totalRun, treadDepth, maxRiser, minTread, targetRiser, nosing].includes(null)) return z.NEVER;
    return {
      unit: u,
      denominator: raw.denominator,
      totalRise: totalRise!,
      maxRiser: maxRiser ?? CODE_MAX_RISER,
      minTread: minTread ?? CODE_MIN_TREAD,
      ...(totalRun && { totalRun }),
      ...(treadDepth && { treadDepth }),
      ...(targetRiser && { targetRiser }),
      ...(nosing && { nosing }),
    };
  });

export type StairLayoutBody = z.input<typeof stairLayoutSchema>;
