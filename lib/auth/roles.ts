import type { Role } from "@/models";

export type SessionUser = { id: number; email: string; name: string; role: Role };

export type AccessDecision = { ok: true; user: SessionUser } | { ok: false; status: 401 | 403; message: string };

/**
 * The one rule every page, action and route handler applies: no user is 401,
 * a user without one of the roles is 403. An empty role list means "any signed-in user".
 */
export function decideAccess(user: SessionUser | null, roles: readonly Role[] = []): AccessDecision {
  if (!user) return { ok: false, status: 401, message: "Sign in to continue." };
  if (roles.length > 0 && !roles.includes(user.role)) {
    return { ok: false, status: 403, message: `This needs a ${roles.join(" or ")} account; you are signed in as a ${user.role}.` };
  }
  return { ok: true, user };
}

export const TEACHING_ROLES: readonly Role[] = ["instructor", "admin"];
