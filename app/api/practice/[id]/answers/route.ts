import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { consume } from "@/lib/auth/rate-limit";
import { ownerFromRequest, ownerKey } from "@/lib/practice/owner";
import { submitAnswers } from "@/lib/practice/problems";
import { answerOnce, idempotencyKeyOf, receiptClaim, replyHeaders } from "@/lib/practice/receipts";
import { answersSchema } from "@/lib/practice/schemas";

export const POST = handle<{ id: string }>(async (req, { params }) => {
  const body = answersSchema.parse(await readJson(req));
  const key = idempotencyKeyOf(req);
  const owner = await ownerFromRequest(req);
  const receiptOwner = owner.user ? { userId: owner.user.id } : owner.visitorId ? { visitorId: owner.visitorId } : null;
  const claim = receiptClaim(key, receiptOwner, "practice", params.id, body);
  const reply = await answerOnce(claim, async () => {
    await consume("answers", ownerKey(owner));
    return submitAnswers(owner, params.id, body, claim);
  });
  return NextResponse.json({ problem: reply.body }, { status: reply.status, headers: replyHeaders(reply) });
});
