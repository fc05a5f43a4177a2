import crypto from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { linkIn, waitForMail } from "../support/mail-catcher";
import { signInCookie } from "../support/http";
import { baseURL, call, createClass, enroll, mailURL, makePerson, PASSWORD, tokenFrom, uniqueEmail, withDb, type Person } from "./classes-helpers";

let lead: Person;
let klass: { id: number; name: string };

async function invite(addresses: string) {
  return call<{ batch: string; results: { email: string; outcome: string; message: string }[] }>("POST", `/api/classes/${klass.id}/invitations`, {
    cookie: lead.cookie,
    body: { addresses },
  });
}

/** Invites one address and returns the token from the e-mail that arrives. */
async function invitedToken(email: string, name = "Avery Castellanos"): Promise<string> {
  const sent = await invite(`${name} <${email}>`);
  expect(sent.status).toBe(201);
  const mail = await waitForMail(mailURL, email, new RegExp(`added you to ${klass.name}`));
  return tokenFrom(linkIn(mail, `${baseURL}/invite/`));
}

const accept = (token: string, body: unknown, cookie?: string) => call<{ error?: { message: string }; classId?: number }>("POST", `/api/invitations/${token}/accept`, { body, cookie });

beforeAll(async () => {
  lead = await makePerson("instructor", "lead");
  klass = await createClass(lead);
});

