import crypto from "node:crypto";
import { afterAll, beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase, type Database } from "@/lib/db";
import { bucketOf } from "@/lib/progress/summaries";
import { createAssignment, createClass, createPerson, FIXTURE_PASSWORD, variantAnswers } from "../support/assignment-fixtures";
import { recomputedScores } from "../support/assignment-scores";
import { signInCookie } from "../support/http";

// Class progress, a student's own progress and the admin overview over real HTTP against the
// built app. The class's tries are written straight into SQLite, then every number the routes
// give is recounted here from those raw rows, longhand.

const baseURL = inject("baseURL");
const file = inject("databasePath");
const secret = inject("secret");
const DAY = 24 * 3600 * 1000;
const now = Date.now();
const sqlTime = (d: Date) => d.toISOString().replace("T", " ").replace("Z", " +00:00");

type Person = { id: number; email: string; name: string };
let database: Database;
let lead: Person, outsider: Person, admin: Person, ana: Person, ben: Person, cal: Person, dee: Person;
let classId: number;
let otherClassId: number;
let assignmentId: number;
let itemId: number;
const cookies: Record<string, string> = {};

const get = (path: string, who?: string) => fetch(`${baseURL}${path}`, { headers: who ? { cookie: cookies[who] } : {} });

async function insertProblem(p: { userId: number; itemId: number | null; variant: number | null; kind: string; level: number; seed: number; partCount: number; status: string; finishedAt: Date | null }) {
  const id = crypto.randomUUID();
  await database.sequelize.query(
    `INSERT INTO practice_problems (id, user_id, assignment_item_id, variant, kind, level, seed, attempts_allowed, attempts_used, status, finished_at, part_count, created_at, updated_at)
     VALUES (?, ?, ?, ?, ?, ?, ?, 3, 0, ?, ?, ?, ?, ?)`,
    { replacements: [id, p.userId, p.itemId, p.variant, p.kind, p.level, p.seed, p.status, p.finishedAt ? sqlTime(p.finishedAt) : null, p.partCount, sqlTime(new Date(now - 30 * DAY)), sqlTime(new Date(now))] },
  );
  return id;
}

async function insertTry(t: { problemId: string; userId: number; itemId: number | null; kind: string; seed: number; submission: number; part: string; verdict: string; pattern: string | null; at: Date }) {
  await database.sequelize.query(
    `INSERT INTO attempts (problem_id, user_id, assignment_item_id, kind, level, seed, submission, part, raw, value, expected, verdict, pattern, time_ms, created_at)
     VALUES (?, ?, ?, ?, 1, ?, ?, ?, '1', '1', '1', ?, ?, 9000, ?)`,
    { replacements: [t.problemId, t.userId, t.itemId, t.kind, t.seed, t.submission, t.part, t.verdict, t.pattern, sqlTime(t.at)] },
  );
}

/**
 * Ana gets everything right at once; Ben divides by members once per part, then gets it; Cal
 * forgets the member width three times and runs out of tries. Dee, in another class, slips a lot.
 */
async function work(student: Person, days: number, plan: "right" | "second" | "fail") {
  for (const variant of [0, 1]) {
    const answers = variantAnswers(secret, itemId, student.id, variant, "even-gap", 1);
    const problemId = await insertProblem({ userId: student.id, itemId, variant, kind: "even-gap", level: 1, seed: answers.seed, partCount: answers.parts.length, status: plan === "fail" ? "failed" : "solved", finishedAt: new Date(now - days * DAY) });
    const submissions = plan === "right" ? 1 : plan === "second" ? 2 : 3;
    for (let submission = 1; submission <= submissions; submission++) {
      for (const part of answers.parts) {
        const right = plan === "right" || (plan === "second" && submission === 2);
        const pattern = right ? null : plan === "second" ? "divided-by-members" : "forgot-member-width";
        await insertTry({ problemId, userId: student.id, itemId, kind: "even-gap", seed: answers.seed, submission, part: part.key, verdict: right ? "correct" : "incorrect", pattern, at: new Date(now - (days - submission * 0.1) * DAY) });
      }
    }
  }
}

