import { db } from "@/lib/db";

/** Proves the database answers and the schema is migrated, not just that the file opens. */
export async function checkDatabase(): Promise<void> {
  await db().sequelize.query("SELECT 1 FROM users LIMIT 1");
}
