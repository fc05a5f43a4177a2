// Idempotency for answers. A client makes one key per submission and sends it again on every
// retry; the first request that gets its try stored also stores its reply under the key, in the
// same transaction (lib/group-commit.ts claims the key there, so of two racing twins exactly one
// is stored). Any later request with the key gets that reply back and stores nothing.
import "server-only";
import { createHash } from "node:crypto";
import { QueryTypes } from "sequelize";
import { z } from "zod";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import { pruneReceipts } from "./receipt-retention";

export const IDEMPOTENCY_HEADER = "Idempotency-Key";

const keySchema = z.uuid({ error: `${IDEMPOTENCY_HEADER} must be a UUID, made once per submission and sent again unchanged on a retry.` });

/** The request's key, or null when the client sent none (older clients still answer, without the safety). */
export function idempotencyKeyOf(req: Request): string | null {
  const raw = req.headers.get(IDEMPOTENCY_HEADER);
  if (raw === null) return null;
  const parsed = keySchema.safeParse(raw.trim());
  if (!parsed.success) throw new AppError("bad_request", parsed.error.issues[0].message, { [IDEMPOTENCY_HEADER]: parsed.error.issues[0].message });
  return parsed.data.toLowerCase();
}

/** Who the key belongs to: keys are unique per learner, not across everyone. */
export type ReceiptOwner = { userId: number } | { visitorId: string };

/** A key claimed by one answer: where it went and a hash of what it said. */
export type ReceiptClaim = { owner: ReceiptOwner; key: string; problemId: string; fingerprint: string };

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };

function canonical(value: unknown): Json {
  if (Array.isArray(value)) return value.map(canonical);
  if (value && typeof value === "object") {
    return Object.fromEntries(Object.keys(value).sort().map((k) => [k, canonical((value as Record<string, unknown>)[k])]));
  }
  return (value ?? null) as Json;
}

/** Null without a key or an owner; `place` tells apart the routes a problem can be answered through. */
export function receiptClaim(key: string | null, owner: ReceiptOwner | null, place: string, problemId: string, body: unknown): ReceiptClaim | null {
  if (!key || !owner) return null;
  const fingerprint = createHash("sha256").update(JSON.stringify([place, problemId, canonical(body)])).digest("hex");
  return { owner, key, problemId, fingerprint };
}

/** The unique columns of a claim, as the group commit looks them up and stores them. */
export function claimColumns(claim: ReceiptClaim): Record<string, string | number> {
  return "userId" in claim.owner ? { user_id: claim.owner.userId, key: claim.key } : { visitor_id: claim.owner.visitorId, key: claim.key };
}

export type StoredReceipt = { fingerprint: string; status: number; response: string };

/** Thrown by the try core when a racing twin's receipt was found inside the write transaction. */
export class ReceiptTaken extends Error {
  constructor(readonly receipt: StoredReceipt) {
    super("This idempotency key is already stored.");
    this.name = "ReceiptTaken";
  }
}

async function findReceipt(claim: ReceiptClaim): Promise<StoredReceipt | null> {
  const columns = claimColumns(claim);
  const where = Object.keys(columns).map((c) => `${c} = ?`).join(" AND ");
  const [row] = await db().sequelize.query<StoredReceipt>(`SELECT fingerprint, status, response FROM answer_receipts WHERE ${where}`, {
    replacements: Object.values(columns),
    type: QueryTypes.SELECT,
  });
  return row ?? null;
}

export type Reply<T> = { status: number; body: T; replayed: boolean };

function replay<T>(claim: ReceiptClaim, receipt: StoredReceipt): Reply<T> {
  if (receipt.fingerprint !== claim.fingerprint) {
    throw new AppError("conflict", "This submission key was already used for different answers. Nothing new was stored; send new answers with a new key.", {
      [IDEMPOTENCY_HEADER]: "Already used for different answers.",
    });
  }
  return { status: receipt.status, body: JSON.parse(receipt.response) as T, replayed: true };
}

/**
 * Runs `answer` once per key: a key already stored returns its first reply (before `answer`
 * runs, so a replay spends no rate-limit point and no try). If the try core meets a twin's
 * receipt in its transaction, or `answer` is refused because a twin just finished the problem,
 * the twin's reply is the answer.
 */
export async function answerOnce<T>(claim: ReceiptClaim | null, answer: () => Promise<T>): Promise<Reply<T>> {
  if (!claim) return { status: 200, body: await answer(), replayed: false };
  const stored = await findReceipt(claim);
  if (stored) return replay(claim, stored);
  try {
    const body = await answer();
    pruneNowAndThen();
    return { status: 200, body, replayed: false };
  } catch (error) {
    if (error instanceof ReceiptTaken) return replay(claim, error.receipt);
    if (error instanceof AppError && error.code === "conflict") {
      const twin = await findReceipt(claim);
      if (twin) return replay(claim, twin);
    }
    throw error;
  }
}

const PRUNE_EVERY_MS = 3600 * 1000;
const pruning = globalThis as typeof globalThis & { __sixteenthsReceiptsPruned?: number };

/** At most once an hour per server, after an answer is stored: old receipts go, without holding up the reply. */
function pruneNowAndThen(): void {
  const now = Date.now();
  if (now - (pruning.__sixteenthsReceiptsPruned ?? 0) < PRUNE_EVERY_MS) return;
  pruning.__sixteenthsReceiptsPruned = now;
  pruneReceipts(db().sequelize, new Date(now)).catch((error: unknown) => console.error("Could not prune old answer receipts:", error));
}

/** Response headers for a reply: a replay says so, which helps when reading logs. */
export function replyHeaders(reply: Reply<unknown>): Record<string, string> {
  return reply.replayed ? { "Idempotent-Replayed": "true" } : {};
}
