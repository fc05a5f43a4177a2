// A receipt only has to outlive the retries of its submission, which come within seconds (or
// while the page stays open); a final try's reply holds the worked solution and runs to ~15 kB, so
// receipts are not kept for ever. A week covers a laptop left asleep with the page open.
import { QueryTypes, type Sequelize } from "sequelize";
import { sqliteDate } from "@/lib/group-commit";

export const RECEIPT_RETENTION_MS = 7 * 24 * 3600 * 1000;

/** Deletes the receipts stored before `now` minus the retention; returns how many went. */
export async function pruneReceipts(sequelize: Sequelize, now: Date): Promise<number> {
  // BULKDELETE makes the SQLite dialect answer with the number of rows deleted.
  return sequelize.query("DELETE FROM answer_receipts WHERE created_at < ?", {
    replacements: [sqliteDate(new Date(now.getTime() - RECEIPT_RETENTION_MS))],
    type: QueryTypes.BULKDELETE,
  });
}
