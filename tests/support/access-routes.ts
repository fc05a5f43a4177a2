// The access matrix's API table: one row per exported method of every route handler, each cell the
// status that principal must get. The rules the rows restate:
//   - nobody signed in → 401 (withAuth), except the public routes;
//   - a teaching route for a class → 403 for a student (wrong role) and for an instructor who does
//     not teach it (classForTeacher / assignmentForTeacher); admins teach every class;
//   - a student's own things (work, variants, photos, layouts, practice) → 404 for everyone else,
//     so nobody can probe what exists (assignmentForStudent, uploadFor, the owner checks).
import crypto from "node:crypto";
import type { Cast, Principal, World } from "./access-world";
import { shopPhoto, studentAnswers } from "./access-world";
import { builderAssignmentBody } from "./assignment-fixtures";

export type Expectation = Record<Principal, number>;
type Ctx = { world: World; cast: Cast; who: Principal; secret: string };

export type RouteRow = {
  url: (ctx: Ctx) => string;
  body?: (ctx: Ctx) => unknown | Promise<unknown>;
  expect: Expectation;
  /** Words a refusal here may carry because the caller already holds them (e.g. the address an invitation link was sent to). */
  mayName?: (ctx: Ctx) => string[];
};

const each = (status: number): Expectation => ({ anonymous: status, student: status, otherStudent: status, instructor: status, otherInstructor: status, admin: status });
/** Open to everyone, signed in or not. */
const open = (ok: number) => each(ok);
/** Any signed-in account; the data is the caller's own. */
const signedIn = (ok: number): Expectation => ({ ...each(ok), anonymous: 401 });
/** Class A's instructors and admins; a student is the wrong role, another instructor does not teach it. */
const teachesA = (ok: number): Expectation => ({ anonymous: 401, student: 403, otherStudent: 403, instructor: ok, otherInstructor: 403, admin: ok });
/** Instructors and admins, whatever class (the builder's sample). */
const teachingRole = (ok: number): Expectation => ({ anonymous: 401, student: 403, otherStudent: 403, instructor: ok, otherInstructor: ok, admin: ok });
/** `student`'s own; everyone else is told it does not exist. */
const studentsOwn = (ok: number): Expectation => ({ anonymous: 401, student: ok, otherStudent: 404, instructor: 404, otherInstructor: 404, admin: 404 });

const unique = () => crypto.randomBytes(4).toString("hex");

/** The builder's whole form, as the fixtures' assignment has it (one even-gap item, three tries, no late work). */
const assignmentBody = (title: string) =>
  builderAssignmentBody({ title, latePolicy: "none", latePenaltyPercent: null, items: [{ kind: "even-gap", level: 1, problemCount: 2, tolerance: "half", points: 4 }] });

const A = ({ world }: Ctx) => world.classA;
const asg = ({ world }: Ctx) => world.assignmentA;

