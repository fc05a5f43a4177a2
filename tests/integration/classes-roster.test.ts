import crypto from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { call, createClass, enroll, makePerson, withDb, type Person } from "./classes-helpers";

type Roster = { roster: { name: string; email: string; status: string }[]; counts: Record<string, number>; page: number; pageCount: number; total: number };

let lead: Person;
let klass: { id: number; joinCode: string; name: string };

const join = (who: Person, code: string) => call<{ classId?: number; alreadyIn?: boolean; error?: { message: string; fields?: Record<string, string> } }>("POST", "/api/classes/join", { cookie: who.cookie, body: { code } });

beforeAll(async () => {
  lead = await makePerson("instructor", "rosterlead");
  klass = await createClass(lead);
});

describe("joining with the class code", () => {
  it("enrols a student however they type the code, once", async () => {
    const student = await makePerson("student", "joiner");
    const typed = `${klass.joinCode.slice(0, 4).toLowerCase()}-${klass.joinCode.slice(4).toLowerCase()}`;
    const first = await join(student, typed);
    expect(first.status).toBe(200);
    expect(first.body).toMatchObject({ classId: klass.id, alreadyIn: false });
    expect((await join(student, klass.joinCode)).body.alreadyIn).toBe(true);
    expect((await call<string>("GET", "/my-classes", { cookie: student.cookie })).body).toContain(klass.name);
  });

  it("answers a wrong code with 404 and an empty or malformed one with 400 naming the field", async () => {
    const student = await makePerson("student", "guesser");
    const wrong = await join(student, "ZZZZ2222");
    expect(wrong.status).toBe(404);
    expect(wrong.body.error!.message).toMatch(/No open class has that code/);
    const empty = await join(student, "  ");
    expect(empty.status).toBe(400);
    expect(empty.body.error!.fields!.code).toMatch(/Enter the join code/);
    expect((await join(student, "K7P#M3QD")).status).toBe(400);
    expect((await call("POST", "/api/classes/join", { body: { code: klass.joinCode } })).status).toBe(401);
    expect((await join(lead, klass.joinCode)).status).toBe(403);
  });

  it("slows down a student who keeps guessing", async () => {
    const student = await makePerson("student", "brute");
    const statuses: number[] = [];
    for (let i = 0; i < 11; i++) statuses.push((await join(student, `ZZZZ${2000 + i}`)).status);
    expect(statuses.slice(0, 10).every((s) => s === 404)).toBe(true);
    expect(statuses[10]).toBe(429);
  });

  it("a new code stops the old one working", async () => {
    const made = await call<{ joinCode: string }>("POST", `/api/classes/${klass.id}/join-code`, { cookie: lead.cookie });
    expect(made.status).toBe(200);
    expect(made.body.joinCode).toMatch(/^[A-HJ-NP-Z2-9]{8}$/);
    expect(made.body.joinCode).not.toBe(klass.joinCode);
    const student = await makePerson("student", "latecomer");
    expect((await join(student, klass.joinCode)).status).toBe(404);
    expect((await join(student, made.body.joinCode)).status).toBe(200);
    klass.joinCode = made.body.joinCode;
  });
});

describe("removing and adding back", () => {
  it("a removed student's work stays; they cannot rejoin by code; the instructor can add them back", async () => {
    const student = await makePerson("student", "removed");
    await enroll(klass.id, student.id);
    const work = await withDb(async ({ models }) => {
      const problem = await models.PracticeProblem.create({ id: crypto.randomUUID(), userId: student.id, visitorId: null, kind: "even-gap", level: 1, seed: 42, attemptsAllowed: 3 });
      await models.Attempt.create({ problemId: problem.id, userId: student.id, kind: "even-gap", level: 1, seed: 42, submission: 1, part: "gap", raw: "3 1/2", value: "7/2", expected: "7/2", verdict: "correct", pattern: null, timeMs: 9000 });
      return problem.id;
    });

    const removed = await call("DELETE", `/api/classes/${klass.id}/students/${student.id}`, { cookie: lead.cookie });
    expect(removed.status).toBe(200);
    expect((await call("DELETE", `/api/classes/${klass.id}/students/${student.id}`, { cookie: lead.cookie })).status).toBe(409);
    const stored = await withDb(async ({ models }) => ({
      enrollment: (await models.Enrollment.findOne({ where: { classId: klass.id, studentId: student.id } }))!.status,
      problems: await models.PracticeProblem.count({ where: { id: work } }),
      attempts: await models.Attempt.count({ where: { problemId: work, userId: student.id } }),
    }));
    expect(stored).toEqual({ enrollment: "removed", problems: 1, attempts: 1 });
    expect((await call<string>("GET", "/my-classes", { cookie: student.cookie })).body).not.toContain(klass.name);

    const rejoin = await join(student, klass.joinCode);
    expect(rejoin.status).toBe(403);
    expect(rejoin.body.error!.message).toMatch(/Ask your instructor/);

    expect((await call("POST", `/api/classes/${klass.id}/students/${student.id}/restore`, { cookie: lead.cookie })).status).toBe(200);
    expect((await call<string>("GET", "/my-classes", { cookie: student.cookie })).body).toContain(klass.name);
  });
});

