import crypto from "node:crypto";
import { beforeAll, describe, expect, it } from "vitest";
import { baseURL, call, createClass, enroll, makePerson, uniqueEmail, withDb, type Person } from "./classes-helpers";

let lead: Person;
let coInstructor: Person;
let outsider: Person;
let student: Person;
let klass: { id: number; joinCode: string };
let invitationId: number;
let batch: string;

beforeAll(async () => {
  [lead, coInstructor, outsider, student] = await Promise.all([
    makePerson("instructor", "owner"),
    makePerson("instructor", "helper"),
    makePerson("instructor", "stranger"),
    makePerson("student", "pupil"),
  ]);
  klass = await createClass(lead);
  await enroll(klass.id, student.id);
  expect((await call("POST", `/api/classes/${klass.id}/co-instructors`, { cookie: lead.cookie, body: { email: coInstructor.email } })).status).toBe(201);
  const sent = await call<{ batch: string }>("POST", `/api/classes/${klass.id}/invitations`, { cookie: lead.cookie, body: { addresses: uniqueEmail("invitee") } });
  batch = sent.body.batch;
  invitationId = (await withDb(({ models }) => models.Invitation.findOne({ where: { classId: klass.id } })))!.id;
});

/** Every roster, invitation and import route, with a body that would be accepted from the lead. */
function routes(): [string, string, unknown?][] {
  const c = `/api/classes/${klass.id}`;
  return [
    ["GET", c],
    ["PATCH", c, { name: "Taken over", term: "Fall 2027" }],
    ["POST", `${c}/archive`],
    ["POST", `${c}/restore`],
    ["POST", `${c}/join-code`],
    ["POST", `${c}/co-instructors`, { email: "someone@example.com" }],
    ["DELETE", `${c}/co-instructors/${coInstructor.id}`],
    ["GET", `${c}/roster`],
    ["POST", `${c}/invitations`, { addresses: "sneaky@example.com" }],
    ["POST", `${c}/invitations/${invitationId}/resend`],
    ["POST", `${c}/invitations/${invitationId}/revoke`],
    ["DELETE", `${c}/students/${student.id}`],
    ["POST", `${c}/students/${student.id}/restore`],
    ["POST", `${c}/roster/import`, { csv: "Name,Email\nSneaky,sneaky@example.com", dryRun: false }],
    ["GET", `${c}/invitations/batches/${batch}`],
  ];
}

async function snapshot() {
  return withDb(async ({ models }) => ({
    klass: await models.SchoolClass.findByPk(klass.id, { raw: true }),
    invitations: await models.Invitation.findAll({ where: { classId: klass.id }, raw: true, order: [["id", "ASC"]] }),
    enrollments: await models.Enrollment.findAll({ where: { classId: klass.id }, raw: true, order: [["id", "ASC"]] }),
    team: await models.ClassInstructor.count({ where: { classId: klass.id } }),
  }));
}

describe("who may touch a class's roster, invitations and imports", () => {
  it("anonymous gets 401, a student 403 and another instructor 403 on every route, and nothing changes", async () => {
    const before = await snapshot();
    for (const [method, path, body] of routes()) {
      expect([method, path, (await call(method, path, { body })).status]).toEqual([method, path, 401]);
      expect([method, path, (await call(method, path, { body, cookie: student.cookie })).status]).toEqual([method, path, 403]);
      const other = await call<{ error: { code: string } }>(method, path, { body, cookie: outsider.cookie });
      expect([method, path, other.status, other.body.error?.code]).toEqual([method, path, 403, "forbidden"]);
    }
    expect(await snapshot()).toEqual(before);
  });

  it("the class pages answer 403 to another instructor and send anonymous visitors to sign in", async () => {
    for (const page of ["", "/add-students", "/settings", "/join-code"]) {
      expect((await call("GET", `/classes/${klass.id}${page}`, { cookie: outsider.cookie })).status).toBe(403);
      const anonymous = await fetch(`${baseURL}/classes/${klass.id}${page}`, { redirect: "manual" });
      expect(anonymous.status).toBe(307);
    }
  });

  it("a co-instructor works the roster but cannot archive the class or change who teaches it", async () => {
    expect((await call("GET", `/api/classes/${klass.id}/roster`, { cookie: coInstructor.cookie })).status).toBe(200);
    expect((await call("POST", `/api/classes/${klass.id}/roster/import`, { cookie: coInstructor.cookie, body: { csv: "Name,Email\nA,a@example.com", dryRun: true } })).status).toBe(200);
    expect((await call("POST", `/api/classes/${klass.id}/archive`, { cookie: coInstructor.cookie })).status).toBe(403);
    expect((await call("POST", `/api/classes/${klass.id}/co-instructors`, { cookie: coInstructor.cookie, body: { email: outsider.email } })).status).toBe(403);
    expect((await call("DELETE", `/api/classes/${klass.id}/co-instructors/${coInstructor.id}`, { cookie: coInstructor.cookie })).status).toBe(403);
  });

  it("a send id from another class reads as not found", async () => {
    const mine = await createClass(outsider);
    expect((await call("GET", `/api/classes/${mine.id}/invitations/batches/${batch}`, { cookie: outsider.cookie })).status).toBe(404);
    expect((await call("GET", `/api/classes/${mine.id}/invitations/batches/${crypto.randomUUID()}`, { cookie: outsider.cookie })).status).toBe(404);
    expect((await call("GET", `/api/classes/${mine.id}/invitations/batches/not-a-uuid`, { cookie: outsider.cookie })).status).toBe(400);
  });
});