async function practice(student: Person, count: number, solved: boolean, pattern: string | null, daysAgo: number) {
  for (let i = 0; i < count; i++) {
    const problemId = await insertProblem({ userId: student.id, itemId: null, variant: null, kind: "mark-position", level: 1, seed: 1000 + i, partCount: 1, status: solved ? "solved" : "failed", finishedAt: new Date(now - (daysAgo + i * 0.01) * DAY) });
    await insertTry({ problemId, userId: student.id, itemId: null, kind: "mark-position", seed: 1000 + i, submission: 1, part: "onCenter", verdict: solved ? "correct" : "incorrect", pattern, at: new Date(now - daysAgo * DAY) });
  }
}

beforeAll(async () => {
  [lead, outsider, admin, ana, ben, cal, dee] = await Promise.all([
    createPerson(file, "Margit Olsen", "instructor"),
    createPerson(file, "Harlan Voss", "instructor"),
    createPerson(file, "Priya Castellanos", "admin"),
    createPerson(file, "Ana Brightwater"),
    createPerson(file, "Ben Okonkwo"),
    createPerson(file, "Cal Dunmore"),
    createPerson(file, "Dee Farrow"),
  ]);
  classId = await createClass(file, lead.id, [ana.id, ben.id, cal.id]);
  otherClassId = await createClass(file, outsider.id, [dee.id]);
  const assignment = await createAssignment(file, classId, { title: "Pickets on the porch rail", opensAt: new Date(now - 20 * DAY) }, [{ kind: "even-gap", level: 1, problemCount: 2, points: 5 }]);
  assignmentId = assignment.id;
  itemId = assignment.itemIds[0];
  await createAssignment(file, classId, { title: "Draft stair drill", status: "draft" }, [{ kind: "stair-risers", level: 1, problemCount: 1, points: 5 }]);
  const elsewhere = await createAssignment(file, otherClassId, { title: "Other class drill", opensAt: new Date(now - 20 * DAY) }, [{ kind: "even-gap", level: 1, problemCount: 2, points: 5 }]);
  // Opened after the fixtures: each fixture opens and closes its own connection, and the models follow the latest one.
  database = openDatabase(file);

  await work(ana, 2, "right");
  await work(ben, 3, "second");
  await work(cal, 5, "fail");
  // Ana masters level 1 of marking in practice; Ben's practice slips add to the class's count,
  // one of them too long ago for the activity chart but not for the slip list.
  await practice(ana, 5, true, null, 1);
  await practice(ben, 2, false, "added-rounded-gaps", 4);
  await practice(ben, 1, false, "added-rounded-gaps", 70);
  // Dee's slips belong to the other class and must not show up in this one.
  itemId = elsewhere.itemIds[0];
  await work(dee, 1, "fail");
  itemId = assignment.itemIds[0];
  await practice(dee, 3, false, "rounded-wrong-way", 1);

  const lessons = [
    [ana.id, "even-spacing", "completed"],
    [ben.id, "even-spacing", "practised"],
    [cal.id, "reading-a-tape", "opened"],
    [dee.id, "even-spacing", "completed"],
  ] as const;
  for (const [userId, lessonSlug, status] of lessons) {
    await database.models.LessonProgress.create({ userId, lessonSlug, status, openedAt: new Date(), completedAt: status === "opened" ? null : new Date() });
  }

  for (const [key, person] of Object.entries({ lead, outsider, admin, ana, ben })) {
    const cookie = await signInCookie(baseURL, person.email, FIXTURE_PASSWORD);
    expect(cookie, `${key} signs in`).toBeTruthy();
    cookies[key] = cookie!;
  }
});

