// Who may call what: every route handler method and every page, for six principals, in two tables
// (tests/support/access-routes.ts, tests/support/access-pages.ts). A route, page or server action
// without a row fails here, so a new one cannot ship without someone deciding who may use it.
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { PAGES, type PageOutcome } from "../support/access-pages";
import { API_ROUTES, CROSS_CLASS, type RouteRow } from "../support/access-routes";
import { buildWorld, databaseChecksum, exportedRouteMethods, makeCast, pageKeys, PRINCIPALS, requester, serverActionFiles, type Cast, type Principal, type Requester, type World } from "../support/access-world";
import { startApp, type RunningApp } from "../support/app-server";
import { startMailCatcher, type MailCatcher } from "../support/mail-catcher";

/**
 * Server actions, by file: none exist yet. One that is added must get a row here that calls it as
 * each principal and states what each may do, like the route rows.
 */
const SERVER_ACTIONS: Record<string, (call: Requester, world: World) => Promise<void>> = {};

/** Routes whose allowed writes leave the fixtures' rows alone, so they may share one world. */
const SHARED_WORLD_WRITES = new Set([
  "POST /api/auth/[...nextauth]",
  "POST /api/layout/even-spacing",
  "POST /api/layout/guard-spacing",
  "POST /api/layout/stairs",
  "POST /api/layout/measure",
  "POST /api/layout/cut-list",
  "POST /api/layout/wall-grid",
  "POST /api/signup",
  "POST /api/password-reset",
  "POST /api/invitations/[token]/accept",
  "POST /api/practice",
  "POST /api/progress",
  "POST /api/layouts",
  "POST /api/classes",
  "POST /api/assignments/preview",
]);

let app: RunningApp;
let mail: MailCatcher;
let cast: Cast;
let world: World;
let call: Requester;

beforeAll(async () => {
  // Its own app and mail catcher: the matrix signs in and writes a great deal, and must not spend
  // the shared suite app's rate limits.
  mail = await startMailCatcher();
  app = await startApp({ seed: false, env: { SMTP_URL: mail.smtpUrl, RATE_LIMIT_SCALE: "100" } }).catch(async (error: unknown) => {
    await mail.stop();
    throw error;
  });
  cast = await makeCast(app.url, app.databasePath);
  call = requester(app.url, cast);
  world = await buildWorld(app.url, app.databasePath, cast);
}, 120_000);

afterAll(async () => {
  await app?.stop();
  await mail?.stop();
});

const methodOf = (key: string) => key.split(" ")[0];
const isRead = (key: string) => methodOf(key) === "GET";
const refused = (status: number) => status >= 400;

/** What the target's owners are called: a refusal must not carry any of it to someone else. */
function targetWords(who: Principal): string[] {
  const people = (["student", "otherStudent", "instructor", "otherInstructor", "admin"] as const).filter((p) => p !== who).map((p) => cast[p]);
  return [...people.flatMap((p) => [p.name, p.email]), cast.coTeacher.email, cast.removed.email, world.classAName, world.assignmentATitle, world.invitedEmailA, world.problemA, world.uploadA];
}

async function request(key: string, row: RouteRow, who: Principal, on: World) {
  const ctx = { world: on, cast, who, secret: app.secret };
  const body = row.body ? await row.body(ctx) : undefined;
  const res = await call(who, row.url(ctx), { method: methodOf(key), body });
  return { res, text: await res.text(), ctx };
}

/** A refusal is the one error shape and nothing else: no ids, names, e-mails or answers of the target. */
function expectBareRefusal(label: string, text: string, allowed: string[], who: Principal) {
  let body: unknown;
  expect(() => (body = JSON.parse(text)), `${label}: a refusal is JSON`).not.toThrow();
  expect(Object.keys(body as object), `${label}: only { error }`).toEqual(["error"]);
  const error = (body as { error: Record<string, unknown> }).error;
  expect(Object.keys(error).filter((k) => !["code", "message", "fields"].includes(k)), `${label}: error keys`).toEqual([]);
  for (const word of targetWords(who).filter((w) => !allowed.includes(w))) expect(text, `${label} names ${word}`).not.toContain(word);
}

describe("the access matrix covers everything", () => {
  it("has a row for every exported route method, and no row for a route that is gone", () => {
    const onDisk = exportedRouteMethods();
    const missing = onDisk.filter((k) => !(k in API_ROUTES));
    const stale = Object.keys(API_ROUTES).filter((k) => !onDisk.includes(k));
    expect(missing, `add a row to tests/support/access-routes.ts for: ${missing.join(", ")}`).toEqual([]);
    expect(stale, `these rows name routes that no longer exist: ${stale.join(", ")}`).toEqual([]);
    // The discovery itself must find what is there, or the check above could pass on nothing.
    expect(onDisk).toContain("GET /api/auth/[...nextauth]");
    expect(onDisk).toContain("GET /api/health");
    expect(onDisk.length).toBeGreaterThan(70);
  });

  it("has a row for every server action file", () => {
    const files = serverActionFiles();
    const missing = files.filter((f) => !(f in SERVER_ACTIONS));
    expect(missing, `add a row to SERVER_ACTIONS in this file for: ${missing.join(", ")}`).toEqual([]);
    expect(Object.keys(SERVER_ACTIONS).filter((f) => !files.includes(f)), "rows for files without server actions").toEqual([]);
  });

  it("has a row for every page", () => {
    const onDisk = pageKeys();
    const missing = onDisk.filter((k) => !(k in PAGES));
    const stale = Object.keys(PAGES).filter((k) => !onDisk.includes(k));
    expect(missing, `add a row to tests/support/access-pages.ts for: ${missing.join(", ")}`).toEqual([]);
    expect(stale, `these rows name pages that no longer exist: ${stale.join(", ")}`).toEqual([]);
    expect(onDisk).toContain("/");
    expect(onDisk).toContain("/classes/[classId]/assignments/[assignmentId]/students/[studentId]");
  });
});

