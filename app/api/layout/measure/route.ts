import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { roundingJson } from "@/lib/layout/measure";
import { measureRequestSchema } from "@/lib/layout/measure-schema";

/** Reads a length or works a calculation on lengths; a plain-number answer (length ÷ length) comes back as a number. */
export const POST = handle(async (req) => {
  const { kind, value, unit, denominator, style } = measureRequestSchema.parse(await readJson(req));
  if (kind === "number") return NextResponse.json({ kind, exact: value.toFraction(), value: value.valueOf() });
  return NextResponse.json({ kind, ...roundingJson(value, { unit, denominator, style }) });
});
