// Every rate-limited action, pushed past its limit on an app of its own (so the shared suite app
// never locks anyone out): the refusal is a 429 with a Retry-After in seconds and a plain
// sentence, and the refused request writes nothing.
import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { newInvitationToken } from "@/lib/classes/tokens";
import { startApp, type RunningApp } from "../support/app-server";
import { createAssignment, createClass, createPerson, FIXTURE_PASSWORD, signedInPerson, withDatabase } from "../support/assignment-fixtures";
import { signInCookie } from "../support/http";
import { startMailCatcher, type MailCatcher } from "../support/mail-catcher";
import { cameraPhoto } from "../unit/uploads/sample-images";

// The limits in lib/auth/rate-limit.ts, repeated so a loosened limit fails here.
const LIMITS = { signIn: 8, signUp: 40, passwordReset: 5, answers: 30, joinClass: 10, acceptInvitation: 40, sendInvitations: 30, photoUploads: 30 };

let app: RunningApp;
let mail: MailCatcher;

beforeAll(async () => {
  mail = await startMailCatcher();
  app = await startApp({ seed: false, env: { SMTP_URL: mail.smtpUrl } }).catch(async (error: unknown) => {
    await mail.stop();
    throw error;
  });
}, 90_000);

afterAll(async () => {
  await app?.stop();
  await mail?.stop();
});

/** A made-up client address per test, so each limit keyed by address starts full. */
const clientIp = () => `203.0.113.${crypto.randomInt(1, 254)}, 10.0.0.${crypto.randomInt(1, 254)}`;

type Options = { cookie?: string; ip?: string; body?: unknown; form?: FormData };

function send(method: string, path: string, { cookie, ip, body, form }: Options = {}): Promise<Response> {
  const headers: Record<string, string> = {};
  if (cookie) headers.cookie = cookie;
  if (ip) headers["x-forwarded-for"] = ip;
  if (body !== undefined) headers["content-type"] = "application/json";
  return fetch(`${app.url}${path}`, { method, headers, body: form ?? (body === undefined ? undefined : JSON.stringify(body)) });
}

/** The one shape of a refusal, whichever limit refused. */
async function expectRateLimited(res: Response): Promise<{ error: { code: string; message: string } }> {
  expect(res.status).toBe(429);
  const retryAfter = res.headers.get("retry-after");
  expect(retryAfter).toMatch(/^\d+$/);
  expect(Number(retryAfter)).toBeGreaterThan(0);
  const body = (await res.json()) as { error: { code: string; message: string } };
  expect(body.error.code).toBe("rate_limited");
  expect(body.error.message).toMatch(/^Too many tries\. Wait \d+ minutes? and try again\.$/);
  return body;
}

const person = (name: string, role: "student" | "instructor" = "student") => signedInPerson(app.url, app.databasePath, name, role);

const count = (model: "User" | "PasswordReset" | "EmailOutbox" | "Invitation" | "Enrollment" | "Upload" | "Attempt", where: Record<string, unknown> = {}) =>
  withDatabase(app.databasePath, (db) => (db.models[model] as unknown as { count: (o: object) => Promise<number> }).count({ where }));

/** The browser's sign-in: a CSRF token, then the credentials callback (JSON mode, as next-auth's client asks). */
async function signInPost(email: string, password: string, ip: string, as: "form" | "json" = "form"): Promise<Response> {
  const csrf = await fetch(`${app.url}/api/auth/csrf`);
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const cookie = csrf.headers
    .getSetCookie()
    .map((line) => line.split(";")[0])
    .join("; ");
  return fetch(`${app.url}/api/auth/callback/credentials`, {
    method: "POST",
    redirect: "manual",
    headers: { "content-type": as === "json" ? "application/json" : "application/x-www-form-urlencoded", cookie, "x-forwarded-for": ip },
    body: as === "json" ? JSON.stringify({ csrfToken, email, password, json: "true" }) : new URLSearchParams({ csrfToken, email, password, json: "true" }),
  });
}

