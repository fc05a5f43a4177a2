// Random request bodies against every route that takes one: whatever arrives, the answer is
// a refusal in the one error shape or a success, never a 500. It starts its own app because
// it spends the answer, sign-up and join limits far faster than a person would.
import fs from "node:fs";
import path from "node:path";
import fc from "fast-check";
import sharp from "sharp";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { startApp, type RunningApp } from "../support/app-server";
import { builderAssignmentBody, createAssignment, createClass, createPerson, FIXTURE_PASSWORD, withDatabase } from "../support/assignment-fixtures";
import { signInCookie } from "../support/http";

// Random bodies per route, plus the fixed hostile ones below: about three minutes for the whole
// file on a loaded two-core machine (FUZZ_BODY_RUNS changes the count).
const RUNS = Number(process.env.FUZZ_BODY_RUNS ?? 120);
const SLOW = { timeout: 300_000 };

// "visitor" is anonymous with next-auth's CSRF cookie, so its bodies get past the CSRF check.
type Who = "anonymous" | "visitor" | "student" | "instructor";
// `library` marks next-auth's own handler: it answers in its own shape, so only "no 500" is checked.
type RouteCase = { method: "POST" | "PUT" | "PATCH" | "DELETE"; path: string; who: Who; sample: Record<string, unknown>; runs?: number; library?: boolean };

let app: RunningApp;
const cookies: Record<Who, string> = { anonymous: "", visitor: "", student: "", instructor: "" };
let csrfToken = "";
let routes: RouteCase[] = [];
// Routes that ignore their body (or change what later routes need) run last and briefly.
let bodylessRoutes: RouteCase[] = [];

const DAY = 24 * 3600 * 1000;