export const API_ROUTES: Record<string, RouteRow> = {
  // Public: health, the calculators, accounts.
  "GET /api/health": { url: () => "/api/health", expect: open(200) },
  "GET /api/auth/[...nextauth]": { url: () => "/api/auth/providers", expect: open(200) },
  // A credentials post without the CSRF token is turned back to the sign-in page for everyone.
  "POST /api/auth/[...nextauth]": { url: () => "/api/auth/callback/credentials", body: ({ cast }) => ({ email: cast.student.email, password: "wrong" }), expect: open(302) },
  "POST /api/layout/even-spacing": { url: () => "/api/layout/even-spacing", body: () => ({ span: "128 3/4", memberWidth: "2 1/2", count: 6, endCondition: "members" }), expect: open(200) },
  "POST /api/layout/guard-spacing": { url: () => "/api/layout/guard-spacing", body: () => ({ span: "72", balusterWidth: "1 1/2" }), expect: open(200) },
  "POST /api/layout/stairs": { url: () => "/api/layout/stairs", body: () => ({ totalRise: "94" }), expect: open(200) },
  "POST /api/layout/measure": { url: () => "/api/layout/measure", body: () => ({ text: `1' 10 3/4"`, style: "feet-inches" }), expect: open(200) },
  "POST /api/layout/cut-list": { url: () => "/api/layout/cut-list", body: () => ({ pieces: [{ label: "Rail", length: "24", quantity: 4 }], stock: [{ length: "96" }], kerf: "1/8" }), expect: open(200) },
  "POST /api/layout/wall-grid": {
    url: () => "/api/layout/wall-grid",
    body: () => ({ wallWidth: "128 3/4", wallHeight: "96", topRailWidth: "5 1/2", bottomRailWidth: "2 1/2", baseTrimHeight: "4", verticalWidth: "2 1/2", verticalCount: 6, rows: 0 }),
    expect: open(200),
  },
  "POST /api/signup": { url: () => "/api/signup", body: () => ({ name: "Pat Scribe", email: `signup.${unique()}@fixtures.example`, password: "square-and-true-77" }), expect: open(201) },
  "POST /api/password-reset": { url: () => "/api/password-reset", body: ({ cast, who }) => ({ email: who === "anonymous" ? cast.removed.email : cast[who].email }), expect: open(200) },
  "POST /api/password-reset/confirm": { url: () => "/api/password-reset/confirm", body: ({ world }) => ({ token: world.resetToken, password: "fresh-chalk-line-88" }), expect: open(200) },
  // The link's token is the credential: the invited student (or a newcomer making an account) joins;
  // anyone else signed in is told whom the link was for.
  "POST /api/invitations/[token]/accept": {
    url: ({ world, who }) => `/api/invitations/${who === "anonymous" ? world.tokenForNewcomer : world.tokenForStudent}/accept`,
    body: ({ who }) => (who === "anonymous" ? { name: "Nell Newcomer", password: "first-day-on-site-9" } : {}),
    expect: { anonymous: 201, student: 201, otherStudent: 403, instructor: 403, otherInstructor: 403, admin: 403 },
    mayName: ({ cast }) => [cast.student.email],
  },

  // Practice: open to visitors; a problem belongs to whoever made it.
  "POST /api/practice": { url: () => "/api/practice", body: () => ({ kind: "even-gap", level: 1 }), expect: open(201) },
  "GET /api/practice/[id]": { url: ({ world }) => `/api/practice/${world.practiceA}`, expect: { ...studentsOwn(200), anonymous: 404 } },
  "POST /api/practice/[id]/answers": { url: ({ world }) => `/api/practice/${world.practiceA}/answers`, body: ({ world }) => ({ answers: Object.fromEntries(world.practiceParts.map((key) => [key, "1"])) }), expect: { ...studentsOwn(200), anonymous: 404 } },
  "GET /api/practice/history": { url: () => "/api/practice/history", expect: signedIn(200) },
  "GET /api/practice/mastery": { url: () => "/api/practice/mastery", expect: signedIn(200) },

  // The caller's own account data.
  "GET /api/me": { url: () => "/api/me", expect: signedIn(200) },
  "GET /api/me/progress": { url: () => "/api/me/progress", expect: signedIn(200) },
  "GET /api/progress": { url: () => "/api/progress", expect: signedIn(200) },
  "POST /api/progress": { url: () => "/api/progress", body: () => ({ slug: "reading-a-tape", status: "opened" }), expect: signedIn(200) },
  "GET /api/layouts": { url: () => "/api/layouts", expect: signedIn(200) },
  "POST /api/layouts": { url: () => "/api/layouts", body: () => ({ kind: "even-spacing", name: "Porch rail", params: "span=72" }), expect: signedIn(201) },
  "PATCH /api/layouts/[id]": { url: ({ world }) => `/api/layouts/${world.layoutA}`, body: () => ({ name: "Hall battens, final" }), expect: studentsOwn(200) },
  "DELETE /api/layouts/[id]": { url: ({ world }) => `/api/layouts/${world.layoutA}`, expect: studentsOwn(204) },

  // Classes.
  "GET /api/admin/classes": { url: () => "/api/admin/classes", expect: { anonymous: 401, student: 403, otherStudent: 403, instructor: 403, otherInstructor: 403, admin: 200 } },
  "GET /api/classes": { url: () => "/api/classes", expect: teachingRole(200) },
  "POST /api/classes": { url: () => "/api/classes", body: () => ({ name: `CARP 130 — Stairs ${unique()}`, term: "Fall 2027" }), expect: teachingRole(201) },
  "POST /api/classes/join": {
    url: () => "/api/classes/join",
    body: ({ world }) => ({ code: world.joinCodeB }),
    // Joining a class one is already in is a harmless success (alreadyIn: true), not a refusal.
    expect: { anonymous: 401, student: 200, otherStudent: 200, instructor: 403, otherInstructor: 403, admin: 403 },
  },
  "GET /api/classes/[classId]": { url: (c) => `/api/classes/${A(c)}`, expect: teachesA(200) },
  "PATCH /api/classes/[classId]": { url: (c) => `/api/classes/${A(c)}`, body: () => ({ name: `CARP 120 — Framing (evening) ${unique()}`, term: "Spring 2027" }), expect: teachesA(200) },
  "POST /api/classes/[classId]/archive": { url: (c) => `/api/classes/${A(c)}/archive`, body: () => ({}), expect: teachesA(200) },
  "POST /api/classes/[classId]/restore": { url: (c) => `/api/classes/${A(c)}/restore`, body: () => ({}), expect: teachesA(200) },
  "POST /api/classes/[classId]/join-code": { url: (c) => `/api/classes/${A(c)}/join-code`, body: () => ({}), expect: teachesA(200) },
  "POST /api/classes/[classId]/co-instructors": { url: (c) => `/api/classes/${A(c)}/co-instructors`, body: ({ cast }) => ({ email: cast.otherInstructor.email }), expect: teachesA(201) },
  "DELETE /api/classes/[classId]/co-instructors/[userId]": { url: (c) => `/api/classes/${A(c)}/co-instructors/${c.cast.coTeacher.id}`, expect: teachesA(200) },
  "GET /api/classes/[classId]/roster": { url: (c) => `/api/classes/${A(c)}/roster`, expect: teachesA(200) },
  "POST /api/classes/[classId]/roster/import": {
    url: (c) => `/api/classes/${A(c)}/roster/import`,
    body: () => ({ csv: `Name,Email\nRosa Batten,rosa.${unique()}@fixtures.example\n`, dryRun: false }),
    expect: teachesA(201),
  },
  "POST /api/classes/[classId]/invitations": { url: (c) => `/api/classes/${A(c)}/invitations`, body: () => ({ addresses: `joiner.${unique()}@fixtures.example` }), expect: teachesA(201) },
  "GET /api/classes/[classId]/invitations/batches/[batch]": { url: (c) => `/api/classes/${A(c)}/invitations/batches/${c.world.batchA}`, expect: teachesA(200) },
  "POST /api/classes/[classId]/invitations/[invitationId]/resend": { url: (c) => `/api/classes/${A(c)}/invitations/${c.world.invitationA}/resend`, body: () => ({}), expect: teachesA(200) },
  "POST /api/classes/[classId]/invitations/[invitationId]/revoke": { url: (c) => `/api/classes/${A(c)}/invitations/${c.world.invitationA}/revoke`, body: () => ({}), expect: teachesA(200) },
  "DELETE /api/classes/[classId]/students/[studentId]": { url: (c) => `/api/classes/${A(c)}/students/${c.cast.student.id}`, expect: teachesA(200) },
  "POST /api/classes/[classId]/students/[studentId]/restore": { url: (c) => `/api/classes/${A(c)}/students/${c.cast.removed.id}/restore`, body: () => ({}), expect: teachesA(200) },
  "GET /api/classes/[classId]/students/[studentId]/record.csv": { url: (c) => `/api/classes/${A(c)}/students/${c.cast.student.id}/record.csv`, expect: teachesA(200) },
  "GET /api/classes/[classId]/progress": { url: (c) => `/api/classes/${A(c)}/progress`, expect: teachesA(200) },
  "GET /api/classes/[classId]/gradebook": { url: (c) => `/api/classes/${A(c)}/gradebook`, expect: teachesA(200) },
  "GET /api/classes/[classId]/gradebook.csv": { url: (c) => `/api/classes/${A(c)}/gradebook.csv`, expect: teachesA(200) },
  "GET /api/classes/[classId]/gradebook/[assignmentId]/[studentId]": { url: (c) => `/api/classes/${A(c)}/gradebook/${asg(c)}/${c.cast.student.id}`, expect: teachesA(200) },
  "POST /api/classes/[classId]/gradebook/[assignmentId]/[studentId]/override": {
    url: (c) => `/api/classes/${A(c)}/gradebook/${asg(c)}/${c.cast.student.id}/override`,
    body: () => ({ points: 3, reason: "Marks checked on the wall, all within 1/16 in." }),
    expect: teachesA(201),
  },

  // Assignments, the teaching side.
  "GET /api/classes/[classId]/assignments": { url: (c) => `/api/classes/${A(c)}/assignments`, expect: teachesA(200) },
  "POST /api/classes/[classId]/assignments": { url: (c) => `/api/classes/${A(c)}/assignments`, body: () => assignmentBody("Rafter tails"), expect: teachesA(201) },
  "POST /api/assignments/preview": { url: () => "/api/assignments/preview", body: () => ({ kind: "even-gap", level: 1, tolerance: "half", sample: 1 }), expect: teachingRole(200) },
  "GET /api/assignments/[assignmentId]": { url: (c) => `/api/assignments/${asg(c)}`, expect: teachesA(200) },
  "PATCH /api/assignments/[assignmentId]": { url: ({ world }) => `/api/assignments/${world.draftA}`, body: () => assignmentBody("Stud layout, second pass"), expect: teachesA(200) },
  "DELETE /api/assignments/[assignmentId]": { url: ({ world }) => `/api/assignments/${world.draftA}`, expect: teachesA(204) },
  "POST /api/assignments/[assignmentId]/publish": { url: ({ world }) => `/api/assignments/${world.draftA}/publish`, body: () => ({}), expect: teachesA(200) },
  "POST /api/assignments/[assignmentId]/unpublish": { url: (c) => `/api/assignments/${asg(c)}/unpublish`, body: () => ({}), expect: teachesA(200) },
  "POST /api/assignments/[assignmentId]/duplicate": { url: (c) => `/api/assignments/${asg(c)}/duplicate`, body: ({ world }) => ({ classId: world.classA }), expect: teachesA(201) },
  "GET /api/assignments/[assignmentId]/extensions": { url: (c) => `/api/assignments/${asg(c)}/extensions`, expect: teachesA(200) },
  "PUT /api/assignments/[assignmentId]/extensions": { url: (c) => `/api/assignments/${asg(c)}/extensions`, body: ({ cast }) => ({ studentId: cast.student.id, extraAttempts: 2 }), expect: teachesA(200) },
  "DELETE /api/assignments/[assignmentId]/extensions/[studentId]": { url: (c) => `/api/assignments/${asg(c)}/extensions/${c.cast.student.id}`, expect: teachesA(204) },
  "GET /api/assignments/[assignmentId]/students": { url: (c) => `/api/assignments/${asg(c)}/students`, expect: teachesA(200) },
  "GET /api/assignments/[assignmentId]/students/[studentId]": { url: (c) => `/api/assignments/${asg(c)}/students/${c.cast.student.id}`, expect: teachesA(200) },

  // Assignments, the student side: only class A's student, everyone else 404.
  "GET /api/assignments/[assignmentId]/work": { url: (c) => `/api/assignments/${asg(c)}/work`, expect: studentsOwn(200) },
  "GET /api/assignments/[assignmentId]/problems/[problemId]": { url: (c) => `/api/assignments/${asg(c)}/problems/${c.world.problemA}`, expect: studentsOwn(200) },
  "POST /api/assignments/[assignmentId]/problems/[problemId]/answers": {
    url: (c) => `/api/assignments/${asg(c)}/problems/${c.world.problemA}/answers`,
    body: ({ world, cast, secret }) => ({ answers: studentAnswers(secret, world, cast).right }),
    expect: studentsOwn(200),
  },
  // Photos: the student sends them; the student and the class's instructors see them (named by ?studentId=).
  "GET /api/assignments/[assignmentId]/uploads": {
    url: (c) => `/api/assignments/${asg(c)}/uploads?studentId=${c.cast.student.id}`,
    expect: { anonymous: 401, student: 200, otherStudent: 404, instructor: 200, otherInstructor: 404, admin: 200 },
  },
  "POST /api/assignments/[assignmentId]/uploads": { url: (c) => `/api/assignments/${asg(c)}/uploads`, body: () => shopPhoto(), expect: studentsOwn(201) },
  "GET /api/uploads/[uploadId]": { url: ({ world }) => `/api/uploads/${world.uploadA}`, expect: { anonymous: 401, student: 200, otherStudent: 404, instructor: 200, otherInstructor: 404, admin: 200 } },
  "PATCH /api/uploads/[uploadId]": {
    url: ({ world }) => `/api/uploads/${world.uploadA}`,
    body: () => ({ comment: "Marks are crisp; square the first batten off the floor." }),
    expect: { anonymous: 401, student: 403, otherStudent: 404, instructor: 200, otherInstructor: 404, admin: 200 },
  },
  "DELETE /api/uploads/[uploadId]": {
    url: ({ world }) => `/api/uploads/${world.uploadA}`,
    // The class's instructors see the photo, so they are told why they cannot delete it rather than "no such photo".
    expect: { anonymous: 401, student: 204, otherStudent: 404, instructor: 403, otherInstructor: 404, admin: 403 },
  },
};

