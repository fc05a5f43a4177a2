import { describe, expect, inject, it } from "vitest";

const baseURL = inject("baseURL");

describe("GET /api/health", () => {
  it("answers ok when the database is migrated and reachable", async () => {
    const res = await fetch(`${baseURL}/api/health`);
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ ok: true });
  });
});
