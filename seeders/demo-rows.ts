// Plain multi-row INSERTs for the demo history: a few hundred rows in a handful of statements
// keeps the first `npm run demo` fast, where one model call per row would take seconds.
import type { Sequelize, Transaction } from "sequelize";

type Value = string | number | null;

// Far under SQLite's limit on bound values for the widest table here.
const ROWS_PER_STATEMENT = 200;

export async function insertRows(sequelize: Sequelize, transaction: Transaction, table: string, columns: readonly string[], rows: readonly Value[][]): Promise<void> {
  const row = `(${columns.map(() => "?").join(", ")})`;
  for (let start = 0; start < rows.length; start += ROWS_PER_STATEMENT) {
    const chunk = rows.slice(start, start + ROWS_PER_STATEMENT);
    await sequelize.query(`INSERT INTO ${table} (${columns.join(", ")}) VALUES ${chunk.map(() => row).join(", ")}`, { replacements: chunk.flat(), transaction });
  }
}
