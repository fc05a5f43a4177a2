// What the class forms and the class API accept. Shared by react-hook-form (through zodResolver)
// and the route handlers, so a message the browser shows is the one the server would send.
import { z } from "zod";
import { emailSchema, nameSchema, passwordSchema } from "@/lib/accounts/schemas";
import type { EnrollmentStatus } from "@/models/enrollment";

const optionalText = (max: number, what: string) =>
  z
    .string()
    .trim()
    .max(max, { error: `Keep the ${what} under ${max} characters.` })
    .default("");

export const classSchema = z.object({
  name: z
    .string({ error: "Give the class a name." })
    .trim()
    .min(1, { error: "Give the class a name, e.g. CARP 110 — Finish Carpentry I." })
    .max(160, { error: "Keep the name under 160 characters." }),
  term: z.string({ error: "Enter the term." }).trim().min(1, { error: "Enter the term, e.g. Spring 2027." }).max(60, { error: "Keep the term under 60 characters." }),
  sectionCode: optionalText(20, "section code"),
  program: optionalText(160, "program"),
});
export type ClassFormInput = z.input<typeof classSchema>;
export type ClassInput = z.output<typeof classSchema>;

export const coInstructorSchema = z.object({ email: emailSchema });

export const MAX_INVITES_AT_ONCE = 100;

export const inviteSchema = z.object({
  addresses: z
    .string({ error: "Enter at least one e-mail address." })
    .trim()
    .min(1, { error: "Enter at least one e-mail address." })
    .max(20_000, { error: "That list is too long; import a CSV file for a whole class." }),
});
export type InviteInput = z.input<typeof inviteSchema>;

export const ROSTER_FILTERS = ["all", "active", "invited", "removed"] as const satisfies readonly ("all" | EnrollmentStatus)[];
export type RosterFilter = (typeof ROSTER_FILTERS)[number];
export const ROSTER_PAGE_SIZE = 25;

export const rosterQuerySchema = z.object({
  q: z.string().trim().max(120, { error: "Keep the search under 120 characters." }).default(""),
  status: z.enum(ROSTER_FILTERS, { error: "Filter by active, invited or removed." }).default("all"),
  page: z.coerce.number({ error: "The page must be a number." }).int().min(1, { error: "Pages start at 1." }).default(1),
});
export type RosterQuery = z.output<typeof rosterQuerySchema>;

/** Join codes avoid 0/O and 1/I, so a code read off a projector is typed right the first time. */
export const JOIN_CODE_ALPHABET = "ABCDEFGHJKLMNPQRSTUVWXYZ23456789";
export const JOIN_CODE_LENGTH = 8;

/** Students type codes with spaces, dashes and in lower case; all of those mean the same code. */
export function normalizeJoinCode(raw: string): string {
  return raw.toUpperCase().replace(/[\s\-–—·.]/g, "");
}

/** "K7PXM3QD" → "K7PX M3QD": two groups of four are easier to read aloud and copy off a board. */
export function formatJoinCode(code: string): string {
  return code.length === JOIN_CODE_LENGTH ? `${code.slice(0, 4)} ${code.slice(4)}` : code;
}

export const joinClassSchema = z.object({
  code: z
    .string({ error: "Enter the join code your instructor gave you." })
    .transform(normalizeJoinCode)
    .pipe(
      z
        .string()
        .min(1, { error: "Enter the join code your instructor gave you." })
        .regex(/^[A-Z0-9]{4,12}$/, { error: "A join code is letters and digits only, like K7PX M3QD." }),
    ),
});
export type JoinClassInput = z.input<typeof joinClassSchema>;

/** A new account made from an invitation: the e-mail comes from the invitation, not the form. */
export const acceptNewAccountSchema = z.object({ name: nameSchema, password: passwordSchema });
export type AcceptNewAccountInput = z.input<typeof acceptNewAccountSchema>;

/**
 * A signed-in student accepts with an empty body; a visitor without an account sends name and
 * password. (A zod union would hide which field was wrong, so the shape decides the schema.)
 */
export function parseAcceptBody(body: unknown): z.output<typeof acceptNewAccountSchema> | null {
  const empty = body === null || body === undefined || (typeof body === "object" && Object.keys(body as object).length === 0);
  return empty ? null : acceptNewAccountSchema.parse(body);
}

export const MAX_IMPORT_ROWS = 500;
export const MAX_IMPORT_BYTES = 1_000_000;

export const rosterImportSchema = z.object({
  csv: z
    .string({ error: "Choose a CSV file or paste the roster." })
    .min(1, { error: "Choose a CSV file or paste the roster." })
    .refine((text) => new TextEncoder().encode(text).length <= MAX_IMPORT_BYTES, { error: "The roster is over 1 MB; split it into smaller files." }),
  dryRun: z.boolean({ error: "Say whether this is a preview (dryRun: true) or the real import." }),
});

export const idParam = (name: string) => z.coerce.number({ error: `The ${name} must be a number.` }).int({ error: `The ${name} must be a whole number.` }).positive({ error: `The ${name} must be a positive number.` });

export const classParamsSchema = z.object({ classId: idParam("class id") });
