import { describe, expect, inject, it } from "vitest";
import { DEMO_STAFF } from "@/seeders/demo";
import { signInCookie } from "../support/http";

const baseURL = inject("baseURL");

function signUp(body: unknown, raw = false) {
  return fetch(`${baseURL}/api/signup`, {
    method: "POST",
    headers: { "content-type": "application/json" },
    body: raw ? (body as string) : JSON.stringify(body),
  });
}

describe("POST /api/signup", () => {
  it("creates a student who can then sign in", async () => {
    const res = await signUp({ name: "  Tess Marlow ", email: "Tess.Marlow@Example.com", password: "plumb and level" });
    expect(res.status).toBe(201);
    const { user } = await res.json();
    expect(user).toEqual({ id: expect.any(Number), name: "Tess Marlow", email: "tess.marlow@example.com", role: "student" });
    expect(await signInCookie(baseURL, "tess.marlow@example.com", "plumb and level")).not.toBeNull();
  });

  it("never makes anything but a student, whatever the body says", async () => {
    const res = await signUp({ name: "Sneaky", email: "sneaky@example.com", password: "plumb and level", role: "admin" });
    expect(res.status).toBe(201);
    expect((await res.json()).user.role).toBe("student");
  });

  it("answers 409 with the e-mail field named when the address is taken (any letter case)", async () => {
    const res = await signUp({ name: "Dana Again", email: DEMO_STAFF[0].email.toUpperCase(), password: "plumb and level" });
    expect(res.status).toBe(409);
    const body = await res.json();
    expect(body.error.code).toBe("conflict");
    expect(body.error.message).toMatch(/already exists/);
    expect(body.error.fields.email).toMatch(/already exists/);
  });

  it.each([
    ["too short", "short1", /at least 10 characters/],
    ["one repeated character", "aaaaaaaaaaaa", /repeats too few/],
    ["a first guess", "carpentry1", /first ones people guess/],
  ])("answers 400 for a weak password (%s) and creates nothing", async (_label, password, message) => {
    const email = `weak.${password}@example.com`;
    const res = await signUp({ name: "Weak", email, password });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(body.error.code).toBe("bad_request");
    expect(body.error.fields.password).toMatch(message);
    expect(await signInCookie(baseURL, email, password)).toBeNull();
  });

  it("answers 400 naming every bad field", async () => {
    const res = await signUp({ name: "", email: "not-an-email", password: "plumb and level" });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(Object.keys(error.fields).sort()).toEqual(["email", "name"]);
  });

  it("answers 400 for a body that is not JSON", async () => {
    const res = await signUp("{name:", true);
    expect(res.status).toBe(400);
    expect((await res.json()).error.message).toMatch(/JSON/);
  });
});
