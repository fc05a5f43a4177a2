// The wall-grid form and API body, read into the engine's exact input.
import { z } from "zod";
import { Fraction, ZERO, type Unit } from "./core";
import { denominatorSchema, measureInput, readMeasure, unitSchema } from "./schema";
import { countInput, isBlank, optionalMeasureInput, readCount, readOptionalMeasure } from "./spacing-schema";
import type { WallGridInput } from "./wall-grid";

/** Limits that keep one request to a wall someone could build (and bound the cut list's work). */
export const MAX_WALL_LENGTH = new Fraction(1200);
export const MAX_VERTICALS = 200;
export const MAX_ROWS = 20;
export const MAX_STOCK_LENGTHS = 10;
/** 8', 10' and 12' boards: common lumberyard lengths (common practice, no source). */
export const DEFAULT_STOCK = [96, 120, 144];
/** A full-kerf circular saw blade (common practice, no handbook source). */
export const DEFAULT_KERF = new Fraction(1, 8);

const stockItem = z.union([measureInput, z.object({ length: measureInput, price: z.number({ error: "A price must be a number." }).min(0, "A price cannot be below 0.").optional() })], {
  error: "Each stock length must be a length like 96 or 8', or { length, price }.",
});

const booleanInput = z
  .union([z.boolean(), z.enum(["true", "false", "on", "off", "1", "0"])], { error: "End studs must be yes or no (true or false)." })
  .transform((v) => v === true || v === "true" || v === "on" || v === "1")
  .optional();

export type WallGridRequest = WallGridInput & { unit: Unit; denominator: number };