beforeAll(async () => {
  app = await startApp({ seed: false, env: { ANSWERS_PER_MINUTE: "1000000" } });
  const file = app.databasePath;
  const instructor = await createPerson(file, "Dana Whitfield", "instructor");
  const coTeacher = await createPerson(file, "Omar Haddad", "instructor");
  const student = await createPerson(file, "Rosa Lindqvist");
  const classmate = await createPerson(file, "Eli Brandt");
  const shop = await createClass(file, instructor.id, [student.id, classmate.id]);
  const spare = await createClass(file, instructor.id, []);
  const item = { kind: "even-gap", level: 1 as const, problemCount: 2, points: 5 };
  const open = await createAssignment(file, shop, {}, [item]);
  const draft = await createAssignment(file, shop, { status: "draft" }, [item]);
  const doomed = await createAssignment(file, shop, { status: "draft" }, [item]);

  cookies.student = (await signInCookie(app.url, student.email, FIXTURE_PASSWORD))!;
  cookies.instructor = (await signInCookie(app.url, instructor.email, FIXTURE_PASSWORD))!;
  expect(cookies.student && cookies.instructor).toBeTruthy();
  const csrf = await fetch(`${app.url}/api/auth/csrf`);
  csrfToken = ((await csrf.json()) as { csrfToken: string }).csrfToken;
  cookies.visitor = csrf.headers.getSetCookie().map((line) => line.split(";")[0]).join("; ");

  const call = async (who: Who, url: string, init: RequestInit = {}) => {
    const res = await fetch(`${app.url}${url}`, { ...init, headers: { "content-type": "application/json", cookie: cookies[who], ...(init.headers ?? {}) } });
    expect(res.status, `${init.method ?? "GET"} ${url}`).toBeLessThan(300);
    return res.json();
  };
  const work = await call("student", `/api/assignments/${open.id}/work`);
  const assignmentProblem: string = work.work.problems[0].id;
  const practice = await call("student", "/api/practice", { method: "POST", body: JSON.stringify({ kind: "even-gap", level: 1 }) });
  const layout = await call("student", "/api/layouts", { method: "POST", body: JSON.stringify({ kind: "even-spacing", name: "Hall battens", params: "span=96" }) });
  await call("instructor", `/api/classes/${shop}/invitations`, { method: "POST", body: JSON.stringify({ addresses: "newcomer@fixtures.example" }) });
  const invitationId = await withDatabase(file, async (db) => (await db.models.Invitation.findOne({ where: { classId: shop } }))!.id);
  const photo = new FormData();
  const jpeg = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#8a6f4d" } }).jpeg().toBuffer();
  photo.append("photo", new Blob([new Uint8Array(jpeg)], { type: "image/jpeg" }), "joint.jpg");
  const upload = await fetch(`${app.url}/api/assignments/${open.id}/uploads`, { method: "POST", body: photo, headers: { cookie: cookies.student } });
  expect(upload.status).toBe(201);
  const uploadId: string = (await upload.json()).upload.id;

  const now = Date.now();
  const assignmentBody = builderAssignmentBody();
  const a = `/api/assignments/${open.id}`;
  const c = `/api/classes/${shop}`;
  routes = [
    { method: "POST", path: "/api/signup", who: "anonymous", sample: { name: "Jo Reyes", email: "jo.reyes@fixtures.example", password: "a-long-pass-phrase-9" } },
    { method: "POST", path: "/api/password-reset", who: "anonymous", sample: { email: student.email } },
    { method: "POST", path: "/api/password-reset/confirm", who: "anonymous", sample: { token: "x".repeat(43), password: "a-long-pass-phrase-9" } },
    { method: "POST", path: "/api/invitations/not-a-real-token/accept", who: "anonymous", sample: { name: "Jo Reyes", password: "a-long-pass-phrase-9" } },
    { method: "POST", path: "/api/layout/even-spacing", who: "anonymous", sample: { span: "128 3/4", memberWidth: "2 1/2", count: 6, endCondition: "members" } },
    { method: "POST", path: "/api/layout/guard-spacing", who: "anonymous", sample: { span: "72", balusterWidth: "1 1/2" } },
    { method: "POST", path: "/api/layout/stairs", who: "anonymous", sample: { totalRise: "94" } },
    { method: "POST", path: "/api/layout/measure", who: "anonymous", sample: { text: `1' 10 3/4"`, style: "feet-inches" } },
    { method: "POST", path: "/api/layout/cut-list", who: "anonymous", sample: { pieces: [{ label: "Rail", length: "24", quantity: 4 }], stock: [{ length: "96" }], kerf: "1/8" } },
    { method: "POST", path: "/api/layout/wall-grid", who: "anonymous", sample: { wallWidth: "128 3/4", wallHeight: "96", topRailWidth: "5 1/2", bottomRailWidth: "2 1/2", baseTrimHeight: "4", verticalWidth: "2 1/2", verticalCount: 6, rows: 0 } },
    { method: "POST", path: "/api/practice", who: "student", sample: { kind: "even-gap", level: 1 } },
    { method: "POST", path: `/api/practice/${practice.problem.id}/answers`, who: "student", sample: { answers: { gap: "3 1/4" }, timeMs: 2000 } },
    { method: "POST", path: `${a}/problems/${assignmentProblem}/answers`, who: "student", sample: { answers: { gap: "3 1/4" }, timeMs: 2000 } },
    { method: "POST", path: "/api/progress", who: "student", sample: { slug: "reading-a-tape", status: "opened" } },
    { method: "POST", path: "/api/layouts", who: "student", sample: { kind: "even-spacing", name: "Hall battens", params: "span=96" } },
    { method: "PATCH", path: `/api/layouts/${layout.layout.id}`, who: "student", sample: { name: "Hall, 1x4" } },
    { method: "POST", path: "/api/classes/join", who: "student", sample: { code: "K7PXM3QD" } },
    { method: "POST", path: `${a}/uploads`, who: "student", sample: { photo: "joint.jpg" } },
    { method: "PATCH", path: `/api/uploads/${uploadId}`, who: "instructor", sample: { comment: "Tight joint, well done." } },
    { method: "POST", path: "/api/classes", who: "instructor", sample: { name: "CARP 110 — Finish Carpentry I", term: "Spring 2027", sectionCode: "B", program: "Carpentry" } },
    { method: "PATCH", path: c, who: "instructor", sample: { name: "CARP 110 — Finish Carpentry I", term: "Spring 2027" } },
    { method: "POST", path: `${c}/assignments`, who: "instructor", sample: assignmentBody },
    { method: "PATCH", path: `/api/assignments/${draft.id}`, who: "instructor", sample: assignmentBody },
    { method: "POST", path: "/api/assignments/preview", who: "instructor", sample: { kind: "even-gap", level: 2, tolerance: "full", sample: 3 } },
    { method: "POST", path: `${a}/duplicate`, who: "instructor", sample: { classId: spare } },
    { method: "PUT", path: `${a}/extensions`, who: "instructor", sample: { studentId: student.id, dueAt: new Date(now + 9 * DAY).toISOString(), extraAttempts: 1, note: "Shop accident" } },
    { method: "POST", path: `${c}/gradebook/${open.id}/${student.id}/override`, who: "instructor", sample: { points: 4, reason: "Marks checked on the wall." } },
    { method: "POST", path: `${c}/co-instructors`, who: "instructor", sample: { email: coTeacher.email } },
    { method: "POST", path: `${c}/invitations`, who: "instructor", sample: { addresses: "a@fixtures.example, b@fixtures.example" } },
    { method: "POST", path: `${c}/roster/import`, who: "instructor", sample: { csv: "name,email\nJo Reyes,jo@fixtures.example\n", dryRun: true } },
  ];
  const few = 15;
  bodylessRoutes = [
    { method: "POST", path: `${c}/invitations/${invitationId}/resend`, who: "instructor", sample: {}, runs: few },
    { method: "POST", path: `${c}/join-code`, who: "instructor", sample: {}, runs: few },
    { method: "POST", path: `/api/assignments/${draft.id}/publish`, who: "instructor", sample: {}, runs: few },
    { method: "POST", path: `/api/assignments/${draft.id}/unpublish`, who: "instructor", sample: {}, runs: few },
    { method: "DELETE", path: `${a}/extensions/${student.id}`, who: "instructor", sample: {}, runs: few },
    { method: "DELETE", path: `${c}/co-instructors/${coTeacher.id}`, who: "instructor", sample: {}, runs: few },
    { method: "DELETE", path: `${c}/students/${classmate.id}`, who: "instructor", sample: {}, runs: few },
    { method: "POST", path: `${c}/students/${classmate.id}/restore`, who: "instructor", sample: {}, runs: few },
    { method: "POST", path: `${c}/invitations/${invitationId}/revoke`, who: "instructor", sample: {}, runs: few },
    { method: "DELETE", path: `/api/assignments/${doomed.id}`, who: "instructor", sample: {}, runs: few },
    { method: "DELETE", path: `/api/uploads/${uploadId}`, who: "student", sample: {}, runs: few },
    { method: "DELETE", path: `/api/layouts/${layout.layout.id}`, who: "student", sample: {}, runs: few },
    { method: "POST", path: `/api/classes/${spare}/archive`, who: "instructor", sample: {}, runs: few },
    { method: "POST", path: `/api/classes/${spare}/restore`, who: "instructor", sample: {}, runs: few },
    { method: "POST", path: "/api/auth/callback/credentials", who: "visitor", sample: { csrfToken, email: student.email, password: "wrong", callbackUrl: "/classes", json: "true" }, runs: 80, library: true },
    { method: "POST", path: "/api/auth/signin/credentials", who: "visitor", sample: { csrfToken, callbackUrl: "/classes", json: "true" }, runs: 40, library: true },
    { method: "POST", path: "/api/auth/signout", who: "visitor", sample: { csrfToken, callbackUrl: "/", json: "true" }, runs: 40, library: true },
  ];
}, 120_000);

