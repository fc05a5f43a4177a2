// Each student's own numbers: a variant of an assignment item is a practice problem whose seed is
// derived on the server from the item, the student and the variant's place, keyed by the app's
// secret. Stored the first time the student opens the assignment, so every later visit (and the
// grader) rebuilds the same problem, and neighbours get different ones that cannot be worked out
// from each other.
import { createHmac, randomUUID } from "node:crypto";
import { QueryTypes, Transaction } from "sequelize";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { sqliteDate } from "@/lib/group-commit";
import { findKind, type Level } from "@/lib/problems";
import { MAX_SEED } from "@/lib/problems/random";

/** HMAC-SHA256(secret, "item:student:variant"), its first 32 bits reduced to 1…MAX_SEED. */
export function variantSeed(secret: string, itemId: number, studentId: number, variant: number): number {
  const digest = createHmac("sha256", secret).update(`${itemId}:${studentId}:${variant}`).digest();
  return (digest.readUInt32BE(0) % MAX_SEED) + 1;
}

export type VariantItem = { id: number; kind: string; level: number; problemCount: number };

/** How many answer boxes a variant has, stored with it so scores can be summed in SQL. */
export function partCountOf(kindKey: string, level: number, seed: number): number {
  const kind = findKind(kindKey);
  if (!kind) throw new Error(`unknown problem kind ${kindKey}`);
  return kind.parts(kind.generate(seed, level as Level)).length;
}

/**
 * Makes sure the student has a stored problem for every variant of every item (INSERT OR IGNORE on
 * the unique (item, student, variant) index, so two tabs opening at once make one set), and that each
 * problem still open allows the tries the assignment gives them now (tries taken away close one that
 * has used them up). A finished problem is never reopened: its answers may already have been shown.
 */
export async function ensureVariants(items: readonly VariantItem[], studentId: number, attemptsAllowed: number): Promise<void> {
  if (items.length === 0) return;
  const { sequelize } = db();
  const itemIds = items.map((i) => i.id);
  const inItems = `assignment_item_id IN (${itemIds.map(() => "?").join(", ")})`;
  // Usually everything is there already: one small read, and no generator runs.
  const existing = await sequelize.query<{ itemId: number; variant: number; attemptsAllowed: number; status: string }>(
    `SELECT assignment_item_id AS itemId, variant, attempts_allowed AS attemptsAllowed, status FROM practice_problems WHERE user_id = ? AND ${inItems}`,
    { replacements: [studentId, ...itemIds], type: QueryTypes.SELECT },
  );
  const have = new Set(existing.map((r) => `${r.itemId}:${r.variant}`));
  const now = sqliteDate(new Date());
  const secret = env().NEXTAUTH_SECRET;
  const rows: (string | number)[][] = [];
  for (const item of items) {
    for (let variant = 0; variant < item.problemCount; variant++) {
      if (have.has(`${item.id}:${variant}`)) continue;
      const seed = variantSeed(secret, item.id, studentId, variant);
      rows.push([randomUUID(), studentId, item.id, variant, item.kind, item.level, seed, attemptsAllowed, partCountOf(item.kind, item.level, seed), now, now]);
    }
  }
  const stale = existing.some((r) => r.status === "open" && r.attemptsAllowed !== attemptsAllowed);
  if (rows.length === 0 && !stale) return;
  await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    if (rows.length > 0) await sequelize.query(
      `INSERT OR IGNORE INTO practice_problems
         (id, user_id, assignment_item_id, variant, kind, level, seed, attempts_allowed, part_count, created_at, updated_at, attempts_used, status)
       VALUES ${rows.map(() => "(?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, 0, 'open')").join(", ")}`,
      { replacements: rows.flat(), transaction },
    );
    if (stale) await sequelize.query(
      `UPDATE practice_problems
       SET attempts_allowed = ?,
           status = CASE WHEN attempts_used >= ? THEN 'failed' ELSE status END,
           finished_at = CASE WHEN attempts_used >= ? THEN ? ELSE finished_at END,
           updated_at = ?
       WHERE user_id = ? AND ${inItems} AND status = 'open' AND attempts_allowed <> ?`,
      { replacements: [attemptsAllowed, attemptsAllowed, attemptsAllowed, now, now, studentId, ...itemIds, attemptsAllowed], transaction, type: QueryTypes.UPDATE },
    );
  });
}
