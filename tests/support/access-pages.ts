// The access matrix's page table: every app/**/page.tsx, its dynamic segments filled from the
// fixtures, and what each principal gets: the page (200), a trip to sign in, the 403 page, the 404 page,
// or (the sign-in and sign-up forms, once signed in) a trip home.
import type { Cast, Principal, World } from "./access-world";

export type PageOutcome = 200 | 403 | 404 | "signin" | "home";
export type PageExpectation = Record<Principal, PageOutcome>;
type Ctx = { world: World; cast: Cast };
export type PageRow = { url: (ctx: Ctx) => string; expect: PageExpectation };

const each = (outcome: PageOutcome): PageExpectation => ({ anonymous: outcome, student: outcome, otherStudent: outcome, instructor: outcome, otherInstructor: outcome, admin: outcome });
const open = each(200);
const signedIn: PageExpectation = { ...each(200), anonymous: "signin" };
/** The account forms: someone already signed in is sent home. */
const visitorsOnly: PageExpectation = { ...each("home"), anonymous: 200 };
/** A student page about class A: anyone not enrolled in it (instructors included) is told it does not exist. */
const studentOfA: PageExpectation = { ...each(404), anonymous: "signin", student: 200 };
const teachingRole: PageExpectation = { anonymous: "signin", student: 403, otherStudent: 403, instructor: 200, otherInstructor: 200, admin: 200 };
/** A page of class A for its instructors (classForTeacher / assignmentForTeacher: another instructor 403). */
const teachesA: PageExpectation = { ...teachingRole, otherInstructor: 403 };
const adminOnly: PageExpectation = { anonymous: "signin", student: 403, otherStudent: 403, instructor: 403, otherInstructor: 403, admin: 200 };

const cls = ({ world }: Ctx) => `/classes/${world.classA}`;
const asg = (c: Ctx) => `${cls(c)}/assignments/${c.world.assignmentA}`;

export const PAGES: Record<string, PageRow> = {
  "/": { url: () => "/", expect: open },
  "/safety": { url: () => "/safety", expect: open },
  "/signin": { url: () => "/signin", expect: visitorsOnly },
  "/signup": { url: () => "/signup", expect: visitorsOnly },
  "/forgot-password": { url: () => "/forgot-password", expect: open },
  "/reset-password/[token]": { url: ({ world }) => `/reset-password/${world.resetToken}`, expect: open },
  "/invite/[token]": { url: ({ world }) => `/invite/${world.tokenForStudent}`, expect: open },
  "/calculators": { url: () => "/calculators", expect: open },
  "/calculators/cut-list": { url: () => "/calculators/cut-list", expect: open },
  "/calculators/even-spacing": { url: () => "/calculators/even-spacing", expect: open },
  "/calculators/fraction-bench": { url: () => "/calculators/fraction-bench", expect: open },
  "/calculators/guard-spacing": { url: () => "/calculators/guard-spacing", expect: open },
  "/calculators/stairs": { url: () => "/calculators/stairs", expect: open },
  "/calculators/wall-grid": { url: () => "/calculators/wall-grid", expect: open },
  "/lessons": { url: () => "/lessons", expect: open },
  "/lessons/[slug]": { url: () => "/lessons/reading-a-tape", expect: open },
  "/practice": { url: () => "/practice", expect: open },
  // A practice problem is its maker's: anyone else (visitors included) is told it does not exist.
  "/practice/[id]": { url: ({ world }) => `/practice/${world.practiceA}`, expect: { ...each(404), student: 200 } },
  "/layouts": { url: () => "/layouts", expect: signedIn },

  // The caller's own classes and progress (requireUser): an instructor sees their own, empty, lists.
  "/my-classes": { url: () => "/my-classes", expect: signedIn },
  "/my-classes/[classId]": { url: ({ world }) => `/my-classes/${world.classA}`, expect: studentOfA },
  "/my-classes/[classId]/assignments/[assignmentId]": { url: ({ world }) => `/my-classes/${world.classA}/assignments/${world.assignmentA}`, expect: studentOfA },
  "/my-progress": { url: () => "/my-progress", expect: signedIn },

  "/classes": { url: () => "/classes", expect: teachingRole },
  "/classes/new": { url: () => "/classes/new", expect: teachingRole },
  "/classes/[classId]": { url: cls, expect: teachesA },
  "/classes/[classId]/add-students": { url: (c) => `${cls(c)}/add-students`, expect: teachesA },
  "/classes/[classId]/join-code": { url: (c) => `${cls(c)}/join-code`, expect: teachesA },
  "/classes/[classId]/settings": { url: (c) => `${cls(c)}/settings`, expect: teachesA },
  "/classes/[classId]/gradebook": { url: (c) => `${cls(c)}/gradebook`, expect: teachesA },
  "/classes/[classId]/progress": { url: (c) => `${cls(c)}/progress`, expect: teachesA },
  "/classes/[classId]/assignments": { url: (c) => `${cls(c)}/assignments`, expect: teachesA },
  "/classes/[classId]/assignments/new": { url: (c) => `${cls(c)}/assignments/new`, expect: teachesA },
  "/classes/[classId]/assignments/[assignmentId]": { url: asg, expect: teachesA },
  "/classes/[classId]/assignments/[assignmentId]/edit": { url: (c) => `${asg(c)}/edit`, expect: teachesA },
  "/classes/[classId]/assignments/[assignmentId]/students": { url: (c) => `${asg(c)}/students`, expect: teachesA },
  "/classes/[classId]/assignments/[assignmentId]/students/[studentId]": { url: (c) => `${asg(c)}/students/${c.cast.student.id}`, expect: teachesA },
  "/classes/[classId]/assignments/[assignmentId]/worksheets": { url: (c) => `${asg(c)}/worksheets`, expect: teachesA },

  "/admin/classes": { url: () => "/admin/classes", expect: adminOnly },
  "/admin/users": { url: () => "/admin/users", expect: adminOnly },
};
