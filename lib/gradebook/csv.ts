// CSV out of the gradebook (pure). Spreadsheet programs run a cell that starts with = + - @ (or a
// tab or carriage return, which some strip before looking) as a formula, so a student named
// "=HYPERLINK(…)" could run one on the instructor's machine; such a cell gets a leading quote.
import Papa from "papaparse";

const FORMULA_START = /^[=+\-@\t\r]/;

export function escapeCell(value: string | number | null | undefined): string {
  if (value === null || value === undefined) return "";
  // Our own numbers are written plainly; a negative never comes out of a score.
  if (typeof value === "number") return String(value);
  return FORMULA_START.test(value) ? `'${value}` : value;
}

/** Rows to CSV text with every cell escaped; the BOM lets spreadsheet programs read accents as UTF-8. */
export function toCsv(header: readonly string[], rows: readonly (readonly (string | number | null)[])[], { bom = true } = {}): string {
  const text = Papa.unparse({ fields: header.map(escapeCell), data: rows.map((row) => row.map(escapeCell)) }, { newline: "\r\n", quotes: false });
  return `${bom ? "\uFEFF" : ""}${text}\r\n`;
}

/** A file name from a class name: letters, digits and dashes only. */
export function csvFileName(base: string, suffix: string): string {
  const slug = base.normalize("NFKD").replace(/[^\w\s-]/g, "").trim().replace(/[\s_]+/g, "-").toLowerCase().slice(0, 60) || "class";
  return `${slug}-${suffix}.csv`;
}