afterAll(async () => {
  await database?.sequelize.close();
});

type Slip = { pattern: string; count: number; name: string; lessonHref: string | null; students: { name: string; count: number }[]; kinds: { kind: string; count: number }[] };

describe("GET /api/classes/{classId}/progress", () => {
  it("refuses visitors, students and instructors of other classes; a missing class is 404", async () => {
    expect((await get(`/api/classes/${classId}/progress`)).status).toBe(401);
    expect((await get(`/api/classes/${classId}/progress`, "ana")).status).toBe(403);
    expect((await get(`/api/classes/${classId}/progress`, "outsider")).status).toBe(403);
    expect((await get(`/api/classes/999999999/progress`, "lead")).status).toBe(404);
    expect((await get(`/api/classes/not-a-class/progress`, "lead")).status).toBe(400);
    expect((await get(`/api/classes/${classId}/progress`, "admin")).status).toBe(200);
  });

  it("gives numbers equal to a recount from the raw rows", async () => {
    const res = await get(`/api/classes/${classId}/progress`, "lead");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.students).toBe(3);

    // Scores: only the published assignment, bucketed from the independent recomputation.
    expect(body.assignments.map((a: { id: number }) => a.id)).toEqual([assignmentId]);
    const earned = await recomputedScores(file, assignmentId);
    const percents = [ana, ben, cal].map((s) => ((earned.get(s.id) ?? 0) / 10) * 100);
    expect(percents).toEqual([100, 100, 0]);
    const expectedBuckets = Array.from({ length: 10 }, (_, i) => percents.filter((p) => bucketOf(p) === i).length);
    expect(body.assignments[0].buckets.map((b: { students: number }) => b.students)).toEqual(expectedBuckets);
    expect(body.assignments[0].average).toBeCloseTo(200 / 3, 1);

    // Slips: every named wrong try of the three students, practice and this class's assignment.
    const [rows] = (await database.sequelize.query(
      `SELECT pattern, user_id AS userId, COUNT(*) AS n FROM attempts WHERE user_id IN (?, ?, ?) AND pattern IS NOT NULL AND verdict != 'correct'
       AND (assignment_item_id IS NULL OR assignment_item_id = ?) GROUP BY pattern, user_id`,
      { replacements: [ana.id, ben.id, cal.id, itemId] },
    )) as [{ pattern: string; userId: number; n: number }[], unknown];
    const slips: Slip[] = body.slips;
    const recount = new Map<string, number>();
    for (const r of rows) recount.set(r.pattern, (recount.get(r.pattern) ?? 0) + Number(r.n));
    expect(new Map(slips.map((s) => [s.pattern, s.count]))).toEqual(recount);
    expect(slips.map((s) => s.pattern)).not.toContain("rounded-wrong-way");
    const counts = slips.map((s) => s.count);
    expect(counts).toEqual([...counts].sort((a, b) => b - a));
    const top = slips[0];
    expect(top.pattern).toBe("forgot-member-width");
    expect(top.name).toBe("Forgot member width");
    expect(top.lessonHref).toBe("/lessons/even-spacing#the-formula");
    expect(top.students.map((s) => s.name)).toEqual(["Cal Dunmore"]);
    expect(top.kinds.map((k) => k.kind)).toEqual(["even-gap"]);
    const rounding = slips.find((s) => s.pattern === "added-rounded-gaps")!;
    expect(rounding.count).toBe(3);
    expect(rounding.students).toEqual([{ id: ben.id, name: "Ben Okonkwo", count: 3 }]);

    // Activity: distinct (problem, submission) per UTC day within the last 56 days.
    const [tries] = (await database.sequelize.query(
      `SELECT problem_id AS problemId, submission, created_at AS at FROM attempts WHERE user_id IN (?, ?, ?) AND (assignment_item_id IS NULL OR assignment_item_id = ?)`,
      { replacements: [ana.id, ben.id, cal.id, itemId] },
    )) as [{ problemId: string; submission: number; at: string }[], unknown];
    const firstDay = body.activity[0].day as string;
    const perDay = new Map<string, Set<string>>();
    for (const t of tries) {
      const day = new Date(t.at.replace(" +00:00", "Z").replace(" ", "T")).toISOString().slice(0, 10);
      if (day < firstDay) continue;
      perDay.set(day, (perDay.get(day) ?? new Set()).add(`${t.problemId}:${t.submission}`));
    }
    expect(body.activity).toHaveLength(56);
    for (const d of body.activity) expect(d.tries, d.day).toBe(perDay.get(d.day)?.size ?? 0);
    expect(body.activity.reduce((n: number, d: { tries: number }) => n + d.tries, 0)).toBe([...perDay.values()].reduce((n, s) => n + s.size, 0));

    // Mastery: Ana's five solved marking problems master level 1 of marking; nobody else masters anything.
    const marking = body.skills.find((s: { skill: string }) => s.skill === "marking");
    expect(marking.levels.map((l: { mastered: number }) => l.mastered)).toEqual([1, 0, 0]);
    expect(body.skills.filter((s: { skill: string }) => s.skill !== "marking").every((s: { levels: { mastered: number }[] }) => s.levels.every((l) => l.mastered === 0))).toBe(true);

    // Lessons: Dee's reading is another class's.
    const lesson = (slug: string) => body.lessons.find((l: { slug: string }) => l.slug === slug);
    expect(lesson("even-spacing")).toMatchObject({ opened: 2, read: 2, practised: 1, mastered: 0 });
    expect(lesson("reading-a-tape")).toMatchObject({ opened: 1, read: 0, practised: 0 });
    expect(lesson("mark-from-one-end")).toMatchObject({ read: 0, mastered: 0 });
  });
});

