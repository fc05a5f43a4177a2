import { beforeAll, describe, expect, inject, it } from "vitest";
import { DAY_MS_FOR_TESTS, recomputedScores } from "../support/assignment-scores";
import { createAssignment, createClass, createPerson, signedInPerson, updateAssignment, variantAnswers, withDatabase, type SignedInPerson } from "../support/assignment-fixtures";

const baseURL = inject("baseURL");
const file = inject("databasePath");
const secret = inject("secret");
const KIND = "even-gap";

type Person = SignedInPerson;
type ProblemJson = { id: string; status: string; final: unknown; attemptsUsed: number; promptHtml: string; figure: unknown; earned: number; accepting: boolean; solutionAfter: string | null; tries: { late: boolean }[] };

const person = (name: string, role: "student" | "instructor" = "student") => signedInPerson(baseURL, file, name, role);

async function call(who: Person | null, path: string, body?: unknown): Promise<Response> {
  return fetch(`${baseURL}${path}`, {
    method: body === undefined ? "GET" : "POST",
    headers: { "content-type": "application/json", ...(who ? { cookie: who.cookie } : {}) },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
}

async function work(who: Person, assignmentId: number) {
  const res = await call(who, `/api/assignments/${assignmentId}/work`);
  expect(res.status).toBe(200);
  return (await res.json()).work as { status: string; late: boolean; timing: { window: string }; score: { earned: number; possible: number }; problems: ProblemJson[] };
}

async function storedFor(problemId: string) {
  return withDatabase(file, async (db) => ({
    problem: await db.models.PracticeProblem.findByPk(problemId, { raw: true }),
    attempts: await db.models.Attempt.findAll({ where: { problemId }, raw: true }),
  }));
}

/**
 * A reply with what the student already has taken out: the prompt's text (each kind's property test
 * checks it holds no answer) and the echo of their own answers. What is left, the drawing included,
 * must not hold one.
 */
const searchable = (text: string) =>
  text
    .replace(/"promptHtml":"(?:[^"\\]|\\.)*"/g, "")
    .replace(/"(?:raw|readAs)":"(?:[^"\\]|\\.)*"/g, "")
    .replace(/"message":"Right: (?:[^"\\]|\\.)*"/g, "");

/** A leak as a whole reading: "8\"" inside "1/8\"" or "18\"" is a different number, not a leak. */
const leaksIn = (text: string, leaks: string[]) => leaks.filter((leak) => new RegExp(`(?<![\\d/]|\\d )${leak.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}`).test(searchable(text)));

const hoursAgo = (h: number) => new Date(Date.now() - h * 3600 * 1000);
const daysAhead = (d: number) => new Date(Date.now() + d * DAY_MS_FOR_TESTS);

let instructor: Person;
let avery: Person;
let bashir: Person;
let outsider: Person;
let classId: number;

beforeAll(async () => {
  instructor = await person("Tomasz Kowal", "instructor");
  avery = await person("Avery Plumb");
  bashir = await person("Bashir Level");
  outsider = await person("Odette Square");
  classId = await createClass(file, instructor.id, [avery.id, bashir.id]);
  const otherInstructor = await createPerson(file, "Greta Miter", "instructor");
  await createClass(file, otherInstructor.id, [outsider.id]);
});

describe("assignment variants", () => {
  it("are made on first opening, stay the same on every visit, and differ between students", async () => {
    const { id, itemIds } = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 3, points: 4 }]);
    const first = await work(avery, id);
    const again = await work(avery, id);
    expect(first.problems).toHaveLength(3);
    expect(again.problems.map((p) => [p.id, p.promptHtml])).toEqual(first.problems.map((p) => [p.id, p.promptHtml]));
    const theirs = await work(bashir, id);
    expect(theirs.problems.map((p) => p.id)).not.toEqual(first.problems.map((p) => p.id));
    expect(theirs.problems.map((p) => p.promptHtml)).not.toEqual(first.problems.map((p) => p.promptHtml));
    // The seeds are the HMAC ones, one row per variant, never a duplicate from two visits.
    const rows = await withDatabase(file, (db) => db.models.PracticeProblem.findAll({ where: { assignmentItemId: itemIds[0] }, order: [["variant", "ASC"]], raw: true }));
    expect(rows.filter((r) => r.userId === avery.id).map((r) => r.seed)).toEqual([0, 1, 2].map((v) => variantAnswers(secret, itemIds[0], avery.id, v, KIND, 1).seed));
    expect(rows).toHaveLength(6);
    expect(JSON.stringify(first)).not.toMatch(/seed/i);
  });
});

