import "server-only";
import { randomUUID } from "node:crypto";
import { cookies } from "next/headers";
import type { NextResponse } from "next/server";
import { userFromRequest } from "@/lib/auth/route";
import { getCurrentUser } from "@/lib/auth/session";
import { env } from "@/lib/env";
import type { PracticeOwner } from "./problems";

export const VISITOR_COOKIE = "sixteenths-visitor";
const VISITOR_PATTERN = /^[0-9a-f-]{36}$/;

function visitorFrom(value: string | undefined): string | null {
  return value && VISITOR_PATTERN.test(value) ? value : null;
}

function cookieValue(req: Request, name: string): string | undefined {
  for (const piece of (req.headers.get("cookie") ?? "").split(";")) {
    const [key, ...rest] = piece.trim().split("=");
    if (key === name) return rest.join("=");
  }
  return undefined;
}

export async function ownerFromRequest(req: Request): Promise<PracticeOwner> {
  return { user: await userFromRequest(req), visitorId: visitorFrom(cookieValue(req, VISITOR_COOKIE)) };
}

/** For server pages. */
export async function ownerForPage(): Promise<PracticeOwner> {
  return { user: await getCurrentUser(), visitorId: visitorFrom((await cookies()).get(VISITOR_COOKIE)?.value) };
}

/** An anonymous visitor's first problem gives them a cookie that owns their problems. */
export function withVisitor(owner: PracticeOwner): { owner: PracticeOwner; setCookie: (res: NextResponse) => NextResponse } {
  if (owner.user || owner.visitorId) return { owner, setCookie: (res) => res };
  const visitorId = randomUUID();
  return {
    owner: { user: null, visitorId },
    setCookie: (res) => {
      res.cookies.set(VISITOR_COOKIE, visitorId, { httpOnly: true, sameSite: "lax", path: "/", maxAge: 30 * 86_400, secure: env().NODE_ENV === "production" && env().NEXTAUTH_URL.startsWith("https:") });
      return res;
    },
  };
}

export function ownerKey(owner: PracticeOwner): string {
  return owner.user ? `user:${owner.user.id}` : `visitor:${owner.visitorId ?? "none"}`;
}
