// The session cookie's name and flags, shared by next-auth (which sets it) and every place
// that reads the token with getToken (proxy.ts, route handlers): both must agree on the name,
// and the `__Secure-` prefix changes it.

/**
 * Secure cookies only when the app's public address is https. The test and demo apps listen on
 * plain http loopback, where a browser would drop a Secure cookie and nobody could sign in;
 * behind TLS in production the cookie must never travel over http, and the prefix makes the
 * browser refuse one set without Secure.
 */
export function usesSecureCookies(): boolean {
  return (process.env.NEXTAUTH_URL ?? "").startsWith("https://");
}

export function sessionCookieName(): string {
  return `${usesSecureCookies() ? "__Secure-" : ""}next-auth.session-token`;
}

/** Not readable by page scripts; sent on top-level navigations from other sites (a link in an e-mail) but not on their sub-requests or form posts. */
export function sessionCookieOptions() {
  return { httpOnly: true, sameSite: "lax" as const, path: "/", secure: usesSecureCookies() };
}