describe("GET /api/me/progress", () => {
  it("needs a signed-in user", async () => {
    expect((await get("/api/me/progress")).status).toBe(401);
  });

  it("gives a student only their own scores and slips", async () => {
    const res = await get("/api/me/progress", "ben");
    expect(res.status).toBe(200);
    const body = await res.json();
    expect(body.classes.map((c: { id: number }) => c.id)).toEqual([classId]);
    const [only] = body.classes[0].assignments;
    expect(body.classes[0].assignments).toHaveLength(1);
    expect(only).toMatchObject({ id: assignmentId, earned: 10, possible: 10, percent: 100 });
    expect(body.slips.map((s: { pattern: string; count: number }) => [s.pattern, s.count])).toEqual([
      ["divided-by-members", 8],
      ["added-rounded-gaps", 3],
    ]);
    expect(body.slips[0].lessonHref).toBe("/lessons/even-spacing#count-the-spaces-not-the-members");
    const text = JSON.stringify(body);
    for (const other of [ana, cal, dee]) {
      expect(text).not.toContain(other.name);
      expect(text).not.toContain(other.email);
    }
  });
});

describe("GET /api/admin/classes", () => {
  it("is for admins only", async () => {
    expect((await get("/api/admin/classes")).status).toBe(401);
    expect((await get("/api/admin/classes", "ana")).status).toBe(403);
    expect((await get("/api/admin/classes", "lead")).status).toBe(403);
  });

  it("summarises each class from its published work", async () => {
    const res = await get("/api/admin/classes", "admin");
    expect(res.status).toBe(200);
    const { classes } = await res.json();
    const ours = classes.find((c: { id: number }) => c.id === classId);
    expect(ours).toMatchObject({ students: 3, publishedAssignments: 1, missingPercent: 0, instructorName: "Margit Olsen" });
    expect(ours.average).toBeCloseTo(200 / 3, 1);
    const theirs = classes.find((c: { id: number }) => c.id === otherClassId);
    expect(theirs).toMatchObject({ students: 1, publishedAssignments: 1, average: 0 });
  });
});
