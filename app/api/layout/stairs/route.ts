import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { stairLayout } from "@/lib/layout/stairs";
import { stairLayoutSchema } from "@/lib/layout/stairs-schema";
import { toJson } from "@/lib/layout/serialize";

export const POST = handle(async (req) => {
  const input = stairLayoutSchema.parse(await readJson(req));
  return NextResponse.json(toJson(stairLayout(input), input));
});
