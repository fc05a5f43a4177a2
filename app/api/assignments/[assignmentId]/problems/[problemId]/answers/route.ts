import { NextResponse } from "next/server";
import { withAuth, readJson } from "@/lib/auth/route";
import { consume } from "@/lib/auth/rate-limit";
import { answerProblem } from "@/lib/assignments/work";
import { answerOnce, idempotencyKeyOf, receiptClaim, replyHeaders } from "@/lib/practice/receipts";
import { answersSchema } from "@/lib/practice/schemas";

// The same body and the same limiter as a practice answer: one budget of tries per learner.
export const POST = withAuth<{ assignmentId: string; problemId: string }>([], async (req, { user, params }) => {
  const body = answersSchema.parse(await readJson(req));
  const claim = receiptClaim(idempotencyKeyOf(req), { userId: user.id }, `assignment:${params.assignmentId}`, params.problemId, body);
  const reply = await answerOnce(claim, async () => {
    await consume("answers", `user:${user.id}`);
    return answerProblem(user, Number(params.assignmentId), params.problemId, body, claim);
  });
  return NextResponse.json(reply.body, { status: reply.status, headers: replyHeaders(reply) });
});
