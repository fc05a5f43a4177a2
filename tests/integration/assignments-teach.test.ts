import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase, type Database } from "@/lib/db";
import { DEMO_PASSWORD, DEMO_STAFF } from "@/seeders/demo";
import { builderAssignmentBody } from "../support/assignment-fixtures";
import { signInCookie } from "../support/http";
import { caughtMail, waitForMail } from "../support/mail-catcher";

// The instructor's side of assignments over real HTTP against the built app, with a real SQLite
// file and maildev. Every account and class here is made by this file, so no other test's data moves.

const baseURL = inject("baseURL");
const mailURL = inject("mailURL");
const run = crypto.randomBytes(4).toString("hex");
const PASSWORD = "shop-floor-layout-42";
const DAY = 24 * 60 * 60 * 1000;
// Sign-ups are rate-limited per address; this file's own address keeps it out of other files' budget.
const SIGNUP_ADDRESS = `10.66.${crypto.randomInt(0, 255)}.${crypto.randomInt(1, 254)}`;

type Api = (path: string, init?: { method?: string; body?: unknown }) => Promise<Response>;

function apiAs(cookie: string | null): Api {
  return (path, init = {}) =>
    fetch(`${baseURL}${path}`, {
      method: init.method ?? (init.body === undefined ? "GET" : "POST"),
      headers: { "content-type": "application/json", ...(cookie ? { cookie } : {}) },
      body: init.body === undefined ? undefined : JSON.stringify(init.body),
    });
}

let database: Database;
const people: Record<"lead" | "outsider" | "active" | "invited" | "removed" | "accommodated" | "elsewhere", { id: number; email: string }> = {} as never;
const classes: Record<"shop" | "evening" | "outsiders", number> = {} as never;
let lead: Api;
let outsider: Api;
let student: Api;
const anonymous = apiAs(null);

async function makeStaff(name: string, email: string) {
  const user = await database.models.User.create({ name, email, role: "instructor", passwordHash: await bcrypt.hash(PASSWORD, 10) });
  return { id: user.id, email };
}

async function signUp(name: string, email: string) {
  const res = await fetch(`${baseURL}/api/signup`, {
    method: "POST",
    headers: { "content-type": "application/json", "x-forwarded-for": SIGNUP_ADDRESS },
    body: JSON.stringify({ name, email, password: PASSWORD }),
  });
  expect(res.status).toBe(201);
  return { id: (await res.json()).user.id as number, email };
}

async function makeClass(name: string, instructorId: number) {
  const row = await database.models.SchoolClass.create({ name, term: "Fall 2027", joinCode: `T${crypto.randomBytes(4).toString("hex").toUpperCase()}`.slice(0, 10), instructorId });
  return row.id;
}

const body = builderAssignmentBody;

beforeAll(async () => {
  database = openDatabase(inject("databasePath"));
  people.lead = await makeStaff("Teodora Vance", `teach-lead-${run}@shop.example`);
  people.outsider = await makeStaff("Ruben Achterberg", `teach-outsider-${run}@shop.example`);
  classes.shop = await makeClass(`CARP 120 — Stair Layout ${run}`, people.lead.id);
  classes.evening = await makeClass(`CARP 120E — Evening ${run}`, people.lead.id);
  classes.outsiders = await makeClass(`CARP 210 — Cabinets ${run}`, people.outsider.id);
  people.active = await signUp("Ines Albright", `teach-active-${run}@shop.example`);
  people.invited = await signUp("Oskar Pell", `teach-invited-${run}@shop.example`);
  people.removed = await signUp("Wanda Klee", `teach-removed-${run}@shop.example`);
  people.accommodated = await signUp("Milo Ferrante", `teach-accommodated-${run}@shop.example`);
  people.elsewhere = await signUp("Priya Nandakumar", `teach-elsewhere-${run}@shop.example`);
  await database.models.Enrollment.bulkCreate([
    { classId: classes.shop, studentId: people.active.id, status: "active" },
    { classId: classes.shop, studentId: people.invited.id, status: "invited" },
    { classId: classes.shop, studentId: people.removed.id, status: "removed" },
    { classId: classes.shop, studentId: people.accommodated.id, status: "active" },
    { classId: classes.outsiders, studentId: people.elsewhere.id, status: "active" },
  ]);
  lead = apiAs(await signInCookie(baseURL, people.lead.email, PASSWORD));
  outsider = apiAs(await signInCookie(baseURL, people.outsider.email, PASSWORD));
  student = apiAs(await signInCookie(baseURL, people.active.email, PASSWORD));
});

