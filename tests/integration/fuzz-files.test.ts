// Malformed files where the app takes files: the roster CSV and shop photos. Whatever arrives,
// the answer is a verdict the page can show (a preview, or a 400/413 naming the problem),
// never a 500, and a refused file leaves no row and no stored bytes behind.
import fs from "node:fs";
import http from "node:http";
import path from "node:path";
import fc from "fast-check";
import sharp from "sharp";
import { Op } from "sequelize";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { MAX_IMPORT_ROWS } from "@/lib/classes/schemas";
import { MAX_REQUEST_BYTES } from "@/lib/uploads/limits";
import { createAssignment, createClass, createPerson, FIXTURE_PASSWORD, withDatabase } from "../support/assignment-fixtures";
import { startApp, type RunningApp } from "../support/app-server";
import { signInCookie } from "../support/http";
import { cameraPhoto, zipFile } from "../unit/uploads/sample-images";

const SLOW = { timeout: 240_000 };

// Its own app: dozens of imports and uploads as one instructor and one student in a minute are
// legitimate here, so every rate limit is multiplied (the rate-limit suite checks the real ones).
let app: RunningApp;
let baseURL = "";
let databasePath = "";
let uploadsFolder = "";

let classId = 0;
let assignmentId = 0;
let studentId = 0;
const cookies = { instructor: "", student: "" };

beforeAll(async () => {
  app = await startApp({ seed: false, env: { RATE_LIMIT_SCALE: "100" } });
  ({ url: baseURL, databasePath } = app);
  uploadsFolder = path.join(path.dirname(databasePath), "uploads");
  const instructor = await createPerson(databasePath, "Greta Olsen", "instructor");
  const student = await createPerson(databasePath, "Nico Ferreira");
  studentId = student.id;
  classId = await createClass(databasePath, instructor.id, [student.id]);
  assignmentId = (await createAssignment(databasePath, classId, {}, [{ kind: "even-gap", level: 1, problemCount: 1, points: 5 }])).id;
  cookies.instructor = (await signInCookie(baseURL, instructor.email, FIXTURE_PASSWORD))!;
  cookies.student = (await signInCookie(baseURL, student.email, FIXTURE_PASSWORD))!;
  expect(cookies.instructor && cookies.student).toBeTruthy();
}, 60_000);

afterAll(async () => {
  await app?.stop();
});

type ErrorBody = { error: { code: string; message: string; fields?: Record<string, string> } };
type Preview = { rows: { line: number; name: string; email: string; status: string; message: string | null }[]; counts: Record<string, number>; fileError: string | null };

function expectErrorShape(status: number, body: unknown, what: string) {
  expect(status, what).toBeGreaterThanOrEqual(400);
  expect(status, what).toBeLessThan(500);
  const { error } = body as ErrorBody;
  expect(typeof error?.code, what).toBe("string");
  expect(error.message.trim().length, what).toBeGreaterThan(0);
}

