import "server-only";
import { forbidden, notFound } from "next/navigation";
import { AppError } from "@/lib/errors";

/** Turns lib's refusals into the framework's pages: 404 for a class that does not exist, 403 for someone else's. */
export async function orPage<T>(work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof AppError && error.code === "forbidden") forbidden();
    if (error instanceof AppError && (error.code === "not_found" || error.code === "bad_request")) notFound();
    throw error;
  }
}

export function classIdOf(raw: string): number {
  const id = Number(raw);
  if (!Number.isSafeInteger(id) || id <= 0) notFound();
  return id;
}