afterAll(async () => {
  await database?.sequelize.close();
});

async function create(overrides: Record<string, unknown> = {}, classId = classes.shop) {
  const res = await lead(`/api/classes/${classId}/assignments`, { body: body(overrides) });
  expect(res.status).toBe(201);
  return (await res.json()).assignment as { id: number; [key: string]: unknown };
}

const mailTo = async (email: string) => (await caughtMail(mailURL)).filter((m) => m.to.some((t) => t.address.toLowerCase() === email.toLowerCase()));

describe("building, publishing and changing an assignment", () => {
  it("creates a draft in the class and lists it with its items and points", async () => {
    const created = await create({ items: [{ kind: "even-gap", level: 1, problemCount: 2, tolerance: "half", points: 5 }, { kind: "stair-risers", level: 2, problemCount: 1, tolerance: "full", points: 10 }] });
    expect(created).toMatchObject({ classId: classes.shop, status: "draft", publishedAt: null, locked: false, itemCount: 2, problemCount: 3, totalPoints: 20, activeStudents: 2 });
    expect(created.items).toMatchObject([
      { position: 1, kind: "even-gap", level: 1, levelLabel: "Eighths" },
      { position: 2, kind: "stair-risers", level: 2, tolerance: "full", points: 10 },
    ]);

    const list = await (await lead(`/api/classes/${classes.shop}/assignments`)).json();
    expect(list.klass).toMatchObject({ id: classes.shop, activeStudents: 2 });
    expect(list.assignments).toContainEqual(expect.objectContaining({ id: created.id, status: "draft", itemCount: 2, totalPoints: 20 }));
  });

  it("refuses a bad body with a message per field and writes nothing", async () => {
    const before = await database.models.Assignment.count();
    const res = await lead(`/api/classes/${classes.shop}/assignments`, { body: body({ title: " ", items: [], latePolicy: "until", lateUntil: null }) });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(error.code).toBe("bad_request");
    expect(error.fields).toMatchObject({ title: "Give the assignment a title.", items: "Add at least one item of problems.", lateUntil: "Say until when late work is taken." });

    const unknownKind = await lead(`/api/classes/${classes.shop}/assignments`, { body: body({ items: [{ kind: "crown-moulding", level: 1, problemCount: 1, tolerance: "half", points: 1 }] }) });
    expect(unknownKind.status).toBe(400);
    expect((await unknownKind.json()).error.fields).toEqual({ "items.0.kind": "Choose a problem kind from the list." });
    expect(await database.models.Assignment.count()).toBe(before);
  });

  it("updates everything in a draft, publishes it, and e-mails the active students only", async () => {
    const draft = await create();
    const updated = await lead(`/api/assignments/${draft.id}`, {
      method: "PATCH",
      body: body({ title: "Battens, second pass", attemptsAllowed: 2, items: [{ kind: "mark-position", level: 2, problemCount: 3, tolerance: "half", points: 4 }] }),
    });
    expect(updated.status).toBe(200);
    expect((await updated.json()).assignment).toMatchObject({ title: "Battens, second pass", attemptsAllowed: 2, totalPoints: 12, items: [{ kind: "mark-position", problemCount: 3 }] });

    const published = await lead(`/api/assignments/${draft.id}/publish`, { body: {} });
    expect(published.status).toBe(200);
    const result = await published.json();
    expect(result.emailed).toBe(2);
    expect(result.assignment).toMatchObject({ status: "published", locked: true });

    const mail = await waitForMail(mailURL, people.active.email, /Battens, second pass/);
    expect(mail.text).toContain(`${baseURL}/my-classes/${classes.shop}/assignments/${draft.id}`);
    expect(mail.text).toMatch(/due \w+day, \w+ \d+, \d{4}, \d+:\d\d [AP]M UTC/);
    expect(mail.html).toContain("Open the assignment");
    await waitForMail(mailURL, people.accommodated.email, /Battens, second pass/);
    expect(await mailTo(people.invited.email)).toEqual([]);
    expect(await mailTo(people.removed.email)).toEqual([]);

    // Publishing again (or after unpublishing) never mails a student twice.
    expect((await (await lead(`/api/assignments/${draft.id}/publish`, { body: {} })).json()).emailed).toBe(0);
    expect((await lead(`/api/assignments/${draft.id}/unpublish`, { body: {} })).status).toBe(200);
    const again = await (await lead(`/api/assignments/${draft.id}/publish`, { body: {} })).json();
    expect(again).toMatchObject({ emailed: 0, assignment: { status: "published" } });
    await new Promise((r) => setTimeout(r, 1500));
    expect(await mailTo(people.active.email)).toHaveLength(1);
  });

  it("refuses to publish an assignment whose due date has passed", async () => {
    const late = await create({ opensAt: new Date(Date.now() - 5 * DAY).toISOString(), dueAt: new Date(Date.now() - DAY).toISOString(), latePenaltyPercent: 5 });
    const res = await lead(`/api/assignments/${late.id}/publish`, { body: {} });
    expect(res.status).toBe(400);
    const { error } = await res.json();
    expect(error.message).toMatch(/due date has passed/);
    expect(error.fields.dueAt).toBeTruthy();
    expect((await (await lead(`/api/assignments/${late.id}`)).json()).assignment.status).toBe("draft");
  });

  it("locks items and tries once published, even after unpublishing, but keeps the wording and dates editable", async () => {
    const a = await create();
    await lead(`/api/assignments/${a.id}/publish`, { body: {} });

    const moreItems = await lead(`/api/assignments/${a.id}`, { method: "PATCH", body: body({ items: [{ kind: "even-gap", level: 1, problemCount: 3, tolerance: "half", points: 5 }] }) });
    expect(moreItems.status).toBe(400);
    expect((await moreItems.json()).error.fields.items).toMatch(/problems are fixed/);
    const moreTries = await lead(`/api/assignments/${a.id}`, { method: "PATCH", body: body({ attemptsAllowed: 5 }) });
    expect(moreTries.status).toBe(400);
    expect((await moreTries.json()).error.fields.attemptsAllowed).toMatch(/fixed once an assignment has been published/);

    const newDue = new Date(Date.now() + 10 * DAY).toISOString();
    const reworded = await lead(`/api/assignments/${a.id}`, { method: "PATCH", body: body({ title: "Battens (due moved)", dueAt: newDue, latePolicy: "none", latePenaltyPercent: null, reveal: "after-due" }) });
    expect(reworded.status).toBe(200);
    expect((await reworded.json()).assignment).toMatchObject({ title: "Battens (due moved)", dueAt: newDue, latePolicy: "none", reveal: "after-due", status: "published" });

    await lead(`/api/assignments/${a.id}/unpublish`, { body: {} });
    const stillLocked = await lead(`/api/assignments/${a.id}`, { method: "PATCH", body: body({ attemptsAllowed: 1 }) });
    expect(stillLocked.status).toBe(400);

    const removed = await lead(`/api/assignments/${a.id}`, { method: "DELETE" });
    expect(removed.status).toBe(409);
    expect((await removed.json()).error.message).toMatch(/published assignment cannot be deleted/);
    expect((await lead(`/api/assignments/${a.id}`)).status).toBe(200);
  });

  it("duplicates into another class the instructor teaches as a draft copy, and deletes that draft", async () => {
    const source = await create({ title: "Stair layout", items: [{ kind: "stair-risers", level: 3, problemCount: 2, tolerance: "full", points: 6 }] });
    await lead(`/api/assignments/${source.id}/publish`, { body: {} });

    const copied = await lead(`/api/assignments/${source.id}/duplicate`, { body: { classId: classes.evening } });
    expect(copied.status).toBe(201);
    const copy = (await copied.json()).assignment;
    expect(copy).toMatchObject({ classId: classes.evening, title: "Stair layout (copy)", status: "draft", publishedAt: null, dueAt: source.dueAt, opensAt: source.opensAt, attemptsAllowed: 3 });
    expect(copy.items).toMatchObject([{ kind: "stair-risers", level: 3, problemCount: 2, tolerance: "full", points: 6 }]);

    expect((await lead(`/api/assignments/${source.id}/duplicate`, { body: { classId: classes.outsiders } })).status).toBe(403);
    expect((await lead(`/api/assignments/${source.id}/duplicate`, { body: { classId: 987654 } })).status).toBe(404);
    const badTarget = await lead(`/api/assignments/${source.id}/duplicate`, { body: { classId: "the evening one" } });
    expect(badTarget.status).toBe(400);
    expect((await badTarget.json()).error.fields.classId).toBeTruthy();

    expect((await lead(`/api/assignments/${copy.id}`, { method: "DELETE" })).status).toBe(204);
    expect((await lead(`/api/assignments/${copy.id}`)).status).toBe(404);
    expect(await database.models.AssignmentItem.count({ where: { assignmentId: copy.id } })).toBe(0);
  });
});

