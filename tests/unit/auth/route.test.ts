import { encode } from "next-auth/jwt";
import { beforeAll, describe, expect, it } from "vitest";
import { z } from "zod";
import type { Role } from "@/models";
import { ownUnitDatabase } from "../../support/unit-database";

// The cheapest hash cost the app accepts keeps this file quick; set before the app reads its environment.
process.env.BCRYPT_COST = "10";
const { db } = await ownUnitDatabase();
const { withAuth } = await import("@/lib/auth/route");
const { AppError } = await import("@/lib/errors");

let studentId = 0;
let instructorId = 0;

beforeAll(async () => {
  const { User } = db().models;
  studentId = (await User.create({ email: "s@example.com", name: "Stu Dent", role: "student", passwordHash: "x" })).id;
  instructorId = (await User.create({ email: "i@example.com", name: "Inge Structor", role: "instructor", passwordHash: "x" })).id;
});

async function requestAs(uid: number | null, role: Role = "student"): Promise<Request> {
  const headers = new Headers();
  if (uid !== null) {
    const token = await encode({ token: { uid, role, sub: String(uid) }, secret: process.env.NEXTAUTH_SECRET! });
    headers.set("cookie", `next-auth.session-token=${token}`);
  }
  return new Request("http://localhost/api/x", { headers });
}

const ctx = { params: Promise.resolve({}) };
const echo = withAuth(["instructor"], async (_req, { user }) => Response.json({ user }));

describe("withAuth", () => {
  it("answers 401 JSON without a session", async () => {
    const res = await echo(await requestAs(null), ctx);
    expect(res.status).toBe(401);
    expect(await res.json()).toEqual({ error: { code: "unauthenticated", message: "Sign in to continue." } });
  });

  it("answers 403 JSON for the wrong role, judged by the database, not the token", async () => {
    // The token claims instructor; the account is a student. The database wins.
    const res = await echo(await requestAs(studentId, "instructor"), ctx);
    expect(res.status).toBe(403);
    expect((await res.json()).error.code).toBe("forbidden");
  });

  it("passes the user to the handler for the right role", async () => {
    const res = await echo(await requestAs(instructorId, "instructor"), ctx);
    expect(res.status).toBe(200);
    expect((await res.json()).user).toEqual({ id: instructorId, email: "i@example.com", name: "Inge Structor", role: "instructor" });
  });

  it("leaves the request body for the handler to read", async () => {
    const req = await requestAs(instructorId, "instructor");
    const withBody = new Request(req.url, { method: "POST", headers: req.headers, body: JSON.stringify({ span: "96" }) });
    const readsBody = withAuth(["instructor"], async (r) => Response.json(await r.json()));
    expect(await (await readsBody(withBody, ctx)).json()).toEqual({ span: "96" });
  });

  it("answers 401 for a token of a deleted account", async () => {
    const res = await echo(await requestAs(987654, "instructor"), ctx);
    expect(res.status).toBe(401);
  });

  it("turns thrown AppErrors and zod errors into the one error shape, and hides anything else", async () => {
    const throwing = (error: unknown) => withAuth([], async () => Promise.reject(error));
    const req = await requestAs(studentId);

    const conflict = await throwing(new AppError("conflict", "Taken.", { email: "Taken." }))(req, ctx);
    expect(conflict.status).toBe(409);
    expect(await conflict.json()).toEqual({ error: { code: "conflict", message: "Taken.", fields: { email: "Taken." } } });

    const zodError = z.object({ n: z.number({ error: "n must be a number" }) }).safeParse({ n: "x" }).error;
    const bad = await throwing(zodError)(req, ctx);
    expect(bad.status).toBe(400);
    expect(await bad.json()).toEqual({ error: { code: "bad_request", message: "n must be a number", fields: { n: "n must be a number" } } });

    const limited = await throwing(new AppError("rate_limited", "Wait.", undefined, 90))(req, ctx);
    expect(limited.status).toBe(429);
    expect(limited.headers.get("retry-after")).toBe("90");

    const original = console.error;
    console.error = () => {};
    const crash = await throwing(new Error("SQLITE_CORRUPT at /secret/path"))(req, ctx);
    console.error = original;
    expect(crash.status).toBe(500);
    expect(JSON.stringify(await crash.json())).not.toContain("secret");
  });
});