describe("who may see and answer", () => {
  it("refuses other classes, drafts, other students' problems and the instructor routes", async () => {
    const { id } = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 1, points: 2 }]);
    const draft = await createAssignment(file, classId, { status: "draft" }, [{ kind: KIND, level: 1, problemCount: 1, points: 2 }]);
    expect((await call(outsider, `/api/assignments/${id}/work`)).status).toBe(404);
    expect((await call(avery, `/api/assignments/${draft.id}/work`)).status).toBe(404);
    expect((await call(avery, `/api/assignments/999999/work`)).status).toBe(404);
    expect((await call(avery, `/api/assignments/abc/work`)).status).toBe(404);
    expect((await call(null, `/api/assignments/${id}/work`)).status).toBe(401);

    const bashirsProblem = (await work(bashir, id)).problems[0].id;
    await work(avery, id);
    expect((await call(avery, `/api/assignments/${id}/problems/${bashirsProblem}`)).status).toBe(404);
    expect((await call(avery, `/api/assignments/${id}/problems/${bashirsProblem}/answers`, { answers: { spaces: "3" } })).status).toBe(404);
    expect((await call(outsider, `/api/assignments/${id}/problems/${bashirsProblem}`)).status).toBe(404);
    expect((await storedFor(bashirsProblem)).attempts).toHaveLength(0);

    expect((await call(avery, `/api/assignments/${id}/students`)).status).toBe(403);
    expect((await call(avery, `/api/assignments/${id}/students/${bashir.id}`)).status).toBe(403);
    const stranger = await person("Hugo Scribe", "instructor");
    expect((await call(stranger, `/api/assignments/${id}/students`)).status).toBe(403);
    expect((await call(instructor, `/api/assignments/${id}/students/${outsider.id}`)).status).toBe(404);
    const list = await (await call(instructor, `/api/assignments/${id}/students`)).json();
    expect(list.students.map((s: { name: string }) => s.name)).toEqual([avery.name, bashir.name]);
  });

  it("the practice routes do not serve or take an assignment problem", async () => {
    const { id, itemIds } = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 1, points: 2 }]);
    const problem = (await work(avery, id)).problems[0];
    const { right } = variantAnswers(secret, itemIds[0], avery.id, 0, KIND, 1);
    expect((await call(avery, `/api/practice/${problem.id}`)).status).toBe(404);
    expect((await call(avery, `/api/practice/${problem.id}/answers`, { answers: right })).status).toBe(404);
    expect((await storedFor(problem.id)).attempts).toHaveLength(0);
    const history = await (await call(avery, "/api/practice/history")).json();
    expect(history.problems.map((p: { id: string }) => p.id)).not.toContain(problem.id);
  });
});

describe("dates and late work", () => {
  it("a try a day late under a 10% daily penalty is flagged late and keeps 90% of the points", async () => {
    const { id, itemIds } = await createAssignment(file, classId, { latePolicy: "penalty", latePenaltyPercent: 10 }, [{ kind: KIND, level: 1, problemCount: 1, points: 5 }]);
    const problem = (await work(avery, id)).problems[0];
    await updateAssignment(file, id, { dueAt: hoursAgo(12) });
    const { right } = variantAnswers(secret, itemIds[0], avery.id, 0, KIND, 1);
    const res = await call(avery, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: right });
    expect(res.status).toBe(200);
    const reply = await res.json();
    expect(reply.late).toBe(true);
    expect(reply.problem).toMatchObject({ status: "solved", earned: 4.5, accepting: false });
    expect(reply.problem.tries[0].late).toBe(true);
    const { attempts } = await storedFor(problem.id);
    expect(attempts.every((a) => a.assignmentItemId === itemIds[0] && a.userId === avery.id)).toBe(true);
    const mine = await work(avery, id);
    expect(mine).toMatchObject({ status: "late", late: true, score: { earned: 4.5, possible: 5 } });
    const list = await (await call(instructor, `/api/assignments/${id}/students`)).json();
    expect(list.students.find((s: { studentId: number }) => s.studentId === avery.id)).toMatchObject({ earned: 4.5, percent: 90, late: true, status: "late" });
    expect(list.students.find((s: { studentId: number }) => s.studentId === bashir.id)).toMatchObject({ earned: 0, status: "missing" });
  });

  it("after the due date with no late work the answer is refused and nothing is stored; before opening too", async () => {
    const { id, itemIds } = await createAssignment(file, classId, { latePolicy: "none" }, [{ kind: KIND, level: 1, problemCount: 1, points: 5 }]);
    const problem = (await work(avery, id)).problems[0];
    const { right } = variantAnswers(secret, itemIds[0], avery.id, 0, KIND, 1);
    await updateAssignment(file, id, { dueAt: hoursAgo(1) });
    const late = await call(avery, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: right });
    expect(late.status).toBe(409);
    expect((await late.json()).error.message).toMatch(/closed on .*late work is not taken/);
    let stored = await storedFor(problem.id);
    expect(stored.attempts).toHaveLength(0);
    expect(stored.problem).toMatchObject({ attemptsUsed: 0, status: "open" });
    // Closed for the student: the answers come out.
    expect((await work(avery, id)).problems[0].final).not.toBeNull();

    await updateAssignment(file, id, { opensAt: daysAhead(1), dueAt: daysAhead(2) });
    const early = await call(avery, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: right });
    expect(early.status).toBe(409);
    expect((await early.json()).error.message).toMatch(/opens on/);
    stored = await storedFor(problem.id);
    expect(stored.attempts).toHaveLength(0);
    const upcoming = await work(avery, id);
    expect(upcoming.timing.window).toBe("upcoming");
    expect(upcoming.problems).toHaveLength(0);
  });
});

