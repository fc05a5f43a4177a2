import { DataTypes, type QueryInterface } from "sequelize";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("saved_layouts", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    kind: { type: DataTypes.STRING(32), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: false },
    // The calculator's own URL query: reopening a layout is opening that address.
    params: { type: DataTypes.TEXT, allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex("saved_layouts", ["user_id", "updated_at"]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("saved_layouts");
}
