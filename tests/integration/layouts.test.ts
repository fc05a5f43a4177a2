import { describe, expect, inject, it } from "vitest";
import { DEMO_PASSWORD, DEMO_STUDENTS } from "@/seeders/demo";
import { signInCookie } from "../support/http";

const baseURL = inject("baseURL");

async function as(email: string) {
  const cookie = (await signInCookie(baseURL, email, DEMO_PASSWORD))!;
  return (path: string, init: RequestInit = {}) =>
    fetch(`${baseURL}${path}`, { ...init, headers: { cookie, "content-type": "application/json", ...(init.headers ?? {}) } });
}

describe("saved layouts", () => {
  it("are saved, listed, renamed and deleted by their owner", async () => {
    const api = await as(DEMO_STUDENTS[1].email);
    const params = "unit=in&denominator=16&span=141+1%2F2&memberWidth=3+1%2F2&by=count&count=8&endCondition=members";
    const created = await api("/api/layouts", { method: "POST", body: JSON.stringify({ kind: "even-spacing", name: "Hallway battens", params }) });
    expect(created.status).toBe(201);
    const { layout } = await created.json();
    expect(layout).toMatchObject({ kind: "even-spacing", name: "Hallway battens", params, href: `/calculators/even-spacing?${params}` });

    const list = await (await api("/api/layouts")).json();
    expect(list.layouts.map((l: { id: number }) => l.id)).toContain(layout.id);

    const renamed = await api(`/api/layouts/${layout.id}`, { method: "PATCH", body: JSON.stringify({ name: "  Hall, 1x4  " }) });
    expect(renamed.status).toBe(200);
    expect((await renamed.json()).layout.name).toBe("Hall, 1x4");

    expect((await api(`/api/layouts/${layout.id}`, { method: "DELETE" })).status).toBe(204);
    expect((await (await api("/api/layouts")).json()).layouts.map((l: { id: number }) => l.id)).not.toContain(layout.id);
  });

  it("are invisible to everyone else: another user's id answers 404 and changes nothing", async () => {
    const owner = await as(DEMO_STUDENTS[2].email);
    const other = await as(DEMO_STUDENTS[3].email);
    const { layout } = await (await owner("/api/layouts", { method: "POST", body: JSON.stringify({ kind: "stairs", name: "Porch stair", params: "totalRise=104+3%2F4" }) })).json();

    expect((await (await other("/api/layouts")).json()).layouts).toEqual([]);
    const rename = await other(`/api/layouts/${layout.id}`, { method: "PATCH", body: JSON.stringify({ name: "Mine now" }) });
    expect(rename.status).toBe(404);
    expect(await rename.json()).toEqual({ error: { code: "not_found", message: expect.any(String) } });
    expect((await other(`/api/layouts/${layout.id}`, { method: "DELETE" })).status).toBe(404);

    const still = (await (await owner("/api/layouts")).json()).layouts;
    expect(still).toEqual([expect.objectContaining({ id: layout.id, name: "Porch stair" })]);
  });

  it("need a signed-in user", async () => {
    expect((await fetch(`${baseURL}/api/layouts`)).status).toBe(401);
    const res = await fetch(`${baseURL}/api/layouts`, { method: "POST", body: JSON.stringify({ kind: "stairs", name: "x", params: "" }) });
    expect(res.status).toBe(401);
  });

  it.each([
    ["an unknown calculator", { kind: "router-table", name: "x", params: "" }, "kind"],
    ["a blank name", { kind: "stairs", name: "   ", params: "" }, "name"],
    ["a name of 121 characters", { kind: "stairs", name: "x".repeat(121), params: "" }, "name"],
    ["settings over 4,000 characters", { kind: "stairs", name: "x", params: "a".repeat(4001) }, "params"],
    ["no settings", { kind: "stairs", name: "x" }, "params"],
  ])("reject %s with a 400 naming the field", async (_label, body, field) => {
    const api = await as(DEMO_STUDENTS[4].email);
    const res = await api("/api/layouts", { method: "POST", body: JSON.stringify(body) });
    expect(res.status).toBe(400);
    expect((await res.json()).error.fields).toHaveProperty(field);
  });

  it("reject a bad id with a 400", async () => {
    const api = await as(DEMO_STUDENTS[4].email);
    const res = await api("/api/layouts/abc", { method: "DELETE" });
    expect(res.status).toBe(400);
  });
});
