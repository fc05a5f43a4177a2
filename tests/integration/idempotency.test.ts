import { randomUUID } from "node:crypto";
import { QueryTypes } from "sequelize";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { createAssignment, createClass, createPerson, signedInPerson, withDatabase } from "../support/assignment-fixtures";

const baseURL = inject("baseURL");
const file = inject("databasePath");
const KIND = "even-gap";

type Who = { id: number | null; cookie: string };

const student = (name: string): Promise<Who> => signedInPerson(baseURL, file, name);

function post(who: Who, path: string, body: unknown, key?: string): Promise<Response> {
  return fetch(`${baseURL}${path}`, {
    method: "POST",
    headers: { "content-type": "application/json", cookie: who.cookie, ...(key === undefined ? {} : { "Idempotency-Key": key }) },
    body: JSON.stringify(body),
  });
}

/** A new practice problem and an unreadable-free wrong answer for each of its parts. */
async function newProblem(who: Who): Promise<{ id: string; wrong: Record<string, string>; other: Record<string, string> }> {
  const res = await post(who, "/api/practice", { kind: KIND, level: 1 });
  expect(res.status).toBe(201);
  const set = res.headers.getSetCookie().find((c) => c.startsWith("sixteenths-visitor="));
  if (set) who.cookie = [who.cookie, set.split(";")[0]].filter(Boolean).join("; ");
  const { problem } = (await res.json()) as { problem: { id: string; parts: { key: string }[] } };
  // Whole feet of nonsense: readable, and never the right gap for a level-1 layout.
  return { id: problem.id, wrong: Object.fromEntries(problem.parts.map((p) => [p.key, "997"])), other: Object.fromEntries(problem.parts.map((p) => [p.key, "998"])) };
}

async function stored(problemId: string) {
  return withDatabase(file, async (db) => {
    const q = <T extends object>(sql: string) => db.sequelize.query<T>(sql, { replacements: [problemId], type: QueryTypes.SELECT });
    const [problem] = await q<{ attemptsUsed: number; status: string }>("SELECT attempts_used AS attemptsUsed, status FROM practice_problems WHERE id = ?");
    const tries = await q<{ submission: number }>("SELECT DISTINCT submission FROM attempts WHERE problem_id = ? ORDER BY submission");
    const receipts = await q<{ key: string; submission: number }>("SELECT key, submission FROM answer_receipts WHERE problem_id = ? ORDER BY submission");
    return { ...problem, tries: tries.map((t) => t.submission), receipts };
  });
}

let ana: Who;
let ben: Who;
beforeAll(async () => {
  ana = await student("Ana Idempotent");
  ben = await student("Ben Idempotent");
});

