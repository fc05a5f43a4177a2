import "server-only";
import { Transaction } from "sequelize";
import { db } from "@/lib/db";
import { env } from "@/lib/env";
import { AppError, type FieldErrors } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { enqueueMail } from "@/lib/mail/outbox";
import { assignmentPublishedMail } from "@/lib/mail/templates/assignment-published";
import { findKind } from "@/lib/problems";
import { assignmentForTeacher, itemsOf, type AssignmentItemRecord } from "./access";
import type { AssignmentData } from "./schemas";
import { copyTitle } from "./teacher-format";
import { classForTeacher, getTeacherAssignment, type TeacherAssignment } from "./teacher-views";

// The instructor's writes. Each runs in one transaction; the "published" e-mails are stored in
// the same transaction as the publish itself, so neither exists without the other.

type ItemData = AssignmentData["items"][number];

/** Unknown kinds, and levels a kind does not have, as field errors on the item. */
function checkKinds(items: ItemData[]): void {
  const fields: FieldErrors = {};
  items.forEach((item, i) => {
    const kind = findKind(item.kind);
    if (!kind) fields[`items.${i}.kind`] = "Choose a problem kind from the list.";
    else if (!kind.levels.some((l) => l.level === item.level)) fields[`items.${i}.level`] = "That level does not exist for this kind.";
  });
  const first = Object.values(fields)[0];
  if (first) throw new AppError("bad_request", first, fields);
}

function columnsOf(data: AssignmentData) {
  return {
    title: data.title,
    instructions: data.instructions,
    opensAt: new Date(data.opensAt),
    dueAt: new Date(data.dueAt),
    latePolicy: data.latePolicy,
    lateUntil: data.latePolicy === "until" && data.lateUntil ? new Date(data.lateUntil) : null,
    latePenaltyPercent: data.latePolicy === "penalty" ? data.latePenaltyPercent : null,
    reveal: data.reveal,
  };
}

async function writeItems(assignmentId: number, items: Pick<ItemData, "kind" | "level" | "problemCount" | "tolerance" | "points">[], transaction: Transaction) {
  await db().models.AssignmentItem.bulkCreate(
    items.map((item, i) => ({ assignmentId, position: i + 1, kind: item.kind, level: item.level, problemCount: item.problemCount, tolerance: item.tolerance, points: item.points })),
    { transaction },
  );
}

export async function createAssignment(user: SessionUser, classId: number, data: AssignmentData): Promise<TeacherAssignment> {
  await classForTeacher(user, classId);
  checkKinds(data.items);
  const { sequelize, models } = db();
  const id = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const row = await models.Assignment.create({ ...columnsOf(data), classId, attemptsAllowed: data.attemptsAllowed, status: "draft", createdBy: user.id }, { transaction });
    await writeItems(row.id, data.items, transaction);
    return row.id;
  });
  return getTeacherAssignment(user, id);
}

function sameItems(stored: AssignmentItemRecord[], sent: ItemData[]): boolean {
  return (
    stored.length === sent.length &&
    stored.every((s, i) => s.kind === sent[i].kind && s.level === sent[i].level && s.problemCount === sent[i].problemCount && s.tolerance === sent[i].tolerance && s.points === sent[i].points)
  );
}

export const LOCKED_ITEMS_MESSAGE = "This assignment has been published, so its problems are fixed: students already have their own numbers. Duplicate it to build a changed version.";
export const LOCKED_TRIES_MESSAGE = "Tries per problem are fixed once an assignment has been published. Give one student more tries with an extension instead.";

/**
 * A draft that was never published changes freely. Once published (even if unpublished since),
 * items and tries stay as they are — students' variants and tries were made from them — while
 * the wording, dates, late policy and reveal rule stay editable.
 */
export async function updateAssignment(user: SessionUser, assignmentId: number, data: AssignmentData): Promise<TeacherAssignment> {
  await assignmentForTeacher(user, assignmentId);
  checkKinds(data.items);
  const { sequelize, models } = db();
  await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const row = await models.Assignment.findByPk(assignmentId, { transaction });
    if (!row) throw new AppError("not_found", "There is no such assignment.");
    if (row.publishedAt) {
      const fields: FieldErrors = {};
      if (!sameItems(await itemsOf(assignmentId), data.items)) fields.items = LOCKED_ITEMS_MESSAGE;
      if (data.attemptsAllowed !== row.attemptsAllowed) fields.attemptsAllowed = LOCKED_TRIES_MESSAGE;
      const first = Object.values(fields)[0];
      if (first) throw new AppError("bad_request", first, fields);
      await row.update(columnsOf(data), { transaction });
      return;
    }
    await row.update({ ...columnsOf(data), attemptsAllowed: data.attemptsAllowed }, { transaction });
    await models.AssignmentItem.destroy({ where: { assignmentId }, transaction });
    await writeItems(assignmentId, data.items, transaction);
  });
  return getTeacherAssignment(user, assignmentId);
}

