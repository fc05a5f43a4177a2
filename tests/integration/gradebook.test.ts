import Papa from "papaparse";
import { beforeAll, describe, expect, inject, it } from "vitest";
import type { Gradebook, OverrideEntry } from "@/lib/gradebook/types";
import { recomputedScores } from "../support/assignment-scores";
import { createAssignment, createClass, signedInPerson, withDatabase, type SignedInPerson } from "../support/assignment-fixtures";
import { generateTries, randomFrom } from "../support/gradebook-data";
import { waitForMail } from "../support/mail-catcher";

// The gradebook over real HTTP against the built app, real SQLite and maildev. The class, its
// people and their tries are made here, so nothing another file does moves these numbers.

const baseURL = inject("baseURL");
const mailURL = inject("mailURL");
const file = inject("databasePath");
const secret = inject("secret");
const DAY = 24 * 3600 * 1000;

type Person = SignedInPerson;

const person = (name: string, role: "student" | "instructor" = "student") => signedInPerson(baseURL, file, name, role);

async function call(who: Person | null, path: string, body?: unknown, raw = false): Promise<Response> {
  return fetch(`${baseURL}${path}`, {
    method: body === undefined ? "GET" : "POST",
    headers: { "content-type": "application/json", ...(who ? { cookie: who.cookie } : {}) },
    body: body === undefined ? undefined : raw ? (body as string) : JSON.stringify(body),
  });
}

async function book(who: Person): Promise<Gradebook> {
  const res = await call(who, `/api/classes/${classId}/gradebook`);
  expect(res.status).toBe(200);
  return (await res.json()).gradebook;
}

const overrideRows = () => withDatabase(file, (db) => db.models.ScoreOverride.count());

let instructor: Person;
let outsider: Person;
let students: Person[];
let classId: number;
const assignments: { id: number; itemIds: number[] }[] = [];

beforeAll(async () => {
  instructor = await person("Marisol Tegen", "instructor");
  outsider = await person("Pieter Vos", "instructor");
  students = [];
  for (const name of ["Avery Quill", "Bashir Oduya", "Céline Moreau", "Dmitri Halloran", "Esi Mensah"]) students.push(await person(name));
  classId = await createClass(file, instructor.id, students.map((s) => s.id));
  const now = Date.now();
  // Past due with a daily penalty (late tries keep less), past due with none taken late, and one still open.
  assignments.push(
    await createAssignment(file, classId, { title: "Battens on the hallway wall", opensAt: new Date(now - 10 * DAY), dueAt: new Date(now - 4 * DAY), latePolicy: "penalty", latePenaltyPercent: 10 }, [
      { kind: "even-gap", level: 1, problemCount: 2, points: 5 },
      { kind: "even-gap", level: 2, problemCount: 1, points: 4 },
    ]),
    await createAssignment(file, classId, { title: "Deck joists on centre", opensAt: new Date(now - 8 * DAY), dueAt: new Date(now - 2 * DAY) }, [{ kind: "even-gap", level: 1, problemCount: 2, points: 3 }]),
    await createAssignment(file, classId, { title: "Stair stringer marks", opensAt: new Date(now - DAY), dueAt: new Date(now + 5 * DAY) }, [{ kind: "even-gap", level: 1, problemCount: 1, points: 10 }]),
  );
  await createAssignment(file, classId, { title: "A draft nobody sees", status: "draft" }, [{ kind: "even-gap", level: 1, problemCount: 1, points: 10 }]);
  const random = randomFrom(7);
  const levels = [
    [1, 2],
    [1, 1],
    [1, 1],
  ] as const;
  // The last student does nothing at all: missing on the past-due work.
  for (const [si, s] of students.slice(0, -1).entries()) {
    for (const [ai, a] of assignments.entries()) {
      if (si === 1 && ai === 1) continue; // Bashir skipped the deck joists.
      // Avery starts the battens a day after their due date, so that work is late and loses 10% a day.
      const daysAgo = si === 0 && ai === 0 ? 3 : ai === 0 ? 6 : ai === 1 ? 5 : 0.5;
      const startAt = new Date(now - daysAgo * DAY + si * 3600_000);
      await generateTries(file, secret, s.id, a.itemIds.map((itemId, i) => ({ itemId, kind: "even-gap", level: levels[ai][i] as 1 | 2, problemCount: ai === 0 && i === 0 ? 2 : ai === 1 ? 2 : 1 })), {
        tries: 3,
        rightShare: 0.55,
        startAt,
        random,
      });
    }
  }
});

