import type { JWT } from "next-auth/jwt";
import { toPublicUser } from "@/lib/accounts/users";
import type { SessionUser } from "@/lib/auth/roles";
import { db } from "@/lib/db";

/**
 * The account behind a session token, read fresh (one primary-key read, which every request makes
 * anyway so a role change applies at once). Null when the account is gone, or when its sessions
 * were ended after this token was issued — a password reset raises the version.
 */
export async function userForToken(token: Pick<JWT, "uid" | "sv"> | null): Promise<SessionUser | null> {
  if (!token?.uid) return null;
  const user = await db().models.User.findByPk(token.uid);
  // Tokens issued before versions existed carry none: they belong to version 0.
  if (!user || user.sessionVersion !== (token.sv ?? 0)) return null;
  return toPublicUser(user);
}

/** Read at sign-in, to be carried in the new token. */
export async function sessionVersionOf(userId: number): Promise<number> {
  const user = await db().models.User.findByPk(userId, { attributes: ["sessionVersion"] });
  return user?.sessionVersion ?? 0;
}