describe("answers before final", () => {
  it("never leave the server before the problem is final, on any route; then they do", async () => {
    const { id, itemIds } = await createAssignment(file, classId, { attemptsAllowed: 3 }, [{ kind: KIND, level: 1, problemCount: 1, points: 3 }]);
    const problem = (await work(bashir, id)).problems[0];
    const { right, wrong, leaks } = variantAnswers(secret, itemIds[0], bashir.id, 0, KIND, 1);
    const before: string[] = [JSON.stringify(await work(bashir, id)), await (await call(bashir, `/api/assignments/${id}/problems/${problem.id}`)).text()];
    for (let attempt = 1; attempt <= 2; attempt++) {
      const res = await call(bashir, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: wrong });
      expect(res.status).toBe(200);
      const text = await res.text();
      before.push(text);
      expect(JSON.parse(text).problem).toMatchObject({ status: "open", attemptsUsed: attempt, final: null });
    }
    before.push(JSON.stringify(await work(bashir, id)), await (await call(bashir, `/api/assignments/${id}/problems/${problem.id}`)).text());
    for (const text of before) expect(leaksIn(text, leaks)).toEqual([]);

    const last = await (await call(bashir, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: right })).json();
    expect(last.problem).toMatchObject({ status: "solved", attemptsUsed: 3, earned: 3 });
    expect(Object.keys(last.problem.final.expected).sort()).toEqual(Object.keys(right).sort());
    expect(last.problem.tries).toHaveLength(3);
    // The search finds the answers once they are meant to be there, so its silence above means something.
    expect(leaksIn(JSON.stringify(last), leaks).length).toBeGreaterThan(0);
    expect((await call(bashir, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: right })).status).toBe(409);
    // The instructor sees the answers and every try.
    const review = (await (await call(instructor, `/api/assignments/${id}/students/${bashir.id}`)).json()).review;
    expect(review.problems[0].tries.map((t: { answers: unknown[] }) => t.answers.length)).toEqual([4, 4, 4]);
    expect(review.problems[0].final.expected).toBeTruthy();
    expect(review.score).toMatchObject({ earned: 3, possible: 3, percent: 100 });
  });

  it("under 'after the due date' a solved problem's solution waits for the student's due date", async () => {
    const { id, itemIds } = await createAssignment(file, classId, { reveal: "after-due", latePolicy: "penalty", latePenaltyPercent: 20 }, [{ kind: KIND, level: 1, problemCount: 1, points: 2 }]);
    const problem = (await work(avery, id)).problems[0];
    const { right, leaks } = variantAnswers(secret, itemIds[0], avery.id, 0, KIND, 1);
    const solved = await call(avery, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: right });
    const solvedText = await solved.text();
    expect(JSON.parse(solvedText).problem).toMatchObject({ status: "solved", final: null });
    expect(JSON.parse(solvedText).problem.solutionAfter).toBeTruthy();
    const views = [JSON.stringify(await work(avery, id)), await (await call(avery, `/api/assignments/${id}/problems/${problem.id}`)).text()];
    for (const text of views) {
      expect(text).toContain('"final":null');
      expect(leaksIn(text, leaks)).toEqual([]);
      expect(text).not.toContain("stepsHtml");
    }
    await updateAssignment(file, id, { dueAt: hoursAgo(1) });
    const after = await (await call(avery, `/api/assignments/${id}/problems/${problem.id}`)).json();
    expect(after.problem.final.stepsHtml.length).toBeGreaterThan(1);
  });

  it("extra tries from an extension reach open problems but never reopen one whose answers were shown", async () => {
    const { id, itemIds } = await createAssignment(file, classId, { attemptsAllowed: 1 }, [{ kind: KIND, level: 1, problemCount: 2, points: 2 }]);
    const [spent, fresh] = (await work(avery, id)).problems;
    const { wrong } = variantAnswers(secret, itemIds[0], avery.id, 0, KIND, 1);
    const failed = await (await call(avery, `/api/assignments/${id}/problems/${spent.id}/answers`, { answers: wrong })).json();
    expect(failed.problem.status).toBe("failed");
    expect(failed.problem.final).not.toBeNull();
    await withDatabase(file, (db) => db.models.AssignmentExtension.create({ assignmentId: id, studentId: avery.id, extraAttempts: 2, grantedBy: instructor.id }));
    const after = (await work(avery, id)).problems;
    expect(after.find((p) => p.id === spent.id)).toMatchObject({ status: "failed" });
    expect((await storedFor(fresh.id)).problem).toMatchObject({ status: "open", attemptsAllowed: 3 });
    expect((await call(avery, `/api/assignments/${id}/problems/${spent.id}/answers`, { answers: wrong })).status).toBe(409);
  });

  it("a 'full graduation' item takes an answer one graduation off as right", async () => {
    const { id, itemIds } = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 1, points: 2, tolerance: "full" }]);
    const problem = (await work(avery, id)).problems[0];
    const { right, parts, expected } = variantAnswers(secret, itemIds[0], avery.id, 0, KIND, 1);
    const gap = parts.find((p) => p.key === "gap")!;
    const off = { ...right, gap: expected.gap.add(1 / gap.precision).toFraction(true) };
    const reply = await (await call(avery, `/api/assignments/${id}/problems/${problem.id}/answers`, { answers: off })).json();
    expect(reply.problem.results.gap.verdict).toBe("correct");
  });
});

