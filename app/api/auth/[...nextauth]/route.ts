import NextAuth from "next-auth";
import type { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth/options";
import { errorResponse } from "@/lib/auth/route";
import { signInRefusal } from "@/lib/auth/sign-in-limit";
import { AppError } from "@/lib/errors";

const handler = NextAuth(authOptions);

type Context = { params: Promise<{ nextauth: string[] }> };

// next-auth parses a JSON body without a guard and uses its fields as text, so malformed JSON
// or a field that is an object would leave as a 500. Its own forms post text fields (urlencoded);
// a JSON body is taken only in that shape, and refused in the app's error shape otherwise.
async function refuseMalformedJson(req: NextRequest): Promise<Response | null> {
  if (!req.headers.get("content-type")?.includes("application/json")) return null;
  let body: unknown;
  try {
    body = JSON.parse(await req.clone().text());
  } catch {
    return errorResponse(new AppError("bad_request", "The request body must be JSON."));
  }
  const textFields = typeof body === "object" && body !== null && !Array.isArray(body) && Object.values(body).every((v) => typeof v === "string");
  return textFields ? null : errorResponse(new AppError("bad_request", "Send the sign-in fields as text."));
}

async function POST(req: NextRequest, context: Context): Promise<Response> {
  const malformed = await refuseMalformedJson(req);
  if (malformed) return malformed;
  // A credentials sign-in is counted here so that a refusal is a real 429 with Retry-After.
  if (req.nextUrl.pathname.endsWith("/callback/credentials")) {
    const refusal = await signInRefusal(req);
    if (refusal) return refusal;
  }
  return handler(req, context);
}

export { handler as GET, POST };
