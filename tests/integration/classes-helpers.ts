// Shared by the classes-*.test.ts files: people made straight in the app's database (instructors
// are never made by sign-up, and sign-up is rate limited per address), and a small JSON client.
import crypto from "node:crypto";
import bcrypt from "bcryptjs";
import { inject } from "vitest";
import { openDatabase, type Database } from "@/lib/db";
import type { Role } from "@/models";
import { signInCookie } from "../support/http";

export const baseURL = inject("baseURL");
export const mailURL = inject("mailURL");
export const PASSWORD = "square and plumb";

export type Person = { id: number; email: string; name: string; cookie: string };

export async function withDb<T>(work: (database: Database) => Promise<T>): Promise<T> {
  const database = openDatabase(inject("databasePath"));
  try {
    return await work(database);
  } finally {
    await database.sequelize.close();
  }
}

export function uniqueEmail(label: string): string {
  return `${label}.${crypto.randomBytes(4).toString("hex")}@example.com`;
}

/** A user written into the database and signed in over HTTP. */
export async function makePerson(role: Role, label: string): Promise<Person> {
  const email = uniqueEmail(label);
  const name = `${label[0].toUpperCase()}${label.slice(1)} Tester`;
  const passwordHash = await bcrypt.hash(PASSWORD, 10);
  const id = await withDb(async ({ models }) => (await models.User.create({ email, name, role, passwordHash })).id);
  const cookie = await signInCookie(baseURL, email, PASSWORD);
  if (!cookie) throw new Error(`Could not sign in ${email}`);
  return { id, email, name, cookie };
}

export type Reply<T = Record<string, unknown>> = { status: number; body: T };

export async function call<T = Record<string, unknown>>(method: string, path: string, options: { cookie?: string; body?: unknown } = {}): Promise<Reply<T>> {
  const res = await fetch(`${baseURL}${path}`, {
    method,
    headers: { ...(options.cookie ? { cookie: options.cookie } : {}), ...(options.body !== undefined ? { "content-type": "application/json" } : {}) },
    body: options.body === undefined ? undefined : JSON.stringify(options.body),
  });
  const text = await res.text();
  let body: unknown = text;
  try {
    body = JSON.parse(text);
  } catch {
    // pages answer HTML
  }
  return { status: res.status, body: body as T };
}

export async function createClass(lead: Person, name = `CARP ${crypto.randomInt(100, 999)} — Test class`): Promise<{ id: number; joinCode: string; name: string }> {
  const created = await call<{ id: number }>("POST", "/api/classes", { cookie: lead.cookie, body: { name, term: "Spring 2027", sectionCode: "B" } });
  if (created.status !== 201) throw new Error(`Class not created: ${JSON.stringify(created.body)}`);
  const { summary } = (await call<{ summary: { joinCode: string } }>("GET", `/api/classes/${created.body.id}`, { cookie: lead.cookie })).body;
  return { id: created.body.id, joinCode: summary.joinCode, name };
}

export async function enroll(classId: number, studentId: number, status: "active" | "removed" = "active"): Promise<void> {
  await withDb(({ models }) => models.Enrollment.create({ classId, studentId, status }));
}

export function tokenFrom(link: string): string {
  return link.split("/invite/")[1];
}
