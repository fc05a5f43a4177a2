import { createHash, randomBytes } from "node:crypto";
import sqlite3 from "sqlite3";
import { describe, expect, inject, it } from "vitest";
import { signInCookie } from "../support/http";
import { caughtMail, linkIn } from "../support/mail-catcher";

const baseURL = inject("baseURL");
const mailURL = inject("mailURL");
const databasePath = inject("databasePath");

const OLD_PASSWORD = "measure twice, cut once";
const NEW_PASSWORD = "scribe to the wall";

// Each scenario comes from its own client address, so the per-client limits of one never reach another.
let clients = 0;
const client = () => `198.51.100.${++clients}`;
const fresh = () => `reset.${randomBytes(4).toString("hex")}@example.com`;

function post(url: string, body: unknown, ip = client()) {
  return fetch(`${baseURL}${url}`, { method: "POST", headers: { "content-type": "application/json", "x-forwarded-for": ip }, body: JSON.stringify(body) });
}

async function signUp(email: string) {
  const res = await post("/api/signup", { name: "Robin Scribe", email, password: OLD_PASSWORD });
  expect(res.status).toBe(201);
}

/** Waits for the `count`-th mail to `address` and returns it. */
async function mailNumber(address: string, count: number) {
  const deadline = Date.now() + 15_000;
  while (Date.now() < deadline) {
    const mails = (await caughtMail(mailURL)).filter((m) => m.to.some((t) => t.address === address));
    if (mails.length >= count) return mails[count - 1];
    await new Promise((r) => setTimeout(r, 150));
  }
  throw new Error(`Mail number ${count} to ${address} did not arrive.`);
}

async function requestToken(email: string, count: number): Promise<string> {
  const res = await post("/api/password-reset", { email });
  expect(res.status).toBe(200);
  const mail = await mailNumber(email, count);
  expect(mail.subject).toBe("Choose a new Sixteenths password");
  return linkIn(mail, `${baseURL}/reset-password/`).slice(`${baseURL}/reset-password/`.length);
}

function sql(statement: string, ...params: unknown[]): Promise<number> {
  const database = new sqlite3.Database(databasePath);
  database.configure("busyTimeout", 5_000);
  return new Promise((resolve, reject) =>
    database.run(statement, params, function (this: sqlite3.RunResult, error: Error | null) {
      database.close();
      if (error) reject(error);
      else resolve(this.changes);
    }),
  );
}

const page = async (token: string) => (await fetch(`${baseURL}/reset-password/${token}`)).text();

