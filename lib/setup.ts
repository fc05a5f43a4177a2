import fs from "node:fs";
import type { Database } from "@/lib/db";
import { openDatabase } from "@/lib/db";
import { migrateUp } from "@/lib/migrator";
import { seedDemo, type DemoLogin } from "@/seeders/demo";

/** Migrates (and optionally seeds) a database file; used by the npm scripts and the test harness alike. */
export async function prepareDatabase(file: string, options: { seed: boolean; bcryptCost: number }): Promise<{ logins: DemoLogin[] }> {
  const database: Database = openDatabase(file);
  try {
    await migrateUp(database.sequelize);
    const logins = options.seed ? await seedDemo(database, options.bcryptCost) : [];
    return { logins };
  } finally {
    await database.sequelize.close();
  }
}

export function removeDatabase(file: string): void {
  for (const suffix of ["", "-wal", "-shm", "-journal"]) fs.rmSync(file + suffix, { force: true });
}