afterAll(async () => {
  await app?.stop();
});

type Payload = { body: string | undefined; contentType: string | null; label: string };

const json = (value: unknown): string | undefined => {
  try {
    return JSON.stringify(value);
  } catch {
    return "{}";
  }
};

/** Values of the wrong kind, odd edges of the right kind, and anything at all. */
const oddValue = fc.oneof(
  fc.constantFrom("http://[", "%", "%E0%A4%A", "//evil.example", "javascript:alert(1)", "http://127.0.0.1:1/x", "\\\\evil"),
  fc.anything({ maxDepth: 3 }),
  fc.constantFrom(null, true, false, 0, -1, 1e308, -0, 2 ** 53 + 1, "", " ", "0", "-1", "NaN", "Infinity", "1e999", "__proto__", "constructor", "\u0000", "\ud800", "<script>alert(1)</script>", "=cmd|' /C calc'!A0", [], {}, [[[]]]),
  fc.string({ unit: "binary", maxLength: 300 }),
  fc.double(),
  fc.integer(),
);

function mutated(sample: Record<string, unknown>): fc.Arbitrary<Record<string, unknown>> {
  const keys = Object.keys(sample);
  if (keys.length === 0) return fc.dictionary(fc.string({ maxLength: 12 }), oddValue, { maxKeys: 4 });
  const fields = Object.fromEntries(keys.map((k) => [k, fc.oneof(fc.constant(sample[k]), oddValue)]));
  return fc
    .tuple(fc.record(fields, { requiredKeys: [] }), fc.dictionary(fc.string({ maxLength: 12 }), oddValue, { maxKeys: 2 }))
    .map(([known, extra]) => ({ ...extra, ...known }));
}

