import { NextResponse } from "next/server";
import { requestPasswordReset } from "@/lib/accounts/password-reset";
import { RESET_REQUESTED_MESSAGE, resetRequestSchema } from "@/lib/accounts/password-reset-schemas";
import { clientAddress, consume } from "@/lib/auth/rate-limit";
import { handle, readJson } from "@/lib/auth/route";

/** Public. Answers the same for every well-formed address, so it cannot be used to find accounts. */
export const POST = handle(async (req) => {
  await consume("passwordResetClient", clientAddress(req.headers));
  const { email } = resetRequestSchema.parse(await readJson(req));
  await consume("passwordReset", `address:${email}`);
  await requestPasswordReset(email);
  return NextResponse.json({ message: RESET_REQUESTED_MESSAGE });
});