describe("gradebook totals", () => {
  it("equal an independent recomputation from the raw attempts, with statuses and class averages", async () => {
    const data = await book(instructor);
    expect(data.assignments.map((a) => a.title)).toEqual(["Battens on the hallway wall", "Deck joists on centre", "Stair stringer marks"]);
    expect(data.assignments.map((a) => a.possible)).toEqual([14, 6, 10]);
    expect(data.students.map((s) => s.name)).toEqual(["Avery Quill", "Bashir Oduya", "Céline Moreau", "Dmitri Halloran", "Esi Mensah"]);
    let anyEarned = false;
    for (const [ai, a] of data.assignments.entries()) {
      const expected = await recomputedScores(file, a.id);
      for (const s of data.students) {
        const cell = s.cells[ai];
        expect(cell.computedEarned, `${s.name} on ${a.title}`).toBeCloseTo(expected.get(s.id) ?? 0, 2);
        expect(cell.earned).toBe(cell.computedEarned);
        if (cell.earned > 0) anyEarned = true;
      }
      const percents = data.students.map((s) => (s.cells[ai].earned / a.possible) * 100);
      expect(a.average).toBeCloseTo(percents.reduce((x, y) => x + y, 0) / percents.length, 1);
    }
    expect(anyEarned).toBe(true);
    for (const s of data.students) {
      expect(s.earned).toBeCloseTo(s.cells.reduce((sum, c) => sum + c.earned, 0), 2);
      expect(s.possible).toBe(30);
    }
    const esi = data.students.find((s) => s.name === "Esi Mensah")!;
    expect(esi.cells.map((c) => c.status)).toEqual(["missing", "missing", "not-started"]);
    expect(esi.cells[0].missing).toBe(true);
    const bashir = data.students.find((s) => s.name === "Bashir Oduya")!;
    expect(bashir.cells[1].status).toBe("missing");
    // Avery's battens came in after the due date: late, and flagged.
    const avery = data.students.find((s) => s.name === "Avery Quill")!;
    expect(avery.cells[0].late).toBe(true);
    expect(avery.cells[0].status).toBe("late");
  });

  it("count lateness from a student's extended due date", async () => {
    const before = (await book(instructor)).students.find((s) => s.name === "Avery Quill")!.cells[0];
    expect(before.late).toBe(true);
    // Avery's battens started three days ago; an extension to a minute ago puts every try on time.
    const avery = students[0];
    await withDatabase(file, (db) => db.models.AssignmentExtension.create({ assignmentId: assignments[0].id, studentId: avery.id, dueAt: new Date(Date.now() - 60_000), grantedBy: instructor.id }));
    try {
      const cell = (await book(instructor)).students.find((s) => s.id === avery.id)!.cells[0];
      expect(cell.computedEarned).toBeCloseTo((await recomputedScores(file, assignments[0].id)).get(avery.id) ?? 0, 2);
      expect(cell.late).toBe(false);
      expect(cell.computedEarned).toBeGreaterThan(before.computedEarned);
    } finally {
      await withDatabase(file, (db) => db.models.AssignmentExtension.destroy({ where: { assignmentId: assignments[0].id, studentId: avery.id } }));
    }
  });
});

