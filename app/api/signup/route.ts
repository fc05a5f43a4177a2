import { NextResponse } from "next/server";
import { signUpSchema } from "@/lib/accounts/schemas";
import { createUser } from "@/lib/accounts/users";
import { clientAddress, consume } from "@/lib/auth/rate-limit";
import { handle, readJson } from "@/lib/auth/route";

/** Self-learner sign-up: always creates a student; instructors are made by an admin. */
export const POST = handle(async (req) => {
  await consume("signUp", clientAddress(req.headers));
  const input = signUpSchema.parse(await readJson(req));
  const user = await createUser({ ...input, role: "student" });
  return NextResponse.json({ user }, { status: 201 });
});