describe("the roster list", () => {
  it("searches, filters by status and pages through a big class", async () => {
    const big = await createClass(lead, "CARP 120 — Framing (big section)");
    await withDb(async ({ models }) => {
      const users = await models.User.bulkCreate(
        Array.from({ length: 30 }, (_, i) => ({ name: `Student ${String(i).padStart(2, "0")}`, email: `big${i}.${big.id}@example.com`, passwordHash: "x", role: "student" as const })),
      );
      const ids = (await models.User.findAll({ where: { email: users.map((u) => u.email) } })).map((u) => u.id);
      await models.Enrollment.bulkCreate(ids.map((studentId, i) => ({ classId: big.id, studentId, status: i < 27 ? ("active" as const) : ("removed" as const) })));
    });
    await call("POST", `/api/classes/${big.id}/invitations`, { cookie: lead.cookie, body: { addresses: "Zed Newcomer <zed.newcomer@example.com>" } });

    const page1 = await call<Roster>("GET", `/api/classes/${big.id}/roster`, { cookie: lead.cookie });
    expect(page1.body.counts).toEqual({ all: 31, active: 27, invited: 1, removed: 3 });
    expect(page1.body.roster).toHaveLength(25);
    expect(page1.body.pageCount).toBe(2);
    const page2 = await call<Roster>("GET", `/api/classes/${big.id}/roster?page=2`, { cookie: lead.cookie });
    expect(page2.body.roster.map((r) => r.status)).toEqual(["active", "active", "invited", "removed", "removed", "removed"]);

    const invited = await call<Roster>("GET", `/api/classes/${big.id}/roster?status=invited`, { cookie: lead.cookie });
    expect(invited.body.roster).toEqual([expect.objectContaining({ name: "Zed Newcomer", email: "zed.newcomer@example.com", status: "invited" })]);
    const search = await call<Roster>("GET", `/api/classes/${big.id}/roster?q=student%2012`, { cookie: lead.cookie });
    expect(search.body.roster.map((r) => r.name)).toEqual(["Student 12"]);
    // A % in the search is a character to find, not a wildcard.
    expect((await call<Roster>("GET", `/api/classes/${big.id}/roster?q=%25`, { cookie: lead.cookie })).body.total).toBe(0);
    expect((await call("GET", `/api/classes/${big.id}/roster?status=gone`, { cookie: lead.cookie })).status).toBe(400);
  });
});

describe("class settings", () => {
  it("creates, edits, archives and restores a class; an archived class leaves the lists and takes nobody by code", async () => {
    const bad = await call<{ error: { fields: Record<string, string> } }>("POST", "/api/classes", { cookie: lead.cookie, body: { name: " ", term: "" } });
    expect(bad.status).toBe(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(["name", "term"]);

    const mine = await createClass(lead, "CARP 130 — Stairs");
    const edited = await call<{ summary: { name: string; sectionCode: string | null; program: string | null } }>("PATCH", `/api/classes/${mine.id}`, {
      cookie: lead.cookie,
      body: { name: "CARP 130 — Stairs and Guards", term: "Fall 2027", sectionCode: "", program: "Carpentry & Joinery" },
    });
    expect(edited.body.summary).toMatchObject({ name: "CARP 130 — Stairs and Guards", sectionCode: null, program: "Carpentry & Joinery" });

    expect((await call("POST", `/api/classes/${mine.id}/archive`, { cookie: lead.cookie })).status).toBe(200);
    const listed = async (archived: boolean) =>
      (await call<{ classes: { id: number }[] }>("GET", `/api/classes${archived ? "?archived=1" : ""}`, { cookie: lead.cookie })).body.classes.map((c) => c.id);
    expect(await listed(false)).not.toContain(mine.id);
    expect(await listed(true)).toContain(mine.id);
    const student = await makePerson("student", "archivejoin");
    expect((await join(student, mine.joinCode)).status).toBe(404);
    expect((await call("POST", `/api/classes/${mine.id}/invitations`, { cookie: lead.cookie, body: { addresses: "x@example.com" } })).status).toBe(409);

    expect((await call("POST", `/api/classes/${mine.id}/restore`, { cookie: lead.cookie })).status).toBe(200);
    expect(await listed(false)).toContain(mine.id);
    expect((await join(student, mine.joinCode)).status).toBe(200);
  });

  it("adds a co-instructor by the e-mail of an instructor account only, and removes them", async () => {
    const colleague = await makePerson("instructor", "colleague");
    const student = await makePerson("student", "notstaff");
    const add = (email: string) => call<{ error?: { fields: Record<string, string> } }>("POST", `/api/classes/${klass.id}/co-instructors`, { cookie: lead.cookie, body: { email } });
    expect((await add(student.email)).body.error!.fields.email).toMatch(/No instructor account/);
    expect((await add("nobody.here@example.com")).status).toBe(400);
    expect((await add(lead.email)).status).toBe(409);
    expect((await add(colleague.email.toUpperCase())).status).toBe(201);
    expect((await add(colleague.email)).status).toBe(409);
    expect((await call("GET", `/api/classes/${klass.id}/roster`, { cookie: colleague.cookie })).status).toBe(200);
    expect((await call("DELETE", `/api/classes/${klass.id}/co-instructors/${colleague.id}`, { cookie: lead.cookie })).status).toBe(200);
    expect((await call("GET", `/api/classes/${klass.id}/roster`, { cookie: colleague.cookie })).status).toBe(403);
  });
});