describe("answers with an Idempotency-Key", () => {
  it("a replay returns the first reply, byte for byte, and stores nothing new", async () => {
    const problem = await newProblem(ana);
    const key = randomUUID();
    const first = await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong, timeMs: 4000 }, key);
    expect(first.status).toBe(200);
    const firstText = await first.text();
    expect(JSON.parse(firstText).problem).toMatchObject({ attemptsUsed: 1, status: "open" });

    const again = await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong, timeMs: 4000 }, key);
    expect(again.status).toBe(200);
    expect(again.headers.get("idempotent-replayed")).toBe("true");
    expect(await again.text()).toBe(firstText);
    expect(await stored(problem.id)).toMatchObject({ attemptsUsed: 1, tries: [1], receipts: [{ key, submission: 1 }] });
  });

  it("ten identical requests racing store exactly one try, and all ten get the same reply", async () => {
    const problem = await newProblem(ana);
    const key = randomUUID();
    const replies = await Promise.all(Array.from({ length: 10 }, () => post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, key)));
    expect(replies.map((r) => r.status)).toEqual(Array(10).fill(200));
    const bodies = await Promise.all(replies.map((r) => r.text()));
    expect(new Set(bodies).size).toBe(1);
    expect(JSON.parse(bodies[0]).problem.attemptsUsed).toBe(1);
    expect(await stored(problem.id)).toMatchObject({ attemptsUsed: 1, tries: [1], receipts: [{ key, submission: 1 }] });
  });

  it("the same key with other answers, or at another problem, is refused with a plain message and stores nothing", async () => {
    const problem = await newProblem(ana);
    const key = randomUUID();
    expect((await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, key)).status).toBe(200);

    const changed = await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.other }, key);
    expect(changed.status).toBe(409);
    const { error } = await changed.json();
    expect(error.message).toMatch(/already used for different answers/);
    expect(error.fields["Idempotency-Key"]).toBeTruthy();

    const elsewhere = await newProblem(ana);
    expect((await post(ana, `/api/practice/${elsewhere.id}/answers`, { answers: elsewhere.wrong }, key)).status).toBe(409);
    expect(await stored(problem.id)).toMatchObject({ attemptsUsed: 1, tries: [1] });
    expect(await stored(elsewhere.id)).toMatchObject({ attemptsUsed: 0, tries: [], receipts: [] });
  });

  it("keys belong to one learner: another student's identical key is a new submission of theirs", async () => {
    const key = randomUUID();
    const mine = await newProblem(ana);
    const theirs = await newProblem(ben);
    expect((await post(ana, `/api/practice/${mine.id}/answers`, { answers: mine.wrong }, key)).status).toBe(200);
    const res = await post(ben, `/api/practice/${theirs.id}/answers`, { answers: theirs.wrong }, key);
    expect(res.status).toBe(200);
    expect(res.headers.get("idempotent-replayed")).toBeNull();
    expect(await stored(theirs.id)).toMatchObject({ attemptsUsed: 1, receipts: [{ key }] });
  });

  it("without a key an answer still counts (older pages), and a malformed key is a 400 that stores nothing", async () => {
    const problem = await newProblem(ana);
    const bad = await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, "not-a-uuid");
    expect(bad.status).toBe(400);
    expect((await bad.json()).error.fields["Idempotency-Key"]).toMatch(/UUID/);
    expect(await stored(problem.id)).toMatchObject({ attemptsUsed: 0, tries: [] });

    expect((await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong })).status).toBe(200);
    expect((await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong })).status).toBe(200);
    expect(await stored(problem.id)).toMatchObject({ attemptsUsed: 2, tries: [1, 2], receipts: [] });
  });

  it("retries never spend a try: three keyed tries with replays in between use three, and a replay after the problem is out of tries still gets its reply", async () => {
    const problem = await newProblem(ana);
    const keys = [randomUUID(), randomUUID(), randomUUID()];
    const firstReplies: string[] = [];
    for (const key of keys) {
      const res = await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, key);
      expect(res.status).toBe(200);
      firstReplies.push(await res.text());
      const replays = await Promise.all([0, 1].map(() => post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, key)));
      expect(replays.map((r) => r.status)).toEqual([200, 200]);
    }
    const after = await stored(problem.id);
    expect(after).toMatchObject({ attemptsUsed: 3, status: "failed", tries: [1, 2, 3] });
    expect(after.receipts.map((r) => r.key)).toEqual(keys);
    const late = await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, keys[0]);
    expect(late.status).toBe(200);
    expect(await late.text()).toBe(firstReplies[0]);
    // A new key at the finished problem is a new submission, and it is refused as before.
    expect((await post(ana, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, randomUUID())).status).toBe(409);
  });

  it("an anonymous visitor's keyed answer is replayed the same way", async () => {
    const visitor: Who = { id: null, cookie: "" };
    const problem = await newProblem(visitor);
    const key = randomUUID();
    const first = await post(visitor, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, key);
    expect(first.status).toBe(200);
    const replay = await post(visitor, `/api/practice/${problem.id}/answers`, { answers: problem.wrong }, key);
    expect(await replay.text()).toBe(await first.text());
    expect(await stored(problem.id)).toMatchObject({ attemptsUsed: 1, tries: [1], receipts: [{ key }] });
  });

  it("an assignment answer is stored once under racing retries, and its replay carries the same score and late flag", async () => {
    const instructor = await createPerson(file, "Inez Idempotent", "instructor");
    const classId = await createClass(file, instructor.id, [ben.id!]);
    const assignment = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 1, points: 10 }]);
    const workRes = await fetch(`${baseURL}/api/assignments/${assignment.id}/work`, { headers: { cookie: ben.cookie } });
    expect(workRes.status).toBe(200);
    const [problem] = (await workRes.json()).work.problems as { id: string; parts: { key: string }[] }[];
    const answers = Object.fromEntries(problem.parts.map((p) => [p.key, "997"]));
    const key = randomUUID();
    const url = `/api/assignments/${assignment.id}/problems/${problem.id}/answers`;
    const replies = await Promise.all(Array.from({ length: 6 }, () => post(ben, url, { answers }, key)));
    expect(replies.map((r) => r.status)).toEqual(Array(6).fill(200));
    const bodies = await Promise.all(replies.map((r) => r.text()));
    expect(new Set(bodies).size).toBe(1);
    expect(JSON.parse(bodies[0])).toMatchObject({ late: false, problem: { attemptsUsed: 1 } });
    expect(await stored(problem.id)).toMatchObject({ attemptsUsed: 1, tries: [1], receipts: [{ key }] });
    // The same key and answers at the practice route are a different request.
    expect((await post(ben, `/api/practice/${problem.id}/answers`, { answers }, key)).status).toBe(409);
  });
});
