import NextAuth from "next-auth";
import type { NextRequest } from "next/server";
import { authOptions } from "@/lib/auth/options";
import { errorResponse } from "@/lib/auth/route";
import { AppError } from "@/lib/errors";

const handler = NextAuth(authOptions);

type Context = { params: Promise<{ nextauth: string[] }> };

// next-auth parses a JSON body without a guard and uses its fields as text, so malformed JSON
// or a field that is an object would leave as a 500. Its own forms post text fields (urlencoded);
// a JSON body is taken only in that shape, and refused in the app's error shape otherwise.
async function POST(req: NextRequest, ctx: Context): Promise<Response> {
  if (req.headers.get("content-type")?.includes("application/json")) {
    let body: unknown;
    try {
      body = JSON.parse(await req.clone().text());
    } catch {
      return errorResponse(new AppError("bad_request", "The request body must be JSON."));
    }
    const textFields = typeof body === "object" && body !== null && !Array.isArray(body) && Object.values(body).every((v) => typeof v === "string");
    if (!textFields) return errorResponse(new AppError("bad_request", "Send the sign-in fields as text."));
  }
  return handler(req, ctx);
}

export { handler as GET, POST };
