import { beforeAll, describe, expect, inject, it } from "vitest";
import { formatMeasure } from "@/lib/layout";
import { createAssignment, createClass, createPerson, signedInPerson, variantAnswers, withDatabase, type SignedInPerson } from "../support/assignment-fixtures";

const baseURL = inject("baseURL");
const file = inject("databasePath");
const secret = inject("secret");
const KIND = "even-gap";

type Person = SignedInPerson;

const person = (name: string, role: "student" | "instructor" = "student") => signedInPerson(baseURL, file, name, role);

async function page(who: Person, path: string): Promise<{ status: number; html: string }> {
  const res = await fetch(`${baseURL}${path}`, { headers: { cookie: who.cookie }, redirect: "manual" });
  return { status: res.status, html: await res.text() };
}

/** Text as a reader sees it: tags dropped, entities and the payload's escaped quotes undone. */
const readable = (html: string) =>
  html
    .replace(/<[^>]+>/g, " ")
    .replace(/\\+"/g, '"')
    .replace(/&quot;/g, '"')
    .replace(/&#x27;|&#39;/g, "'")
    .replace(/&lt;/g, "<")
    .replace(/&gt;/g, ">")
    .replace(/&amp;/g, "&");

/** A reading as a whole: "8\"" inside "1/8\"" or "18\"" is a different number. */
const holds = (text: string, reading: string) => new RegExp(`(?<![\\d/]|\\d )${reading.replace(/[.*+?^${}()|[\]\\]/g, "\\$&")}`).test(text);

/** The printed articles of one kind (worksheet or answer key) by student id, from the HTML (not the payload). */
function articles(html: string, attribute: "data-worksheet" | "data-answer-key"): Map<number, string> {
  const found = new Map<number, string>();
  for (const m of html.matchAll(new RegExp(`<article[^>]*${attribute}="(\\d+)"[^>]*>([\\s\\S]*?)</article>`, "g"))) found.set(Number(m[1]), m[2]);
  return found;
}

function problemSections(article: string): string[] {
  return [...article.matchAll(/<section[^>]*data-sheet-problem="\d+"[^>]*>([\s\S]*?)<\/section>/g)].map((m) => m[1]);
}

/** Each of a student's variants as the key should give it: the length to the asked graduation, counts whole. */
function expectedOf(itemId: number, studentId: number, problemCount: number) {
  return Array.from({ length: problemCount }, (_, variant) => {
    const { parts, expected } = variantAnswers(secret, itemId, studentId, variant, KIND, 1);
    return parts.map((p) => ({
      key: p.key,
      answer: p.answer,
      text: p.answer === "count" ? expected[p.key].toString() : formatMeasure(expected[p.key], { denominator: p.precision, style: p.style ?? "inches" }).text,
    }));
  });
}

let instructor: Person;
let students: Person[];
let outsider: Person;
let classId: number;

beforeAll(async () => {
  instructor = await person("Ines Scribe", "instructor");
  students = [await person("Avery Kerf"), await person("Bashir Plumb"), await person("Carmen Batten")];
  outsider = await person("Odette Stringer");
  classId = await createClass(file, instructor.id, students.map((s) => s.id));
  const otherInstructor = await createPerson(file, "Greta Miter", "instructor");
  await createClass(file, otherInstructor.id, [outsider.id]);
});

describe("printable worksheets", () => {
  it("give every active student a sheet with their own numbers, the same the screen shows", async () => {
    const { id, itemIds } = await createAssignment(file, classId, { title: "Batten layout by hand" }, [{ kind: KIND, level: 1, problemCount: 2, points: 4 }]);
    const { status, html } = await page(instructor, `/classes/${classId}/assignments/${id}/worksheets`);
    expect(status).toBe(200);
    const sheets = articles(html, "data-worksheet");
    expect([...sheets.keys()]).toEqual(students.map((s) => s.id));
    for (const s of students) expect(readable(sheets.get(s.id)!)).toContain(s.name);
    expect(html).not.toContain(outsider.name);

    // Printing made the variants with the stored seeds, and the student's screen shows the same prompts.
    const rows = await withDatabase(file, (db) => db.models.PracticeProblem.findAll({ where: { assignmentItemId: itemIds[0] }, order: [["userId", "ASC"], ["variant", "ASC"]], raw: true }));
    expect(rows.map((r) => [r.userId, r.seed])).toEqual(students.flatMap((s) => [0, 1].map((v) => [s.id, variantAnswers(secret, itemIds[0], s.id, v, KIND, 1).seed])));
    const work = await (await fetch(`${baseURL}/api/assignments/${id}/work`, { headers: { cookie: students[1].cookie } })).json();
    const sections = problemSections(sheets.get(students[1].id)!);
    expect(sections).toHaveLength(2);
    work.work.problems.forEach((p: { promptHtml: string }, i: number) => expect(sections[i]).toContain(p.promptHtml));
  });

  it("keep the answers out of the sheets and put each variant's answers and steps in the key", async () => {
    const { id, itemIds } = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 2, points: 4 }]);
    const { html } = await page(instructor, `/classes/${classId}/assignments/${id}/worksheets`);
    const firstKey = html.indexOf("data-answer-key=");
    expect(firstKey).toBeGreaterThan(0);
    const beforeKey = html.slice(0, firstKey);
    expect(beforeKey).not.toContain("data-expected");
    expect(readable(beforeKey)).not.toContain("Worked steps");

    const sheets = articles(html, "data-worksheet");
    const keys = articles(html, "data-answer-key");
    expect([...keys.keys()]).toEqual(students.map((s) => s.id));
    for (const s of students) {
      const expected = expectedOf(itemIds[0], s.id, 2);
      // Each prompt is checked against its own answers: another problem's given width may equal this gap.
      problemSections(sheets.get(s.id)!).forEach((section, n) => {
        for (const part of expected[n].filter((p) => p.answer === "length")) expect(holds(readable(section), part.text), `${s.name} problem ${n + 1} ${part.key}`).toBe(false);
      });
      const shown = [...keys.get(s.id)!.matchAll(/data-expected="([^"]+)"[^>]*>([^<]*)</g)].map((m) => [m[1], readable(m[2]).trim()]);
      const wanted = expected.flat();
      expect(shown.map(([key]) => key)).toEqual(wanted.map((p) => p.key));
      shown.forEach(([, text], i) => expect(text.startsWith(wanted[i].text), `${text} starts with ${wanted[i].text}`).toBe(true));
      expect(readable(keys.get(s.id)!)).toContain("Worked steps");
      expect(readable(keys.get(s.id)!)).toContain(s.name);
    }
  });

  it("print the sheets alone, the key alone, or one student", async () => {
    const { id, itemIds } = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 1, points: 4 }]);
    const base = `/classes/${classId}/assignments/${id}/worksheets`;

    const without = await page(instructor, `${base}?key=without`);
    expect(articles(without.html, "data-worksheet").size).toBe(3);
    // Not rendered and not in the page's payload either.
    expect(without.html).not.toContain("data-answer-key");
    expect(without.html).not.toContain("data-expected");
    expect(readable(without.html)).not.toContain("instructor's copy");

    const only = await page(instructor, `${base}?key=only`);
    expect(articles(only.html, "data-worksheet").size).toBe(0);
    expect(articles(only.html, "data-answer-key").size).toBe(3);

    const one = await page(instructor, `${base}?student=${students[2].id}`);
    expect([...articles(one.html, "data-worksheet").keys()]).toEqual([students[2].id]);
    expect([...articles(one.html, "data-answer-key").keys()]).toEqual([students[2].id]);
    const rows = await withDatabase(file, (db) => db.models.PracticeProblem.count({ where: { assignmentItemId: itemIds[0] } }));
    expect(rows).toBe(3);

    expect((await page(instructor, `${base}?student=${outsider.id}`)).status).toBe(404);
    // An unreadable choice prints the whole set rather than failing.
    expect(articles((await page(instructor, `${base}?key=everything&student=abc`)).html, "data-worksheet").size).toBe(3);
  });

  it("wait for a draft to be published", async () => {
    const { id, itemIds } = await createAssignment(file, classId, { status: "draft" }, [{ kind: KIND, level: 1, problemCount: 1, points: 4 }]);
    const { status, html } = await page(instructor, `/classes/${classId}/assignments/${id}/worksheets`);
    expect(status).toBe(200);
    expect(readable(html)).toContain("Worksheets are printed from a published assignment");
    expect(articles(html, "data-worksheet").size).toBe(0);
    expect(await withDatabase(file, (db) => db.models.PracticeProblem.count({ where: { assignmentItemId: itemIds[0] } }))).toBe(0);
  });

  it("refuse students, other instructors and the wrong class's address", async () => {
    const { id, itemIds } = await createAssignment(file, classId, {}, [{ kind: KIND, level: 1, problemCount: 1, points: 4 }]);
    const path = `/classes/${classId}/assignments/${id}/worksheets`;
    expect((await page(students[0], path)).status).toBe(403);
    expect((await page(outsider, path)).status).toBe(403);
    const stranger = await person("Hugo Rasp", "instructor");
    expect((await page(stranger, path)).status).toBe(403);
    expect((await page(instructor, `/classes/${classId + 1000}/assignments/${id}/worksheets`)).status).toBe(404);
    expect((await page(instructor, `/classes/${classId}/assignments/999999/worksheets`)).status).toBe(404);
    // A refused visit makes nothing.
    expect(await withDatabase(file, (db) => db.models.PracticeProblem.count({ where: { assignmentItemId: itemIds[0] } }))).toBe(0);
    const anonymous = await fetch(`${baseURL}${path}`, { redirect: "manual" });
    expect([302, 307]).toContain(anonymous.status);
    expect(anonymous.headers.get("location")).toContain("/signin");
  });
});
