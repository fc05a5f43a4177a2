import "server-only";
import { Transaction } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { assignmentForStudent } from "@/lib/assignments/access";
import { acceptsWork } from "@/lib/assignments/policy";
import type { Upload } from "@/models";
import { noSuchPhoto, uploadFor, viewerOfAssignment } from "./access";
import { newStoredName, openStoredFile, removeStoredFiles, writeStoredFile } from "./files";
import { MAX_PHOTOS_PER_ASSIGNMENT, type PhotoMime, type UploadView } from "./limits";
import { inspectPhoto, processPhoto } from "./photo";
import type { ReceivedPhoto } from "./request";
import type { CommentInput } from "./schemas";

type UploadWithCommenter = Upload & { commenter?: { name: string } | null };

function toView(row: UploadWithCommenter): UploadView {
  return {
    id: row.id,
    assignmentId: row.assignmentId,
    studentId: row.studentId,
    originalName: row.originalName,
    mime: row.mime as PhotoMime,
    bytes: row.bytes,
    width: row.width,
    height: row.height,
    uploadedAt: row.createdAt.toISOString(),
    thumbUrl: `/api/uploads/${row.id}?size=thumb`,
    fullUrl: `/api/uploads/${row.id}?size=full`,
    comment: row.comment ?? null,
    commentByName: row.comment ? (row.commenter?.name ?? null) : null,
    commentedAt: row.comment && row.commentedAt ? row.commentedAt.toISOString() : null,
  };
}

async function viewOf(uploadId: string): Promise<UploadView> {
  const { Upload, User } = db().models;
  const row = await Upload.findByPk(uploadId, { include: [{ model: User, as: "commenter", attributes: ["name"] }] });
  if (!row) throw noSuchPhoto();
  return toView(row as UploadWithCommenter);
}

/** The name the student's file had, cut to something safe to show: no folders, no control characters. */
function displayName(name: string, ext: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  const clean = Array.from(base.replace(/[\u0000-\u001f\u007f]/g, "").trim()).slice(0, 120).join("");
  return clean || `photo.${ext}`;
}

function closed(): AppError {
  return new AppError("conflict", "This assignment is closed, so its photos stay as they were sent.");
}

function full(): AppError {
  return new AppError("conflict", `You already have ${MAX_PHOTOS_PER_ASSIGNMENT} photos on this assignment, the most it takes. Delete one to send another.`);
}

async function photoCount(assignmentId: number, studentId: number, transaction?: Transaction): Promise<number> {
  return db().models.Upload.count({ where: { assignmentId, studentId }, transaction });
}

/**
 * A student's photos of one assignment, oldest first. A student sees only their own; the class's
 * instructors see any student's. Pages call this to hand the photo components their first list.
 */
export async function listUploads(user: SessionUser, assignmentId: number, studentId?: number): Promise<UploadView[]> {
  const viewer = await viewerOfAssignment(user, assignmentId);
  if (viewer.kind === "student" && studentId !== undefined && studentId !== user.id) {
    throw new AppError("not_found", "There are no such photos.");
  }
  if (viewer.kind === "teacher" && studentId === undefined) {
    throw new AppError("bad_request", "Say whose photos to list.", { studentId: "Give the student's id." });
  }
  const { Upload, User } = db().models;
  const rows = await Upload.findAll({
    where: { assignmentId, studentId: studentId ?? user.id },
    include: [{ model: User, as: "commenter", attributes: ["name"] }],
    order: [["createdAt", "ASC"]],
  });
  return rows.map((row) => toView(row as UploadWithCommenter));
}

/**
 * Stores one photo for a student. The files are written before the row, and removed again if
 * the row is not: once this returns, both exist; if it throws, neither does. The count is taken
 * again inside an IMMEDIATE transaction (SQLite's write lock held from BEGIN), so two uploads
 * arriving together cannot both be the fifth.
 */
