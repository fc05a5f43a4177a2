// The people and the data the access matrix and the answer-leak search run against: two classes
// side by side, so every cell can ask "does class A's data reach someone outside class A?".
import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import sharp from "sharp";
import { hashResetToken } from "@/lib/accounts/password-reset";
import { hashToken } from "@/lib/classes/tokens";
import { createAssignment, createClass, createPerson, signedInPerson, variantAnswers, withDatabase } from "./assignment-fixtures";

export const PRINCIPALS = ["anonymous", "student", "otherStudent", "instructor", "otherInstructor", "admin"] as const;
export type Principal = (typeof PRINCIPALS)[number];

export type Person = { id: number; email: string; name: string; cookie: string };
export type Cast = Record<Exclude<Principal, "anonymous">, Person> & {
  /** Neither principals nor visitors: a co-instructor of class A and a student removed from it. */
  coTeacher: { id: number; email: string; name: string };
  removed: { id: number; email: string; name: string };
};

export const ITEM_KIND = "even-gap";
export const ITEM_LEVEL = 1 as const;

/** Everything one cell may point at. Class A is taught by `instructor` and holds `student`; class B belongs to the others. */
export type World = {
  classA: number;
  classAName: string;
  classB: number;
  joinCodeB: string;
  assignmentA: number;
  assignmentATitle: string;
  itemA: number;
  draftA: number;
  assignmentB: number;
  problemA: string;
  practiceA: string;
  practiceParts: string[];
  uploadA: string;
  layoutA: number;
  invitationA: number;
  /** Class B's invitation to `student`: what class A's instructor must not reach through class A's routes. */
  invitationB: number;
  invitedEmailA: string;
  batchA: string;
  /** An invitation into class B addressed to `student`, and one to an address nobody has yet. */
  tokenForStudent: string;
  tokenForNewcomer: string;
  resetToken: string;
};

export type Requester = (who: Principal, url: string, init?: { method?: string; body?: unknown }) => Promise<Response>;

export function requester(baseURL: string, cast: Cast): Requester {
  return (who, url, init = {}) => {
    const isForm = init.body instanceof FormData;
    const headers: Record<string, string> = who === "anonymous" ? {} : { cookie: cast[who].cookie };
    if (init.body !== undefined && !isForm) headers["content-type"] = "application/json";
    return fetch(`${baseURL}${url}`, {
      method: init.method ?? "GET",
      redirect: "manual",
      headers,
      body: init.body === undefined ? undefined : isForm ? (init.body as FormData) : JSON.stringify(init.body),
    });
  };
}

export async function makeCast(baseURL: string, file: string): Promise<Cast> {
  const signed = (name: string, role: "student" | "instructor" | "admin"): Promise<Person> => signedInPerson(baseURL, file, name, role);
  return {
    student: await signed("Avery Plumb", "student"),
    otherStudent: await signed("Odette Square", "student"),
    instructor: await signed("Tomasz Kowal", "instructor"),
    otherInstructor: await signed("Greta Miter", "instructor"),
    admin: await signed("Hollis Bevel", "admin"),
    coTeacher: await createPerson(file, "Ines Varga", "instructor"),
    removed: await createPerson(file, "Luis Ortega", "student"),
  };
}

export async function shopPhoto(): Promise<FormData> {
  const bytes = await sharp({ create: { width: 64, height: 48, channels: 3, background: "#a0764f" } }).jpeg().toBuffer();
  const form = new FormData();
  form.append("photo", new Blob([new Uint8Array(bytes)], { type: "image/jpeg" }), "batten-marks.jpg");
  return form;
}

async function json(res: Response, what: string) {
  if (!res.ok) throw new Error(`${what}: ${res.status} ${await res.text()}`);
  return res.json();
}

/**
 * A whole world: made once for the reads and the refused writes, and again for each allowed write
 * so that write acts on rows no other cell depends on.
 */
