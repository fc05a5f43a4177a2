import { NextResponse } from "next/server";
import { withAuth, readJson } from "@/lib/auth/route";
import { consume } from "@/lib/auth/rate-limit";
import { answerProblem } from "@/lib/assignments/work";
import { answersSchema } from "@/lib/practice/schemas";

// The same body and the same limiter as a practice answer: one budget of tries per learner.
export const POST = withAuth<{ assignmentId: string; problemId: string }>([], async (req, { user, params }) => {
  const body = answersSchema.parse(await readJson(req));
  await consume("answers", `user:${user.id}`);
  return NextResponse.json(await answerProblem(user, Number(params.assignmentId), params.problemId, body));
});