describe("extensions", () => {
  it("raise tries on the student's open problems only, and removing one never takes back a started problem's tries", async () => {
    const a = await create({ attemptsAllowed: 3, items: [{ kind: "even-gap", level: 1, problemCount: 3, tolerance: "half", points: 5 }] });
    await lead(`/api/assignments/${a.id}/publish`, { body: {} });
    const itemId = (a.items as { id: number }[])[0].id;
    const problem = (userId: number, variant: number, status: "open" | "solved" | "failed", attemptsUsed: number) => ({
      id: crypto.randomUUID(),
      userId,
      visitorId: null,
      assignmentItemId: itemId,
      variant,
      kind: "even-gap",
      level: 1,
      seed: 1000 + variant,
      attemptsAllowed: 3,
      attemptsUsed,
      status,
    });
    const rows = {
      fresh: problem(people.accommodated.id, 1, "open", 0),
      started: problem(people.accommodated.id, 2, "open", 2),
      solved: problem(people.accommodated.id, 3, "solved", 1),
      neighbour: problem(people.active.id, 1, "open", 0),
    };
    await database.models.PracticeProblem.bulkCreate(Object.values(rows));
    const allowed = async () => {
      const found = await database.models.PracticeProblem.findAll({ where: { id: Object.values(rows).map((r) => r.id) }, raw: true });
      const byId = new Map(found.map((r) => [r.id, r.attemptsAllowed]));
      return Object.fromEntries(Object.entries(rows).map(([name, r]) => [name, byId.get(r.id)]));
    };

    const newDue = new Date(Date.now() + 12 * DAY).toISOString();
    const granted = await lead(`/api/assignments/${a.id}/extensions`, { method: "PUT", body: { studentId: people.accommodated.id, dueAt: newDue, extraAttempts: 2, note: "Shop accident, hand in a splint" } });
    expect(granted.status).toBe(200);
    expect((await granted.json()).extension).toMatchObject({ studentId: people.accommodated.id, studentName: "Milo Ferrante", dueAt: newDue, extraAttempts: 2, note: "Shop accident, hand in a splint", grantedByName: "Teodora Vance" });
    expect(await allowed()).toEqual({ fresh: 5, started: 5, solved: 3, neighbour: 3 });

    // Fewer extra tries: only the problem not yet started gives them back.
    expect((await lead(`/api/assignments/${a.id}/extensions`, { method: "PUT", body: { studentId: people.accommodated.id, dueAt: null, extraAttempts: 1, note: null } })).status).toBe(200);
    expect(await allowed()).toEqual({ fresh: 4, started: 5, solved: 3, neighbour: 3 });

    const list = await (await lead(`/api/assignments/${a.id}/extensions`)).json();
    expect(list.extensions).toEqual([expect.objectContaining({ studentId: people.accommodated.id, dueAt: null, extraAttempts: 1, note: null })]);

    expect((await lead(`/api/assignments/${a.id}/extensions/${people.accommodated.id}`, { method: "DELETE" })).status).toBe(204);
    expect(await allowed()).toEqual({ fresh: 3, started: 5, solved: 3, neighbour: 3 });
    expect((await (await lead(`/api/assignments/${a.id}/extensions`)).json()).extensions).toEqual([]);
    expect((await lead(`/api/assignments/${a.id}/extensions/${people.accommodated.id}`, { method: "DELETE" })).status).toBe(404);
  });

  it("are only for students on the roster, and need a new date or extra tries", async () => {
    const a = await create();
    const put = (b: unknown) => lead(`/api/assignments/${a.id}/extensions`, { method: "PUT", body: b });
    for (const studentId of [people.removed.id, people.elsewhere.id]) {
      const res = await put({ studentId, extraAttempts: 1 });
      expect(res.status).toBe(400);
      expect((await res.json()).error.fields).toEqual({ studentId: "Choose a student from the class roster." });
    }
    const empty = await put({ studentId: people.active.id, dueAt: null, extraAttempts: 0 });
    expect(empty.status).toBe(400);
    expect((await empty.json()).error.fields.dueAt).toMatch(/new due date, extra tries, or both/);
    const tooMany = await put({ studentId: people.active.id, extraAttempts: 50 });
    expect((await tooMany.json()).error.fields.extraAttempts).toMatch(/At most 10 extra tries/);
    expect(await database.models.AssignmentExtension.count({ where: { assignmentId: a.id } })).toBe(0);
  });
});