export const wallGridSchema = z
  .object({
    unit: unitSchema,
    denominator: denominatorSchema,
    wallWidth: measureInput,
    wallHeight: measureInput,
    topRailWidth: measureInput,
    bottomRailWidth: measureInput,
    /** Blank means no base trim. */
    baseTrimHeight: optionalMeasureInput,
    verticalWidth: measureInput,
    verticalCount: countInput,
    maxBay: optionalMeasureInput,
    rows: countInput,
    rowWidth: optionalMeasureInput,
    /** Given, it turns on the stud check. */
    firstStudCenter: optionalMeasureInput,
    studSpacing: optionalMeasureInput,
    endStuds: booleanInput,
    stock: z.array(stockItem, { error: "Stock must be a list of lengths." }).max(MAX_STOCK_LENGTHS, `Give at most ${MAX_STOCK_LENGTHS} stock lengths.`).optional(),
    kerf: optionalMeasureInput,
    trim: optionalMeasureInput,
  })
  .transform((raw, ctx): WallGridRequest => {
    const u = raw.unit;
    const length = (label: string) => ({ label, positive: true, max: MAX_WALL_LENGTH });
    const width = (label: string) => ({ label, min: ZERO, max: MAX_WALL_LENGTH });
    const wallWidth = readMeasure(ctx, raw.wallWidth, u, ["wallWidth"], length("Wall width"));
    const wallHeight = readMeasure(ctx, raw.wallHeight, u, ["wallHeight"], length("Wall height"));
    const topRailWidth = readMeasure(ctx, raw.topRailWidth, u, ["topRailWidth"], width("Top rail width"));
    const bottomRailWidth = readMeasure(ctx, raw.bottomRailWidth, u, ["bottomRailWidth"], width("Bottom rail width"));
    const baseTrimHeight = readOptionalMeasure(ctx, raw.baseTrimHeight, u, ["baseTrimHeight"], width("Base trim height"));
    const verticalWidth = readMeasure(ctx, raw.verticalWidth, u, ["verticalWidth"], length("Vertical width"));
    const maxBay = readOptionalMeasure(ctx, raw.maxBay, u, ["maxBay"], length("Widest bay"));
    const verticalCount = isBlank(raw.verticalCount) ? undefined : readCount(ctx, raw.verticalCount, ["verticalCount"], "Number of verticals", 2, MAX_VERTICALS);
    const rows = isBlank(raw.rows) ? 0 : readCount(ctx, raw.rows, ["rows"], "Rows", 0, MAX_ROWS);
    const rowWidth = readOptionalMeasure(ctx, raw.rowWidth, u, ["rowWidth"], length("Row rail width"));
    const firstStudCenter = readOptionalMeasure(ctx, raw.firstStudCenter, u, ["firstStudCenter"], width("First stud centre"));
    const studSpacing = readOptionalMeasure(ctx, raw.studSpacing, u, ["studSpacing"], { label: "Stud spacing", min: new Fraction(4), max: MAX_WALL_LENGTH });
    const kerf = readOptionalMeasure(ctx, raw.kerf, u, ["kerf"], { label: "Kerf", min: ZERO, max: new Fraction(1) });
    const trim = readOptionalMeasure(ctx, raw.trim, u, ["trim"], { label: "End trim", min: ZERO, max: new Fraction(24) });
    // The default lengths are inches whatever the unit; lengths the user gives are in the unit.
    const stock: ({ length: Fraction; price?: number } | null)[] = raw.stock
      ? raw.stock.map((item, i) => {
          const isObject = typeof item === "object" && item !== null;
          const path = isObject ? ["stock", i, "length"] : ["stock", i];
          const value = readMeasure(ctx, isObject ? item.length : item, u, path, length(`Stock length ${i + 1}`));
          return value === null ? null : { length: value, ...(isObject && item.price !== undefined && { price: item.price }) };
        })
      : DEFAULT_STOCK.map((inchesLong) => ({ length: new Fraction(inchesLong) }));

    if (isBlank(raw.verticalCount) === isBlank(raw.maxBay)) {
      const message = isBlank(raw.verticalCount) ? "Give the number of verticals or the widest bay." : "Give either the number of verticals or the widest bay, not both.";
      ctx.addIssue({ code: "custom", message, path: ["verticalCount"] });
      return z.NEVER;
    }
    if (stock.length === 0) {
      ctx.addIssue({ code: "custom", message: "Give at least one stock length.", path: ["stock"] });
      return z.NEVER;
    }
    const values = [wallWidth, wallHeight, topRailWidth, bottomRailWidth, baseTrimHeight, verticalWidth, maxBay, verticalCount, rows, rowWidth, firstStudCenter, studSpacing, kerf, trim];
    if (values.includes(null) || stock.includes(null)) return z.NEVER;

    const used = topRailWidth!.add(bottomRailWidth!).add(baseTrimHeight ?? ZERO);
    if (used.compare(wallHeight!) >= 0) {
      ctx.addIssue({ code: "custom", message: "The top rail, bottom rail and base trim take the whole wall height: nothing is left for the verticals.", path: ["wallHeight"] });
      return z.NEVER;
    }
    const longest = stock.reduce((a, b) => (b!.length.compare(a) > 0 ? b!.length : a), ZERO);
    if (trim !== undefined && longest.compare(trim!) <= 0) {
      ctx.addIssue({ code: "custom", message: "The end trim is as long as the longest stock: no board would be left to cut.", path: ["trim"] });
      return z.NEVER;
    }
    if (maxBay !== undefined && wallWidth!.div(verticalWidth!.add(maxBay!)).compare(MAX_VERTICALS) >= 0) {
      ctx.addIssue({ code: "custom", message: `That widest bay needs more than ${MAX_VERTICALS} verticals; make it larger.`, path: ["maxBay"] });
      return z.NEVER;
    }
    if (studSpacing !== undefined && firstStudCenter === undefined) {
      ctx.addIssue({ code: "custom", message: "Give the first stud's centre too, measured from the left end of the wall.", path: ["firstStudCenter"] });
      return z.NEVER;
    }

    return {
      unit: u,
      denominator: raw.denominator,
      wallWidth: wallWidth!,
      wallHeight: wallHeight!,
      topRailWidth: topRailWidth!,
      bottomRailWidth: bottomRailWidth!,
      baseTrimHeight: baseTrimHeight ?? ZERO,
      verticalWidth: verticalWidth!,
      ...(verticalCount !== undefined ? { verticalCount: verticalCount! } : { maxBay: maxBay! }),
      rows: rows!,
      ...(rowWidth && { rowWidth }),
      ...(firstStudCenter !== undefined && {
        studs: { firstStudCenter: firstStudCenter!, ...(studSpacing && { studSpacing }), ...(raw.endStuds !== undefined && { endStuds: raw.endStuds }) },
      }),
      stock: stock.map((item) => item!),
      kerf: kerf ?? DEFAULT_KERF,
      ...(trim && { trim }),
    };
  });

export type WallGridBody = z.input<typeof wallGridSchema>;
