import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { consume } from "@/lib/auth/rate-limit";
import { ownerFromRequest, ownerKey } from "@/lib/practice/owner";
import { submitAnswers } from "@/lib/practice/problems";
import { answersSchema } from "@/lib/practice/schemas";

export const POST = handle<{ id: string }>(async (req, { params }) => {
  const body = answersSchema.parse(await readJson(req));
  const owner = await ownerFromRequest(req);
  await consume("answers", ownerKey(owner));
  return NextResponse.json({ problem: await submitAnswers(owner, params.id, body) });
});
