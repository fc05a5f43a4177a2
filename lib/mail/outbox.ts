import { Op, type Transaction } from "sequelize";
import type { Transporter } from "nodemailer";
import { db } from "@/lib/db";
import type { EmailOutbox } from "@/models";
import { env } from "@/lib/env";
import type { MailMessage } from "./message";
import { transport as defaultTransport } from "./transport";

// Mail is stored in email_outbox inside the caller's transaction, and sent after it commits.
// A send that fails is retried with a growing wait; the action that asked for the mail has
// already committed and is never undone by a mail failure.

/** With the waits below, the last try comes about four hours after the first: long enough to ride out an SMTP outage. */
const MAX_TRIES = 12;
const BATCH = 25;
/** A row claimed by a process that then died is claimed again after this long. */
const STALE_CLAIM_MS = 10 * 60_000;
const POLL_MS = 30_000;

export function retryDelayMs(tries: number): number {
  return Math.min(60 * 60_000, 15_000 * 2 ** Math.max(0, tries - 1));
}

export type QueuedMail = MailMessage & { dedupeKey?: string };

/**
 * Queues messages and answers how many were new. Pass the caller's transaction so the mail is
 * stored exactly when the action is; delivery starts after that transaction commits (a batch
 * job that delivers by itself passes `deliver: false`). A `dedupeKey` already queued is skipped:
 * that is how "nobody is reminded twice" holds, and the unique index keeps it so under a race.
 */
export async function enqueueMail(messages: QueuedMail[], transaction?: Transaction, { deliver = true }: { deliver?: boolean } = {}): Promise<number> {
  const { EmailOutbox } = db().models;
  const keys = messages.flatMap((m) => (m.dedupeKey ? [m.dedupeKey] : []));
  const taken = new Set(
    keys.length === 0 ? [] : (await EmailOutbox.findAll({ attributes: ["dedupeKey"], where: { dedupeKey: { [Op.in]: keys } }, transaction })).map((r) => r.dedupeKey),
  );
  const fresh = messages.filter((m) => {
    if (!m.dedupeKey) return true;
    if (taken.has(m.dedupeKey)) return false;
    taken.add(m.dedupeKey);
    return true;
  });
  if (fresh.length === 0) return 0;
  const now = new Date();
  await EmailOutbox.bulkCreate(
    fresh.map((m) => ({ kind: m.kind, toAddress: m.to, subject: m.subject.slice(0, 200), text: m.text, html: m.html, dedupeKey: m.dedupeKey ?? null, nextTryAt: now })),
    { transaction, ignoreDuplicates: true },
  );
  if (deliver) {
    if (transaction) transaction.afterCommit(() => kickDelivery());
    else kickDelivery();
  }
  return fresh.length;
}

export type Delivery = { sent: number; failed: number };

export type DeliveryOptions = {
  /** Defaults to the process's SMTP_URL transport; tests pass one for a server of their own. */
  transport?: Transporter;
  /** The moment the pass runs as; tests move it forward to reach a retry. */
  now?: Date;
};

/** Marks a row as ours to send; false when another pass got there first. */
async function claim(id: number, now: Date): Promise<boolean> {
  const { EmailOutbox } = db().models;
  const staleBefore = new Date(now.getTime() - STALE_CLAIM_MS);
  const [count] = await EmailOutbox.update(
    { status: "sending", claimedAt: now },
    { where: { id, [Op.or]: [{ status: "pending", nextTryAt: { [Op.lte]: now } }, { status: "sending", claimedAt: { [Op.lt]: staleBefore } }] } },
  );
  return count === 1;
}

/**
 * Writes a try's outcome by id. Not through the loaded instance: it still holds the row as it was
 * before the claim, so a field set back to that value ("pending", no claim) would not be written.
 */
async function settle(id: number, outcome: Partial<Pick<EmailOutbox, "status" | "tries" | "lastError" | "claimedAt" | "nextTryAt" | "sentAt">>): Promise<void> {
  await db().models.EmailOutbox.update(outcome, { where: { id } });
}

/** Sends every message that is due. Safe to run from two passes or two processes at once: each row is claimed first. */
export async function deliverDueMail(options: DeliveryOptions = {}): Promise<Delivery> {
  const { EmailOutbox } = db().models;
  const now = options.now ?? new Date();
  const send = options.transport ?? defaultTransport();
  const staleBefore = new Date(now.getTime() - STALE_CLAIM_MS);
  const due = await EmailOutbox.findAll({
    where: { [Op.or]: [{ status: "pending", nextTryAt: { [Op.lte]: now } }, { status: "sending", claimedAt: { [Op.lt]: staleBefore } }] },
    order: [["id", "ASC"]],
    limit: BATCH,
  });
  const result: Delivery = { sent: 0, failed: 0 };
  for (const row of due) {
    if (!(await claim(row.id, now))) continue;
    const tries = row.tries + 1;
    try {
      await send.sendMail({ from: env().MAIL_FROM, to: row.toAddress, subject: row.subject, text: row.text, html: row.html });
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      // Logged for the operator, one line without a stack; the person who triggered the mail never sees it.
      console.error(`Mail ${row.id} (${row.kind}) to ${row.toAddress} failed on try ${tries} of ${MAX_TRIES}: ${message}`);
      await settle(row.id, {
        status: tries >= MAX_TRIES ? "failed" : "pending",
        tries,
        lastError: message.slice(0, 500),
        claimedAt: null,
        nextTryAt: new Date(now.getTime() + retryDelayMs(tries)),
      });
      result.failed++;
      continue;
    }
    await settle(row.id, { status: "sent", sentAt: new Date(), claimedAt: null, lastError: null, tries });
    result.sent++;
  }
  if (due.length === BATCH && result.sent > 0) {
    const more = await deliverDueMail(options);
    return { sent: result.sent + more.sent, failed: result.failed + more.failed };
  }
  return result;
}

const state = globalThis as typeof globalThis & { __sixteenthsOutbox?: { running: Promise<unknown> | null; again: boolean; timer?: NodeJS.Timeout } };

/** Starts a delivery pass now (coalescing with one already running) and keeps a slow retry timer going. */
export function kickDelivery(): void {
  const s = (state.__sixteenthsOutbox ??= { running: null, again: false });
  if (!s.timer) {
    s.timer = setInterval(() => kickDelivery(), POLL_MS);
    s.timer.unref();
  }
  if (s.running) {
    s.again = true;
    return;
  }
  s.running = deliverDueMail()
    .catch((error) => console.error(`Mail delivery pass failed: ${error instanceof Error ? error.message : String(error)}`))
    .finally(() => {
      s.running = null;
      if (s.again) {
        s.again = false;
        kickDelivery();
      }
    });
}

/** Waits for the delivery pass in flight (scripts and tests call this before they move on). */
export async function settleDelivery(): Promise<void> {
  while (state.__sixteenthsOutbox?.running) await state.__sixteenthsOutbox.running;
}
