import { describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/lib/db";
import { findKind, type Level } from "@/lib/problems";
import { DEMO_PASSWORD, DEMO_STUDENTS } from "@/seeders/demo";
import { answersFor } from "../support/assignment-fixtures";
import { signInCookie } from "../support/http";

const baseURL = inject("baseURL");
const KIND = "even-gap";
const FIXED_SEED = 424242;

type Client = { cookie: string; call: (path: string, body?: unknown) => Promise<Response> };

function client(cookie = ""): Client {
  const jar = { cookie };
  return {
    get cookie() {
      return jar.cookie;
    },
    call: async (path, body) => {
      const res = await fetch(`${baseURL}${path}`, {
        method: body === undefined ? "GET" : "POST",
        headers: { "content-type": "application/json", ...(jar.cookie ? { cookie: jar.cookie } : {}) },
        body: body === undefined ? undefined : JSON.stringify(body),
      });
      const set = res.headers.getSetCookie().find((c) => c.startsWith("sixteenths-visitor="));
      if (set) jar.cookie = [jar.cookie, set.split(";")[0]].filter(Boolean).join("; ");
      return res;
    },
  };
}

/** Pins a problem to a known seed, written straight into the app's database, so the test knows its answers. */
async function pin(id: string): Promise<void> {
  const database = openDatabase(inject("databasePath"));
  await database.models.PracticeProblem.update({ seed: FIXED_SEED }, { where: { id } });
  await database.sequelize.close();
}

async function storedAttempts(id: string) {
  const database = openDatabase(inject("databasePath"));
  const rows = await database.models.Attempt.findAll({ where: { problemId: id }, raw: true });
  const problem = await database.models.PracticeProblem.findByPk(id, { raw: true });
  await database.sequelize.close();
  return { rows, problem };
}

const expectedFor = (level: Level) => answersFor(KIND, FIXED_SEED, level);

async function newPinnedProblem(c: Client, level: Level = 1) {
  const res = await c.call("/api/practice", { kind: KIND, level });
  expect(res.status).toBe(201);
  const { problem } = await res.json();
  await pin(problem.id);
  return problem.id as string;
}

describe("practice problems", () => {
  it("an anonymous visitor gets a problem and a cookie that owns it; nobody else can see it", async () => {
    const visitor = client();
    const id = await newPinnedProblem(visitor);
    expect(visitor.cookie).toMatch(/^sixteenths-visitor=[0-9a-f-]{36}$/);
    const view = await (await visitor.call(`/api/practice/${id}`)).json();
    expect(view.problem).toMatchObject({ id, kind: KIND, status: "open", final: null, attemptsUsed: 0 });
    expect(JSON.stringify(view)).not.toMatch(/seed/i);

    const stranger = client();
    await stranger.call("/api/practice", { next: true });
    expect((await stranger.call(`/api/practice/${id}`)).status).toBe(404);
    expect((await stranger.call(`/api/practice/${id}/answers`, { answers: {} })).status).toBe(404);
    const student = client((await signInCookie(baseURL, DEMO_STUDENTS[4].email, DEMO_PASSWORD))!);
    expect((await student.call(`/api/practice/${id}`)).status).toBe(404);
  });

  it("unreadable answers are a 400 naming each box, and count as no attempt", async () => {
    const visitor = client();
    const id = await newPinnedProblem(visitor);
    const { parts } = expectedFor(1);
    const res = await visitor.call(`/api/practice/${id}/answers`, { answers: Object.fromEntries(parts.map((p) => [p.key, "12 3/"])) });
    expect(res.status).toBe(400);
    const body = await res.json();
    expect(Object.keys(body.error.fields).sort()).toEqual(parts.map((p) => p.key).sort());
    const { rows, problem } = await storedAttempts(id);
    expect(rows).toHaveLength(0);
    expect(problem?.attemptsUsed).toBe(0);

    expect((await visitor.call(`/api/practice/${id}/answers`, { answers: { nope: "1" } })).status).toBe(400);
    expect((await visitor.call(`/api/practice/${id}/answers`, { answers: "22" })).status).toBe(400);
    expect((await visitor.call("/api/practice", { kind: "no-such-kind", level: 1 })).status).toBe(400);
    expect((await visitor.call("/api/practice", { kind: KIND, level: 7 })).status).toBe(400);
  });

  it("no answer leaves the server before the problem is final; then the answers and the worked solution do", async () => {
    const student = client((await signInCookie(baseURL, DEMO_STUDENTS[14].email, DEMO_PASSWORD))!);
    const id = await newPinnedProblem(student);
    const { right, wrong, leaks } = expectedFor(1);
    const before: string[] = [JSON.stringify(await (await student.call(`/api/practice/${id}`)).json())];

    for (let attempt = 1; attempt <= 2; attempt++) {
      const res = await student.call(`/api/practice/${id}/answers`, { answers: wrong, timeMs: 30_000 });
      expect(res.status).toBe(200);
      const text = await res.text();
      before.push(text);
      const { problem } = JSON.parse(text);
      expect(problem).toMatchObject({ status: "open", attemptsUsed: attempt, final: null });
      for (const result of Object.values(problem.results) as { verdict: string }[]) expect(result.verdict).not.toBe("correct");
    }
    for (const text of before) for (const leak of leaks) expect(text, `leaked ${leak}`).not.toContain(leak);

    const last = await (await student.call(`/api/practice/${id}/answers`, { answers: right })).json();
    expect(last.problem).toMatchObject({ status: "solved", attemptsUsed: 3 });
    expect(Object.keys(last.problem.final.expected).sort()).toEqual(Object.keys(right).sort());
    expect(last.problem.final.stepsHtml.length).toBeGreaterThan(1);
    expect(last.problem.final.stepsHtml.join("")).toContain('class="katex"');

    const { rows, problem } = await storedAttempts(id);
    expect(problem).toMatchObject({ status: "solved", attemptsUsed: 3 });
    expect(rows).toHaveLength(3 * Object.keys(right).length);
    const row = rows.find((r) => r.submission === 3)!;
    expect(row).toMatchObject({ kind: KIND, level: 1, seed: FIXED_SEED, verdict: "correct" });
    expect(row.expected).toMatch(/^-?\d+(\/\d+)?$/);

    // Final is final: another try is refused and changes nothing.
    expect((await student.call(`/api/practice/${id}/answers`, { answers: right })).status).toBe(409);
    const history = await (await student.call("/api/practice/history")).json();
    expect(history.problems[0]).toMatchObject({ id, status: "solved" });
    expect(history.mastery.find((m: { skill: string }) => m.skill === findKind(KIND)!.skill).levels[0].solvedOfLastFive).toBe(1);
    const { mastery } = await (await student.call("/api/practice/mastery")).json();
    expect(mastery).toEqual(history.mastery);
  });

  it("tries sent at once are each stored whole or refused whole, never lost or half-written", async () => {
    const visitor = client();
    // One after another: the first reply sets the visitor cookie the others must carry.
    const ids = [await newPinnedProblem(visitor), await newPinnedProblem(visitor), await newPinnedProblem(visitor)];
    const { wrong } = expectedFor(1);
    // Tries at different problems arriving together share a commit; two at one problem race for it.
    const replies = await Promise.all([...ids, ids[0]].map((id) => visitor.call(`/api/practice/${id}/answers`, { answers: wrong })));
    const statuses = replies.map((r) => r.status);
    expect(statuses.slice(1, 3)).toEqual([200, 200]);
    // The racing pair: the second either lost the race (409) or arrived after the first was stored (a second try).
    const raced = [statuses[0], statuses[3]].filter((s) => s === 200).length;
    expect([statuses[0], statuses[3]].every((s) => s === 200 || s === 409)).toBe(true);
    expect(raced).toBeGreaterThanOrEqual(1);
    for (const id of ids) {
      const { rows, problem } = await storedAttempts(id);
      const acknowledged = id === ids[0] ? raced : 1;
      expect(problem?.attemptsUsed).toBe(acknowledged);
      expect(rows).toHaveLength(acknowledged * Object.keys(wrong).length);
    }
  });

  it("history needs an account; a student cannot skip ahead to a level they have not opened", async () => {
    expect((await client().call("/api/practice/history")).status).toBe(401);
    expect((await client().call("/api/practice/mastery")).status).toBe(401);
    const student = client((await signInCookie(baseURL, DEMO_STUDENTS[6].email, DEMO_PASSWORD))!);
    expect((await student.call("/api/practice", { kind: KIND, level: 3 })).status).toBe(403);
    expect((await student.call("/api/practice/history?page=0")).status).toBe(400);
  });

  it("answers are rate limited per learner with a Retry-After", async () => {
    const visitor = client();
    const id = await newPinnedProblem(visitor);
    let limited: Response | undefined;
    for (let i = 0; i < 40 && !limited; i++) {
      const res = await visitor.call(`/api/practice/${id}/answers`, { answers: { x: "1" } });
      if (res.status === 429) limited = res;
    }
    expect(limited?.headers.get("retry-after")).toMatch(/^\d+$/);
  });
});
