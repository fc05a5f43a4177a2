import type { NextAuthOptions } from "next-auth";
import CredentialsProvider from "next-auth/providers/credentials";
import { signInSchema } from "@/lib/accounts/schemas";
import { verifyCredentials } from "@/lib/accounts/users";
import { sessionCookieName, sessionCookieOptions, usesSecureCookies } from "@/lib/auth/cookies";
import { reset } from "@/lib/auth/rate-limit";
import { signInLimitKey } from "@/lib/auth/sign-in-limit";
import { sessionVersionOf } from "@/lib/auth/session-user";

export const SESSION_MAX_AGE_SECONDS = 30 * 24 * 60 * 60;

export const authOptions: NextAuthOptions = {
  session: { strategy: "jwt", maxAge: SESSION_MAX_AGE_SECONDS },
  // next-auth reads NEXTAUTH_SECRET itself; lib/env validates it at the first request.
  secret: process.env.NEXTAUTH_SECRET,
  pages: { signIn: "/signin", error: "/signin" },
  // Stated rather than left to next-auth's guess, so proxy.ts and the route handlers read the
  // same cookie name (lib/auth/cookies.ts explains when it is Secure).
  useSecureCookies: usesSecureCookies(),
  cookies: { sessionToken: { name: sessionCookieName(), options: sessionCookieOptions() } },
  providers: [
    CredentialsProvider({
      name: "E-mail and password",
      credentials: { email: { label: "E-mail", type: "email" }, password: { label: "Password", type: "password" } },
      async authorize(credentials, req) {
        const parsed = signInSchema.safeParse(credentials ?? {});
        if (!parsed.success) return null;
        // The try was already counted by the sign-in route (app/api/auth/[...nextauth]), which
        // answers 429 with Retry-After before next-auth runs; here a success gives the points back.
        const key = signInLimitKey(parsed.data.email, req?.headers);
        const user = await verifyCredentials(parsed.data.email, parsed.data.password);
        if (!user) return null;
        await reset("signIn", key);
        return { id: String(user.id), email: user.email, name: user.name, role: user.role, sessionVersion: await sessionVersionOf(user.id) };
      },
    }),
  ],
  callbacks: {
    // next-auth's default builds a URL from the callback address unguarded, so `http://[` or `%`
    // was a 500. The same rule without the throw: our own paths and our own origin, else home.
    async redirect({ url, baseUrl }) {
      if (url.startsWith("/")) return `${baseUrl}${url}`;
      try {
        if (new URL(url).origin === baseUrl) return url;
      } catch {
        // not an address at all
      }
      return baseUrl;
    },
    async jwt({ token, user }) {
      if (user) {
        token.uid = Number(user.id);
        token.role = user.role;
        token.sv = user.sessionVersion;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.uid;
        session.user.role = token.role;
      }
      return session;
    },
  },
};
