import bcrypt from "bcryptjs";
import { describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/lib/db";
import { DEMO_PASSWORD, DEMO_STAFF, DEMO_INVITED, DEMO_STUDENTS } from "@/seeders/demo";
import { signInCookie } from "../support/http";

const baseURL = inject("baseURL");
const dana = DEMO_STAFF.find((s) => s.name === "Dana Whitlock")!;
const admin = DEMO_STAFF.find((s) => s.role === "admin")!;
const student = DEMO_STUDENTS[0];

describe("GET /api/me", () => {
  it("answers 401 in the one error shape when nobody is signed in", async () => {
    const res = await fetch(`${baseURL}/api/me`);
    expect(res.status).toBe(401);
    const body = await res.json();
    expect(body).toEqual({ error: { code: "unauthenticated", message: expect.any(String) } });
  });

  it.each([
    ["student", student.email],
    ["instructor", dana.email],
    ["admin", admin.email],
  ])("returns the signed-in %s as plain JSON, without the password hash", async (role, email) => {
    const cookie = await signInCookie(baseURL, email, DEMO_PASSWORD);
    expect(cookie).not.toBeNull();
    const res = await fetch(`${baseURL}/api/me`, { headers: { cookie: cookie! } });
    expect(res.status).toBe(200);
    const { user } = await res.json();
    expect(user).toEqual({ id: expect.any(Number), email, name: expect.any(String), role });
    expect(JSON.stringify(user)).not.toMatch(/hash|\$2[aby]\$/i);
  });

  it("ignores a session cookie signed with another secret", async () => {
    const res = await fetch(`${baseURL}/api/me`, { headers: { cookie: "next-auth.session-token=forged.value.here" } });
    expect(res.status).toBe(401);
  });

  it("refuses a wrong password: no session cookie is issued", async () => {
    expect(await signInCookie(baseURL, dana.email, "not-the-password")).toBeNull();
  });
});

describe("role checks on the server", () => {
  it("a student gets 403 JSON from an instructor API and a 403 page from an instructor URL", async () => {
    const cookie = (await signInCookie(baseURL, student.email, DEMO_PASSWORD))!;
    const api = await fetch(`${baseURL}/api/classes`, { headers: { cookie } });
    expect(api.status).toBe(403);
    expect((await api.json()).error.code).toBe("forbidden");

    const page = await fetch(`${baseURL}/classes`, { headers: { cookie } });
    expect(page.status).toBe(403);
    expect(await page.text()).toContain("This page is not open to your account.");
  });

  it("an anonymous visitor to an instructor URL is sent to sign in, and comes back after", async () => {
    const res = await fetch(`${baseURL}/classes/1`, { redirect: "manual" });
    expect(res.status).toBeGreaterThanOrEqual(300);
    expect(res.status).toBeLessThan(400);
    expect(res.headers.get("location")).toContain("/signin?callbackUrl=%2Fclasses%2F1");
  });

  it("an instructor sees their own class and its roster of 18 students and 3 open invitations", async () => {
    const cookie = (await signInCookie(baseURL, dana.email, DEMO_PASSWORD))!;
    const list = await (await fetch(`${baseURL}/api/classes`, { headers: { cookie } })).json();
    expect(list.classes).toHaveLength(1);
    const roster = await fetch(`${baseURL}/api/classes/${list.classes[0].id}/roster`, { headers: { cookie } });
    expect(roster.status).toBe(200);
    const body = await roster.json();
    expect(body.roster).toHaveLength(DEMO_STUDENTS.length + DEMO_INVITED.length);
    expect(body.roster.filter((r: { status: string }) => r.status === "invited")).toHaveLength(DEMO_INVITED.length);
  });

  it("the co-instructor may read the roster; another instructor and a student of the class may not", async () => {
    const co = DEMO_STAFF.find((s) => s.note.startsWith("co-instructor"))!;
    const coCookie = (await signInCookie(baseURL, co.email, DEMO_PASSWORD))!;
    const [carp] = (await (await fetch(`${baseURL}/api/classes`, { headers: { cookie: coCookie } })).json()).classes;
    expect((await fetch(`${baseURL}/api/classes/${carp.id}/roster`, { headers: { cookie: coCookie } })).status).toBe(200);

    // Another instructor, written straight into the app's database file (instructors are not made by sign-up).
    const database = openDatabase(inject("databasePath"));
    await database.models.User.findOrCreate({
      where: { email: "other.instructor@example.com" },
      defaults: { name: "Other Instructor", email: "other.instructor@example.com", role: "instructor", passwordHash: await bcrypt.hash(DEMO_PASSWORD, 10) },
    });
    await database.sequelize.close();
    const otherCookie = (await signInCookie(baseURL, "other.instructor@example.com", DEMO_PASSWORD))!;
    expect((await (await fetch(`${baseURL}/api/classes`, { headers: { cookie: otherCookie } })).json()).classes).toEqual([]);
    expect((await fetch(`${baseURL}/api/classes/${carp.id}/roster`, { headers: { cookie: otherCookie } })).status).toBe(403);
    expect((await fetch(`${baseURL}/classes/${carp.id}`, { headers: { cookie: otherCookie } })).status).toBe(403);

    const studentCookie = (await signInCookie(baseURL, student.email, DEMO_PASSWORD))!;
    expect((await fetch(`${baseURL}/api/classes/${carp.id}/roster`, { headers: { cookie: studentCookie } })).status).toBe(403);
  });

  it("a bad class id is a 400 with the field named, an unknown one a 404", async () => {
    const cookie = (await signInCookie(baseURL, admin.email, DEMO_PASSWORD))!;
    const bad = await fetch(`${baseURL}/api/classes/abc/roster`, { headers: { cookie } });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields).toHaveProperty("classId");
    expect((await fetch(`${baseURL}/api/classes/9999/roster`, { headers: { cookie } })).status).toBe(404);
  });
});