export async function buildWorld(baseURL: string, file: string, cast: Cast): Promise<World> {
  const call = requester(baseURL, cast);
  const stamp = crypto.randomBytes(3).toString("hex");
  const classAName = `CARP 120 — Framing ${stamp}`;
  const classA = await createClass(file, cast.instructor.id, [cast.student.id], classAName);
  const classB = await createClass(file, cast.otherInstructor.id, [cast.otherStudent.id]);
  const item = { kind: ITEM_KIND, level: ITEM_LEVEL, problemCount: 2, points: 4 };
  const assignmentATitle = `Stud layout ${stamp}`;
  const a = await createAssignment(file, classA, { title: assignmentATitle }, [item]);
  const draft = await createAssignment(file, classA, { status: "draft" }, [item]);
  const b = await createAssignment(file, classB, {}, [item]);
  const tokenForStudent = crypto.randomBytes(32).toString("base64url");
  const tokenForNewcomer = crypto.randomBytes(32).toString("base64url");
  const resetToken = crypto.randomBytes(32).toString("base64url");
  const { joinCodeB } = await withDatabase(file, async (db) => {
    const { ClassInstructor, Enrollment, Invitation, PasswordReset, SchoolClass } = db.models;
    await ClassInstructor.create({ classId: classA, userId: cast.coTeacher.id });
    await Enrollment.create({ classId: classA, studentId: cast.removed.id, status: "removed" });
    const expiresAt = new Date(Date.now() + 24 * 3600 * 1000);
    await Invitation.create({ classId: classB, email: cast.student.email, tokenHash: hashToken(tokenForStudent), invitedBy: cast.otherInstructor.id, expiresAt });
    await Invitation.create({ classId: classB, email: `newcomer.${stamp}@fixtures.example`, tokenHash: hashToken(tokenForNewcomer), invitedBy: cast.otherInstructor.id, expiresAt });
    await PasswordReset.create({ userId: cast.removed.id, tokenHash: hashResetToken(resetToken), expiresAt });
    return { joinCodeB: (await SchoolClass.findByPk(classB))!.joinCode };
  });

  // What the student and the instructor would have done through the app before anyone probes.
  await json(await call("student", `/api/assignments/${a.id}/work`), "open the assignment");
  const uploadA = (await json(await call("student", `/api/assignments/${a.id}/uploads`, { method: "POST", body: await shopPhoto() }), "upload")).upload.id as string;
  const practice = (await json(await call("student", "/api/practice", { method: "POST", body: { kind: ITEM_KIND, level: ITEM_LEVEL } }), "practice")).problem as { id: string; parts: { key: string }[] };
  const layoutA = (await json(await call("student", "/api/layouts", { method: "POST", body: { kind: "even-spacing", name: `Hall battens ${stamp}`, params: "span=96" } }), "layout")).layout.id as number;
  const invitedEmailA = `invitee.${stamp}@fixtures.example`;
  const { batch } = await json(await call("instructor", `/api/classes/${classA}/invitations`, { method: "POST", body: { addresses: invitedEmailA } }), "invite");
  await json(await call("instructor", `/api/assignments/${a.id}/extensions`, { method: "PUT", body: { studentId: cast.student.id, extraAttempts: 1 } }), "extension");

  const { problemA, invitationA, invitationB } = await withDatabase(file, async (db) => ({
    problemA: (await db.models.PracticeProblem.findOne({ where: { assignmentItemId: a.itemIds[0], userId: cast.student.id, variant: 0 } }))!.id,
    invitationA: (await db.models.Invitation.findOne({ where: { classId: classA, email: invitedEmailA } }))!.id,
    invitationB: (await db.models.Invitation.findOne({ where: { classId: classB, email: cast.student.email } }))!.id,
  }));
  return {
    classA,
    classAName,
    classB,
    joinCodeB,
    assignmentA: a.id,
    assignmentATitle,
    itemA: a.itemIds[0],
    draftA: draft.id,
    assignmentB: b.id,
    problemA,
    practiceA: practice.id,
    practiceParts: practice.parts.map((p) => p.key),
    uploadA,
    layoutA,
    invitationA,
    invitationB,
    invitedEmailA,
    batchA: batch,
    tokenForStudent,
    tokenForNewcomer,
    resetToken,
  };
}

