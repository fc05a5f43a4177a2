import { DataTypes, type QueryInterface } from "sequelize";

// An answer sent with an Idempotency-Key leaves a receipt, written in the same transaction as the
// try itself: a client that lost the reply (a dropped connection, a server restart) sends the same
// key again and gets the first reply back instead of spending a second try. The reply is kept
// whole because it cannot be rebuilt later: later tries change the problem it describes.
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("answer_receipts", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    // Exactly one of the two owners is set, as on practice_problems: visitors practise without an account.
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    visitor_id: { type: DataTypes.STRING(36), allowNull: true },
    key: { type: DataTypes.STRING(36), allowNull: false },
    problem_id: { type: DataTypes.STRING(36), allowNull: false, references: { model: "practice_problems", key: "id" }, onDelete: "CASCADE" },
    // The try number the answer was stored as (attempts.submission), so a receipt names its rows.
    submission: { type: DataTypes.INTEGER, allowNull: false },
    // A hash of where the answer went and what it said: the same key with other answers is refused.
    fingerprint: { type: DataTypes.STRING(64), allowNull: false },
    status: { type: DataTypes.INTEGER, allowNull: false },
    response: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  // SQLite never counts NULLs as equal, so each index binds only the rows of its own kind of owner.
  await qi.addIndex("answer_receipts", ["user_id", "key"], { unique: true, name: "answer_receipts_user_key" });
  await qi.addIndex("answer_receipts", ["visitor_id", "key"], { unique: true, name: "answer_receipts_visitor_key" });
  await qi.addIndex("answer_receipts", ["problem_id"], { name: "answer_receipts_problem" });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("answer_receipts");
}
