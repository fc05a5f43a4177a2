import "server-only";
import { cache } from "react";
import { getServerSession } from "next-auth";
import { forbidden, redirect } from "next/navigation";
import { headers } from "next/headers";
import { findUserById } from "@/lib/accounts/users";
import { authOptions } from "@/lib/auth/options";
import { decideAccess, type SessionUser } from "@/lib/auth/roles";
import type { Role } from "@/models";

/**
 * The signed-in user, read fresh from the database once per request so a changed
 * role or a deleted account takes effect at once rather than when the token expires.
 */
export const getCurrentUser = cache(async (): Promise<SessionUser | null> => {
  const session = await getServerSession(authOptions);
  const id = session?.user?.id;
  if (!id) return null;
  return findUserById(id);
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
