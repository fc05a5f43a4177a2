import "server-only";
import { forbidden, notFound } from "next/navigation";
import { AppError } from "@/lib/errors";

/** A route id from the address: anything but a positive whole number is a missing page. */
export function idFrom(value: string): number {
  const id = Number(value);
  if (!Number.isSafeInteger(id) || id <= 0) notFound();
  return id;
}

/** Runs a lib read for a page: lib's 403 renders the forbidden page, its 404 the not-found page. */
export async function orPage<T>(read: Promise<T>): Promise<T> {
  try {
    return await read;
  } catch (error) {
    if (error instanceof AppError && error.code === "forbidden") forbidden();
    if (error instanceof AppError && error.code === "not_found") notFound();
    throw error;
  }
}