/** What a browser form posts: every field as text, the odd values included. */
const formEncoded = (sample: Record<string, unknown>) =>
  mutated(sample).map((value): Payload => ({
    body: new URLSearchParams(Object.entries(value).map(([k, v]) => [k, typeof v === "string" ? v : (json(v) ?? "")])).toString(),
    contentType: "application/x-www-form-urlencoded",
    label: "form",
  }));

function payloads(sample: Record<string, unknown>, library = false): fc.Arbitrary<Payload> {
  const asJson = (label: string) => (value: unknown): Payload => ({ body: json(value), contentType: "application/json", label });
  return fc.oneof(
    { weight: library ? 6 : 1, arbitrary: formEncoded(sample) },
    { weight: 4, arbitrary: mutated(sample).map(asJson("mutated")) },
    { weight: 2, arbitrary: fc.json({ maxDepth: 4 }).map((body) => ({ body, contentType: "application/json", label: "json" })) },
    { weight: 2, arbitrary: fc.anything({ maxDepth: 4 }).map(asJson("anything")) },
    { weight: 1, arbitrary: fc.string({ unit: "binary", maxLength: 200 }).map((body) => ({ body, contentType: "application/json", label: "text" })) },
    {
      weight: 1,
      arbitrary: fc
        .tuple(mutated(sample), fc.constantFrom("text/plain", "application/x-www-form-urlencoded", "multipart/form-data; boundary=xyz", "application/xml", null))
        .map(([value, contentType]) => ({ body: json(value), contentType, label: `as ${contentType}` })),
    },
  );
}

/** The same few hostile bodies for every route: nothing, huge, deep and not JSON. */
function hostile(sample: Record<string, unknown>): Payload[] {
  const huge = "9".repeat(2_000_000);
  const first = Object.keys(sample)[0] ?? "x";
  const j = (body: string, label: string): Payload => ({ body, contentType: "application/json", label });
  return [
    { body: undefined, contentType: null, label: "no body" },
    j("", "empty body"),
    j("null", "null"),
    j("[]", "array"),
    j("{", "cut off"),
    j(`{"${first}": "${huge}"}`, "2 MB field"),
    j(JSON.stringify({ ...sample, [first]: [huge] }), "2 MB in an array"),
    j("[".repeat(100_000) + "]".repeat(100_000), "deep arrays"),
    j('{"a":'.repeat(20_000) + "1" + "}".repeat(20_000), "deep objects"),
    j(JSON.stringify({ ...sample, __proto__: { admin: true }, constructor: { prototype: {} } }), "prototype keys"),
    { body: "\u00ff\u00fe<\u0000x\u0000>", contentType: "application/json; charset=utf-16", label: "wrong charset" },
    { body: json(sample), contentType: "text/plain", label: "sample as text/plain" },
  ];
}