describe("rate limits", () => {
  it("sign-in: tries per e-mail and address; the refusal is a 429 the sign-in form can read, and no session", async () => {
    const dana = await createPerson(app.databasePath, "Dana Reyes");
    const ip = clientIp();
    for (let i = 0; i < LIMITS.signIn; i++) {
      const res = await signInPost(dana.email, "not-the-password", ip);
      expect(res.status).toBe(401);
      expect(((await res.json()) as { url: string }).url).toContain("error=CredentialsSignin");
    }
    const refused = await signInPost(dana.email, FIXTURE_PASSWORD, ip);
    expect(refused.headers.getSetCookie().some((c) => c.includes("session-token"))).toBe(false);
    const body = (await expectRateLimited(refused)) as unknown as { url: string; error: { message: string } };
    // next-auth's client takes the message from the url's `error`, which the sign-in page shows.
    expect(new URL(body.url).searchParams.get("error")).toBe(body.error.message);
    // next-auth also takes the credentials as JSON: those tries are counted and refused alike.
    await expectRateLimited(await signInPost(dana.email, FIXTURE_PASSWORD, ip, "json"));
    // Another address (the school's other lab) is not locked out by this one.
    expect(await signInCookie(app.url, dana.email, FIXTURE_PASSWORD)).toBeTruthy();
  });

  it("sign-up: per address; the refused sign-up makes no account", async () => {
    const ip = clientIp();
    for (let i = 0; i < LIMITS.signUp; i++) expect((await send("POST", "/api/signup", { ip, body: {} })).status).toBe(400);
    const email = `late.signup.${crypto.randomBytes(3).toString("hex")}@example.com`;
    await expectRateLimited(await send("POST", "/api/signup", { ip, body: { name: "Ravi Joiner", email, password: "mitre-and-cope-77" } }));
    expect(await count("User", { email })).toBe(0);
  });

  it("password reset: per account address; the refused request stores no reset and queues no mail", async () => {
    const lee = await createPerson(app.databasePath, "Lee Sawyer");
    const ip = clientIp();
    for (let i = 0; i < LIMITS.passwordReset; i++) expect((await send("POST", "/api/password-reset", { ip, body: { email: lee.email } })).status).toBe(200);
    const resets = await count("PasswordReset", { userId: lee.id });
    const mails = await count("EmailOutbox", { toAddress: lee.email });
    expect(resets).toBeGreaterThan(0);
    await expectRateLimited(await send("POST", "/api/password-reset", { ip: clientIp(), body: { email: lee.email } }));
    expect(await count("PasswordReset", { userId: lee.id })).toBe(resets);
    expect(await count("EmailOutbox", { toAddress: lee.email })).toBe(mails);
  });

  it("practice answers: per learner; the refused try is not stored", async () => {
    const sam = await person("Sam Ortiz");
    const newProblem = async () => {
      const res = await send("POST", "/api/practice", { cookie: sam.cookie, body: { kind: "even-gap", level: 1 } });
      expect(res.status).toBe(201);
      return ((await res.json()) as { problem: { id: string; parts: { key: string }[] } }).problem;
    };
    const spent = await newProblem();
    const fresh = await newProblem();
    const answersFor = (problem: { parts: { key: string }[] }) => ({ answers: Object.fromEntries(problem.parts.map((p) => [p.key, "1"])) });
    const first = await send("POST", `/api/practice/${spent.id}/answers`, { cookie: sam.cookie, body: answersFor(spent) });
    expect(first.status).toBe(200);
    // The rest are spent on a problem that runs out of tries: those answers count too.
    for (let i = 1; i < LIMITS.answers; i++) await send("POST", `/api/practice/${spent.id}/answers`, { cookie: sam.cookie, body: answersFor(spent) });
    await expectRateLimited(await send("POST", `/api/practice/${fresh.id}/answers`, { cookie: sam.cookie, body: answersFor(fresh) }));
    expect(await count("Attempt", { problemId: fresh.id })).toBe(0);
  });

  it("assignment answers: the same budget per student; the refused try is not stored", async () => {
    const teacher = await createPerson(app.databasePath, "Morgan Plumb", "instructor");
    const kim = await person("Kim Baptiste");
    const classId = await createClass(app.databasePath, teacher.id, [kim.id]);
    const assignment = await createAssignment(app.databasePath, classId, {}, [{ kind: "even-gap", level: 1, problemCount: 2, points: 10 }]);
    const work = await send("GET", `/api/assignments/${assignment.id}/work`, { cookie: kim.cookie });
    expect(work.status).toBe(200);
    const problems = ((await work.json()) as { work: { problems: { id: string; parts: { key: string }[] }[] } }).work.problems;
    expect(problems.length).toBe(2);
    const [spent, fresh] = problems;
    const answersFor = (problem: { parts: { key: string }[] }) => ({ answers: Object.fromEntries(problem.parts.map((p) => [p.key, "1"])) });
    const path = (id: string) => `/api/assignments/${assignment.id}/problems/${id}/answers`;
    expect((await send("POST", path(spent.id), { cookie: kim.cookie, body: answersFor(spent) })).status).toBe(200);
    for (let i = 1; i < LIMITS.answers; i++) await send("POST", path(spent.id), { cookie: kim.cookie, body: answersFor(spent) });
    await expectRateLimited(await send("POST", path(fresh.id), { cookie: kim.cookie, body: answersFor(fresh) }));
    expect(await count("Attempt", { problemId: fresh.id })).toBe(0);
  });

  it("join by code: per student; the refused join (with the right code) enrols nobody", async () => {
    const teacher = await createPerson(app.databasePath, "Ana Truss", "instructor");
    const classId = await createClass(app.databasePath, teacher.id, []);
    const joinCode = await withDatabase(app.databasePath, async (db) => (await db.models.SchoolClass.findByPk(classId))!.joinCode);
    const jo = await person("Jo Lintel");
    for (let i = 0; i < LIMITS.joinClass; i++) expect((await send("POST", "/api/classes/join", { cookie: jo.cookie, body: { code: "ZZZZ9999" } })).status).toBe(404);
    await expectRateLimited(await send("POST", "/api/classes/join", { cookie: jo.cookie, body: { code: joinCode } }));
    expect(await count("Enrollment", { classId, studentId: jo.id })).toBe(0);
  });

  it("invitation accept: per address; the refused accept makes no account and leaves the invitation open", async () => {
    const teacher = await createPerson(app.databasePath, "Ruth Header", "instructor");
    const classId = await createClass(app.databasePath, teacher.id, []);
    const email = `invitee.${crypto.randomBytes(3).toString("hex")}@example.com`;
    const { token, tokenHash, expiresAt } = newInvitationToken();
    await withDatabase(app.databasePath, (db) => db.models.Invitation.create({ classId, email, tokenHash, expiresAt, invitedBy: teacher.id }));
    const ip = clientIp();
    const bogus = newInvitationToken().token;
    for (let i = 0; i < LIMITS.acceptInvitation; i++) expect((await send("POST", `/api/invitations/${bogus}/accept`, { ip, body: {} })).status).toBe(404);
    await expectRateLimited(await send("POST", `/api/invitations/${token}/accept`, { ip, body: { name: "Nell Header", password: "scribe-and-fit-21" } }));
    expect(await count("User", { email })).toBe(0);
    const invitation = await withDatabase(app.databasePath, (db) => db.models.Invitation.findOne({ where: { tokenHash }, raw: true }));
    expect(invitation?.acceptedAt).toBeNull();
    expect(await count("Enrollment", { classId })).toBe(0);
  });

  it("sending invitations: invites, resends and roster imports share one budget per instructor; refused sends write and mail nothing", async () => {
    const teacher = await person("Cass Joist", "instructor");
    const classId = await createClass(app.databasePath, teacher.id, []);
    const address = (label: string) => `${label}.${crypto.randomBytes(3).toString("hex")}@example.com`;
    const invite = () => send("POST", `/api/classes/${classId}/invitations`, { cookie: teacher.cookie, body: { addresses: address("crew") } });
    const importCsv = (dryRun: boolean) => send("POST", `/api/classes/${classId}/roster/import`, { cookie: teacher.cookie, body: { csv: `Name,Email\nPat Beam,${address("import")}`, dryRun } });

    const first = await invite();
    expect(first.status).toBe(201);
    const invitationId = await withDatabase(app.databasePath, async (db) => (await db.models.Invitation.findOne({ where: { classId }, raw: true }))!.id);
    expect((await send("POST", `/api/classes/${classId}/invitations/${invitationId}/resend`, { cookie: teacher.cookie })).status).toBe(200);
    expect((await importCsv(false)).status).toBe(201);
    for (let i = 3; i < LIMITS.sendInvitations; i++) expect((await invite()).status).toBe(201);

    const invitations = await count("Invitation", { classId });
    const mails = await count("EmailOutbox");
    await expectRateLimited(await invite());
    await expectRateLimited(await send("POST", `/api/classes/${classId}/invitations/${invitationId}/resend`, { cookie: teacher.cookie }));
    await expectRateLimited(await importCsv(false));
    // A preview sends nothing, so it is not counted.
    expect((await importCsv(true)).status).toBe(200);
    expect(await count("Invitation", { classId })).toBe(invitations);
    expect(await count("EmailOutbox")).toBe(mails);
  });

  it("photo uploads: per student; the refused photo is not stored", async () => {
    const teacher = await createPerson(app.databasePath, "Eli Rafter", "instructor");
    const noor = await person("Noor Scarf");
    const classId = await createClass(app.databasePath, teacher.id, [noor.id]);
    const assignment = await createAssignment(app.databasePath, classId, {}, [{ kind: "even-gap", level: 1, problemCount: 1, points: 10 }]);
    const photo = await cameraPhoto("jpeg", { width: 320, height: 240 });
    const photoForm = () => {
      const form = new FormData();
      form.append("photo", new Blob([new Uint8Array(photo)], { type: "image/jpeg" }), "IMG_0412.jpg");
      return form;
    };
    const path = `/api/assignments/${assignment.id}/uploads`;
    expect((await send("POST", path, { cookie: noor.cookie, form: photoForm() })).status).toBe(201);
    // The rest of the budget goes on empty posts: refused for their body, but counted first.
    for (let i = 1; i < LIMITS.photoUploads; i++) expect((await send("POST", path, { cookie: noor.cookie, form: new FormData() })).status).toBe(400);
    await expectRateLimited(await send("POST", path, { cookie: noor.cookie, form: photoForm() }));
    expect(await count("Upload", { studentId: noor.id })).toBe(1);
  });
});