describe("sample preview", () => {
  it("shows the instructor one sample with its answers, the same for the same counter", async () => {
    const ask = (sample: number) => lead("/api/assignments/preview", { body: { kind: "even-gap", level: 2, tolerance: "full", sample } });
    const first = (await (await ask(0)).json()).preview;
    expect(first).toMatchObject({ kind: "even-gap", level: 2, levelLabel: "Sixteenths", sample: 0 });
    expect(first.promptHtml).toMatch(/^<p>.+wall/);
    expect(first.parts.map((p: { key: string }) => p.key)).toEqual(["total", "free", "spaces", "gap"]);
    expect(first.parts.find((p: { key: string }) => p.key === "gap")).toMatchObject({ accepts: 'within ±1/16"', expected: expect.stringMatching(/"/) });
    expect(first.parts.find((p: { key: string }) => p.key === "spaces").accepts).toBe("exact count");
    expect(first.stepsHtml.length).toBeGreaterThan(1);
    expect(first.stepsHtml.join("")).toContain('class="katex"');
    expect((await (await ask(0)).json()).preview.promptHtml).toBe(first.promptHtml);
    expect((await (await ask(1)).json()).preview.promptHtml).not.toBe(first.promptHtml);

    const bad = await lead("/api/assignments/preview", { body: { kind: "crown-moulding", level: 1 } });
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields).toEqual({ kind: "Choose a problem kind from the list." });
  });
});

describe("who may do what", () => {
  it("anonymous visitors get 401, students 403, and another class's instructor 403 on every route", async () => {
    const a = await create();
    const s = people.accommodated.id;
    const routes: [string, string, unknown?][] = [
      ["GET", `/api/classes/${classes.shop}/assignments`],
      ["POST", `/api/classes/${classes.shop}/assignments`, body()],
      ["GET", `/api/assignments/${a.id}`],
      ["PATCH", `/api/assignments/${a.id}`, body({ title: "Taken over" })],
      ["DELETE", `/api/assignments/${a.id}`],
      ["POST", `/api/assignments/${a.id}/publish`, {}],
      ["POST", `/api/assignments/${a.id}/unpublish`, {}],
      ["POST", `/api/assignments/${a.id}/duplicate`, { classId: classes.outsiders }],
      ["GET", `/api/assignments/${a.id}/extensions`],
      ["PUT", `/api/assignments/${a.id}/extensions`, { studentId: s, extraAttempts: 3 }],
      ["DELETE", `/api/assignments/${a.id}/extensions/${s}`],
    ];
    for (const [method, path, b] of routes) {
      expect((await anonymous(path, { method, body: b })).status, `${method} ${path} anonymous`).toBe(401);
      expect((await student(path, { method, body: b })).status, `${method} ${path} student`).toBe(403);
      expect((await outsider(path, { method, body: b })).status, `${method} ${path} other instructor`).toBe(403);
    }
    expect((await anonymous("/api/assignments/preview", { body: { kind: "even-gap", level: 1 } })).status).toBe(401);
    expect((await student("/api/assignments/preview", { body: { kind: "even-gap", level: 1 } })).status).toBe(403);

    // Nothing of the refused calls landed.
    const after = await (await lead(`/api/assignments/${a.id}`)).json();
    expect(after.assignment).toMatchObject({ title: "Battens on the hallway wall", status: "draft" });
    expect(await database.models.Assignment.count({ where: { classId: classes.outsiders } })).toBe(0);
  });

  it("lets an admin manage any class's assignment", async () => {
    const a = await create();
    const admin = apiAs(await signInCookie(baseURL, DEMO_STAFF[2].email, DEMO_PASSWORD));
    expect((await admin(`/api/assignments/${a.id}`)).status).toBe(200);
    expect((await admin(`/api/classes/${classes.shop}/assignments`)).status).toBe(200);
  });
});
