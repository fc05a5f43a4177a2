import "server-only";
import { Op, type Transaction } from "sequelize";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import type { MailMessage } from "./message";
import { transport } from "./transport";

// Mail is stored in email_outbox inside the caller's transaction, and sent after it commits.
// A send that fails is retried with a growing wait; the action that asked for the mail has
// already committed and is never undone by a mail failure.

const MAX_TRIES = 8;
const BATCH = 25;
/** A row claimed by a process that then died is claimed again after this long. */
const STALE_CLAIM_MS = 10 * 60_000;
const POLL_MS = 30_000;

export function retryDelayMs(tries: number): number {
  return Math.min(60 * 60_000, 15_000 * 2 ** Math.max(0, tries - 1));
}

/**
 * Queues messages. Pass the caller's transaction so the mail is stored exactly when the action
 * is; delivery starts after that transaction commits. A `dedupeKey` already queued is skipped
 * (that is how "nobody is reminded twice" holds).
 */
export async function enqueueMail(messages: (MailMessage & { dedupeKey?: string })[], transaction?: Transaction): Promise<number> {
  if (messages.length === 0) return 0;
  const now = new Date();
  const rows = await db().models.EmailOutbox.bulkCreate(
    messages.map((m) => ({ kind: m.kind, toAddress: m.to, subject: m.subject.slice(0, 200), text: m.text, html: m.html, dedupeKey: m.dedupeKey ?? null, nextTryAt: now })),
    { transaction, ignoreDuplicates: true },
  );
  if (transaction) transaction.afterCommit(() => kickDelivery());
  else kickDelivery();
  return rows.length;
}

type Delivery = { sent: number; failed: number };

async function claim(id: number): Promise<boolean> {
  const { EmailOutbox } = db().models;
  const staleBefore = new Date(Date.now() - STALE_CLAIM_MS);
  const [count] = await EmailOutbox.update(
    { status: "sending", claimedAt: new Date() },
    { where: { id, [Op.or]: [{ status: "pending" }, { status: "sending", claimedAt: { [Op.lt]: staleBefore } }] } },
  );
  return count === 1;
}

/** Sends every message that is due now. Safe to run from two processes: each row is claimed first. */
export async function deliverDueMail(): Promise<Delivery> {
  const { EmailOutbox } = db().models;
  const staleBefore = new Date(Date.now() - STALE_CLAIM_MS);
  const due = await EmailOutbox.findAll({
    where: { [Op.or]: [{ status: "pending", nextTryAt: { [Op.lte]: new Date() } }, { status: "sending", claimedAt: { [Op.lt]: staleBefore } }] },
    order: [["id", "ASC"]],
    limit: BATCH,
  });
  const result: Delivery = { sent: 0, failed: 0 };
  for (const row of due) {
    if (!(await claim(row.id))) continue;
    try {
      await transport().sendMail({ from: env().MAIL_FROM, to: row.toAddress, subject: row.subject, text: row.text, html: row.html });
      await row.update({ status: "sent", sentAt: new Date(), claimedAt: null, lastError: null, tries: row.tries + 1 });
      result.sent++;
    } catch (error) {
      const tries = row.tries + 1;
      const message = error instanceof Error ? error.message : String(error);
      // Logged for the operator; the person who triggered the mail never sees this.
      console.error(`Mail ${row.id} (${row.kind}) to ${row.toAddress} failed on try ${tries}: ${message}`);
      await row.update({
        status: tries >= MAX_TRIES ? "failed" : "pending",
        tries,
        lastError: message.slice(0, 500),
        claimedAt: null,
        nextTryAt: new Date(Date.now() + retryDelayMs(tries)),
      });
      result.failed++;
    }
  }
  if (due.length === BATCH && result.sent > 0) {
    const more = await deliverDueMail();
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
    .catch((error) => console.error("Mail delivery pass failed:", error))
    .finally(() => {
      s.running = null;
      if (s.again) {
        s.again = false;
        kickDelivery();
      }
    });
}

/** Waits for the delivery pass in flight (scripts call this before they exit). */
export async function settleDelivery(): Promise<void> {
  while (state.__sixteenthsOutbox?.running) await state.__sixteenthsOutbox.running;
}
