import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import { Readable } from "node:stream";
import { env } from "@/lib/env";
import { AppError } from "@/lib/errors";

// Photos live beside the database, never under public/: the only way to read one is the
// checked route. Names on disk are random; the name the student's file had is only shown.

const STORED_NAME = /^[0-9a-f-]{36}\.(jpg|png|webp)$/;

export function uploadsFolder(): string {
  return path.join(path.dirname(path.resolve(env().DATABASE_PATH)), "uploads");
}

function pathOf(name: string): string {
  // The names come from our own rows, but a path is only ever built from one of our own shapes.
  if (!STORED_NAME.test(name)) throw new Error(`Not a stored upload name: ${name}`);
  return path.join(uploadsFolder(), name);
}

export function newStoredName(ext: "jpg" | "png" | "webp"): string {
  return `${crypto.randomUUID()}.${ext}`;
}

/** Writes a new file; "wx" refuses to overwrite, so two uploads can never share a file. */
export async function writeStoredFile(name: string, bytes: Buffer): Promise<void> {
  await fs.promises.mkdir(uploadsFolder(), { recursive: true });
  await fs.promises.writeFile(pathOf(name), bytes, { flag: "wx" });
}

export async function removeStoredFiles(names: string[]): Promise<void> {
  await Promise.all(names.map((name) => fs.promises.rm(pathOf(name), { force: true })));
}

export async function openStoredFile(name: string): Promise<{ body: ReadableStream<Uint8Array>; bytes: number }> {
  const file = pathOf(name);
  const stat = await fs.promises.stat(file).catch(() => null);
  if (!stat?.isFile()) throw new AppError("not_found", "That photo's file is missing.");
  return { body: Readable.toWeb(fs.createReadStream(file)) as ReadableStream<Uint8Array>, bytes: stat.size };
}
