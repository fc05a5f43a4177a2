import { NextResponse } from "next/server";
import { emailSchema } from "@/lib/accounts/schemas";
import { clientAddress, consume } from "@/lib/auth/rate-limit";
import { env } from "@/lib/env";
import { AppError, errorBody } from "@/lib/errors";

/** Tries are counted per e-mail and client address, so one guesser does not lock a whole shop class out. */
export function signInLimitKey(email: string, headers: Headers | Record<string, unknown> | undefined): string {
  const parsed = emailSchema.safeParse(email);
  return `${parsed.success ? parsed.data : email.trim().toLowerCase().slice(0, 254)}|${clientAddress(headers)}`;
}

/**
 * Counts a credentials sign-in before next-auth sees it. Inside next-auth's `authorize` a refusal
 * can only become a redirect with `?error=`, never a 429 with Retry-After, so the route asks here
 * first. Returns the refusal to send, or null to let next-auth go on.
 */
export async function signInRefusal(req: Request): Promise<Response | null> {
  let email = "";
  try {
    // next-auth takes the credentials as a form or as JSON; both are counted.
    if (req.headers.get("content-type")?.includes("application/json")) {
      const body = (await req.clone().json()) as { email?: unknown };
      email = typeof body?.email === "string" ? body.email : "";
    } else {
      email = String((await req.clone().formData()).get("email") ?? "");
    }
  } catch {
    return null; // no readable body: next-auth answers it
  }
  try {
    await consume("signIn", signInLimitKey(email, req.headers));
    return null;
  } catch (error) {
    if (!(error instanceof AppError)) throw error;
    // next-auth's client reads `url` from the JSON answer and takes `error` from its query,
    // so the sign-in form shows the same sentence the error body carries.
    const url = new URL("/signin", env().NEXTAUTH_URL);
    url.searchParams.set("error", error.message);
    return NextResponse.json(
      { url: url.toString(), ...errorBody(error) },
      { status: error.status, headers: { "Retry-After": String(error.retryAfterSeconds ?? 60) } },
    );
  }
}
