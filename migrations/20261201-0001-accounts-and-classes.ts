import { DataTypes, type QueryInterface } from "sequelize";

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.createTable("users", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    email: { type: DataTypes.STRING(254), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(120), allowNull: false },
    password_hash: { type: DataTypes.STRING(100), allowNull: false },
    role: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "student" },
    ...timestamps,
  });
  await qi.addIndex("users", ["role"]);

  await qi.createTable("classes", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    name: { type: DataTypes.STRING(160), allowNull: false },
    term: { type: DataTypes.STRING(60), allowNull: false },
    program: { type: DataTypes.STRING(160), allowNull: true },
    join_code: { type: DataTypes.STRING(12), allowNull: false, unique: true },
    instructor_id: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: "users", key: "id" },
      onDelete: "RESTRICT",
    },
    archived_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("classes", ["instructor_id"]);

  await qi.createTable("enrollments", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    class_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "classes", key: "id" }, onDelete: "CASCADE" },
    student_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    status: { type: DataTypes.STRING(16), allowNull: false, defaultValue: "active" },
    ...timestamps,
  });
  await qi.addIndex("enrollments", ["class_id", "student_id"], { unique: true });
  await qi.addIndex("enrollments", ["student_id"]);

  await qi.createTable("class_instructors", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    class_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "classes", key: "id" }, onDelete: "CASCADE" },
    user_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "users", key: "id" }, onDelete: "CASCADE" },
    ...timestamps,
  });
  await qi.addIndex("class_instructors", ["class_id", "user_id"], { unique: true });
  await qi.addIndex("class_instructors", ["user_id"]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("class_instructors");
  await qi.dropTable("enrollments");
  await qi.dropTable("classes");
  await qi.dropTable("users");
}
