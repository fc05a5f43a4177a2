import "server-only";
import { cache } from "react";
import { getToken } from "next-auth/jwt";
import { forbidden, redirect } from "next/navigation";
import { cookies, headers } from "next/headers";
import { sessionCookieName, usesSecureCookies } from "@/lib/auth/cookies";
import { decideAccess, type SessionUser } from "@/lib/auth/roles";
import { userForToken } from "@/lib/auth/session-user";
import { env } from "@/lib/env";
import type { Role } from "@/models";

/**
 * The signed-in user, read fresh from the database once per request so a changed
 * role or a deleted account takes effect at once rather than when the token expires.
 */
export const getCurrentUser = cache(async (): Promise<SessionUser | null> => {
  // The token itself rather than getServerSession: the session object next-auth builds for the
  // browser leaves out the session version, which the check below needs.
  const req = { cookies: await cookies(), headers: await headers() } as unknown as Parameters<typeof getToken>[0]["req"];
  const token = await getToken({ req, secret: env().NEXTAUTH_SECRET, cookieName: sessionCookieName(), secureCookie: usesSecureCookies() });
  return userForToken(token);
});

async function signInRedirect(): Promise<never> {
  const from = (await headers()).get("x-pathname") ?? "/";
  redirect(`/signin?callbackUrl=${encodeURIComponent(from)}`);
}

/** For pages and server actions: sends an anonymous visitor to sign in. */
export async function requireUser(): Promise<SessionUser> {
  return (await getCurrentUser()) ?? signInRedirect();
}

/** For pages and server actions: anonymous → sign in; wrong role → the 403 page. */
export async function requireRole(...roles: Role[]): Promise<SessionUser> {
  const decision = decideAccess(await getCurrentUser(), roles);
  if (decision.ok) return decision.user;
  if (decision.status === 401) return signInRedirect();
  forbidden();
}