export type PublishResult = { assignment: TeacherAssignment; emailed: number };

/** Opens the assignment to the class and e-mails every active student (once per student, ever). */
export async function publishAssignment(user: SessionUser, assignmentId: number, now = new Date()): Promise<PublishResult> {
  await assignmentForTeacher(user, assignmentId);
  const { sequelize, models } = db();
  const emailed = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const row = await models.Assignment.findByPk(assignmentId, { transaction });
    if (!row) throw new AppError("not_found", "There is no such assignment.");
    if (row.status === "published") return 0;
    const itemCount = await models.AssignmentItem.count({ where: { assignmentId }, transaction });
    if (itemCount === 0) throw new AppError("bad_request", "Add at least one item of problems before publishing.", { items: "Add at least one item of problems before publishing." });
    if (row.dueAt.getTime() <= now.getTime()) {
      throw new AppError("bad_request", "The due date has passed. Move it later before publishing, so students have time to do the work.", { dueAt: "Set a due date in the future before publishing." });
    }
    await row.update({ status: "published", publishedAt: row.publishedAt ?? now }, { transaction });
    const klass = await models.SchoolClass.findByPk(row.classId, { attributes: ["name"], transaction });
    const enrollments = await models.Enrollment.findAll({
      where: { classId: row.classId, status: "active" },
      include: [{ model: models.User, as: "student", attributes: ["id", "name", "email"] }],
      transaction,
    });
    const baseUrl = env().NEXTAUTH_URL.replace(/\/+$/, "");
    const messages = enrollments.map((e) => {
      const student = (e as unknown as { student: { id: number; name: string; email: string } }).student;
      return {
        ...assignmentPublishedMail({ to: student.email, studentName: student.name, className: klass?.name ?? "your class", title: row.title, dueAt: row.dueAt, classId: row.classId, assignmentId, baseUrl }),
        dedupeKey: `published:${assignmentId}:${student.id}`,
      };
    });
    // A student e-mailed at an earlier publish is not e-mailed again, nor counted as e-mailed now.
    const already = await models.EmailOutbox.findAll({ attributes: ["dedupeKey"], where: { dedupeKey: messages.map((m) => m.dedupeKey) }, transaction });
    const sentBefore = new Set(already.map((row) => row.dedupeKey));
    const fresh = messages.filter((m) => !sentBefore.has(m.dedupeKey));
    await enqueueMail(fresh, transaction);
    return fresh.length;
  });
  return { assignment: await getTeacherAssignment(user, assignmentId), emailed };
}

/** Hides the assignment from students again; their variants and tries are kept. */
export async function unpublishAssignment(user: SessionUser, assignmentId: number): Promise<TeacherAssignment> {
  await assignmentForTeacher(user, assignmentId);
  await db().models.Assignment.update({ status: "draft" }, { where: { id: assignmentId } });
  return getTeacherAssignment(user, assignmentId);
}

/** A new draft with the same settings and items, in this class or another one the user teaches. */
export async function duplicateAssignment(user: SessionUser, assignmentId: number, targetClassId: number): Promise<TeacherAssignment> {
  const source = await assignmentForTeacher(user, assignmentId);
  await classForTeacher(user, targetClassId);
  const items = await itemsOf(assignmentId);
  const { sequelize, models } = db();
  const id = await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const row = await models.Assignment.create(
      {
        classId: targetClassId,
        title: copyTitle(source.title),
        instructions: source.instructions,
        opensAt: source.opensAt,
        dueAt: source.dueAt,
        latePolicy: source.latePolicy,
        lateUntil: source.lateUntil,
        latePenaltyPercent: source.latePenaltyPercent,
        attemptsAllowed: source.attemptsAllowed,
        reveal: source.reveal,
        status: "draft",
        createdBy: user.id,
      },
      { transaction },
    );
    await writeItems(row.id, items, transaction);
    return row.id;
  });
  return getTeacherAssignment(user, id);
}

export const PUBLISHED_DELETE_MESSAGE = "A published assignment cannot be deleted: students' numbers and tries belong to it. Unpublish it to hide it from the class.";

/** Only a draft that was never published: nothing of any student's hangs on it. */
export async function deleteDraft(user: SessionUser, assignmentId: number): Promise<{ classId: number }> {
  const assignment = await assignmentForTeacher(user, assignmentId);
  if (assignment.publishedAt) throw new AppError("conflict", PUBLISHED_DELETE_MESSAGE);
  const { sequelize, models } = db();
  await sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    // Checked again inside the write: a publish that landed in between wins.
    const deleted = await models.Assignment.destroy({ where: { id: assignmentId, publishedAt: null }, transaction });
    if (deleted === 0) throw new AppError("conflict", PUBLISHED_DELETE_MESSAGE);
  });
  return { classId: assignment.classId };
}
