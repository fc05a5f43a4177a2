import { NextResponse } from "next/server";
import { handle, readJson } from "@/lib/auth/route";
import { consume } from "@/lib/auth/rate-limit";
import { AppError } from "@/lib/errors";
import { levelAllowed, masteryFor, nextProblemChoice } from "@/lib/practice/history";
import { ownerFromRequest, ownerKey, withVisitor } from "@/lib/practice/owner";
import { createProblem } from "@/lib/practice/problems";
import { newProblemSchema } from "@/lib/practice/schemas";

// Open to everyone: a self-learner practises without an account (progress is kept after sign-up).
export const POST = handle(async (req) => {
  const body = newProblemSchema.parse(await readJson(req));
  const { owner, setCookie } = withVisitor(await ownerFromRequest(req));
  await consume("newProblem", ownerKey(owner));
  const mastery = await masteryFor(owner.user);
  const choice = "kind" in body ? body : nextProblemChoice(owner.user, mastery, "skill" in body ? body.skill : undefined);
  if (!levelAllowed(owner.user, mastery, choice.kind, choice.level)) {
    throw new AppError("forbidden", "Master the level below first: four of your last five problems there solved.");
  }
  return setCookie(NextResponse.json({ problem: await createProblem(owner, choice.kind, choice.level) }, { status: 201 }));
});
