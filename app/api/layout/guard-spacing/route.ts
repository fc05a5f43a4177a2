import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { guardSpacing } from "@/lib/layout/guards";
import { guardSpacingSchema } from "@/lib/layout/guards-schema";
import { toJson } from "@/lib/layout/serialize";

export const POST = handle(async (req) => {
  const input = guardSpacingSchema.parse(await readJson(req));
  return NextResponse.json(toJson(guardSpacing(input), input));
});
