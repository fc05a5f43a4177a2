import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { evenSpacing } from "@/lib/layout/spacing";
import { evenSpacingSchema } from "@/lib/layout/spacing-schema";
import { toJson } from "@/lib/layout/serialize";

export const POST = handle(async (req) => {
  const input = evenSpacingSchema.parse(await readJson(req));
  return NextResponse.json(toJson(evenSpacing(input), input));
});
