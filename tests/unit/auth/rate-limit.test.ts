import { describe, expect, it } from "vitest";
import { clientAddress, consume, reset } from "@/lib/auth/rate-limit";
import { AppError } from "@/lib/errors";

describe("sign-in rate limit", () => {
  it("allows eight tries per key, then refuses with a 429 and a wait", async () => {
    const key = `limit-test-${Math.random()}`;
    for (let i = 0; i < 8; i++) await consume("signIn", key);
    const refusal = await consume("signIn", key).catch((e: unknown) => e);
    expect(refusal).toBeInstanceOf(AppError);
    expect((refusal as AppError).status).toBe(429);
    expect((refusal as AppError).retryAfterSeconds).toBeGreaterThan(0);
    expect((refusal as AppError).message).toMatch(/^Too many tries\. Wait \d+ minutes? and try again\.$/);
    await reset("signIn", key);
    await expect(consume("signIn", key)).resolves.toBeUndefined();
  });

  it("keeps keys apart", async () => {
    const a = `a-${Math.random()}`;
    for (let i = 0; i < 8; i++) await consume("signIn", a);
    await expect(consume("signIn", `b-${Math.random()}`)).resolves.toBeUndefined();
  });

  it("reads the client address from proxy headers", () => {
    expect(clientAddress(new Headers({ "x-forwarded-for": "203.0.113.5, 10.0.0.1" }))).toBe("203.0.113.5");
    expect(clientAddress({ "x-real-ip": "198.51.100.7" })).toBe("198.51.100.7");
    expect(clientAddress(undefined)).toBe("local");
  });
});
