import { getToken } from "next-auth/jwt";
import { NextResponse, type NextRequest } from "next/server";

// Areas that need an account. This is only the first, optimistic gate: every page,
// action and route handler checks the user and role again on the server.
const SIGNED_IN_AREAS = ["/classes", "/admin", "/my-classes", "/layouts"];

export async function proxy(request: NextRequest) {
  const { pathname, search } = request.nextUrl;
  const headers = new Headers(request.headers);
  // Lets server components know where to send a visitor back to after sign-in.
  headers.set("x-pathname", pathname + search);

  if (SIGNED_IN_AREAS.some((area) => pathname === area || pathname.startsWith(`${area}/`))) {
    const token = await getToken({ req: request, secret: process.env.NEXTAUTH_SECRET });
    if (!token) {
      const url = request.nextUrl.clone();
      url.pathname = "/signin";
      url.search = `?callbackUrl=${encodeURIComponent(pathname + search)}`;
      return NextResponse.redirect(url);
    }
  }
  return NextResponse.next({ request: { headers } });
}

export const config = {
  matcher: ["/((?!api|_next/static|_next/image|fonts|favicon.ico).*)"],
};
