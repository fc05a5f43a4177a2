import { getToken } from "next-auth/jwt";
import { NextRequest, NextResponse } from "next/server";
import { ZodError } from "zod";
import { sessionCookieName, usesSecureCookies } from "@/lib/auth/cookies";
import { decideAccess, type SessionUser } from "@/lib/auth/roles";
import { userForToken } from "@/lib/auth/session-user";
import { env } from "@/lib/env";
import { AppError, errorBody, fieldErrorsFrom } from "@/lib/errors";
import type { Role } from "@/models";

export async function userFromRequest(req: Request): Promise<SessionUser | null> {
  // getToken reads `req.cookies`, which only a NextRequest has. Copy the headers only:
  // wrapping the request itself would take its body away from the handler.
  const nextReq = new NextRequest(req.url, { headers: req.headers });
  const token = await getToken({ req: nextReq, secret: env().NEXTAUTH_SECRET, cookieName: sessionCookieName(), secureCookie: usesSecureCookies() });
  return userForToken(token);
}

/** Every JSON failure leaves through here, in the one error shape. */
export function errorResponse(error: unknown): NextResponse {
  if (error instanceof AppError) {
    const headers = error.retryAfterSeconds ? { "Retry-After": String(error.retryAfterSeconds) } : undefined;
    return NextResponse.json(errorBody(error), { status: error.status, headers });
  }
  if (error instanceof ZodError) {
    const fields = fieldErrorsFrom(error.issues);
    return NextResponse.json(errorBody(new AppError("bad_request", Object.values(fields)[0] ?? "Check the form.", fields)), { status: 400 });
  }
  console.error(error);
  return NextResponse.json(errorBody(new AppError("internal", "Something went wrong on our side. Try again in a moment.")), { status: 500 });
}

export async function readJson(req: Request): Promise<unknown> {
  try {
    return await req.json();
  } catch {
    throw new AppError("bad_request", "The request body must be JSON.");
  }
}

type Context<P> = { user: SessionUser; params: P };
type Handler<P> = (req: Request, ctx: Context<P>) => Promise<Response>;
type NextContext<P> = { params: Promise<P> };

/**
 * Wraps a route handler: resolves the user, answers 401/403 JSON when access is refused,
 * and turns thrown errors into the one error shape. `roles: []` means any signed-in user.
 */
export function withAuth<P = Record<string, string>>(roles: Role[], handler: Handler<P>) {
  return async (req: Request, ctx: NextContext<P>): Promise<Response> => {
    try {
      const decision = decideAccess(await userFromRequest(req), roles);
      if (!decision.ok) {
        throw new AppError(decision.status === 401 ? "unauthenticated" : "forbidden", decision.message);
      }
      return await handler(req, { user: decision.user, params: await ctx.params });
    } catch (error) {
      return errorResponse(error);
    }
  };
}

/** For public routes: the same error handling without the access check. */
export function handle<P = Record<string, string>>(handler: (req: Request, ctx: { params: P }) => Promise<Response>) {
  return async (req: Request, ctx: NextContext<P>): Promise<Response> => {
    try {
      return await handler(req, { params: await ctx.params });
    } catch (error) {
      return errorResponse(error);
    }
  };
}
