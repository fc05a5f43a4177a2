import { DataTypes, type QueryInterface } from "sequelize";

// An assignment's score divides each problem's points among its parts. Storing the count when a
// variant is made lets the scores be summed in SQL without rebuilding every problem from its seed.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("practice_problems", "part_count", { type: DataTypes.INTEGER, allowNull: true });
}

// SQLite's own DROP COLUMN: Sequelize's removeColumn rebuilds the table and loses the composite
// unique index on the variant. The counts are lost either way; the scores fill them in again.
export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query("ALTER TABLE practice_problems DROP COLUMN part_count");
}
