// No answer leaves the server before its problem is final, on any route: a student with open
// practice and assignment problems (and a classmate from another class, and a visitor) fetches every
// GET route and every page of the access matrix, and every body is searched for the answers in every
// form they take. Then the problems are finished and the same search must find them, so it can fail.
import { beforeAll, describe, expect, inject, it } from "vitest";
import type { Level } from "@/lib/problems";
import { leaksIn, problemForms, type AnswerForm } from "../support/access-leaks";
import { PAGES } from "../support/access-pages";
import { API_ROUTES } from "../support/access-routes";
import { buildWorld, ITEM_KIND, ITEM_LEVEL, makeCast, requester, type Cast, type Principal, type Requester, type World } from "../support/access-world";
import { variantAnswers, withDatabase } from "../support/assignment-fixtures";

const baseURL = inject("baseURL");
const file = inject("databasePath");
const secret = inject("secret");

let cast: Cast;
let world: World;
let call: Requester;
let forms: AnswerForm[];
/**
 * The pages that are the same for everyone (lessons, calculators), fetched before any of the
 * fixtures' problems existed: a lesson's worked example that happens to read 21 5/8" is not a leak.
 */
const staticPages = new Map<string, string>();

const VISITORS: Principal[] = ["student", "otherStudent", "anonymous"];

/** Every GET route and page in the matrix, as `who`: the reads any of them could reach, and the ones they must be refused. */
type Reply = { where: string; url: string; status: number; body: string };

async function everyResponse(who: Principal): Promise<Reply[]> {
  const out: Reply[] = [];
  for (const [key, row] of Object.entries(API_ROUTES).filter(([k]) => k.startsWith("GET "))) {
    const url = row.url({ world, cast, who, secret });
    const res = await call(who, url);
    out.push({ where: `${key} (${url}) as ${who}`, url, status: res.status, body: await res.text() });
  }
  for (const [key, row] of Object.entries(PAGES)) {
    const url = row.url({ world, cast });
    const res = await call(who, url);
    out.push({ where: `page ${key} (${url}) as ${who}`, url, status: res.status, body: await res.text() });
  }
  // The worksheets' printable sheets and the student's photo file are reached by address too.
  for (const url of [`/classes/${world.classA}/assignments/${world.assignmentA}/worksheets?print=1`, `/api/uploads/${world.uploadA}?size=thumb`]) {
    const res = await call(who, url);
    out.push({ where: `${url} as ${who}`, url, status: res.status, body: await res.text() });
  }
  return out;
}

async function openProblems() {
  return withDatabase(file, async (db) => {
    const rows = await db.models.PracticeProblem.findAll({ where: { userId: cast.student.id }, raw: true });
    return rows.map((r) => ({ id: r.id, kind: r.kind, level: r.level as Level, seed: r.seed, variant: r.variant, status: r.status, fromAssignment: r.assignmentItemId !== null }));
  });
}

const leaks = (reply: Reply) => leaksIn(reply.body, forms, staticPages.get(reply.url));

beforeAll(async () => {
  cast = await makeCast(baseURL, file);
  call = requester(baseURL, cast);
  for (const row of Object.values(PAGES)) {
    let url: string;
    try {
      // A page whose address needs a fixture's id is not the same for everyone; only the others are kept.
      url = row.url({ world: new Proxy({} as World, { get: () => { throw new Error("needs a fixture"); } }), cast });
    } catch {
      continue;
    }
    staticPages.set(url, await (await call("anonymous", url)).text());
  }
  world = await buildWorld(baseURL, file, cast);
  const problems = await openProblems();
  // Both variants of the assignment item and the practice problem, each with a wrong try on record.
  expect(problems.filter((p) => p.fromAssignment)).toHaveLength(2);
  expect(problems.filter((p) => !p.fromAssignment)).toHaveLength(1);
  const { wrong } = variantAnswers(secret, world.itemA, cast.student.id, 0, ITEM_KIND, ITEM_LEVEL);
  expect((await call("student", `/api/assignments/${world.assignmentA}/problems/${world.problemA}/answers`, { method: "POST", body: { answers: wrong } })).status).toBe(200);
  const practiceWrong = Object.fromEntries(world.practiceParts.map((key) => [key, "1"]));
  expect((await call("student", `/api/practice/${world.practiceA}/answers`, { method: "POST", body: { answers: practiceWrong } })).status).toBe(200);
  expect((await openProblems()).every((p) => p.status === "open")).toBe(true);
  forms = problems.flatMap((p) => problemForms(p.kind, p.seed, p.level, p.fromAssignment ? `variant ${p.variant}` : "practice"));
}, 120_000);

