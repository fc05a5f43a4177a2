import type { Transaction } from "sequelize";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { issueInvitations, openForInvites, standingOf } from "./invitations";
import { writeTransaction } from "./manage";
import { classForTeacher, type ClassSummary } from "./queries";
import { parseRosterCsv, type CsvRow } from "./roster-csv";

export type ImportRowStatus = "invite" | "resend" | "error";
export type ImportRow = Omit<CsvRow, "error"> & { status: ImportRowStatus; message: string | null };
export type ImportPreview = {
  rows: ImportRow[];
  counts: Record<ImportRowStatus, number>;
  fileError: string | null;
  columns: { name: string | null; email: string | null };
};
export type ImportResult = ImportPreview & { batch: string; sent: number };

/** The file's own checks, then the class's: already active is an error, an open invitation is re-sent. */
async function check(summary: ClassSummary, csv: string, transaction?: Transaction): Promise<ImportPreview> {
  const parsed = parseRosterCsv(csv);
  const good = parsed.rows.filter((r) => r.error === null).map((r) => r.email);
  const standing = good.length > 0 ? await standingOf(summary.id, good, transaction) : { active: new Set<string>(), invited: new Set<string>(), removed: new Set<string>() };
  const rows = parsed.rows.map(({ error, ...row }): ImportRow => {
    if (error) return { ...row, status: "error", message: error };
    if (standing.active.has(row.email)) return { ...row, status: "error", message: "Already an active student in this class." };
    if (standing.invited.has(row.email)) return { ...row, status: "resend", message: "Already invited: the old link is cancelled and a new one sent." };
    if (standing.removed.has(row.email)) return { ...row, status: "invite", message: "Was removed earlier: accepting adds them back." };
    return { ...row, status: "invite", message: null };
  });
  const counts = { invite: 0, resend: 0, error: 0 };
  for (const row of rows) counts[row.status]++;
  return { rows, counts, fileError: parsed.fileError, columns: parsed.columns };
}

/** Reads and checks the file; writes nothing. */
export async function previewImport(user: SessionUser, classId: number, csv: string): Promise<ImportPreview> {
  return check(await classForTeacher(user, classId), csv);
}

/**
 * Checks the file again inside one write transaction (the class may have changed since the
 * preview) and writes every good row's invitation and e-mail, or nothing at all.
 */
export async function commitImport(user: SessionUser, classId: number, csv: string): Promise<ImportResult> {
  const summary = await classForTeacher(user, classId);
  openForInvites(summary);
  return writeTransaction(async (transaction) => {
    const preview = await check(summary, csv, transaction);
    if (preview.fileError) throw new AppError("bad_request", preview.fileError, { csv: preview.fileError });
    const sendable = preview.rows.filter((r) => r.status !== "error");
    if (sendable.length === 0) {
      throw new AppError("bad_request", "No row in the file can be invited; fix the rows marked as errors first.", { csv: "No row can be invited." });
    }
    const batch = await issueInvitations(transaction, summary, user, sendable.map((r) => ({ name: r.name, email: r.email })));
    return { ...preview, batch, sent: sendable.length };
  });
}
