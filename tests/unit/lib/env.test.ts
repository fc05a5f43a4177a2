import { describe, expect, it } from "vitest";
import { EnvError, parseEnv } from "@/lib/env";

const SECRET = "x".repeat(40);

describe("parseEnv", () => {
  it("fills every default when only the secret is given", () => {
    expect(parseEnv({ NEXTAUTH_SECRET: SECRET })).toEqual({
      NODE_ENV: "development",
      DATABASE_PATH: "data/sixteenths.sqlite",
      NEXTAUTH_SECRET: SECRET,
      NEXTAUTH_URL: "http://localhost:3000",
      SMTP_URL: "smtp://127.0.0.1:1025",
      MAIL_FROM: "Sixteenths <no-reply@sixteenths.local>",
      BCRYPT_COST: 12,
    });
  });

  it("names the missing secret and how to get one", () => {
    expect(() => parseEnv({})).toThrow(EnvError);
    try {
      parseEnv({});
    } catch (error) {
      expect((error as EnvError).problems).toEqual([expect.stringMatching(/^NEXTAUTH_SECRET is missing: run `npm run demo`/)]);
    }
  });

  it("treats an empty value as unset", () => {
    expect(() => parseEnv({ NEXTAUTH_SECRET: "" })).toThrow(/NEXTAUTH_SECRET is missing/);
    expect(parseEnv({ NEXTAUTH_SECRET: SECRET, DATABASE_PATH: "" }).DATABASE_PATH).toBe("data/sixteenths.sqlite");
  });

  it("lists one message per bad variable, all at once", () => {
    try {
      parseEnv({ NEXTAUTH_SECRET: "short", NEXTAUTH_URL: "localhost", SMTP_URL: "http://x", BCRYPT_COST: "4" });
      expect.unreachable();
    } catch (error) {
      const { problems, message } = error as EnvError;
      expect(problems).toHaveLength(4);
      expect(problems.join("\n")).toMatch(/NEXTAUTH_SECRET is too short/);
      expect(problems.join("\n")).toMatch(/NEXTAUTH_URL must be/);
      expect(problems.join("\n")).toMatch(/SMTP_URL must start with smtp/);
      expect(problems.join("\n")).toMatch(/BCRYPT_COST must be at least 10/);
      expect(message).toMatch(/^Sixteenths cannot start/);
    }
  });

  it("reads numbers from their text form", () => {
    expect(parseEnv({ NEXTAUTH_SECRET: SECRET, BCRYPT_COST: "11" }).BCRYPT_COST).toBe(11);
  });
});