describe("the access matrix holds", () => {
  it("answers every read with the table's status, and refuses with the bare error shape", async () => {
    const wrong: string[] = [];
    for (const [key, row] of Object.entries(API_ROUTES).filter(([k]) => isRead(k))) {
      for (const who of PRINCIPALS) {
        const { res, text, ctx } = await request(key, row, who, world);
        const label = `${key} as ${who}`;
        if (res.status !== row.expect[who]) wrong.push(`${label}: ${res.status}, the table says ${row.expect[who]} (${text.slice(0, 160)})`);
        else if (refused(res.status)) expectBareRefusal(label, text, row.mayName?.(ctx) ?? [], who);
      }
    }
    expect(wrong).toEqual([]);
  }, 300_000);

  it("shows every page to whom the table says, and sends the others to sign in, the 403 page or the 404 page", async () => {
    const wrong: string[] = [];
    for (const [key, row] of Object.entries(PAGES)) {
      for (const who of PRINCIPALS) {
        const res = await call(who, row.url({ world, cast }));
        const location = res.headers.get("location") ?? "";
        const outcome: PageOutcome | number | string = res.status >= 300 && res.status < 400 ? (/^(https?:\/\/[^/]+)?\/signin\b/.test(location) ? "signin" : /^(https?:\/\/[^/]+)?\/$/.test(location) ? "home" : `redirect ${location}`) : res.status;
        const html = await res.text();
        if (outcome !== row.expect[who]) wrong.push(`${key} as ${who}: ${outcome}, the table says ${row.expect[who]}`);
        // A refused page shows none of the class's people or work.
        else if (outcome !== 200) for (const word of targetWords(who)) if (html.includes(word)) wrong.push(`${key} as ${who} shows ${word}`);
      }
    }
    expect(wrong).toEqual([]);
  }, 300_000);

  it("refuses every write the table refuses, with the bare error shape, and the database is unchanged after them all", async () => {
    const before = await databaseChecksum(app.databasePath);
    const wrong: string[] = [];
    let refusals = 0;
    for (const [key, row] of Object.entries(API_ROUTES).filter(([k]) => !isRead(k))) {
      for (const who of PRINCIPALS.filter((p) => refused(row.expect[p]))) {
        const { res, text, ctx } = await request(key, row, who, world);
        const label = `${key} as ${who}`;
        refusals++;
        if (res.status !== row.expect[who]) wrong.push(`${label}: ${res.status}, the table says ${row.expect[who]} (${text.slice(0, 160)})`);
        else expectBareRefusal(label, text, row.mayName?.(ctx) ?? [], who);
      }
    }
    expect(wrong).toEqual([]);
    expect(await databaseChecksum(app.databasePath), "a refused write changed the database").toBe(before);
    expect(refusals).toBeGreaterThan(120);
  }, 300_000);

  it("refuses class A's instructor what belongs to class B, reached through class A's routes, and changes nothing", async () => {
    const before = await databaseChecksum(app.databasePath);
    const wrong: string[] = [];
    for (const row of CROSS_CLASS) {
      const res = await call("instructor", row.url(world, cast), { method: row.method, body: row.body?.(world, cast) });
      const text = await res.text();
      if (res.status !== row.status) wrong.push(`${row.what}: ${res.status}, expected ${row.status} (${text.slice(0, 160)})`);
      else if (!refused(res.status)) expect(JSON.parse(text), row.what).toEqual(row.reply);
      else expectBareRefusal(row.what, text, [cast.instructor.name, cast.instructor.email], "instructor");
    }
    expect(wrong).toEqual([]);
    expect(await databaseChecksum(app.databasePath), "a refused write changed the database").toBe(before);
  }, 120_000);

  it("lets every allowed write through, with the very bodies the refused calls sent", async () => {
    const wrong: string[] = [];
    for (const [key, row] of Object.entries(API_ROUTES).filter(([k]) => !isRead(k))) {
      for (const who of PRINCIPALS.filter((p) => !refused(row.expect[p]))) {
        // Each allowed write acts on its own copy of the fixtures, so none depends on another's leftovers.
        const on = SHARED_WORLD_WRITES.has(key) ? world : await buildWorld(app.url, app.databasePath, cast);
        const { res, text } = await request(key, row, who, on);
        if (res.status !== row.expect[who]) wrong.push(`${key} as ${who}: ${res.status}, the table says ${row.expect[who]} (${text.slice(0, 160)})`);
      }
    }
    expect(wrong).toEqual([]);
  }, 600_000);
});