let address = 0;

async function send(route: RouteCase, payload: Payload): Promise<void> {
  const headers: Record<string, string> = {
    cookie: cookies[route.who],
    // A fresh client address each time, so the per-address limits do not end the fuzzing early.
    "x-forwarded-for": `10.${(address >> 16) & 255}.${(address >> 8) & 255}.${address++ & 255}`,
  };
  if (payload.contentType) headers["content-type"] = payload.contentType;
  const res = await fetch(`${app.url}${route.path}`, { method: route.method, headers, body: payload.body });
  const text = await res.text();
  const what = `${route.method} ${route.path} with ${payload.label}: ${String(payload.body).slice(0, 300)} → ${res.status} ${text.slice(0, 300)}`;
  expect(res.status, what).toBeLessThan(500);
  if (res.status >= 400 && !route.library) {
    const body = JSON.parse(text) as { error?: { code?: unknown; message?: unknown; fields?: unknown } };
    expect(typeof body.error?.code, what).toBe("string");
    expect(typeof body.error?.message === "string" && body.error.message.trim().length > 0, what).toBe(true);
    if (body.error?.fields !== undefined) {
      for (const message of Object.values(body.error.fields as Record<string, unknown>)) expect(typeof message === "string" && message.length > 0, what).toBe(true);
    }
  }
}

async function fuzz(route: RouteCase) {
  for (const payload of hostile(route.sample)) await send(route, payload);
  await fc.assert(
    fc.asyncProperty(payloads(route.sample, route.library), (payload) => send(route, payload)),
    { numRuns: route.runs ?? RUNS },
  );
}

describe("random request bodies never cause a 500", SLOW, () => {
  it("on every route that takes a body", async () => {
    for (const route of routes) await fuzz(route);
  });

  it("on the routes that ignore their body, and next-auth's sign-in and sign-out", async () => {
    for (const route of bodylessRoutes) await fuzz(route);
  });

  it("checked every write route under app/api", () => {
    const root = path.join(process.cwd(), "app/api");
    const covered = new Set([...routes, ...bodylessRoutes].map((r) => `${r.method} ${shape(r.path)}`));
    const missing: string[] = [];
    for (const file of walk(root)) {
      const source = fs.readFileSync(file, "utf8");
      const folder = path.relative(root, path.dirname(file));
      // next-auth's catch-all re-exports one handler; its callback and sign-out are listed above.
      if (folder.startsWith("auth")) continue;
      for (const [, method] of source.matchAll(/export const (POST|PUT|PATCH|DELETE)\b/g)) {
        const key = `${method} ${shape(`/api/${folder}`)}`;
        if (!covered.has(key)) missing.push(key);
      }
    }
    expect(missing).toEqual([]);
  });
});

/** `/api/classes/12/students/7` and `/api/classes/[classId]/students/[studentId]` both become `/api/classes/:/students/:`. */
function shape(url: string): string {
  return url
    .split("/")
    .map((part) => (/^\[.+\]$/.test(part) || /^\d+$/.test(part) || /^[0-9a-f-]{16,}$/i.test(part) || part === "not-a-real-token" ? ":" : part))
    .join("/");
}

function walk(folder: string): string[] {
  return fs.readdirSync(folder, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(folder, entry.name);
    if (entry.isDirectory()) return walk(full);
    return entry.name === "route.ts" ? [full] : [];
  });
}
