import { DataTypes, type QueryInterface } from "sequelize";

const user = (allowNull: boolean, onDelete: "CASCADE" | "SET NULL") => ({ type: DataTypes.INTEGER, allowNull, references: { model: "users", key: "id" }, onDelete });

// An instructor's change to a computed score, kept as history: the newest row per assignment and
// student is in force, and taking a change back is one more row, so who changed what and why is
// never lost. Points are INTEGER hundredths of a point: scores are shown to two decimals
// (roundPoints), and whole numbers compare and sum exactly where REAL would drift (0.1 + 0.2).
export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("score_overrides", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    assignment_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "assignments", key: "id" }, onDelete: "CASCADE" },
    student_id: user(false, "CASCADE"),
    // The points given, in hundredths; null when the work is excused or the change is cleared.
    points: { type: DataTypes.INTEGER, allowNull: true },
    excused: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    // Neither points nor excused: the computed score is back in force.
    cleared: { type: DataTypes.BOOLEAN, allowNull: false, defaultValue: false },
    reason: { type: DataTypes.STRING(500), allowNull: false },
    // The score as the student saw it before and after, in hundredths (null = excused).
    from_points: { type: DataTypes.INTEGER, allowNull: true },
    to_points: { type: DataTypes.INTEGER, allowNull: true },
    created_by: user(true, "SET NULL"),
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  // The gradebook reads the newest row per (assignment, student) for a class's assignments.
  await qi.addIndex("score_overrides", ["assignment_id", "student_id", "id"]);
  await qi.addIndex("score_overrides", ["student_id"]);
  // Photo counts per (assignment, student) are served by the uploads index from issue 6; the
  // scores' attempt reads join on the item and the problem.
  await qi.addIndex("attempts", ["assignment_item_id", "problem_id", "verdict"], { name: "attempts_item_problem_verdict" });
  await qi.addIndex("practice_problems", ["assignment_item_id", "variant"], { name: "practice_problems_item_variant" });
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex("practice_problems", "practice_problems_item_variant");
  await qi.removeIndex("attempts", "attempts_item_problem_verdict");
  await qi.dropTable("score_overrides");
}
