import { DataTypes, type QueryInterface } from "sequelize";

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};
const user = (allowNull: boolean, onDelete: "CASCADE" | "SET NULL" | "RESTRICT") => ({
  type: DataTypes.INTEGER,
  allowNull,
  references: { model: "users", key: "id" },
  onDelete,
});

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("classes", "section_code", { type: DataTypes.STRING(20), allowNull: true });

  // An invitation is for an e-mail address, which may not have an account yet; the roster shows
  // it as "invited" until it is accepted and becomes an enrollment. Only a hash of the token is kept.
  await qi.createTable("invitations", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    class_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "classes", key: "id" }, onDelete: "CASCADE" },
    email: { type: DataTypes.STRING(254), allowNull: false },
    name: { type: DataTypes.STRING(120), allowNull: true },
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invited_by: user(true, "SET NULL"),
    accepted_by: user(true, "SET NULL"),
    expires_at: { type: DataTypes.DATE, allowNull: false },
    accepted_at: { type: DataTypes.DATE, allowNull: true },
    revoked_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("invitations", ["class_id", "email"]);

  await qi.createTable("password_resets", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    user_id: user(false, "CASCADE"),
    token_hash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expires_at: { type: DataTypes.DATE, allowNull: false },
    used_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("password_resets", ["user_id"]);

  // Mail is written here in the same transaction as the action that sends it, then delivered
  // (and retried) from this table: a failed send never loses the action or the message.
  await qi.createTable("email_outbox", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    to_address: { type: DataTypes.STRING(254), allowNull: false },
    subject: { type: DataTypes.STRING(200), allowNull: false },
    text: { type: DataTypes.TEXT, allowNull: false },
    html: { type: DataTypes.TEXT, allowNull: false },
    // Makes a message idempotent (e.g. one due-soon reminder per student and assignment).
    dedupe_key: { type: DataTypes.STRING(160), allowNull: true, unique: true },
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "pending" },
    tries: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    last_error: { type: DataTypes.STRING(500), allowNull: true },
    next_try_at: { type: DataTypes.DATE, allowNull: false },
    claimed_at: { type: DataTypes.DATE, allowNull: true },
    sent_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("email_outbox", ["status", "next_try_at"]);

  await qi.createTable("assignments", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    class_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "classes", key: "id" }, onDelete: "CASCADE" },
    title: { type: DataTypes.STRING(160), allowNull: false },
    instructions: { type: DataTypes.TEXT, allowNull: false, defaultValue: "" },
    opens_at: { type: DataTypes.DATE, allowNull: false },
    due_at: { type: DataTypes.DATE, allowNull: false },
    // none | until | penalty — see lib/assignments/schemas.ts.
    late_policy: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "none" },
    late_until: { type: DataTypes.DATE, allowNull: true },
    late_penalty_percent: { type: DataTypes.INTEGER, allowNull: true },
    attempts_allowed: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 3 },
    // when-final | after-due: when a student may see expected values and worked solutions.
    reveal: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "when-final" },
    status: { type: DataTypes.STRING(12), allowNull: false, defaultValue: "draft" },
    published_at: { type: DataTypes.DATE, allowNull: true },
    created_by: user(true, "SET NULL"),
    ...timestamps,
  });
  await qi.addIndex("assignments", ["class_id", "status", "due_at"]);

  await qi.createTable("assignment_items", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    assignment_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "assignments", key: "id" }, onDelete: "CASCADE" },
    position: { type: DataTypes.INTEGER, allowNull: false },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    level: { type: DataTypes.INTEGER, allowNull: false },
    problem_count: { type: DataTypes.INTEGER, allowNull: false },
    // half | full: accepted error as a share of the asked graduation (counts are always exact).
    tolerance: { type: DataTypes.STRING(8), allowNull: false, defaultValue: "half" },
    points: { type: DataTypes.INTEGER, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex("assignment_items", ["assignment_id", "position"]);

  await qi.createTable("assignment_extensions", {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    assignment_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "assignments", key: "id" }, onDelete: "CASCADE" },
    student_id: user(false, "CASCADE"),
    due_at: { type: DataTypes.DATE, allowNull: true },
    extra_attempts: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    note: { type: DataTypes.STRING(300), allowNull: true },
    granted_by: user(true, "SET NULL"),
    ...timestamps,
  });
  await qi.addIndex("assignment_extensions", ["assignment_id", "student_id"], { unique: true });

  // A student's variant of an assignment item is a practice problem with a stored seed; its
  // tries go through the same grader into the same attempts table.
  await qi.addColumn("practice_problems", "assignment_item_id", {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: "assignment_items", key: "id" },
    onDelete: "CASCADE",
  });
  await qi.addColumn("practice_problems", "variant", { type: DataTypes.INTEGER, allowNull: true });
  await qi.addIndex("practice_problems", ["assignment_item_id", "user_id", "variant"], { unique: true, name: "practice_problems_assignment_variant" });
  await qi.addColumn("attempts", "assignment_item_id", {
    type: DataTypes.INTEGER,
    allowNull: true,
    references: { model: "assignment_items", key: "id" },
    onDelete: "CASCADE",
  });
  await qi.addIndex("attempts", ["assignment_item_id", "user_id"]);

  await qi.createTable("uploads", {
    id: { type: DataTypes.STRING(36), primaryKey: true },
    assignment_id: { type: DataTypes.INTEGER, allowNull: false, references: { model: "assignments", key: "id" }, onDelete: "CASCADE" },
    student_id: user(false, "CASCADE"),
    // Random file names under the data folder, never the name the browser sent.
    stored_name: { type: DataTypes.STRING(80), allowNull: false },
    thumb_name: { type: DataTypes.STRING(80), allowNull: false },
    mime: { type: DataTypes.STRING(40), allowNull: false },
    bytes: { type: DataTypes.INTEGER, allowNull: false },
    width: { type: DataTypes.INTEGER, allowNull: false },
    height: { type: DataTypes.INTEGER, allowNull: false },
    original_name: { type: DataTypes.STRING(120), allowNull: false },
    comment: { type: DataTypes.STRING(1000), allowNull: true },
    comment_by: user(true, "SET NULL"),
    commented_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex("uploads", ["assignment_id", "student_id"]);
}

export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.dropTable("uploads");
  await qi.removeIndex("attempts", ["assignment_item_id", "user_id"]);
  await qi.removeColumn("attempts", "assignment_item_id");
  await qi.removeIndex("practice_problems", "practice_problems_assignment_variant");
  await qi.removeColumn("practice_problems", "variant");
  await qi.removeColumn("practice_problems", "assignment_item_id");
  await qi.dropTable("assignment_extensions");
  await qi.dropTable("assignment_items");
  await qi.dropTable("assignments");
  await qi.dropTable("email_outbox");
  await qi.dropTable("password_resets");
  await qi.dropTable("invitations");
  await qi.removeColumn("classes", "section_code");
}
