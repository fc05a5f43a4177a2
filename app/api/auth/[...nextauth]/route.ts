import NextAuth from "next-auth";
import type { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth/options";
import { signInRefusal } from "@/lib/auth/sign-in-limit";

const handler = NextAuth(authOptions);

type Context = { params: Promise<{ nextauth: string[] }> };

// A credentials sign-in is counted here so that a refusal is a real 429 with Retry-After.
async function post(req: NextRequest, context: Context) {
  if (req.nextUrl.pathname.endsWith("/callback/credentials")) {
    const refusal = await signInRefusal(req);
    if (refusal) return refusal;
  }
  return handler(req, context);
}

export { handler as GET, post as POST };