export async function saveUpload(user: SessionUser, assignmentId: number, photo: ReceivedPhoto): Promise<UploadView> {
  const arrivedAt = new Date();
  const { assignment, extension } = await assignmentForStudent(user, assignmentId);
  if (!acceptsWork(arrivedAt, assignment.opensAt, assignment, extension)) {
    throw arrivedAt < assignment.opensAt ? new AppError("conflict", "This assignment is not open yet, so it cannot take photos.") : closed();
  }
  // Checked once before the slow work so a full set is refused without decoding anything.
  if ((await photoCount(assignmentId, user.id)) >= MAX_PHOTOS_PER_ASSIGNMENT) throw full();

  const inspected = await inspectPhoto(photo.bytes);
  const processed = await processPhoto(photo.bytes, inspected);
  const storedName = newStoredName(processed.ext);
  const thumbName = newStoredName("webp");
  const written: string[] = [];
  try {
    await writeStoredFile(storedName, processed.full);
    written.push(storedName);
    await writeStoredFile(thumbName, processed.thumb);
    written.push(thumbName);
    const { Upload } = db().models;
    const id = await db().sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
      if ((await photoCount(assignmentId, user.id, transaction)) >= MAX_PHOTOS_PER_ASSIGNMENT) throw full();
      const row = await Upload.create(
        {
          id: crypto.randomUUID(),
          assignmentId,
          studentId: user.id,
          storedName,
          thumbName,
          mime: processed.mime,
          bytes: processed.full.byteLength,
          width: processed.width,
          height: processed.height,
          originalName: displayName(photo.name, processed.ext),
          createdAt: arrivedAt,
        },
        { transaction },
      );
      return row.id;
    });
    return await viewOf(id);
  } catch (error) {
    await removeStoredFiles(written).catch((cleanup) => console.error("Could not remove the files of a refused upload", cleanup));
    throw error;
  }
}

/** The student deletes their own photo while the assignment still takes their work; the row goes first, then the files. */
export async function deleteUpload(user: SessionUser, uploadId: string): Promise<void> {
  const { row, relation } = await uploadFor(user, uploadId);
  if (relation === "teacher") throw new AppError("forbidden", "Only the student who sent a photo can delete it.");
  if (relation !== "owner") throw noSuchPhoto();
  const { assignment, extension } = await assignmentForStudent(user, row.assignmentId);
  if (!acceptsWork(new Date(), assignment.opensAt, assignment, extension)) throw closed();
  await row.destroy();
  // A file left behind is unreachable without its row; log it rather than fail a delete that happened.
  await removeStoredFiles([row.storedName, row.thumbName]).catch((error) => console.error("Could not remove a deleted photo's files", error));
}

/** An instructor's note under a photo; an empty comment removes it. */
export async function commentOnUpload(user: SessionUser, uploadId: string, input: CommentInput): Promise<UploadView> {
  const { row, relation } = await uploadFor(user, uploadId);
  if (relation === "owner") throw new AppError("forbidden", "Only the class's instructors can comment on a photo.");
  if (relation !== "teacher") throw noSuchPhoto();
  const comment = input.comment === "" ? null : input.comment;
  await row.update({ comment, commentBy: comment ? user.id : null, commentedAt: comment ? new Date() : null });
  return viewOf(row.id);
}

export type StoredPhotoFile = { body: ReadableStream<Uint8Array>; bytes: number; mime: PhotoMime | "image/webp"; fileName: string };

/** The stored photo or its thumbnail, for its owner and the class's instructors; anyone else is told it does not exist. */
export async function openUpload(user: SessionUser, uploadId: string, size: "thumb" | "full"): Promise<StoredPhotoFile> {
  const { row, relation } = await uploadFor(user, uploadId);
  if (relation === "stranger") throw noSuchPhoto();
  const thumb = size === "thumb";
  const file = await openStoredFile(thumb ? row.thumbName : row.storedName);
  const mime = thumb ? "image/webp" : (row.mime as PhotoMime);
  const ext = thumb ? "webp" : row.storedName.split(".").pop();
  return { ...file, mime, fileName: `shop-photo-${row.id.slice(0, 8)}${thumb ? "-small" : ""}.${ext}` };
}
