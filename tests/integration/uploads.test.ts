import crypto from "node:crypto";
import fs from "node:fs";
import path from "node:path";
import bcrypt from "bcryptjs";
import sharp from "sharp";
import { beforeAll, describe, expect, inject, it } from "vitest";
import { openDatabase } from "@/lib/db";
import { signInCookie } from "../support/http";
import { cameraPhoto, pdfFile } from "../unit/uploads/sample-images";

const baseURL = inject("baseURL");
const databasePath = inject("databasePath");
const uploadsFolder = path.join(path.dirname(databasePath), "uploads");
const PASSWORD = "photo-bench-1616";
const DAY = 24 * 60 * 60 * 1000;

// Everyone here is made for this file alone, so no other test's accounts or classes change.
const run = crypto.randomBytes(3).toString("hex");
const people = {
  instructor: { email: `uploads-teacher-${run}@example.com`, name: "Tomasz Field", role: "instructor" as const },
  otherInstructor: { email: `uploads-other-teacher-${run}@example.com`, name: "Ines Varga", role: "instructor" as const },
  owner: { email: `uploads-owner-${run}@example.com`, name: "Priya Nand", role: "student" as const },
  classmate: { email: `uploads-classmate-${run}@example.com`, name: "Luis Ortega", role: "student" as const },
  filler: { email: `uploads-filler-${run}@example.com`, name: "Mae Carrow", role: "student" as const },
  outsider: { email: `uploads-outsider-${run}@example.com`, name: "Kofi Mensah", role: "student" as const },
};
type Person = keyof typeof people;

const ids = { openAssignment: 0, closedAssignment: 0, otherClassAssignment: 0, users: {} as Record<Person, number> };
const cookies = {} as Record<Person, string>;

beforeAll(async () => {
  const database = openDatabase(databasePath);
  const { User, SchoolClass, Enrollment, Assignment } = database.models;
  const passwordHash = await bcrypt.hash(PASSWORD, 10);
  for (const [key, person] of Object.entries(people) as [Person, (typeof people)[Person]][]) {
    ids.users[key] = (await User.create({ ...person, passwordHash })).id;
  }
  const shop = await SchoolClass.create({ name: "Finish Carpentry", term: "Spring", joinCode: `UP${run}A`.toUpperCase(), instructorId: ids.users.instructor });
  const other = await SchoolClass.create({ name: "Framing", term: "Spring", joinCode: `UP${run}B`.toUpperCase(), instructorId: ids.users.otherInstructor });
  for (const student of ["owner", "classmate", "filler"] as const) await Enrollment.create({ classId: shop.id, studentId: ids.users[student], status: "active" });
  await Enrollment.create({ classId: other.id, studentId: ids.users.outsider, status: "active" });
  const published = { status: "published" as const, publishedAt: new Date(), latePolicy: "none" as const };
  const now = Date.now();
  ids.openAssignment = (await Assignment.create({ ...published, classId: shop.id, title: "Wainscot layout", opensAt: new Date(now - DAY), dueAt: new Date(now + 7 * DAY) })).id;
  ids.closedAssignment = (await Assignment.create({ ...published, classId: shop.id, title: "Stair stringer", opensAt: new Date(now - 9 * DAY), dueAt: new Date(now - 2 * DAY) })).id;
  ids.otherClassAssignment = (await Assignment.create({ ...published, classId: other.id, title: "Wall layout", opensAt: new Date(now - DAY), dueAt: new Date(now + 7 * DAY) })).id;
  await database.sequelize.close();
  for (const [key, person] of Object.entries(people) as [Person, (typeof people)[Person]][]) {
    cookies[key] = (await signInCookie(baseURL, person.email, PASSWORD))!;
    expect(cookies[key], `sign-in for ${key}`).toBeTruthy();
  }
});

