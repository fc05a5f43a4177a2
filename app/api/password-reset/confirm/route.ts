import { NextResponse } from "next/server";
import { confirmPasswordReset } from "@/lib/accounts/password-reset";
import { resetConfirmSchema } from "@/lib/accounts/password-reset-schemas";
import { handle, readJson } from "@/lib/auth/route";

/** Public; the link's code is the authorization (32 random bytes, single use, one hour). */
export const POST = handle(async (req) => {
  const { token, password } = resetConfirmSchema.parse(await readJson(req));
  const { email } = await confirmPasswordReset(token, password);
  return NextResponse.json({ email });
});
