import { DataTypes, type QueryInterface } from "sequelize";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("lesson_progress", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    lesson_slug: { type: DataTypes.STRING(80), allowNull: false },
    // opened → completed → (later) practised; never moves backwards.
    status: { type: DataTypes.STRING(16), allowNull: false },
    opened_at: { type: DataTypes.DATE, allowNull: false },
    completed_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("lesson_progress", ["user_id", "lesson_slug"], { unique: true });
  // The gradebook reads a class's progress lesson by lesson.
  await qi.addIndex("lesson_progress", ["lesson_slug", "status"]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("lesson_progress");
}