function as(who: Person | null) {
  return (url: string, init: RequestInit = {}) => fetch(`${baseURL}${url}`, { ...init, headers: { ...(who ? { cookie: cookies[who] } : {}), ...(init.headers ?? {}) } });
}

function photoForm(bytes: Buffer, name: string, type = "image/jpeg"): FormData {
  const form = new FormData();
  form.append("photo", new Blob([new Uint8Array(bytes)], { type }), name);
  return form;
}

async function upload(who: Person, assignmentId: number, bytes: Buffer, name = "IMG_2041.jpg", type = "image/jpeg") {
  return as(who)(`/api/assignments/${assignmentId}/uploads`, { method: "POST", body: photoForm(bytes, name, type) });
}

async function storedRow(id: string) {
  const database = openDatabase(databasePath);
  const row = await database.models.Upload.findByPk(id, { raw: true });
  await database.sequelize.close();
  return row;
}

async function rowCount(studentId: number, assignmentId: number) {
  const database = openDatabase(databasePath);
  const count = await database.models.Upload.count({ where: { studentId, assignmentId } });
  await database.sequelize.close();
  return count;
}

const filesOnDisk = () => (fs.existsSync(uploadsFolder) ? fs.readdirSync(uploadsFolder).sort() : []);

type Uploaded = { id: string; thumbUrl: string; fullUrl: string };
let first: Uploaded;

