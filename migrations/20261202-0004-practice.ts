import { DataTypes, type QueryInterface } from "sequelize";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("practice_problems", {
    // A random id: the address of a problem must not be guessable by another student.
    id: { type: DataTypes.STRING(36), primaryKey: true },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    // Anonymous self-learners own their problems through a cookie; progress is not kept for them.
    visitor_id: { type: DataTypes.STRING(36), allowNull: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    level: { type: DataTypes.INTEGER, allowNull: false },
    seed: { type: DataTypes.INTEGER, allowNull: false },
    attempts_allowed: { type: DataTypes.INTEGER, allowNull: false },
    attempts_used: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    // open → solved (every part right) or failed (out of attempts); final either way.
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "open" },
    finished_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  // Mastery reads a user's recent final problems per kind and level.
  await qi.addIndex("practice_problems", ["user_id", "status", "finished_at"]);
  await qi.addIndex("practice_problems", ["visitor_id"]);

  await qi.createTable("attempts", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    problem_id: { type: DataTypes.STRING(36), allowNull: false, references: { model: "practice_problems", key: "id" }, onDelete: "CASCADE" },
    user_id: { type: DataTypes.INTEGER, allowNull: true, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    level: { type: DataTypes.INTEGER, allowNull: false },
    seed: { type: DataTypes.INTEGER, allowNull: false },
    // Which try at the problem this answer belongs to (1, 2, …).
    submission: { type: DataTypes.INTEGER, allowNull: false },
    part: { type: DataTypes.STRING(40), allowNull: false },
    raw: { type: DataTypes.STRING(80), allowNull: false },
    // Exact rationals as "n/d" text, so no float ever stands in for a graded value.
    value: { type: DataTypes.STRING(80), allowNull: false },
    expected: { type: DataTypes.STRING(80), allowNull: false },
    verdict: { type: DataTypes.STRING(12), allowNull: false },
    pattern: { type: DataTypes.STRING(40), allowNull: true },
    time_ms: { type: DataTypes.INTEGER, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("attempts", ["problem_id", "submission"]);
  // The class's most common slips, and one student's history.
  await qi.addIndex("attempts", ["user_id", "created_at"]);
  await qi.addIndex("attempts", ["pattern", "kind"]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("attempts");
  await qi.dropTable("practice_problems");
}
