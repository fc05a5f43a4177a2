import { NextResponse } from "next/server";
import { consume } from "@/lib/auth/rate-limit";
import { readJson, withAuth } from "@/lib/auth/route";
import { joinByCode } from "@/lib/classes/join";
import { joinClassSchema } from "@/lib/classes/schemas";

/** A student joins with the class's code; a point is spent before the code is looked up, so guessing is slow. */
export const POST = withAuth([], async (req, { user }) => {
  const { code } = joinClassSchema.parse(await readJson(req));
  await consume("joinClass", String(user.id));
  return NextResponse.json(await joinByCode(user, code));
});