describe("shop-photo uploads", () => {
  it("stores a student's JPEG without its metadata, under the data folder, and serves it with a checked type", async () => {
    const original = await cameraPhoto("jpeg", { width: 1200, height: 900 });
    expect(original.includes("secret-copyright")).toBe(true);
    const res = await upload("owner", ids.openAssignment, original, "C:\\phone\\IMG_2041.jpg");
    expect(res.status).toBe(201);
    const { upload: view } = await res.json();
    expect(view).toMatchObject({
      assignmentId: ids.openAssignment,
      studentId: ids.users.owner,
      originalName: "IMG_2041.jpg",
      mime: "image/jpeg",
      width: 1200,
      height: 900,
      comment: null,
      thumbUrl: `/api/uploads/${view.id}?size=thumb`,
      fullUrl: `/api/uploads/${view.id}?size=full`,
    });
    expect(JSON.stringify(view)).not.toMatch(/storedName|thumbName/);
    first = view;

    const row = (await storedRow(view.id))!;
    expect(row.storedName).toMatch(/^[0-9a-f-]{36}\.jpg$/);
    expect(fs.existsSync(path.join(uploadsFolder, row.storedName))).toBe(true);
    expect(fs.existsSync(path.join(uploadsFolder, row.thumbName))).toBe(true);
    expect(fs.existsSync(path.join(process.cwd(), "public", row.storedName))).toBe(false);

    const full = await as("owner")(view.fullUrl);
    expect(full.status).toBe(200);
    expect(full.headers.get("content-type")).toBe("image/jpeg");
    expect(full.headers.get("x-content-type-options")).toBe("nosniff");
    expect(full.headers.get("content-disposition")).toBe(`inline; filename="shop-photo-${view.id.slice(0, 8)}.jpg"`);
    expect(full.headers.get("cache-control")).toBe("private, max-age=3600");
    const served = Buffer.from(await full.arrayBuffer());
    expect(served.includes("secret-copyright")).toBe(false);
    const meta = await sharp(served).metadata();
    expect([meta.format, meta.width, meta.height, meta.exif, meta.icc]).toEqual(["jpeg", 1200, 900, undefined, undefined]);

    const thumb = await as("owner")(view.thumbUrl);
    expect(thumb.headers.get("content-type")).toBe("image/webp");
    expect((await sharp(Buffer.from(await thumb.arrayBuffer())).metadata()).width).toBe(320);

    const list = await (await as("owner")(`/api/assignments/${ids.openAssignment}/uploads`)).json();
    expect(list.uploads.map((u: Uploaded) => u.id)).toEqual([view.id]);
  });

  it("refuses a file named .jpg that is not a photo, and keeps nothing of it", async () => {
    const before = filesOnDisk();
    const text = await upload("owner", ids.openAssignment, Buffer.from("16 in o.c. from the left end\n".repeat(50)), "layout.jpg");
    expect(text.status).toBe(400);
    expect(await text.json()).toEqual({ error: { code: "bad_request", message: "That file is not a photo we can read. Send a JPEG, PNG or WebP.", fields: { photo: expect.any(String) } } });

    const pdf = await upload("owner", ids.openAssignment, pdfFile(), "mock-up.jpg", "image/jpeg");
    expect(pdf.status).toBe(400);
    expect((await pdf.json()).error.message).toBe("That file is a PDF, not a photo. Send a JPEG, PNG or WebP.");

    const truncated = await cameraPhoto("jpeg");
    const cut = await upload("owner", ids.openAssignment, truncated.subarray(0, truncated.length / 2));
    expect(cut.status).toBe(400);
    expect((await cut.json()).error.message).toMatch(/damaged or cut short/);

    expect(filesOnDisk()).toEqual(before);
    expect(await rowCount(ids.users.owner, ids.openAssignment)).toBe(1);
  });

  it("refuses 11 MB with a 413 before reading it, and a body without a length once it passes the cap", async () => {
    const before = await rowCount(ids.users.owner, ids.openAssignment);
    const big = Buffer.concat([await cameraPhoto("jpeg"), crypto.randomBytes(11 * 1024 * 1024)]);
    const res = await upload("owner", ids.openAssignment, big);
    expect(res.status).toBe(413);
    expect(await res.json()).toEqual({ error: { code: "too_large", message: expect.stringMatching(/^That upload is 11\.\d\sMB; a photo can be at most 10\.0\sMB\./) } });

    // Streamed without a Content-Length, the server cannot refuse up front; it keeps none of it past the cap.
    const boundary = "----shop-photo-boundary";
    const head = Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="photo"; filename="big.jpg"\r\nContent-Type: image/jpeg\r\n\r\n`);
    const chunk = crypto.randomBytes(1024 * 1024);
    let sent = 0;
    const body = new ReadableStream<Uint8Array>({
      pull(controller) {
        if (sent === 0) controller.enqueue(head);
        if (sent >= 12) return controller.close();
        sent += 1;
        controller.enqueue(chunk);
      },
    });
    const streamed = await as("owner")(`/api/assignments/${ids.openAssignment}/uploads`, {
      method: "POST",
      body,
      headers: { "content-type": `multipart/form-data; boundary=${boundary}` },
      duplex: "half",
    } as RequestInit);
    expect(streamed.status).toBe(413);
    expect((await streamed.json()).error).toEqual({ code: "too_large", message: expect.stringMatching(/^That upload is 12\.\d\sMB; a photo can be at most 10\.0\sMB\./) });
    expect(await rowCount(ids.users.owner, ids.openAssignment)).toBe(before);
    expect((await as("owner")(`/api/assignments/${ids.openAssignment}/uploads`)).status).toBe(200);
  });

  it("takes at most five photos even when six arrive at once", async () => {
    const png = await cameraPhoto("png", { width: 300, height: 200 });
    const results = await Promise.all(Array.from({ length: 6 }, (_, i) => upload("filler", ids.openAssignment, png, `bench-${i}.png`, "image/png")));
    const statuses = results.map((r) => r.status).sort();
    expect(statuses).toEqual([201, 201, 201, 201, 201, 409]);
    const refused = results.find((r) => r.status === 409)!;
    expect((await refused.json()).error.message).toMatch(/already have 5 photos/);
    expect(await rowCount(ids.users.filler, ids.openAssignment)).toBe(5);

    const sixth = await upload("filler", ids.openAssignment, await cameraPhoto("webp"), "later.webp", "image/webp");
    expect(sixth.status).toBe(409);
  });

  it("keeps photos from everyone but the owner and the class's instructors (404, never a hint)", async () => {
    for (const who of ["classmate", "outsider", "otherInstructor"] as const) {
      expect((await as(who)(first.thumbUrl)).status, who).toBe(404);
      expect((await as(who)(first.fullUrl)).status, who).toBe(404);
      expect((await as(who)(`/api/uploads/${first.id}`, { method: "DELETE" })).status, who).toBe(404);
      const patch = await as(who)(`/api/uploads/${first.id}`, { method: "PATCH", body: JSON.stringify({ comment: "mine" }) });
      expect(patch.status, who).toBe(404);
    }
    const missing = await as("classmate")(`/api/uploads/${crypto.randomUUID()}?size=full`);
    expect([missing.status, (await missing.json()).error.message]).toEqual([404, "There is no such photo."]);

    expect((await as("classmate")(`/api/assignments/${ids.openAssignment}/uploads?studentId=${ids.users.owner}`)).status).toBe(404);
    expect((await (await as("classmate")(`/api/assignments/${ids.openAssignment}/uploads`)).json()).uploads).toEqual([]);
    expect((await as("outsider")(`/api/assignments/${ids.openAssignment}/uploads`)).status).toBe(404);
    expect((await as("outsider")(`/api/assignments/${ids.openAssignment}/uploads?studentId=${ids.users.owner}`)).status).toBe(404);
    expect((await as("otherInstructor")(`/api/assignments/${ids.openAssignment}/uploads?studentId=${ids.users.owner}`)).status).toBe(404);
    expect((await upload("outsider", ids.openAssignment, await cameraPhoto("jpeg"))).status).toBe(404);
    expect((await upload("owner", ids.otherClassAssignment, await cameraPhoto("jpeg"))).status).toBe(404);
  });

  it("needs a signed-in user", async () => {
    expect((await as(null)(`/api/assignments/${ids.openAssignment}/uploads`)).status).toBe(401);
    expect((await as(null)(first.fullUrl)).status).toBe(401);
    const anonymousPost = await as(null)(`/api/assignments/${ids.openAssignment}/uploads`, { method: "POST", body: photoForm(await cameraPhoto("jpeg"), "a.jpg") });
    expect(anonymousPost.status).toBe(401);
    expect((await as(null)(`/api/uploads/${first.id}`, { method: "PATCH", body: JSON.stringify({ comment: "x" }) })).status).toBe(401);
  });

  it("lets the class's instructor see the photos and comment; the student reads the comment but cannot write one", async () => {
    const listed = await as("instructor")(`/api/assignments/${ids.openAssignment}/uploads?studentId=${ids.users.owner}`);
    expect(listed.status).toBe(200);
    expect((await listed.json()).uploads.map((u: Uploaded) => u.id)).toEqual([first.id]);
    const unnamed = await as("instructor")(`/api/assignments/${ids.openAssignment}/uploads`);
    expect([unnamed.status, Object.keys((await unnamed.json()).error.fields)]).toEqual([400, ["studentId"]]);
    expect((await as("instructor")(first.fullUrl)).status).toBe(200);

    const tooLong = await as("instructor")(`/api/uploads/${first.id}`, { method: "PATCH", body: JSON.stringify({ comment: "x".repeat(1001) }) });
    expect([tooLong.status, Object.keys((await tooLong.json()).error.fields)]).toEqual([400, ["comment"]]);

    const saved = await as("instructor")(`/api/uploads/${first.id}`, { method: "PATCH", body: JSON.stringify({ comment: "  Marks are crisp; square the first batten off the floor.  " }) });
    expect(saved.status).toBe(200);
    const { upload: commented } = await saved.json();
    expect(commented).toMatchObject({ comment: "Marks are crisp; square the first batten off the floor.", commentByName: "Tomasz Field", commentedAt: expect.any(String) });
    const row = (await storedRow(first.id))!;
    expect(row.commentBy).toBe(ids.users.instructor);

    const ownView = (await (await as("owner")(`/api/assignments/${ids.openAssignment}/uploads`)).json()).uploads[0];
    expect(ownView.comment).toBe("Marks are crisp; square the first batten off the floor.");

    const studentTry = await as("owner")(`/api/uploads/${first.id}`, { method: "PATCH", body: JSON.stringify({ comment: "Looks great to me" }) });
    expect(studentTry.status).toBe(403);
    expect((await storedRow(first.id))!.comment).toBe("Marks are crisp; square the first batten off the floor.");

    const teacherDelete = await as("instructor")(`/api/uploads/${first.id}`, { method: "DELETE" });
    expect(teacherDelete.status).toBe(403);
  });

  it("lets the owner delete a photo while the assignment is open, files and all", async () => {
    const res = await upload("classmate", ids.openAssignment, await cameraPhoto("webp"), "mock-up.webp", "image/webp");
    const { upload: view } = await res.json();
    const row = (await storedRow(view.id))!;
    const files = [row.storedName, row.thumbName].map((name) => path.join(uploadsFolder, name));
    expect(files.every((f) => fs.existsSync(f))).toBe(true);

    expect((await as("classmate")(`/api/uploads/${view.id}`, { method: "DELETE" })).status).toBe(204);
    expect(await storedRow(view.id)).toBeNull();
    expect(files.some((f) => fs.existsSync(f))).toBe(false);
    expect((await as("classmate")(view.fullUrl)).status).toBe(404);
    expect((await as("classmate")(`/api/uploads/${view.id}`, { method: "DELETE" })).status).toBe(404);
  });

  it("refuses new photos after the assignment closes and keeps the ones already sent", async () => {
    const closed = await upload("owner", ids.closedAssignment, await cameraPhoto("jpeg"));
    expect(closed.status).toBe(409);
    expect((await closed.json()).error.message).toMatch(/closed/);

    // A photo sent while it was open: the due date then passes.
    const database = openDatabase(databasePath);
    await database.models.Assignment.update({ dueAt: new Date(Date.now() + DAY) }, { where: { id: ids.closedAssignment } });
    await database.sequelize.close();
    const { upload: kept } = await (await upload("owner", ids.closedAssignment, await cameraPhoto("jpeg"))).json();
    const reopened = openDatabase(databasePath);
    await reopened.models.Assignment.update({ dueAt: new Date(Date.now() - DAY) }, { where: { id: ids.closedAssignment } });
    await reopened.sequelize.close();

    const refused = await as("owner")(`/api/uploads/${kept.id}`, { method: "DELETE" });
    expect(refused.status).toBe(409);
    expect(await storedRow(kept.id)).not.toBeNull();
    expect((await as("owner")(kept.thumbUrl)).status).toBe(200);
  });

  it("answers a bad id or size with a 400 naming the field", async () => {
    const badAssignment = await as("owner")("/api/assignments/abc/uploads");
    expect([badAssignment.status, Object.keys((await badAssignment.json()).error.fields)]).toEqual([400, ["assignmentId"]]);
    const badUpload = await as("owner")("/api/uploads/not-a-photo");
    expect([badUpload.status, Object.keys((await badUpload.json()).error.fields)]).toEqual([400, ["uploadId"]]);
    const badSize = await as("owner")(`/api/uploads/${first.id}?size=huge`);
    expect([badSize.status, Object.keys((await badSize.json()).error.fields)]).toEqual([400, ["size"]]);
    const noPhoto = await as("owner")(`/api/assignments/${ids.openAssignment}/uploads`, { method: "POST", body: new FormData() });
    expect([noPhoto.status, (await noPhoto.json()).error.message]).toEqual([400, "Choose a photo to send."]);
  });
});