describe("roster CSV import with malformed files", SLOW, () => {
  const written = () =>
    withDatabase(databasePath, async ({ models }) => ({
      invitations: await models.Invitation.count({ where: { classId } }),
      outbox: await models.EmailOutbox.count({ where: { dedupeKey: { [Op.like]: `invitations:${classId}:%` } } }),
    }));

  async function importCsv(csv: string, dryRun: boolean) {
    const res = await fetch(`${baseURL}/api/classes/${classId}/roster/import`, {
      method: "POST",
      headers: { cookie: cookies.instructor, "content-type": "application/json" },
      body: JSON.stringify({ csv, dryRun }),
    });
    return { status: res.status, body: (await res.json()) as Preview & ErrorBody };
  }

  /** A preview is a verdict on every row or on the file; a refusal is the error shape. */
  function expectVerdict(reply: { status: number; body: Preview & ErrorBody }, what: string) {
    if (reply.status === 200) {
      const { rows, fileError } = reply.body;
      expect(fileError !== null || rows.length > 0, what).toBe(true);
      for (const row of rows) {
        expect(["invite", "resend", "error"], what).toContain(row.status);
        if (row.status === "error") expect(row.message?.length, what).toBeGreaterThan(0);
      }
    } else {
      expectErrorShape(reply.status, reply.body, what);
    }
  }

  // What a browser's file.text() makes of bytes that are not UTF-8: replacement characters and NULs.
  const asBrowserReadsIt = (bytes: Uint8Array) => new TextDecoder("utf-8").decode(bytes);
  const csvAlphabet = fc.constantFrom(..."ab@.,;\t\"'\n\r =+-@|".split(""), "Name", "Email", "E-mail", "jo@shop.example", "\uFEFF", "\u0000", "\uFFFD", "é", "\ud800");
  const randomCsv = fc.oneof(
    fc.string({ unit: "binary", minLength: 1, maxLength: 400 }),
    fc.uint8Array({ minLength: 1, maxLength: 400 }).map(asBrowserReadsIt),
    fc.string({ unit: csvAlphabet, minLength: 1, maxLength: 120 }),
  );

  it("previews random text with a verdict and writes nothing", async () => {
    const before = await written();
    await fc.assert(
      fc.asyncProperty(randomCsv, async (csv) => {
        expectVerdict(await importCsv(csv, true), JSON.stringify(csv).slice(0, 300));
      }),
      { numRuns: 150 },
    );
    expect(await written()).toEqual(before);
  });

  it("refuses to import random text, writing nothing, unless a row really is an address", async () => {
    await fc.assert(
      fc.asyncProperty(randomCsv, async (csv) => {
        const before = await written();
        const reply = await importCsv(csv, false);
        const what = JSON.stringify(csv).slice(0, 300);
        expect(reply.status, what).not.toBe(200);
        if (reply.status === 201) {
          expect((await written()).invitations - before.invitations, what).toBe(reply.body.counts.invite + reply.body.counts.resend);
        } else {
          expectErrorShape(reply.status, reply.body, what);
          expect(await written(), what).toEqual(before);
        }
      }),
      { numRuns: 80 },
    );
  });

  it("answers each known bad file with a plain verdict and writes nothing", async () => {
    const before = await written();
    const utf16 = new Uint8Array(Buffer.from("\uFEFFName,Email\nJo Reyes,jo.utf16@shop.example\n", "utf16le"));
    const latin1 = new Uint8Array(Buffer.from("Name,Email\nJosé Núñez,jose@shop.example\n", "latin1"));
    const huge = `Name,Email\n${"x".repeat(900_000)},huge@shop.example\n`;
    const cases: [string, string, (p: Preview) => void][] = [
      ["UTF-8 with a BOM", "\uFEFFName,Email\nJo Reyes,jo.bom@shop.example\n", (p) => expect(p.rows[0]).toMatchObject({ name: "Jo Reyes", status: "invite" })],
      ["UTF-16 read as UTF-8", asBrowserReadsIt(utf16), (p) => expect(p.fileError ?? p.rows.every((r) => r.status === "error")).toBeTruthy()],
      ["Latin-1 read as UTF-8", asBrowserReadsIt(latin1), (p) => expect(p.rows[0]).toMatchObject({ email: "jose@shop.example", status: "invite" })],
      ["an unbalanced quote", 'Name,Email\n"Jo Reyes,jo.quote@shop.example\nAl Baker,al@shop.example\n', (p) => expect(p.fileError ?? p.rows.some((r) => r.status === "error")).toBeTruthy()],
      [`${MAX_IMPORT_ROWS * 20} rows`, ["Name,Email", ...Array.from({ length: MAX_IMPORT_ROWS * 20 }, (_, i) => `S ${i},s${i}@shop.example`)].join("\n"), (p) => expect(p.fileError).toMatch(/at most 500/)],
      ["a 900 kB name", huge, (p) => expect(p.rows[0].name.length).toBeLessThanOrEqual(120)],
      ["only a header", "Name,Email\n", (p) => expect(p.fileError).toMatch(/no students/)],
      ["only commas", ",,,\n,,,\n", (p) => expect(p.fileError).toMatch(/No e-mail column|empty/)],
      [
        "formula cells",
        'Name,Email\n"=HYPERLINK(""http://evil.example"",""Click"")",f1@shop.example\n+SUM(A1:A9),f2@shop.example\n@cmd,f3@shop.example\n-2+3,=1+1@x\n',
        (p) => {
          // Read as plain text, never evaluated; the gradebook's CSV export escapes them on the way out.
          expect(p.rows.slice(0, 3).map((r) => r.name)).toEqual(['=HYPERLINK("http://evil.example","Click")', "+SUM(A1:A9)", "@cmd"]);
          expect(p.rows[3].status).toBe("error");
        },
      ],
    ];
    for (const [what, csv, check] of cases) {
      const reply = await importCsv(csv, true);
      expectVerdict(reply, what);
      expect(reply.status, what).toBe(200);
      check(reply.body);
    }
    const tooBig = await importCsv(`Name,Email\n${"y".repeat(1_100_000)}`, false);
    expect(tooBig.status).toBe(400);
    expect(tooBig.body.error.fields?.csv).toMatch(/over 1 MB/);
    const tooMany = await importCsv(["Name,Email", ...Array.from({ length: 10_000 }, (_, i) => `S ${i},many${i}@shop.example`)].join("\n"), false);
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields?.csv).toMatch(/at most 500/);
    expect(await written()).toEqual(before);
  });
});