/** The right answers to `student`'s first variant of class A's assignment. */
export function studentAnswers(secret: string, world: World, cast: Cast) {
  return variantAnswers(secret, world.itemA, cast.student.id, 0, ITEM_KIND, ITEM_LEVEL);
}

/**
 * One hash over every row of every table, so "nothing changed" can be checked without knowing
 * which table a refused write would have touched. The outbox's delivery columns move on their own
 * after a commit (the sender works in the background), so only its rows' identities count there.
 */
export async function databaseChecksum(file: string): Promise<string> {
  return withDatabase(file, async (db) => {
    const [tables] = (await db.sequelize.query("SELECT name FROM sqlite_master WHERE type = 'table' AND name NOT LIKE 'sqlite_%' ORDER BY name")) as [{ name: string }[], unknown];
    const hash = crypto.createHash("sha256");
    for (const { name } of tables) {
      const select = name === "email_outbox" ? `SELECT id FROM "${name}" ORDER BY id` : `SELECT * FROM "${name}" ORDER BY rowid`;
      const [rows] = await db.sequelize.query(select);
      hash.update(`${name}:${JSON.stringify(rows)}\n`);
    }
    return hash.digest("hex");
  });
}

const root = process.cwd();

function walk(dir: string, keep: (file: string) => boolean): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return entry.name === "node_modules" || entry.name.startsWith(".") ? [] : walk(full, keep);
    return keep(full) ? [full] : [];
  });
}

const relative = (file: string) => path.relative(root, file).split(path.sep).join("/");

/** "app/api/classes/[classId]/route.ts" → "/api/classes/[classId]". */
export function routeKey(file: string): string {
  return "/" + relative(file).replace(/^app\//, "").replace(/\/route\.ts$/, "");
}

const METHOD = "GET|POST|PUT|PATCH|DELETE|HEAD|OPTIONS";
/** Every "METHOD /api/…" the route files export, read from disk so a new one cannot slip past. */
export function exportedRouteMethods(): string[] {
  const found = new Set<string>();
  for (const file of walk(path.join(root, "app"), (f) => f.endsWith(`${path.sep}route.ts`) || f.endsWith(`${path.sep}route.tsx`))) {
    const source = fs.readFileSync(file, "utf8");
    const direct = new RegExp(`export\\s+(?:const|let|async\\s+function|function)\\s+(${METHOD})\\b`, "g");
    for (const m of source.matchAll(direct)) found.add(`${m[1]} ${routeKey(file)}`);
    for (const block of source.matchAll(/export\s*\{([^}]*)\}/g)) {
      // Each specifier is "name" or "local as name"; the exported name is the last word.
      for (const specifier of block[1].split(",")) {
        const exported = specifier.trim().split(/\s+/).pop() ?? "";
        if (new RegExp(`^(${METHOD})$`).test(exported)) found.add(`${exported} ${routeKey(file)}`);
      }
    }
  }
  return [...found].sort();
}

/** "app/(teaching)/classes/[classId]/page.tsx" → "/classes/[classId]" (route groups drop out of the address). */
export function pageKeys(): string[] {
  return walk(path.join(root, "app"), (f) => /[\\/]page\.(tsx|ts|jsx|js|mdx)$/.test(f))
    .map((f) => "/" + relative(f).replace(/^app\//, "").replace(/\/?page\.\w+$/, "").split("/").filter((s) => !/^\(.*\)$/.test(s)).join("/"))
    .map((k) => (k === "/" ? "/" : k.replace(/\/$/, "")))
    .sort();
}

/** Files that declare server actions (a "use server" directive at the top of the file or inside a function). */
export function serverActionFiles(): string[] {
  return ["app", "lib", "components"]
    .filter((d) => fs.existsSync(path.join(root, d)))
    .flatMap((d) => walk(path.join(root, d), (f) => /\.(ts|tsx|js|jsx)$/.test(f)))
    .filter((f) => /^\s*["']use server["'];?\s*$/m.test(fs.readFileSync(f, "utf8")))
    .map(relative)
    .sort();
}
