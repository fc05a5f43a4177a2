import { MAX_LABEL_LENGTH, MAX_PIECE_ROWS, MAX_STOCK_ROWS } from "@/lib/layout/cut-list-schema";
import type { UrlCodec } from "./use-url-form";

export type CutListPieceRow = { label: string; length: string; quantity: string };
export type CutListStockRow = { length: string; price: string };

export type CutListValues = {
  unit: string;
  denominator: string;
  pieces: CutListPieceRow[];
  stock: CutListStockRow[];
  kerf: string;
  trim: string;
};

/** Longer than any length or label anyone types; a hand-made link cannot make the form huge. */
const MAX_FIELD = 64;

const ROW = "|";
const CELL = "~";

// The separators cannot appear inside a cell, so a label loses them rather than breaking the list.
const clean = (text: string) => text.replaceAll(ROW, "/").replaceAll(CELL, "-");

function encodeRows(rows: string[][]): string {
  return rows.map((cells) => cells.map(clean).join(CELL)).join(ROW);
}

function decodeRows(text: string | null, width: number, limit: number): string[][] | null {
  if (text === null) return null;
  if (text === "") return [];
  return text
    .split(ROW)
    .slice(0, limit)
    .map((row) => {
      const cells = row.split(CELL).map((cell) => cell.slice(0, MAX_FIELD));
      return Array.from({ length: width }, (_, i) => cells[i] ?? "");
    });
}

/**
 * Form encoding escapes the separators (~ as %7E, | as %7C); a link that reads
 * `pieces=shelf~24~4` can be checked by eye. A label's own ~ and | were replaced before
 * encoding, so every bare separator in the query is one of ours.
 */
class ReadableParams extends URLSearchParams {
  toString(): string {
    return super.toString().replaceAll("%7E", CELL).replaceAll("%7C", ROW);
  }
}

/**
 * The list calculator's query: `pieces=Rail~96~2|Batten~84~6&stock=96~4.25|120~`, one row
 * per piece (label, length, quantity) and per stock length (length, price), plus the flat
 * settings. Short enough to read aloud, and a hand-edited link still opens.
 */
export const cutListCodec: UrlCodec<CutListValues> = {
  fromParams: (params, defaults) => {
    const flat = (key: "unit" | "denominator" | "kerf" | "trim") => {
      const value = params.get(key);
      return value !== null && value.length <= MAX_FIELD ? value : defaults[key];
    };
    const pieces = decodeRows(params.get("pieces"), 3, MAX_PIECE_ROWS);
    const stock = decodeRows(params.get("stock"), 2, MAX_STOCK_ROWS);
    return {
      unit: flat("unit"),
      denominator: flat("denominator"),
      pieces: pieces ? pieces.map(([label, length, quantity]) => ({ label: label.slice(0, MAX_LABEL_LENGTH), length, quantity })) : defaults.pieces,
      stock: stock ? stock.map(([length, price]) => ({ length, price })) : defaults.stock,
      kerf: flat("kerf"),
      trim: flat("trim"),
    };
  },
  toParams: (values) =>
    new ReadableParams({
      unit: values.unit,
      denominator: values.denominator,
      pieces: encodeRows((values.pieces ?? []).map((p) => [p?.label ?? "", p?.length ?? "", p?.quantity ?? ""])),
      stock: encodeRows((values.stock ?? []).map((s) => [s?.length ?? "", s?.price ?? ""])),
      kerf: values.kerf,
      trim: values.trim,
    }),
};

export function cutListHref(values: CutListValues): string {
  return `/calculators/cut-list?${cutListCodec.toParams(values).toString()}`;
}
