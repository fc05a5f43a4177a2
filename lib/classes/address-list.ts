// Reads the "invite by e-mail" box: addresses separated by commas, semicolons or new lines, each
// either bare or as `Name <address>` (what a mail program copies). Pure, so the form and the
// server read a list the same way.
import { emailSchema } from "@/lib/accounts/schemas";

export type ListedAddress = { name: string | null; email: string };
export type AddressListProblem = { entry: string; message: string };
export type AddressList = { addresses: ListedAddress[]; problems: AddressListProblem[] };

/** Splits on commas outside <…>, then joins "Castellanos, Avery <a@x>" back into one entry. */
function entriesOf(line: string): string[] {
  const pieces: string[] = [];
  let depth = 0;
  let current = "";
  for (const ch of line) {
    if (ch === "<") depth++;
    if (ch === ">") depth = Math.max(0, depth - 1);
    if (ch === "," && depth === 0) {
      pieces.push(current);
      current = "";
    } else current += ch;
  }
  pieces.push(current);
  const joined: string[] = [];
  for (const piece of pieces.map((p) => p.trim()).filter(Boolean)) {
    const previous = joined[joined.length - 1];
    if (previous !== undefined && !previous.includes("@") && piece.includes("<")) joined[joined.length - 1] = `${previous}, ${piece}`;
    else joined.push(piece);
  }
  return joined;
}

function readEntry(entry: string): ListedAddress | AddressListProblem {
  const angled = entry.match(/^(.*?)\s*<([^<>]*)>$/);
  const rawName = angled ? angled[1].trim().replace(/^["']|["']$/g, "").trim() : "";
  const rawEmail = angled ? angled[2] : entry;
  const parsed = emailSchema.safeParse(rawEmail);
  if (!parsed.success) return { entry, message: `“${entry}” is not an e-mail address.` };
  return { name: rawName ? rawName.slice(0, 120) : null, email: parsed.data };
}

export function parseAddressList(text: string): AddressList {
  const addresses: ListedAddress[] = [];
  const problems: AddressListProblem[] = [];
  const seen = new Set<string>();
  for (const line of text.split(/[\n\r;]+/)) {
    for (const entry of entriesOf(line)) {
      const result = readEntry(entry);
      if ("message" in result) problems.push(result);
      // The same address twice is one invitation; the first name given wins.
      else if (!seen.has(result.email)) {
        seen.add(result.email);
        addresses.push(result);
      }
    }
  }
  return { addresses, problems };
}

/** The name an invitation uses when none was given: the part before the @. */
export function nameFromEmail(email: string): string {
  return email.split("@")[0] ?? email;
}
