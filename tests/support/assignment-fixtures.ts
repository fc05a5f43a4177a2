// Classes, people and assignments written straight into a test app's SQLite file, so the
// assignment tests need neither the builder's pages nor the demo accounts other tests rely on.
import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import { openDatabase, type Database } from "@/lib/db";
import { variantSeed } from "@/lib/assignments/variants";
import { formatMeasure, type Fraction } from "@/lib/layout";
import { findKind, type Level } from "@/lib/problems";
import { roundedAnswer } from "@/lib/problems/kit";
import type { Role } from "@/models";
import { signInCookie } from "./http";

export const FIXTURE_PASSWORD = "plumb-and-level-42";
let hash: string | undefined;

export async function withDatabase<T>(file: string, fn: (db: Database) => Promise<T>): Promise<T> {
  const database = openDatabase(file);
  try {
    return await fn(database);
  } finally {
    await database.sequelize.close();
  }
}

const unique = () => crypto.randomBytes(4).toString("hex");

export async function createPerson(file: string, name: string, role: Role = "student"): Promise<{ id: number; email: string; name: string }> {
  hash ??= await bcrypt.hash(FIXTURE_PASSWORD, 10);
  const email = `${name.toLowerCase().replace(/[^a-z]+/g, ".")}.${unique()}@fixtures.example`;
  const user = await withDatabase(file, (db) => db.models.User.create({ name, email, passwordHash: hash!, role }));
  return { id: user.id, email, name };
}

export type SignedInPerson = { id: number; email: string; name: string; cookie: string };

/** A new person of the app at `baseURL` (its database `file`), signed in, with the cookie to send. */
export async function signedInPerson(baseURL: string, file: string, name: string, role: Role = "student"): Promise<SignedInPerson> {
  const made = await createPerson(file, name, role);
  const cookie = await signInCookie(baseURL, made.email, FIXTURE_PASSWORD);
  if (!cookie) throw new Error(`could not sign in ${made.email}`);
  return { ...made, cookie };
}

export async function createClass(file: string, instructorId: number, studentIds: number[], name = `CARP 120 — Framing ${unique()}`): Promise<number> {
  return withDatabase(file, async (db) => {
    const row = await db.models.SchoolClass.create({ name, term: "Spring 2027", joinCode: unique().toUpperCase(), instructorId });
    for (const studentId of studentIds) await db.models.Enrollment.create({ classId: row.id, studentId, status: "active" });
    return row.id;
  });
}

export type FixtureItem = { kind: string; level: Level; problemCount: number; tolerance?: "half" | "full"; points: number };
export type FixtureAssignment = {
  title?: string;
  instructions?: string;
  opensAt?: Date;
  dueAt?: Date;
  latePolicy?: "none" | "until" | "penalty";
  lateUntil?: Date | null;
  latePenaltyPercent?: number | null;
  attemptsAllowed?: number;
  reveal?: "when-final" | "after-due";
  status?: "draft" | "published";
};

const DAY = 24 * 3600 * 1000;

export async function createAssignment(file: string, classId: number, options: FixtureAssignment, items: FixtureItem[]): Promise<{ id: number; itemIds: number[] }> {
  return withDatabase(file, async (db) => {
    const now = Date.now();
    const status = options.status ?? "published";
    const row = await db.models.Assignment.create({
      classId,
      title: options.title ?? `Layout drill ${unique()}`,
      instructions: options.instructions ?? "Work each layout on paper first, then enter your marks.",
      opensAt: options.opensAt ?? new Date(now - DAY),
      dueAt: options.dueAt ?? new Date(now + 7 * DAY),
      latePolicy: options.latePolicy ?? "none",
      lateUntil: options.lateUntil ?? null,
      latePenaltyPercent: options.latePenaltyPercent ?? null,
      attemptsAllowed: options.attemptsAllowed ?? 3,
      reveal: options.reveal ?? "when-final",
      status,
      publishedAt: status === "published" ? new Date(now) : null,
      createdBy: null,
    });
    const itemIds: number[] = [];
    for (const [position, item] of items.entries()) {
      const created = await db.models.AssignmentItem.create({ assignmentId: row.id, position, kind: item.kind, level: item.level, problemCount: item.problemCount, tolerance: item.tolerance ?? "half", points: item.points });
      itemIds.push(created.id);
    }
    return { id: row.id, itemIds };
  });
}

/**
 * The assignment builder's whole form as its API takes it: one even-gap item, three tries, late
 * work taken at a 10% penalty, open since yesterday and due in a week; `overrides` replace fields.
 */
export function builderAssignmentBody(overrides: Record<string, unknown> = {}) {
  const now = Date.now();
  return {
    title: "Battens on the hallway wall",
    instructions: "Work each layout from the **left end**.",
    opensAt: new Date(now - DAY).toISOString(),
    dueAt: new Date(now + 7 * DAY).toISOString(),
    latePolicy: "penalty",
    lateUntil: null,
    latePenaltyPercent: 10,
    attemptsAllowed: 3,
    reveal: "when-final",
    items: [{ kind: "even-gap", level: 1, problemCount: 2, tolerance: "half", points: 5 }],
    ...overrides,
  };
}

export async function updateAssignment(file: string, id: number, values: FixtureAssignment): Promise<void> {
  await withDatabase(file, (db) => db.models.Assignment.update(values, { where: { id } }));
}

/**
 * A problem as its seed makes it, with answers for each part: `right` as a carpenter writes it (to
 * the part's graduation, counts whole) and `wrong` off by `wrongBy` (a count by `count`, a length by
 * `length` inches), so it can never round to the right mark.
 */
export function answersFor(kindKey: string, seed: number, level: Level, wrongBy = { count: 5, length: 9 }) {
  const kind = findKind(kindKey)!;
  const params = kind.generate(seed, level);
  const expected = kind.solve(params);
  const parts = kind.parts(params);
  const right = Object.fromEntries(parts.map((p) => [p.key, p.answer === "count" ? expected[p.key].toString() : roundedAnswer(expected[p.key], p.precision).toFraction(true)]));
  const wrong = Object.fromEntries(parts.map((p) => [p.key, expected[p.key].add(p.answer === "count" ? wrongBy.count : wrongBy.length).toFraction(true)]));
  // What a leak would look like in JSON: the rounded texts carpenters write, and the exact rationals.
  const leaks = parts.flatMap((p) => {
    const v: Fraction = expected[p.key];
    // A whole number alone could match any id or float in the reply; its inch text (14\") cannot.
    return p.answer === "count" ? [] : [formatMeasure(v, { denominator: p.precision }).text.replace(/"/g, '\\"'), v.toFraction(), v.toFraction(true)].filter((t) => /["/]/.test(t));
  });
  return { kind, params, parts, expected, right, wrong, leaks };
}

/** What a student's variant asks and answers, rebuilt the way the server does from the app's secret. */
export function variantAnswers(secret: string, itemId: number, studentId: number, variant: number, kindKey: string, level: Level) {
  const seed = variantSeed(secret, itemId, studentId, variant);
  return { seed, ...answersFor(kindKey, seed, level) };
}
