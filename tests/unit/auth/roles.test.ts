import { describe, expect, it } from "vitest";
import { decideAccess, type SessionUser } from "@/lib/auth/roles";
import { navFor, safeCallbackPath } from "@/lib/navigation";

const user = (role: SessionUser["role"]): SessionUser => ({ id: 1, email: "a@example.com", name: "A", role });

describe("decideAccess", () => {
  it("refuses nobody with 401", () => {
    expect(decideAccess(null)).toMatchObject({ ok: false, status: 401 });
    expect(decideAccess(null, ["admin"])).toMatchObject({ ok: false, status: 401 });
  });

  it("lets any signed-in user through when no role is required", () => {
    for (const role of ["student", "instructor", "admin"] as const) expect(decideAccess(user(role))).toEqual({ ok: true, user: user(role) });
  });

  it("refuses a wrong role with 403 and says which role is needed", () => {
    const decision = decideAccess(user("student"), ["instructor", "admin"]);
    expect(decision).toMatchObject({ ok: false, status: 403 });
    expect(decision.ok || decision.message).toMatch(/instructor or admin.*student/);
  });

  it("does not treat admin as a superset unless the caller lists it", () => {
    expect(decideAccess(user("admin"), ["instructor"])).toMatchObject({ ok: false, status: 403 });
    expect(decideAccess(user("admin"), ["instructor", "admin"]).ok).toBe(true);
  });
});

describe("navigation", () => {
  it("shows each role only its own areas", () => {
    expect(navFor(null).map((i) => i.label)).toEqual(["Lessons", "Calculators", "Practice"]);
    expect(navFor("student").map((i) => i.label)).toEqual(["Lessons", "Calculators", "Practice", "My classes", "My progress"]);
    expect(navFor("instructor").map((i) => i.label)).toEqual(["Lessons", "Calculators", "Practice", "Classes"]);
    expect(navFor("admin").map((i) => i.label)).toEqual(["Lessons", "Calculators", "Practice", "Classes", "Users", "All classes"]);
  });

  it.each([
    ["/classes/3", "/classes/3"],
    [null, "/"],
    ["https://evil.example/", "/"],
    ["//evil.example/", "/"],
    ["/\\evil.example", "/"],
    ["classes", "/"],
  ])("follows only same-site paths after sign-in (%s)", (input, expected) => {
    expect(safeCallbackPath(input)).toBe(expected);
  });
});
