import { NextResponse } from "next/server";
import { clientAddress, consume } from "@/lib/auth/rate-limit";
import { handle, readJson, userFromRequest } from "@/lib/auth/route";
import { acceptInvitation } from "@/lib/classes/accept";
import { parseAcceptBody } from "@/lib/classes/schemas";

/**
 * Public: the link's token is the credential. A signed-in student sends {}; a newcomer sends
 * { name, password } and gets a student account with the invited e-mail.
 */
export const POST = handle<{ token: string }>(async (req, { params }) => {
  await consume("acceptInvitation", clientAddress(req.headers));
  const user = await userFromRequest(req);
  const newAccount = user ? null : parseAcceptBody(await readJson(req));
  return NextResponse.json(await acceptInvitation(params.token, user, newAccount), { status: 201 });
});
