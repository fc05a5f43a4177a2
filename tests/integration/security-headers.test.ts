// The security headers on every kind of response the app gives, and the session cookie's flags
// over plain http (the suite's app) and behind an https address (an app of its own).
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { startApp, type RunningApp } from "../support/app-server";
import { createPerson, FIXTURE_PASSWORD } from "../support/assignment-fixtures";

const baseURL = inject("baseURL");
const databasePath = inject("databasePath");

function expectSecurityHeaders(res: Response, what: string) {
  const header = (name: string) => res.headers.get(name);
  expect(header("x-content-type-options"), what).toBe("nosniff");
  expect(header("referrer-policy"), what).toMatch(/^(strict-origin-when-cross-origin|strict-origin|same-origin|no-referrer)$/);
  expect(header("x-frame-options"), what).toBe("DENY");
  expect(header("permissions-policy"), what).toContain("camera=()");
  const csp = new Map(
    (header("content-security-policy") ?? "")
      .split(";")
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...values]) => [name, values]),
  );
  expect(csp.get("default-src"), what).toEqual(["'self'"]);
  expect(csp.get("frame-ancestors"), what).toEqual(["'none'"]);
  expect(csp.get("object-src"), what).toEqual(["'none'"]);
  expect(csp.get("base-uri"), what).toEqual(["'self'"]);
  expect(csp.get("form-action"), what).toEqual(["'self'"]);
  expect(csp.get("img-src"), what).toEqual(["'self'", "data:", "blob:"]);
  expect(csp.get("font-src"), what).toEqual(["'self'"]);
  // The production build never allows eval; no directive names another origin.
  expect(csp.get("script-src"), what).not.toContain("'unsafe-eval'");
  expect([...csp.values()].flat().filter((v) => /^(https?:|\*|wss?:)/.test(v)), what).toEqual([]);
}

/** A CSRF token, then the credentials callback, as next-auth's client posts it; returns the raw Set-Cookie lines. */
async function signIn(url: string, email: string, password: string): Promise<{ res: Response; setCookies: string[] }> {
  const csrf = await fetch(`${url}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const cookie = csrf.headers
    .getSetCookie()
    .map((line) => line.split(";")[0])
    .join("; ");
  const res = await fetch(`${url}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": "application/x-www-form-urlencoded", cookie },
    body: new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
  return { res, setCookies: res.headers.getSetCookie() };
}

const flagsOf = (line: string) => line.split(";").map((p) => p.trim().toLowerCase());

/** Signs in through the form and returns the named session cookie's line and its lower-cased flags. */
async function sessionCookie(url: string, email: string, cookieName: string) {
  const { res, setCookies } = await signIn(url, email, FIXTURE_PASSWORD);
  expect(res.status).toBe(200);
  const session = setCookies.find((line) => line.startsWith(`${cookieName}=`));
  expect(session, setCookies.join("\n")).toBeTruthy();
  return { res, setCookies, session: session!, flags: flagsOf(session!) };
}

describe("security headers", () => {
  it("are on a page, a static file, a font and the not-found page", async () => {
    const home = await fetch(`${baseURL}/`);
    expect(home.status).toBe(200);
    expectSecurityHeaders(home, "home page");
    const lesson = await fetch(`${baseURL}/lessons`);
    expectSecurityHeaders(lesson, "lessons index");

    const script = (await home.text()).match(/\/_next\/static\/[^"']+\.js/)?.[0];
    expect(script, "the home page loads a script from /_next/static").toBeTruthy();
    const staticFile = await fetch(`${baseURL}${script}`);
    expect(staticFile.status).toBe(200);
    expectSecurityHeaders(staticFile, "static script");

    const font = await fetch(`${baseURL}/fonts/atkinson-hyperlegible-next-latin-wght-normal.woff2`);
    expect(font.status).toBe(200);
    expectSecurityHeaders(font, "public font");

    const missing = await fetch(`${baseURL}/no-such-page-here`);
    expect(missing.status).toBe(404);
    expectSecurityHeaders(missing, "missing page");
  });

  it("are on API answers: 200, 401 and 404", async () => {
    const health = await fetch(`${baseURL}/api/health`);
    expect(health.status).toBe(200);
    expectSecurityHeaders(health, "GET /api/health");

    const anonymous = await fetch(`${baseURL}/api/me`);
    expect(anonymous.status).toBe(401);
    expectSecurityHeaders(anonymous, "GET /api/me signed out");

    const unknown = await fetch(`${baseURL}/api/no-such-route`);
    expect(unknown.status).toBe(404);
    expectSecurityHeaders(unknown, "unknown API route");
  });

  it("are on the sign-in POST, whose session cookie is httpOnly and SameSite=Lax over http", async () => {
    const ruth = await createPerson(databasePath, "Ruth Mortise");
    const { res, flags } = await sessionCookie(baseURL, ruth.email, "next-auth.session-token");
    expectSecurityHeaders(res, "sign-in POST");
    expect(flags).toContain("httponly");
    expect(flags).toContain("samesite=lax");
    expect(flags).toContain("path=/");
    // Plain http (this app on loopback): a Secure cookie would never come back.
    expect(flags).not.toContain("secure");
  });
});

describe("behind an https address", () => {
  let app: RunningApp;

  beforeAll(async () => {
    // The process still listens on http loopback; only its public address says https.
    app = await startApp({ seed: false, env: { NEXTAUTH_URL: "https://shop.sixteenths.example" } });
  }, 90_000);

  afterAll(async () => {
    await app?.stop();
  });

  it("the session cookie is Secure with the __Secure- prefix, and that cookie is the one the app reads", async () => {
    const omar = await createPerson(app.databasePath, "Omar Dado");
    const { setCookies, session, flags } = await sessionCookie(app.url, omar.email, "__Secure-next-auth.session-token");
    expect(setCookies.some((line) => line.startsWith("next-auth.session-token="))).toBe(false);
    expect(flags).toContain("secure");
    expect(flags).toContain("httponly");
    expect(flags).toContain("samesite=lax");

    const cookie = session.split(";")[0];
    const me = await fetch(`${app.url}/api/me`, { headers: { cookie } });
    expect(me.status).toBe(200);
    expect(((await me.json()) as { user: { email: string } }).user.email).toBe(omar.email);
    // proxy.ts, which guards the signed-in areas before the page does, reads the same cookie.
    const classes = await fetch(`${app.url}/my-classes`, { headers: { cookie }, redirect: "manual" });
    expect(classes.status).toBe(200);
  });
});