describe("overrides", () => {
  it("keep their history, move the total, e-mail the student and show on the student's pages", async () => {
    const [assignment] = assignments;
    const student = students[2];
    const path = `/api/classes/${classId}/gradebook/${assignment.id}/${student.id}`;
    const before = (await book(instructor)).students.find((s) => s.id === student.id)!;
    const computed = before.cells[0].computedEarned;

    const changed = await call(instructor, `${path}/override`, { points: 12.5, reason: "Marks checked on the wall, all within 1/16 in." });
    expect(changed.status).toBe(201);
    let after = (await book(instructor)).students.find((s) => s.id === student.id)!;
    expect(after.cells[0]).toMatchObject({ earned: 12.5, computedEarned: computed, overridden: true, excused: false });
    expect(after.earned).toBeCloseTo(before.earned - computed + 12.5, 2);

    const mail = await waitForMail(mailURL, student.email, /Score changed by your instructor/);
    expect(mail.text).toContain(`to 12.5 of 14 points`);
    expect(mail.text).toContain("Marks checked on the wall");
    expect(mail.text).toContain(`/my-classes/${classId}/assignments/${assignment.id}`);

    const work = (await (await call(student, `/api/assignments/${assignment.id}/work`)).json()).work;
    expect(work.score).toMatchObject({ earned: 12.5, possible: 14, override: { excused: false, reason: "Marks checked on the wall, all within 1/16 in." } });

    expect((await call(instructor, `${path}/override`, { excused: true, reason: "Out for a site visit with the framing crew" })).status).toBe(201);
    after = (await book(instructor)).students.find((s) => s.id === student.id)!;
    expect(after.cells[0]).toMatchObject({ status: "excused", excused: true, overridden: false });
    expect(after.possible).toBe(16);

    expect((await call(instructor, `${path}/override`, { clear: true, reason: "Back to what the tries give" })).status).toBe(201);
    after = (await book(instructor)).students.find((s) => s.id === student.id)!;
    expect(after.cells[0]).toMatchObject({ earned: computed, overridden: false, excused: false });
    expect(after.earned).toBeCloseTo(before.earned, 2);

    const drill = await (await call(instructor, path)).json();
    const history = drill.history as OverrideEntry[];
    expect(history.map((h) => h.action)).toEqual(["cleared", "excused", "points"]);
    expect(history[2]).toMatchObject({ fromPoints: computed, toPoints: 12.5, byName: "Marisol Tegen" });
    expect(history[1]).toMatchObject({ fromPoints: 12.5, toPoints: null });
    expect(history[0]).toMatchObject({ fromPoints: null, toPoints: computed });
    expect(drill.inForce).toBeNull();
    expect(drill.review.problems.length).toBe(3);
    expect(drill.review.problems[0].promptHtml.length).toBeGreaterThan(20);
    expect(Object.keys(drill.secondsPerTry).length).toBeGreaterThan(0);

    const classPage = (await (await fetch(`${baseURL}/my-classes/${classId}`, { headers: { cookie: student.cookie } })).text()) as string;
    expect(classPage).not.toContain("data-override");
  });

  it("the student's class page says a score was changed, and why", async () => {
    const [, deck] = assignments;
    const student = students[3];
    expect((await call(instructor, `/api/classes/${classId}/gradebook/${deck.id}/${student.id}/override`, { points: 6, reason: "Joists re-measured together" })).status).toBe(201);
    const html = await (await fetch(`${baseURL}/my-classes/${classId}`, { headers: { cookie: student.cookie } })).text();
    expect(html).toContain("data-override");
    expect(html).toContain("Joists re-measured together");
  });

  it("refuses bad bodies with a message on the field, and stores nothing", async () => {
    const [assignment] = assignments;
    const path = `/api/classes/${classId}/gradebook/${assignment.id}/${students[0].id}/override`;
    const rows = await overrideRows();
    const cases: [unknown, string][] = [
      [{ points: 5 }, "reason"],
      [{ points: 5, reason: "  " }, "reason"],
      [{ points: 15, reason: "More than it is worth" }, "points"],
      [{ points: -1, reason: "Below nothing" }, "points"],
      [{ points: "seven", reason: "Typed in words" }, "points"],
      [{ points: 3, excused: true, reason: "Both at once" }, "points"],
      [{ reason: "Nothing chosen" }, "points"],
    ];
    for (const [body, field] of cases) {
      const res = await call(instructor, path, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      const json = await res.json();
      expect(json.error.fields?.[field], JSON.stringify(body)).toBeTruthy();
    }
    expect((await call(instructor, path, "{not json", true)).status).toBe(400);
    expect((await call(instructor, path, { clear: true, reason: "Nothing to clear here" })).status).toBe(409);
    expect(await overrideRows()).toBe(rows);
  });
});

describe("CSV", () => {
  it("escapes formula cells and round-trips through papaparse", async () => {
    const sneaky = students[4];
    await withDatabase(file, (db) => db.models.User.update({ name: '=HYPERLINK("http://evil.example","Click")' }, { where: { id: sneaky.id } }));
    try {
      const res = await call(instructor, `/api/classes/${classId}/gradebook.csv`);
      expect(res.status).toBe(200);
      expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
      expect(res.headers.get("content-disposition")).toMatch(/^attachment; filename=".+-gradebook\.csv"$/);
      const bytes = new Uint8Array(await res.arrayBuffer());
      expect([...bytes.slice(0, 3)]).toEqual([0xef, 0xbb, 0xbf]);
      const text = new TextDecoder().decode(bytes.slice(3));
      const parsed = Papa.parse<Record<string, string>>(text, { header: true, skipEmptyLines: true });
      expect(parsed.errors).toEqual([]);
      const data = await book(instructor);
      expect(parsed.data.length).toBe(data.students.length);
      for (const s of data.students) {
        const row = parsed.data.find((r) => r["E-mail"] === s.email)!;
        expect(row["Total points"]).toBe(String(s.earned));
        expect(row.Percent).toBe(String(s.percent));
        for (const [i, a] of data.assignments.entries()) {
          const c = s.cells[i];
          expect(row[`${a.title} (${a.possible} pts)`]).toBe(c.excused ? "EXCUSED" : c.missing ? "MISSING" : String(c.earned));
        }
      }
      const sneakyRow = parsed.data.find((r) => r["E-mail"] === sneaky.email)!;
      expect(sneakyRow.Student).toBe(`'=HYPERLINK("http://evil.example","Click")`);
      expect(sneakyRow["Battens on the hallway wall (14 pts)"]).toBe("MISSING");
      expect(parsed.data.find((r) => r.Student === "Céline Moreau")).toBeTruthy();
    } finally {
      await withDatabase(file, (db) => db.models.User.update({ name: "Esi Mensah" }, { where: { id: sneaky.id } }));
    }
  });

  it("gives one student's record with every try", async () => {
    const avery = students[0];
    const res = await call(instructor, `/api/classes/${classId}/students/${avery.id}/record.csv`);
    expect(res.status).toBe(200);
    expect(res.headers.get("content-disposition")).toMatch(/record\.csv"$/);
    const parsed = Papa.parse<Record<string, string>>((await res.text()).replace(/^\uFEFF/, ""), { header: true, skipEmptyLines: true });
    const tries = await withDatabase(file, (db) => db.models.Attempt.count({ where: { userId: avery.id } }));
    expect(parsed.data.filter((r) => r.Try !== "").length).toBe(tries);
    expect(parsed.data.filter((r) => r.Status !== "" && r.Assignment !== "Total").length).toBe(3);
    // A wrong answer typed as a formula comes out quoted.
    expect(parsed.data.some((r) => r.Answer === "'=1+2")).toBe(true);
    expect(parsed.data.at(-1)!.Assignment).toBe("Total");
  });
});

describe("who may see it", () => {
  const routes = () => {
    const [a] = assignments;
    const s = students[0].id;
    return [
      ["GET", `/api/classes/${classId}/gradebook`],
      ["GET", `/api/classes/${classId}/gradebook.csv`],
      ["GET", `/api/classes/${classId}/gradebook/${a.id}/${s}`],
      ["POST", `/api/classes/${classId}/gradebook/${a.id}/${s}/override`],
      ["GET", `/api/classes/${classId}/students/${s}/record.csv`],
    ] as const;
  };

  it("a student gets 403 on every gradebook route, even their own cell, and changes nothing", async () => {
    const rows = await overrideRows();
    for (const [method, path] of routes()) {
      const res = await call(students[0], path, method === "POST" ? { points: 14, reason: "I deserve it" } : undefined);
      expect(res.status, path).toBe(403);
    }
    expect(await overrideRows()).toBe(rows);
  });

  it("another instructor gets 403 on this class, and nobody signed in gets 401", async () => {
    const rows = await overrideRows();
    for (const [method, path] of routes()) {
      expect((await call(outsider, path, method === "POST" ? { points: 1, reason: "Not my class" } : undefined)).status, path).toBe(403);
      expect((await call(null, path, method === "POST" ? { points: 1, reason: "Anyone" } : undefined)).status, path).toBe(401);
    }
    expect(await overrideRows()).toBe(rows);
  });

  it("an assignment of another class, or a student not on the roster, is a 404", async () => {
    const otherClass = await createClass(file, instructor.id, []);
    const other = await createAssignment(file, otherClass, {}, [{ kind: "even-gap", level: 1, problemCount: 1, points: 2 }]);
    expect((await call(instructor, `/api/classes/${classId}/gradebook/${other.id}/${students[0].id}`)).status).toBe(404);
    expect((await call(instructor, `/api/classes/${classId}/gradebook/${assignments[0].id}/${outsider.id}`)).status).toBe(404);
    const empty = await (await call(instructor, `/api/classes/${otherClass}/gradebook`)).json();
    expect(empty.gradebook).toMatchObject({ students: [], assignments: [{ possible: 2, average: null }] });
  });
});