describe("scores", () => {
  it("equal a recomputation from the attempts rows", async () => {
    const items = [
      { kind: KIND, level: 1 as const, problemCount: 2, points: 4 },
      { kind: "mark-position", level: 1 as const, problemCount: 1, points: 6 },
    ];
    const { id, itemIds } = await createAssignment(file, classId, { latePolicy: "penalty", latePenaltyPercent: 15 }, items);
    const a = await work(avery, id);
    const b = await work(bashir, id);
    const answers = (who: Person, item: number, variant: number) => variantAnswers(secret, itemIds[item], who.id, variant, items[item].kind, 1);
    const post = (who: Person, problemId: string, body: Record<string, string>) => call(who, `/api/assignments/${id}/problems/${problemId}/answers`, { answers: body });
    // Avery: the first problem right on time, half of the second right on time.
    expect((await post(avery, a.problems[0].id, answers(avery, 0, 0).right)).status).toBe(200);
    const partly = answers(avery, 0, 1);
    const [firstKey] = Object.keys(partly.right);
    expect((await post(avery, a.problems[1].id, { ...partly.wrong, [firstKey]: partly.right[firstKey] })).status).toBe(200);
    // Then the due date passes: the rest of the second problem and the third come in late.
    await updateAssignment(file, id, { dueAt: hoursAgo(30) });
    expect((await post(avery, a.problems[1].id, Object.fromEntries(Object.entries(partly.right).filter(([k]) => k !== firstKey)))).status).toBe(200);
    expect((await post(avery, a.problems[2].id, answers(avery, 1, 0).right)).status).toBe(200);
    // Bashir: one wrong try, late.
    expect((await post(bashir, b.problems[2].id, answers(bashir, 1, 0).wrong)).status).toBe(200);

    const list = (await (await call(instructor, `/api/assignments/${id}/students`)).json()).students as { studentId: number; earned: number; possible: number }[];
    const expected = await recomputedScores(file, id);
    expect(expected.get(avery.id)).toBeGreaterThan(0);
    for (const row of list) {
      expect(row.possible).toBe(14);
      expect(row.earned).toBeCloseTo(expected.get(row.studentId) ?? 0, 2);
    }
    // Two days late at 15% a day (any part of a day counts): the late parts keep 70%.
    expect(list.find((r) => r.studentId === avery.id)!.earned).toBeLessThan(14);
  });
});