/**
 * The other half of each check: class A's own instructor naming someone or something of class B
 * through class A's routes (a student id, an assignment, an invitation) is told it is not there.
 */
export const CROSS_CLASS: { what: string; method: string; url: (w: World, c: Cast) => string; body?: (w: World, c: Cast) => unknown; status: number; reply?: unknown }[] = [
  { what: "another class's student's review", method: "GET", url: (w, c) => `/api/assignments/${w.assignmentA}/students/${c.otherStudent.id}`, status: 404 },
  { what: "another class's student's drill-down", method: "GET", url: (w, c) => `/api/classes/${w.classA}/gradebook/${w.assignmentA}/${c.otherStudent.id}`, status: 404 },
  // Another class's assignment is another class's: 403, as for any instructor who does not teach it.
  { what: "another class's assignment under this class", method: "GET", url: (w, c) => `/api/classes/${w.classA}/gradebook/${w.assignmentB}/${c.otherStudent.id}`, status: 403 },
  { what: "another class's student's record", method: "GET", url: (w, c) => `/api/classes/${w.classA}/students/${c.otherStudent.id}/record.csv`, status: 404 },
  // The photo list is filtered to class A's work: an outsider's id finds nothing, the same as an unknown id.
  { what: "another class's student's photos", method: "GET", url: (w, c) => `/api/assignments/${w.assignmentA}/uploads?studentId=${c.otherStudent.id}`, status: 200, reply: { uploads: [] } },
  {
    what: "an override for another class's student",
    method: "POST",
    url: (w, c) => `/api/classes/${w.classA}/gradebook/${w.assignmentB}/${c.otherStudent.id}/override`,
    body: () => ({ points: 1, reason: "Marks checked on the wall." }),
    status: 403,
  },
  { what: "an extension for another class's student", method: "PUT", url: (w) => `/api/assignments/${w.assignmentA}/extensions`, body: (_w, c) => ({ studentId: c.otherStudent.id, extraAttempts: 2 }), status: 400 },
  { what: "removing another class's student", method: "DELETE", url: (w, c) => `/api/classes/${w.classA}/students/${c.otherStudent.id}`, status: 404 },
  { what: "re-adding another class's student", method: "POST", url: (w, c) => `/api/classes/${w.classA}/students/${c.otherStudent.id}/restore`, body: () => ({}), status: 404 },
  { what: "resending another class's invitation", method: "POST", url: (w) => `/api/classes/${w.classA}/invitations/${w.invitationB}/resend`, body: () => ({}), status: 404 },
  { what: "revoking another class's invitation", method: "POST", url: (w) => `/api/classes/${w.classA}/invitations/${w.invitationB}/revoke`, body: () => ({}), status: 404 },
  { what: "removing a co-instructor who is not one", method: "DELETE", url: (w, c) => `/api/classes/${w.classA}/co-instructors/${c.otherInstructor.id}`, status: 404 },
  { what: "copying an assignment into another class", method: "POST", url: (w) => `/api/assignments/${w.assignmentA}/duplicate`, body: (w) => ({ classId: w.classB }), status: 403 },
];