describe("photo uploads with malformed files", SLOW, () => {
  const rows = () => withDatabase(databasePath, ({ models }) => models.Upload.count({ where: { studentId, assignmentId } }));
  const filesOnDisk = () => (fs.existsSync(uploadsFolder) ? fs.readdirSync(uploadsFolder).sort() : []);

  async function upload(bytes: Uint8Array, name = "IMG_0001.jpg", type = "image/jpeg") {
    const form = new FormData();
    form.append("photo", new Blob([new Uint8Array(bytes)], { type }), name);
    const res = await fetch(`${baseURL}/api/assignments/${assignmentId}/uploads`, { method: "POST", body: form, headers: { cookie: cookies.student } });
    return { status: res.status, body: (await res.json()) as { upload: { id: string; fullUrl: string } } & ErrorBody };
  }

  async function served(id: string): Promise<{ type: string | null; bytes: Buffer }> {
    const res = await fetch(`${baseURL}/api/uploads/${id}`, { headers: { cookie: cookies.student } });
    expect(res.status).toBe(200);
    return { type: res.headers.get("content-type"), bytes: Buffer.from(await res.arrayBuffer()) };
  }

  async function remove(id: string) {
    const res = await fetch(`${baseURL}/api/uploads/${id}`, { method: "DELETE", headers: { cookie: cookies.student } });
    expect(res.status).toBe(204);
  }

  /** Refused with a message naming the photo field, and nothing kept. */
  async function expectRefused(bytes: Uint8Array, what: string, name?: string, type?: string) {
    const before = { rows: await rows(), files: filesOnDisk() };
    const reply = await upload(bytes, name, type);
    expectErrorShape(reply.status, reply.body, what);
    expect({ rows: await rows(), files: filesOnDisk() }, what).toEqual(before);
    return reply;
  }

  it("refuses empty, cut-short, SVG and non-image files with a message, keeping nothing", async () => {
    const jpeg = await cameraPhoto("jpeg");
    const png = await cameraPhoto("png");
    expect((await expectRefused(new Uint8Array(0), "zero bytes")).body.error.fields?.photo).toBeTruthy();
    expect((await expectRefused(jpeg.subarray(0, Math.floor(jpeg.length / 2)), "half a JPEG")).body.error.message).toMatch(/damaged or cut short/);
    expect((await expectRefused(png.subarray(0, Math.floor(png.length / 2)), "half a PNG")).body.error.message).toMatch(/damaged or cut short/);
    await expectRefused(jpeg.subarray(0, 16), "a JPEG header alone");
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"><script>alert(1)</script><rect width="10" height="10"/></svg>');
    expect((await expectRefused(svg, "an SVG", "drawing.svg", "image/svg+xml")).body.error.message).toMatch(/not a photo/);
    await expectRefused(Buffer.concat([zipFile("index.html", "<script>alert(1)</script>"), jpeg]), "a ZIP with a JPEG after it", "photo.jpg");
    await expectRefused(Buffer.from("<html><body><script>alert(1)</script></body></html>"), "an HTML page named .jpg", "photo.jpg");
  });

  it("refuses random bytes and answers damaged photos with 201 or a 400, never a 500", async () => {
    const jpeg = await cameraPhoto("jpeg", { width: 160, height: 120 });
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ minLength: 1, maxLength: 4096 }), async (bytes) => {
        await expectRefused(bytes, `random ${bytes.length} bytes`);
      }),
      { numRuns: 40 },
    );
    await fc.assert(
      fc.asyncProperty(fc.array(fc.tuple(fc.nat(), fc.integer({ min: 0, max: 255 })), { minLength: 1, maxLength: 20 }), async (flips) => {
        const damaged = Buffer.from(jpeg);
        for (const [at, value] of flips) damaged[at % damaged.length] = value;
        const reply = await upload(damaged);
        if (reply.status === 201) {
          // Whatever sharp could still decode was re-encoded into a clean JPEG.
          const file = await served(reply.body.upload.id);
          expect(file.type).toBe("image/jpeg");
          expect((await sharp(file.bytes).metadata()).format).toBe("jpeg");
          await remove(reply.body.upload.id);
        } else {
          expectErrorShape(reply.status, reply.body, `damaged JPEG → ${reply.status}`);
        }
      }),
      { numRuns: 40 },
    );
  });

  it("re-encodes a photo with HTML or a ZIP glued on, and serves only the image", async () => {
    const jpeg = await cameraPhoto("jpeg");
    const png = await cameraPhoto("png");
    const script = "<html><body><script>alert(document.cookie)</script></body></html>";
    for (const [what, bytes] of [
      ["JPEG + HTML", Buffer.concat([jpeg, Buffer.from(script)])],
      ["PNG + HTML", Buffer.concat([png, Buffer.from(script)])],
      ["JPEG + ZIP", Buffer.concat([jpeg, zipFile("payload.html", script)])],
    ] as const) {
      const reply = await upload(bytes, "IMG_0042.jpg");
      expect(reply.status, what).toBe(201);
      const file = await served(reply.body.upload.id);
      expect(file.type, what).toMatch(/^image\/(jpeg|png)$/);
      expect(file.bytes.includes(Buffer.from("<script")), what).toBe(false);
      expect(file.bytes.includes(Buffer.from("PK\u0003\u0004")), what).toBe(false);
      expect(file.bytes.equals(bytes), what).toBe(false);
      await remove(reply.body.upload.id);
    }
  });

  it("refuses an upload whose declared length is over the limit without reading it", async () => {
    const before = await rows();
    const url = new URL(`${baseURL}/api/assignments/${assignmentId}/uploads`);
    const reply = await new Promise<{ status: number; body: string }>((resolve, reject) => {
      const req = http.request(
        { host: url.hostname, port: url.port, path: url.pathname, method: "POST", headers: { cookie: cookies.student, "content-type": "multipart/form-data; boundary=x", "content-length": String(MAX_REQUEST_BYTES * 5) } },
        (res) => {
          let body = "";
          res.on("data", (d) => (body += d));
          res.on("end", () => {
            resolve({ status: res.statusCode ?? 0, body });
            req.destroy();
          });
        },
      );
      req.on("error", reject);
      // A few bytes of the fifty megabytes promised; the answer must come without the rest.
      req.write("--x\r\n");
    });
    expect(reply.status).toBe(413);
    expectErrorShape(reply.status, JSON.parse(reply.body), "declared 50 MB");
    expect(await rows()).toBe(before);
  });
});