describe("answers before a problem is final", () => {
  it("have forms to search for: fractions, decimals and the worked steps", () => {
    expect(forms.some((f) => f.what.includes("worked step"))).toBe(true);
    expect(forms.some((f) => f.what.includes("/"))).toBe(true);
    expect(forms.some((f) => / as \d+\.\d+ in\.$/.test(f.what))).toBe(true);
  });

  it.each(VISITORS)("appear in no route or page reached as %s", async (who) => {
    const responses = await everyResponse(who);
    const found = responses.flatMap((r) => leaks(r).map((what) => `${r.where} [${r.status}] shows ${what}`));
    expect(found).toEqual([]);
    // The student did reach their own work: the search ran over real problem pages, not only refusals.
    if (who === "student") {
      const reached = responses.filter((r) => r.status === 200).map((r) => r.where);
      for (const part of ["GET /api/assignments/[assignmentId]/work", "GET /api/practice/[id]", "page /my-classes/[classId]/assignments/[assignmentId]", "page /practice/[id]"]) {
        expect(reached.some((w) => w.startsWith(part)), `${part} answered the student`).toBe(true);
      }
    }
  }, 180_000);

  it("do appear once the problems are finished, where the student looks", async () => {
    const { right } = variantAnswers(secret, world.itemA, cast.student.id, 0, ITEM_KIND, ITEM_LEVEL);
    const solved = await call("student", `/api/assignments/${world.assignmentA}/problems/${world.problemA}/answers`, { method: "POST", body: { answers: right } });
    expect(solved.status).toBe(200);
    // Practice: spend the remaining tries on wrong answers until the problem is out of tries.
    for (let i = 0; i < 6; i++) {
      const res = await call("student", `/api/practice/${world.practiceA}/answers`, { method: "POST", body: { answers: Object.fromEntries(world.practiceParts.map((key) => [key, "1"])) } });
      if (res.status !== 200 || (await res.json()).problem.status !== "open") break;
    }
    const statuses = Object.fromEntries((await openProblems()).map((p) => [p.fromAssignment ? `variant ${p.variant}` : "practice", p.status]));
    expect(statuses).toEqual({ "variant 0": "solved", "variant 1": "open", practice: "failed" });

    const responses = await everyResponse("student");
    const shown = (where: string) => responses.filter((r) => r.where.startsWith(where)).flatMap(leaks);
    for (const where of ["GET /api/assignments/[assignmentId]/work", "GET /api/assignments/[assignmentId]/problems/[problemId]", "page /my-classes/[classId]/assignments/[assignmentId]"]) {
      const found = shown(where);
      expect(found.filter((w) => w.startsWith("variant 0")).length, `${where} shows the solved variant's answers`).toBeGreaterThan(0);
      expect(found.filter((w) => !w.startsWith("variant 0") && !w.startsWith("practice")), `${where} still hides the open variant`).toEqual([]);
    }
    for (const where of ["GET /api/practice/[id]", "page /practice/[id]"]) {
      expect(shown(where).filter((w) => w.startsWith("practice")).length, `${where} shows the finished practice answers`).toBeGreaterThan(0);
    }
    // The classmate and the visitor still see none of it.
    for (const who of ["otherStudent", "anonymous"] as const) {
      const found = (await everyResponse(who)).flatMap((r) => leaks(r).map((what) => `${r.where} shows ${what}`));
      expect(found).toEqual([]);
    }
  }, 300_000);
});
