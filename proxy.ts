import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";
import { sessionCookieName, usesSecureCookies } from "@/lib/auth/cookies";

// Areas that need an account. This is only the first, optimistic gate: every page,
// action and route handler checks the user and role again on the server.
const SIGNED_IN_AREAS = ["/classes", "/admin", "/my-classes", "/layouts"];

export async function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const headers = new Headers(request.headers);
  // Lets server components know where to send a visitor back to after sign-in.
  headers.set("x-pathname", pathname + search);

  if (SIGNED_IN_AREAS.some((area) => pathname === area || pathname.startsWith(`${area}/`))) {
    const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET, cookieName: sessionCookieName(), secureCookie: usesSecureCookies() });
    if (!token) {
      const url = request.nextUrl.clone();
      url.pathname = "/signin";
      url.search = `?callbackUrl=${encodeURIComponent(pathname + search)}`;
      return NextResponse.redirect(url);
    }
  }
  return NextResponse.next({ request: { headers } });
}

// Security headers (CSP and the rest) are set in next.config.ts, not here: this proxy skips /api
// and static files, and headers() reaches every response while prerendered pages stay static.
export const config = {
  matcher: ["/((?!api|_next/static|_next/image|fonts|favicon.ico).*)"],
};
