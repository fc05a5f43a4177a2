import crypto from "node:crypto";
import { Op, type Transaction } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { enqueueMail } from "@/lib/mail/outbox";
import { invitationMail } from "@/lib/mail/templates/invitation";
import { parseAddressList } from "./address-list";
import { writeTransaction } from "./manage";
import { classForTeacher, type ClassSummary } from "./queries";
import { MAX_INVITES_AT_ONCE } from "./schemas";
import { newInvitationToken } from "./tokens";

export type Invitee = { name: string | null; email: string };
export type InviteOutcome = Invitee & { outcome: "sent" | "resent" | "refused"; message: string };

/**
 * Every invitation e-mail of one send (a typed list, an import, a resend) carries the same batch
 * in its outbox key, so the page can poll how many of that send have gone (see importProgress).
 */
export function batchPrefix(classId: number, batch: string): string {
  return `invitations:${classId}:${batch}:`;
}

/** Where each address stands in the class now: active students, open invitations, removed students. */
export async function standingOf(classId: number, emails: string[], transaction?: Transaction) {
  const { Enrollment, User, Invitation } = db().models;
  const [enrolled, open] = await Promise.all([
    Enrollment.findAll({
      where: { classId },
      include: [{ model: User, as: "student", attributes: ["email"], where: { email: emails } }],
      transaction,
    }),
    Invitation.findAll({ attributes: ["email"], where: { classId, email: emails, acceptedAt: null, revokedAt: null }, transaction }),
  ]);
  const emailOf = (e: (typeof enrolled)[number]) => (e as unknown as { student: { email: string } }).student.email;
  return {
    active: new Set(enrolled.filter((e) => e.status === "active").map(emailOf)),
    removed: new Set(enrolled.filter((e) => e.status === "removed").map(emailOf)),
    invited: new Set(open.map((i) => i.email)),
  };
}

/**
 * Writes the invitations and their e-mails inside the caller's transaction: an address with an
 * open invitation has it revoked first, so only the newest link works. Returns the batch id.
 */
export async function issueInvitations(transaction: Transaction, summary: ClassSummary, inviter: SessionUser, invitees: Invitee[]): Promise<string> {
  const batch = crypto.randomUUID();
  if (invitees.length === 0) return batch;
  const { Invitation } = db().models;
  const now = new Date();
  await Invitation.update(
    { revokedAt: now },
    { where: { classId: summary.id, email: invitees.map((i) => i.email), acceptedAt: null, revokedAt: null }, transaction },
  );
  const issued = invitees.map((invitee) => ({ invitee, ...newInvitationToken(now.getTime()) }));
  await Invitation.bulkCreate(
    issued.map(({ invitee, tokenHash, expiresAt }) => ({ classId: summary.id, email: invitee.email, name: invitee.name, tokenHash, expiresAt, invitedBy: inviter.id })),
    { transaction },
  );
  await enqueueMail(
    issued.map(({ invitee, token, expiresAt }, index) => ({
      ...invitationMail({ to: invitee.email, name: invitee.name, className: summary.name, term: summary.term, instructorName: inviter.name, token, expiresAt }),
      dedupeKey: `${batchPrefix(summary.id, batch)}${index}`,
    })),
    transaction,
  );
  return batch;
}

export function openForInvites(summary: ClassSummary): void {
  if (summary.archivedAt) throw new AppError("conflict", "This class is archived. Restore it before inviting students.");
}

/** The "invite by e-mail" box: malformed entries refuse the whole send; an active student is refused on its own row. */
export async function inviteByEmail(user: SessionUser, classId: number, text: string): Promise<{ batch: string; results: InviteOutcome[] }> {
  const summary = await classForTeacher(user, classId);
  openForInvites(summary);
  const { addresses, problems } = parseAddressList(text);
  if (problems.length > 0) {
    const message = problems.length === 1 ? problems[0].message : `${problems.length} entries are not e-mail addresses: ${problems.map((p) => p.entry).join(", ")}.`;
    throw new AppError("bad_request", message, { addresses: message });
  }
  if (addresses.length === 0) throw new AppError("bad_request", "Enter at least one e-mail address.", { addresses: "Enter at least one e-mail address." });
  if (addresses.length > MAX_INVITES_AT_ONCE) {
    const message = `That is ${addresses.length} addresses; send at most ${MAX_INVITES_AT_ONCE} at once, or import a CSV file.`;
    throw new AppError("bad_request", message, { addresses: message });
  }
  return writeTransaction(async (transaction) => {
    const standing = await standingOf(classId, addresses.map((a) => a.email), transaction);
    const results: InviteOutcome[] = addresses.map((a) =>
      standing.active.has(a.email)
        ? { ...a, outcome: "refused", message: "Already an active student in this class." }
        : standing.invited.has(a.email)
          ? { ...a, outcome: "resent", message: "Had an open invitation: that link is cancelled and a new one sent." }
          : { ...a, outcome: "sent", message: standing.removed.has(a.email) ? "Was removed earlier: accepting adds them back." : "Invitation sent." },
    );
    const batch = await issueInvitations(transaction, summary, user, results.filter((r) => r.outcome !== "refused"));
    return { batch, results };
  });
}

async function openInvitation(classId: number, invitationId: number, transaction?: Transaction) {
  const invitation = await db().models.Invitation.findOne({ where: { id: invitationId, classId }, transaction });
  if (!invitation) throw new AppError("not_found", "There is no such invitation in this class.");
  if (invitation.acceptedAt) throw new AppError("conflict", "That invitation was already accepted.");
  if (invitation.revokedAt) throw new AppError("conflict", "That invitation was cancelled. Invite the address again.");
  return invitation;
}

/** A fresh link and a fresh 7 days; the old link stops working. */
export async function resendInvitation(user: SessionUser, classId: number, invitationId: number): Promise<{ batch: string }> {
  const summary = await classForTeacher(user, classId);
  openForInvites(summary);
  return writeTransaction(async (transaction) => {
    const invitation = await openInvitation(classId, invitationId, transaction);
    return { batch: await issueInvitations(transaction, summary, user, [{ name: invitation.name ?? null, email: invitation.email }]) };
  });
}

export async function revokeInvitation(user: SessionUser, classId: number, invitationId: number): Promise<void> {
  await classForTeacher(user, classId);
  await writeTransaction(async (transaction) => {
    const invitation = await openInvitation(classId, invitationId, transaction);
    await invitation.update({ revokedAt: new Date() }, { transaction });
  });
}

export type BatchProgress = { total: number; sent: number; waiting: number; retrying: string[]; failed: string[]; done: boolean };

/** How far the e-mails of one send have got, read from the outbox (the only place that knows). */
export async function batchProgress(user: SessionUser, classId: number, batch: string): Promise<BatchProgress> {
  await classForTeacher(user, classId);
  const prefix = batchPrefix(classId, batch);
  // A range on the unique key uses its index; "~" sorts after every character a key holds.
  const rows = await db().models.EmailOutbox.findAll({
    attributes: ["toAddress", "status", "tries"],
    where: { dedupeKey: { [Op.gte]: prefix, [Op.lt]: `${prefix}~` } },
  });
  if (rows.length === 0) throw new AppError("not_found", "There is no such send for this class.");
  const sent = rows.filter((r) => r.status === "sent").length;
  const failed = rows.filter((r) => r.status === "failed").map((r) => r.toAddress);
  const retrying = rows.filter((r) => r.status !== "sent" && r.status !== "failed" && r.tries > 0).map((r) => r.toAddress);
  const waiting = rows.length - sent - failed.length;
  return { total: rows.length, sent, waiting, retrying, failed, done: waiting === 0 };
}
