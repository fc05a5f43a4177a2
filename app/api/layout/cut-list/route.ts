import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { cutList } from "@/lib/layout/cut-list";
import { cutListSchema } from "@/lib/layout/cut-list-schema";
import { toJson } from "@/lib/layout/serialize";

export const POST = handle(async (req) => {
  const input = cutListSchema.parse(await readJson(req));
  return NextResponse.json(toJson(cutList(input), input));
});
