// The cut-list form and API body, read into the engine's exact input. Every error names
// its row: `pieces.2.length` → "Piece 3 length: …", `stock.0.price` → "Stock 1 price: …".
import { z } from "zod";
import { Fraction, ZERO, type Unit } from "./core";
import type { CutListInput, CutPiece, StockLength } from "./cut-list";
import { denominatorSchema, measureInput, readMeasure, unitSchema } from "./schema";
import { isBlank, optionalMeasureInput, readCount, readOptionalMeasure } from "./spacing-schema";

export const MAX_PIECE_ROWS = 200;
export const MAX_PIECE_QUANTITY = 500;
/** Pieces in all, across the rows: a real cut list is far shorter, and it bounds the work one request can ask for. */
export const MAX_TOTAL_PIECES = 2_000;
export const MAX_STOCK_ROWS = 10;
export const MAX_LABEL_LENGTH = 60;
/** 100 feet: longer than any board sold, short enough to catch a slip of the unit. */
export const MAX_CUT_LIST_LENGTH = new Fraction(1200);
export const MAX_KERF = new Fraction(1);
export const MAX_TRIM = new Fraction(24);
export const MAX_PRICE = 100_000;
/** A full-kerf circular saw blade (common practice, no handbook source). */
export const DEFAULT_CUT_LIST_KERF = new Fraction(1, 8);

const countOrText = z.union([z.number(), z.string().max(12, "That is too long to be a quantity.")]).optional().nullable();
const priceInput = z.union([z.number(), z.string().max(16, "That is too long to be a price.")]).optional().nullable();

const pieceRow = z.object(
  {
    label: z.string().max(MAX_LABEL_LENGTH, `A label is at most ${MAX_LABEL_LENGTH} characters.`).optional().nullable(),
    length: measureInput,
    /** Blank means one. */
    quantity: countOrText,
  },
  { error: "Each piece must be { label, length, quantity }." },
);

const stockRow = z.object({ length: measureInput, price: priceInput }, { error: "Each stock length must be { length, price }." });

export type CutListRequest = CutListInput & { unit: Unit; denominator: number };

/** Dollars and cents, as a number or text like 4.25 or $4.25; undefined when blank, null when wrong. */
function readPrice(ctx: z.RefinementCtx, raw: string | number | null | undefined, path: (string | number)[], label: string): number | undefined | null {
  if (isBlank(raw)) return undefined;
  const fail = (message: string) => {
    ctx.addIssue({ code: "custom", message: `${label}: ${message}`, path });
    return null;
  };
  const text = typeof raw === "number" ? String(raw) : raw.trim().replace(/^\$\s*/, "");
  if (/^\d+\.\d{3,}$/.test(text)) return fail("give it to the cent, like 4.25.");
  if (!/^\d+(\.\d{1,2})?$/.test(text)) return fail("write a price like 4.25, in dollars and cents.");
  const value = Number(text);
  if (value > MAX_PRICE) return fail(`a board costs at most ${MAX_PRICE.toLocaleString("en-US")} here.`);
  return value;
}

export const cutListSchema = z
  .object({
    unit: unitSchema,
    denominator: denominatorSchema,
    /** Blank means 1/8" (inches whatever the unit). */
    kerf: optionalMeasureInput,
    /** Blank means none. */
    trim: optionalMeasureInput,
    pieces: z
      .array(pieceRow, { error: "Pieces must be a list of { label, length, quantity }." })
      .min(1, "Add at least one piece.")
      .max(MAX_PIECE_ROWS, `Give at most ${MAX_PIECE_ROWS} pieces (rows).`),
    stock: z
      .array(stockRow, { error: "Stock must be a list of { length, price }." })
      .min(1, "Add at least one stock length.")
      .max(MAX_STOCK_ROWS, `Give at most ${MAX_STOCK_ROWS} stock lengths.`),
  })
  .transform((raw, ctx): CutListRequest => {
    const u = raw.unit;
    const kerf = readOptionalMeasure(ctx, raw.kerf, u, ["kerf"], { label: "Kerf", min: ZERO, max: MAX_KERF });
    const trim = readOptionalMeasure(ctx, raw.trim, u, ["trim"], { label: "End trim", min: ZERO, max: MAX_TRIM });
    const pieces: (CutPiece | null)[] = raw.pieces.map((row, i) => {
      const name = `Piece ${i + 1}`;
      const length = readMeasure(ctx, row.length, u, ["pieces", i, "length"], { label: `${name} length`, positive: true, max: MAX_CUT_LIST_LENGTH });
      const quantity = isBlank(row.quantity) ? 1 : readCount(ctx, row.quantity, ["pieces", i, "quantity"], `${name} quantity`, 1, MAX_PIECE_QUANTITY);
      if (length === null || quantity === null) return null;
      return { label: (row.label ?? "").trim(), length, quantity };
    });
    const stock: (StockLength | null)[] = raw.stock.map((row, i) => {
      const name = `Stock ${i + 1}`;
      const length = readMeasure(ctx, row.length, u, ["stock", i, "length"], { label: `${name} length`, positive: true, max: MAX_CUT_LIST_LENGTH });
      const price = readPrice(ctx, row.price, ["stock", i, "price"], `${name} price`);
      if (length === null || price === null) return null;
      return { length, ...(price !== undefined && { price }) };
    });
    if (kerf === null || trim === null || pieces.includes(null) || stock.includes(null)) return z.NEVER;
    const total = (pieces as CutPiece[]).reduce((n, p) => n + p.quantity, 0);
    if (total > MAX_TOTAL_PIECES) {
      ctx.addIssue({ code: "custom", message: `That is ${total.toLocaleString("en-US")} pieces; a cut list here holds at most ${MAX_TOTAL_PIECES.toLocaleString("en-US")}. Split the job.`, path: ["pieces"] });
      return z.NEVER;
    }

    const longest = stock.reduce((a, b) => (b!.length.compare(a) > 0 ? b!.length : a), ZERO);
    if (trim !== undefined && longest.compare(trim) <= 0) {
      ctx.addIssue({ code: "custom", message: "The end trim is as long as the longest stock: no board would be left to cut.", path: ["trim"] });
      return z.NEVER;
    }
    return {
      unit: u,
      denominator: raw.denominator,
      pieces: pieces as CutPiece[],
      stock: stock as StockLength[],
      kerf: kerf ?? DEFAULT_CUT_LIST_KERF,
      trim: trim ?? ZERO,
    };
  });

export type CutListBody = z.input<typeof cutListSchema>;
