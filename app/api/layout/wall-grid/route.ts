import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { wallGrid } from "@/lib/layout/wall-grid";
import { wallGridSchema } from "@/lib/layout/wall-grid-schema";
import { toJson } from "@/lib/layout/serialize";

export const POST = handle(async (req) => {
  const input = wallGridSchema.parse(await readJson(req));
  return NextResponse.json(toJson(wallGrid(input), input));
});
