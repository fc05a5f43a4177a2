import { randomUUID } from "node:crypto";
import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { caughtMail, startMailCatcher } from "../support/mail-catcher";

// queueDueReminders against a SQLite file and a maildev of this file's own.
const catcher = await startMailCatcher();
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-reminders-"));
process.env.DATABASE_PATH = path.join(dir, "reminders.sqlite");
process.env.NEXTAUTH_SECRET = "reminders-secret-reminders-secret-1234";
process.env.NEXTAUTH_URL = "http://shop.test";
process.env.SMTP_URL = catcher.smtpUrl;

const { prepareDatabase } = await import("@/lib/setup");
const { db } = await import("@/lib/db");
const { queueDueReminders } = await import("@/lib/mail/reminders");
const { deliverDueMail } = await import("@/lib/mail/outbox");

const HOUR = 60 * 60_000;
const now = new Date();
const ids = { classId: 0, dueSoon: 0, dueLater: 0 };

type Done = "solved" | "failed" | "open";

beforeAll(async () => {
  await prepareDatabase(process.env.DATABASE_PATH!, { seed: false, bcryptCost: 10 });
  const { User, SchoolClass, Enrollment, Assignment, AssignmentItem, AssignmentExtension, PracticeProblem } = db().models;
  const person = (name: string, role: "student" | "instructor" = "student") =>
    User.create({ name, email: `${name.toLowerCase()}@example.com`, passwordHash: "not used here", role });
  const teacher = await person("Dana", "instructor");
  const [ann, ben, cal, dee, eve, fay, hal] = await Promise.all(["Ann", "Ben", "Cal", "Dee", "Eve", "Fay", "Hal"].map((n) => person(n)));
  const outsider = await person("Ola");

  const shop = await SchoolClass.create({ name: "CARP 110 — Finish Carpentry I", term: "Spring", joinCode: "REMIND1", instructorId: teacher.id });
  const other = await SchoolClass.create({ name: "CARP 120", term: "Spring", joinCode: "REMIND2", instructorId: teacher.id });
  ids.classId = shop.id;
  await Enrollment.bulkCreate([
    ...[ann, ben, cal, dee, fay, hal].map((s) => ({ classId: shop.id, studentId: s.id, status: "active" as const })),
    { classId: shop.id, studentId: eve.id, status: "removed" },
    { classId: other.id, studentId: outsider.id, status: "active" },
  ]);

  const assignment = (title: string, classId: number, dueInHours: number, status: "draft" | "published" = "published") =>
    Assignment.create({ classId, title, opensAt: new Date(now.getTime() - 48 * HOUR), dueAt: new Date(now.getTime() + dueInHours * HOUR), status, createdBy: teacher.id });
  const dueSoon = await assignment("Batten layout, hallway wall", shop.id, 12);
  const dueLater = await assignment("Stair stringer layout", shop.id, 72);
  await assignment("Draft due soon", shop.id, 12, "draft");
  await assignment("Already past due", shop.id, -2);
  await assignment("Other class", other.id, 12);
  ids.dueSoon = dueSoon.id;
  ids.dueLater = dueLater.id;

  const marks = await AssignmentItem.create({ assignmentId: dueSoon.id, position: 1, kind: "even-gap", level: 1, problemCount: 2, points: 10 });
  const stock = await AssignmentItem.create({ assignmentId: dueSoon.id, position: 2, kind: "stock-boards", level: 1, problemCount: 1, points: 5 });
  await AssignmentItem.create({ assignmentId: dueLater.id, position: 1, kind: "stair-risers", level: 1, problemCount: 1, points: 5 });

  const work = (userId: number, itemId: number, variant: number, status: Done) =>
    ({ id: randomUUID(), userId, visitorId: null, assignmentItemId: itemId, variant, kind: "even-gap", level: 1, seed: variant, attemptsAllowed: 3, status });
  await PracticeProblem.bulkCreate([
    // Cal finished everything: two marks problems and the stock problem, one of them out of tries.
    work(cal.id, marks.id, 0, "solved"),
    work(cal.id, marks.id, 1, "failed"),
    work(cal.id, stock.id, 0, "solved"),
    // Ben finished the marks but not the stock item.
    work(ben.id, marks.id, 0, "solved"),
    work(ben.id, marks.id, 1, "solved"),
    // Fay has every problem started, one still open.
    work(fay.id, marks.id, 0, "solved"),
    work(fay.id, marks.id, 1, "solved"),
    work(fay.id, stock.id, 0, "open"),
  ]);

  // Dee has until next week; Hal's stair layout was moved up to six hours from now.
  await AssignmentExtension.create({ assignmentId: dueSoon.id, studentId: dee.id, dueAt: new Date(now.getTime() + 7 * 24 * HOUR), grantedBy: teacher.id });
  await AssignmentExtension.create({ assignmentId: dueLater.id, studentId: hal.id, dueAt: new Date(now.getTime() + 6 * HOUR), grantedBy: teacher.id });
  // An extension with extra tries only keeps the class due date.
  await AssignmentExtension.create({ assignmentId: dueSoon.id, studentId: ann.id, dueAt: null, extraAttempts: 2, grantedBy: teacher.id });
});

afterAll(async () => {
  await db().sequelize.close();
  await catcher.stop();
  fs.rmSync(dir, { recursive: true, force: true });
});

const reminders = async () => (await caughtMail(catcher.apiUrl)).filter((m) => m.subject.startsWith("Due within 24 hours"));

describe("due-soon reminders", () => {
  it("reminds each unfinished active student whose own due date is within 24 hours, once", async () => {
    expect(await queueDueReminders(now)).toBe(5);
    expect(await deliverDueMail()).toEqual({ sent: 5, failed: 0 });

    const caught = await reminders();
    const who = caught.map((m) => `${m.to[0].address} ${m.subject.replace("Due within 24 hours: ", "")}`).sort();
    expect(who).toEqual([
      "ann@example.com Batten layout, hallway wall",
      "ben@example.com Batten layout, hallway wall",
      "fay@example.com Batten layout, hallway wall",
      "hal@example.com Batten layout, hallway wall",
      "hal@example.com Stair stringer layout",
    ]);

    const ann = caught.find((m) => m.to[0].address === "ann@example.com")!;
    const link = `http://shop.test/my-classes/${ids.classId}/assignments/${ids.dueSoon}`;
    expect(ann.text).toContain(link);
    expect(ann.html).toContain(`href="${link}"`);
    expect(ann.text).toContain("CARP 110 — Finish Carpentry I");
    expect(ann.text).toMatch(/is due \w+day, \w+ \d{1,2}, \d{4} at \d{1,2}:\d{2} [AP]M UTC/);
  });

  it("queues nothing new on the next run, or the one after", async () => {
    expect(await queueDueReminders(now)).toBe(0);
    expect(await queueDueReminders(new Date(now.getTime() + HOUR))).toBe(0);
    expect(await deliverDueMail()).toEqual({ sent: 0, failed: 0 });
    expect(await reminders()).toHaveLength(5);
    expect(await db().models.EmailOutbox.count({ where: { kind: "due-soon" } })).toBe(5);
  });

  it("reminds Dee once her extended due date comes within 24 hours", async () => {
    const sixDaysOn = new Date(now.getTime() + 6 * 24 * HOUR + HOUR);
    expect(await queueDueReminders(sixDaysOn)).toBe(1);
    await deliverDueMail();
    expect((await reminders()).filter((m) => m.to[0].address === "dee@example.com")).toHaveLength(1);
  });
});
