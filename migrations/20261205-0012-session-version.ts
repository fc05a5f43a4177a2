import { DataTypes, type QueryInterface } from "sequelize";

// A password reset must end the sessions already open (a stolen laptop, a shared shop computer).
// Sessions are signed tokens with nothing stored server-side, so each token carries the account's
// session version from its sign-in, and a reset raises the version: older tokens stop working.
// The user row is read on every request anyway (by primary key), so the check costs no extra query.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("users", "session_version", { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 });
}

// SQLite's own DROP COLUMN: Sequelize's removeColumn rebuilds the table instead, and dropping the
// old users table would cascade through every foreign key that points at it.
export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.sequelize.query("ALTER TABLE users DROP COLUMN session_version");
}