describe("password reset", () => {
  it("answers alike for an account and for no account, and mails only the account", async () => {
    const email = fresh();
    await signUp(email);
    const known = await post("/api/password-reset", { email: email.toUpperCase() });
    const unknown = await post("/api/password-reset", { email: fresh() });
    expect(known.status).toBe(200);
    expect(unknown.status).toBe(200);
    expect(await unknown.json()).toEqual(await known.json());
    await mailNumber(email, 1);
  });

  it("sets a new password through the mailed link, which then works no more", async () => {
    const email = fresh();
    await signUp(email);
    const token = await requestToken(email, 1);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);

    expect(await page(token)).toContain("Choose a new password");
    const res = await post("/api/password-reset/confirm", { token, password: NEW_PASSWORD });
    expect(res.status).toBe(200);
    expect(await res.json()).toEqual({ email });

    const again = await post("/api/password-reset/confirm", { token, password: "another fine password" });
    expect(again.status).toBe(409);
    expect((await again.json()).error.fields.token).toMatch(/already been used/);
    expect(await page(token)).toContain("This link has already been used");

    expect(await signInCookie(baseURL, email, NEW_PASSWORD)).not.toBeNull();
    expect(await signInCookie(baseURL, email, OLD_PASSWORD)).toBeNull();
  });

  it("stores only a hash of the token", async () => {
    const email = fresh();
    await signUp(email);
    const token = await requestToken(email, 1);
    const hash = createHash("sha256").update(token).digest("hex");
    expect(await sql("UPDATE password_resets SET updated_at = updated_at WHERE token_hash = ?", hash)).toBe(1);
    expect(await sql("UPDATE password_resets SET updated_at = updated_at WHERE token_hash = ?", token)).toBe(0);
  });

  it("refuses an expired link and leaves the password alone", async () => {
    const email = fresh();
    await signUp(email);
    const token = await requestToken(email, 1);
    const hash = createHash("sha256").update(token).digest("hex");
    expect(await sql("UPDATE password_resets SET expires_at = '2001-01-01 00:00:00.000 +00:00' WHERE token_hash = ?", hash)).toBe(1);

    expect(await page(token)).toContain("This link has run out");
    const res = await post("/api/password-reset/confirm", { token, password: NEW_PASSWORD });
    expect(res.status).toBe(409);
    expect((await res.json()).error.message).toMatch(/run out/);
    expect(await signInCookie(baseURL, email, OLD_PASSWORD)).not.toBeNull();
  });

  it("spends every other open link of the account when one is used", async () => {
    const email = fresh();
    await signUp(email);
    const first = await requestToken(email, 1);
    const second = await requestToken(email, 2);
    expect(second).not.toBe(first);
    expect((await post("/api/password-reset/confirm", { token: second, password: NEW_PASSWORD })).status).toBe(200);
    const stale = await post("/api/password-reset/confirm", { token: first, password: "a third password here" });
    expect(stale.status).toBe(409);
    expect(await signInCookie(baseURL, email, NEW_PASSWORD)).not.toBeNull();
  });

  it("refuses a weak password field by field and keeps the link usable", async () => {
    const email = fresh();
    await signUp(email);
    const token = await requestToken(email, 1);
    const weak = await post("/api/password-reset/confirm", { token, password: "short" });
    expect(weak.status).toBe(400);
    expect((await weak.json()).error.fields.password).toMatch(/at least 10 characters/);
    expect(await page(token)).toContain("Choose a new password");
    expect((await post("/api/password-reset/confirm", { token, password: NEW_PASSWORD })).status).toBe(200);
  });

  it("refuses a link it never sent, and bad input", async () => {
    const unknown = await post("/api/password-reset/confirm", { token: randomBytes(32).toString("base64url"), password: NEW_PASSWORD });
    expect(unknown.status).toBe(409);
    expect((await unknown.json()).error.message).toMatch(/not one we sent/);
    expect(await page("not-a-real-token")).toContain("We do not recognise this link");

    const badEmail = await post("/api/password-reset", { email: "not an address" });
    expect(badEmail.status).toBe(400);
    expect((await badEmail.json()).error.fields.email).toMatch(/does not look like an e-mail/);
    const notJson = await fetch(`${baseURL}/api/password-reset`, { method: "POST", headers: { "x-forwarded-for": client() }, body: "email=x" });
    expect(notJson.status).toBe(400);
  });

  it("limits requests per address, from any client, with a 429 and Retry-After", async () => {
    const email = fresh();
    for (let i = 0; i < 5; i++) expect((await post("/api/password-reset", { email }, client())).status).toBe(200);
    const refused = await post("/api/password-reset", { email }, client());
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get("retry-after"))).toBeGreaterThan(0);
    expect((await refused.json()).error.message).toMatch(/Too many tries/);
  });

  it("limits requests per client, whatever the address, with a 429 and Retry-After", async () => {
    const ip = "203.0.113.77";
    // A whole class on one school address may ask at once: 30 in 15 minutes, then no more.
    for (let i = 0; i < 30; i++) expect((await post("/api/password-reset", { email: fresh() }, ip)).status).toBe(200);
    const refused = await post("/api/password-reset", { email: fresh() }, ip);
    expect(refused.status).toBe(429);
    expect(Number(refused.headers.get("retry-after"))).toBeGreaterThan(0);
  });
});