describe("invitations by e-mail", () => {
  it("e-mails a link whose token is stored only as its SHA-256; the link makes an account once, and a second accept is refused", async () => {
    const email = uniqueEmail("avery");
    const token = await invitedToken(email);
    expect(token).toMatch(/^[A-Za-z0-9_-]{43}$/);
    const row = await withDb(({ models }) => models.Invitation.findOne({ where: { classId: klass.id, email }, raw: true }));
    expect(row!.tokenHash).toBe(crypto.createHash("sha256").update(token).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(token);
    expect(new Date(row!.expiresAt).getTime() - new Date(row!.createdAt).getTime()).toBeGreaterThan(7 * 24 * 3600_000 - 60_000);
    expect(new Date(row!.expiresAt).getTime() - new Date(row!.createdAt).getTime()).toBeLessThanOrEqual(7 * 24 * 3600_000 + 1000);

    const page = await call<string>("GET", `/invite/${token}`);
    expect(page.status).toBe(200);
    expect(page.body).toContain("Create account and join");
    expect(page.body).toContain("Avery Castellanos");

    const first = await accept(token, { name: "Avery Castellanos", password: PASSWORD });
    expect(first.status).toBe(201);
    expect(first.body.classId).toBe(klass.id);
    const second = await accept(token, { name: "Someone Else", password: PASSWORD });
    expect(second.status).toBe(409);
    expect(second.body.error!.message).toMatch(/already been used/);

    const cookie = await signInCookie(baseURL, email, PASSWORD);
    expect(cookie).not.toBeNull();
    const myClasses = await call<string>("GET", "/my-classes", { cookie: cookie! });
    expect(myClasses.body).toContain(klass.name);
    const enrollment = await withDb(({ models }) => models.Enrollment.findOne({ where: { classId: klass.id }, include: [{ model: models.User, as: "student", where: { email } }] }));
    expect(enrollment!.status).toBe("active");
    expect((await call<string>("GET", `/invite/${token}`)).body).toContain("This invitation was already used");
  });

  it("lets exactly one of two accepts that arrive together through", async () => {
    const email = uniqueEmail("double");
    const token = await invitedToken(email, "Double Click");
    const replies = await Promise.all([accept(token, { name: "Double Click", password: PASSWORD }), accept(token, { name: "Double Click", password: PASSWORD })]);
    expect(replies.map((r) => r.status).sort()).toEqual([201, 409]);
    expect(await withDb(({ models }) => models.User.count({ where: { email } }))).toBe(1);
  });

  it("refuses an expired invitation and says so on the page", async () => {
    const email = uniqueEmail("late");
    const token = await invitedToken(email, "Late Comer");
    await withDb(({ models }) => models.Invitation.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { classId: klass.id, email } }));
    const reply = await accept(token, { name: "Late Comer", password: PASSWORD });
    expect(reply.status).toBe(409);
    expect(reply.body.error!.message).toMatch(/run out/);
    expect((await call<string>("GET", `/invite/${token}`)).body).toContain("This invitation has run out");
    expect(await withDb(({ models }) => models.User.count({ where: { email } }))).toBe(0);
  });

  it("an unknown token gets a clear 404 and page", async () => {
    const bogus = crypto.randomBytes(32).toString("base64url");
    expect((await accept(bogus, { name: "Nobody", password: PASSWORD })).status).toBe(404);
    expect((await call<string>("GET", `/invite/${bogus}`)).body).toContain("This link does not work");
  });

  it("re-inviting an address cancels the old link; an address already active is refused on its own row", async () => {
    const email = uniqueEmail("twice");
    const oldToken = await invitedToken(email, "Twice Asked");
    const student = await makePerson("student", "already");
    await enroll(klass.id, student.id);
    const again = await invite(`${email}, ${student.email}`);
    expect(again.status).toBe(201);
    expect(again.body.results).toEqual([
      expect.objectContaining({ email, outcome: "resent" }),
      expect.objectContaining({ email: student.email, outcome: "refused", message: "Already an active student in this class." }),
    ]);
    const cancelled = await accept(oldToken, { name: "Twice Asked", password: PASSWORD });
    expect(cancelled.status).toBe(409);
    expect(cancelled.body.error!.message).toMatch(/cancelled/);
    const open = await withDb(({ models }) => models.Invitation.count({ where: { classId: klass.id, email, revokedAt: null, acceptedAt: null } }));
    expect(open).toBe(1);
    expect(await withDb(({ models }) => models.Invitation.count({ where: { classId: klass.id, email: student.email } }))).toBe(0);
  });

  it("refuses a list with a malformed address and writes nothing", async () => {
    const before = await withDb(({ models }) => models.Invitation.count({ where: { classId: klass.id } }));
    const reply = await invite(`${uniqueEmail("fine")}\nnot-an-address`);
    expect(reply.status).toBe(400);
    expect((reply.body as unknown as { error: { fields: Record<string, string> } }).error.fields.addresses).toMatch(/“not-an-address” is not an e-mail address/);
    expect(await withDb(({ models }) => models.Invitation.count({ where: { classId: klass.id } }))).toBe(before);
  });

  it("a student with an account joins with one click when signed in as the invited address, and not as anyone else", async () => {
    const student = await makePerson("student", "existing");
    const other = await makePerson("student", "other");
    const token = await invitedToken(student.email, "Existing Student");
    expect((await call<string>("GET", `/invite/${token}`)).body).toContain("Sign in to join");
    expect((await accept(token, {})).status).toBe(400);
    const wrong = await accept(token, {}, other.cookie);
    expect(wrong.status).toBe(403);
    expect(wrong.body.error!.message).toContain(student.email);
    expect((await call<string>("GET", `/invite/${token}`, { cookie: other.cookie })).body).toContain("Sign out and open the invitation again");
    expect((await accept(token, {}, student.cookie)).status).toBe(201);
    const enrollment = await withDb(({ models }) => models.Enrollment.findOne({ where: { classId: klass.id, studentId: student.id } }));
    expect(enrollment!.status).toBe("active");
  });

  it("resend sends a new link and cancels the old; revoke cancels it outright", async () => {
    const email = uniqueEmail("resend");
    const first = await invitedToken(email, "Resend Me");
    const invitation = await withDb(({ models }) => models.Invitation.findOne({ where: { classId: klass.id, email, revokedAt: null } }));
    const resent = await call<{ batch: string }>("POST", `/api/classes/${klass.id}/invitations/${invitation!.id}/resend`, { cookie: lead.cookie });
    expect(resent.status).toBe(200);
    await expect.poll(async () => (await fetch(`${mailURL}/api/email`).then((r) => r.json())).filter((m: { to: { address: string }[] }) => m.to[0].address === email).length, { timeout: 10_000 }).toBe(2);
    expect((await accept(first, { name: "Resend Me", password: PASSWORD })).status).toBe(409);
    const fresh = await withDb(({ models }) => models.Invitation.findOne({ where: { classId: klass.id, email, revokedAt: null } }));
    expect((await call("POST", `/api/classes/${klass.id}/invitations/${fresh!.id}/revoke`, { cookie: lead.cookie })).status).toBe(200);
    expect((await call("POST", `/api/classes/${klass.id}/invitations/${fresh!.id}/revoke`, { cookie: lead.cookie })).status).toBe(409);
    const roster = await call<{ roster: { email: string }[] }>("GET", `/api/classes/${klass.id}/roster?q=${encodeURIComponent(email)}`, { cookie: lead.cookie });
    expect(roster.body.roster).toEqual([]);
  });
});
