// A password reset ends the sessions already open for that account (on every device), and only
// those: the new password signs in, and other people stay signed in.
import crypto from "node:crypto";
import { describe, expect, inject, it } from "vitest";
import { hashResetToken } from "@/lib/accounts/password-reset";
import { createPerson, FIXTURE_PASSWORD, withDatabase } from "../support/assignment-fixtures";
import { signInCookie } from "../support/http";

const baseURL = inject("baseURL");
const file = inject("databasePath");
const NEW_PASSWORD = "scarf-joint-and-glue-58";

const me = (cookie: string) => fetch(`${baseURL}/api/me`, { headers: { cookie } });

/** A reset link written straight into the database: the test holds the token the e-mail would carry. */
async function resetLinkFor(userId: number): Promise<string> {
  const token = crypto.randomBytes(32).toString("base64url");
  await withDatabase(file, (db) => db.models.PasswordReset.create({ userId, tokenHash: hashResetToken(token), expiresAt: new Date(Date.now() + 3600_000) }));
  return token;
}

describe("sessions after a password reset", () => {
  it("every session open before the reset is refused, pages and API alike; a new sign-in works", async () => {
    const owner = await createPerson(file, "Hana Coping");
    const bystander = await createPerson(file, "Iver Dovetail");
    const laptop = (await signInCookie(baseURL, owner.email, FIXTURE_PASSWORD))!;
    const phone = (await signInCookie(baseURL, owner.email, FIXTURE_PASSWORD))!;
    const other = (await signInCookie(baseURL, bystander.email, FIXTURE_PASSWORD))!;
    for (const cookie of [laptop, phone, other]) expect((await me(cookie)).status).toBe(200);

    const confirmed = await fetch(`${baseURL}/api/password-reset/confirm`, {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: JSON.stringify({ token: await resetLinkFor(owner.id), password: NEW_PASSWORD }),
    });
    expect(confirmed.status).toBe(200);
    expect(await withDatabase(file, async (db) => (await db.models.User.findByPk(owner.id))!.sessionVersion)).toBe(1);

    for (const cookie of [laptop, phone]) {
      const res = await me(cookie);
      expect(res.status).toBe(401);
      expect(((await res.json()) as { error: { code: string } }).error.code).toBe("unauthenticated");
    }
    // A page behind sign-in sends the old session to the sign-in form.
    const page = await fetch(`${baseURL}/my-progress`, { headers: { cookie: laptop }, redirect: "manual" });
    expect(page.headers.get("location") ?? (await page.text())).toContain("/signin?callbackUrl=%2Fmy-progress");
    // Someone else's session is untouched.
    expect((await me(other)).status).toBe(200);

    expect(await signInCookie(baseURL, owner.email, FIXTURE_PASSWORD)).toBeNull();
    const fresh = await signInCookie(baseURL, owner.email, NEW_PASSWORD);
    expect(fresh).toBeTruthy();
    const again = await me(fresh!);
    expect(again.status).toBe(200);
    expect(((await again.json()) as { user: { email: string } }).user.email).toBe(owner.email);
  });
});
