// Reads a roster CSV the way school systems export it: any column order, headers spelled many
// ways ("Full name", "Email Address", "mail"), tabs or semicolons instead of commas. Pure: the
// server checks every row against the class afterwards (lib/classes/import.ts).
import Papa from "papaparse";
import { emailSchema } from "@/lib/accounts/schemas";
import { nameFromEmail } from "./address-list";
import { MAX_IMPORT_ROWS } from "./schemas";

export type CsvRow = {
  /** The line in the file, counting the header, as a spreadsheet numbers it. */
  line: number;
  name: string;
  email: string;
  /** Set when the row cannot be invited; the message says why in plain words. */
  error: string | null;
  /** Something worth knowing that does not stop the row (a name taken from the e-mail). */
  note: string | null;
};

export type ParsedRoster = { rows: CsvRow[]; fileError: string | null; columns: { name: string | null; email: string | null } };

const key = (header: string) => header.toLowerCase().replace(/[^a-z]/g, "");

const NAME_HEADERS = new Set(["name", "fullname", "student", "studentname", "learner", "displayname", "names", "nameofstudent", "participant"]);
const FIRST_HEADERS = new Set(["first", "firstname", "givenname", "forename", "preferredname"]);
const LAST_HEADERS = new Set(["last", "lastname", "surname", "familyname"]);

type Columns = { email: number; name: number | null; first: number | null; last: number | null; header: boolean };

function findColumns(firstRow: string[]): Columns | null {
  const keys = firstRow.map(key);
  const email = keys.findIndex((k) => k.includes("mail"));
  if (email >= 0) {
    const find = (set: Set<string>) => {
      const i = keys.findIndex((k, index) => index !== email && set.has(k));
      return i >= 0 ? i : null;
    };
    const looseName = keys.findIndex((k, i) => i !== email && k.includes("name") && !/first|last|given|family|sur|user/.test(k));
    const name = find(NAME_HEADERS) ?? (looseName >= 0 ? looseName : null);
    return { email, name, first: name === null ? find(FIRST_HEADERS) : null, last: name === null ? find(LAST_HEADERS) : null, header: true };
  }
  // No header row: a file straight from a mail program. The column holding an @ is the e-mail.
  const at = firstRow.findIndex((cell) => cell.includes("@"));
  if (at < 0) return null;
  const other = firstRow.findIndex((cell, i) => i !== at && cell.trim() !== "");
  return { email: at, name: other >= 0 ? other : null, first: null, last: null, header: false };
}

export function parseRosterCsv(text: string): ParsedRoster {
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ""), { skipEmptyLines: "greedy" });
  const table = parsed.data.filter((row) => row.some((cell) => cell.trim() !== ""));
  if (table.length === 0) return { rows: [], fileError: "The file is empty. Put a header row (Name, E-mail) and one student per line.", columns: { name: null, email: null } };
  const columns = findColumns(table[0]);
  if (!columns) {
    return {
      rows: [],
      fileError: "No e-mail column found. The first row should name the columns, for example: Name, E-mail.",
      columns: { name: null, email: null },
    };
  }
  const header = columns.header ? table[0] : null;
  const body = columns.header ? table.slice(1) : table;
  const named = (i: number | null) => (header && i !== null ? header[i].trim() : null);
  const described = {
    email: named(columns.email),
    name: named(columns.name) ?? ([named(columns.first), named(columns.last)].filter(Boolean).join(" + ") || null),
  };
  if (body.length > MAX_IMPORT_ROWS) {
    return { rows: [], fileError: `The file has ${body.length} students; import at most ${MAX_IMPORT_ROWS} at a time.`, columns: described };
  }
  if (body.length === 0) return { rows: [], fileError: "The file has a header row but no students under it.", columns: described };

  const firstLine = new Map<string, number>();
  const rows = body.map((cells, index): CsvRow => {
    const line = index + (columns.header ? 2 : 1);
    const cell = (i: number | null) => (i === null ? "" : (cells[i] ?? "").trim());
    const rawEmail = cell(columns.email);
    const name = (columns.name !== null ? cell(columns.name) : [cell(columns.first), cell(columns.last)].filter(Boolean).join(" ")).replace(/\s+/g, " ").slice(0, 120);
    if (!rawEmail) return { line, name, email: "", error: "No e-mail address on this row.", note: null };
    const email = emailSchema.safeParse(rawEmail);
    if (!email.success) return { line, name, email: rawEmail, error: `“${rawEmail}” is not an e-mail address.`, note: null };
    const earlier = firstLine.get(email.data);
    if (earlier !== undefined) return { line, name, email: email.data, error: `Same e-mail as line ${earlier}; one invitation is enough.`, note: null };
    firstLine.set(email.data, line);
    if (!name) return { line, name: nameFromEmail(email.data), email: email.data, error: null, note: "No name given: the invitation uses the start of the e-mail until they type their own." };
    return { line, name, email: email.data, error: null, note: null };
  });
  return { rows, fileError: null, columns: described };
}
