import { describe, expect, it } from "vitest";
import { formatJoinCode, joinClassSchema, JOIN_CODE_ALPHABET, normalizeJoinCode } from "@/lib/classes/schemas";
import { generateJoinCode, hashToken, newInvitationToken } from "@/lib/classes/tokens";

describe("join codes", () => {
  it("are 8 characters with no 0, O, 1 or I, and differ from one call to the next", () => {
    const codes = Array.from({ length: 200 }, generateJoinCode);
    for (const code of codes) expect(code).toMatch(/^[A-HJ-NP-Z2-9]{8}$/);
    expect(new Set(codes).size).toBe(codes.length);
    expect(JOIN_CODE_ALPHABET).not.toMatch(/[01OI]/);
  });

  it("read the same however a student types them", () => {
    expect(normalizeJoinCode(" k7px-m3qd ")).toBe("K7PXM3QD");
    expect(joinClassSchema.parse({ code: "k7px m3qd" }).code).toBe("K7PXM3QD");
    expect(formatJoinCode("K7PXM3QD")).toBe("K7PX M3QD");
    expect(joinClassSchema.safeParse({ code: "  " }).error?.issues[0].message).toMatch(/Enter the join code/);
    expect(joinClassSchema.safeParse({ code: "K7P#M3QD" }).error?.issues[0].message).toMatch(/letters and digits only/);
  });
});

describe("invitation tokens", () => {
  it("are 32 random bytes (43 base64url characters); only their SHA-256 is kept, and they expire in 7 days", () => {
    const now = Date.UTC(2027, 0, 10, 12);
    const { token, tokenHash, expiresAt } = newInvitationToken(now);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    expect(Buffer.from(token, "base64url")).toHaveLength(32);
    expect(tokenHash).toBe(hashToken(token));
    expect(tokenHash).toMatch(/^[0-9a-f]{64}$/);
    expect(tokenHash).not.toContain(token);
    expect(expiresAt.toISOString()).toBe("2027-01-17T12:00:00.000Z");
  });
});
