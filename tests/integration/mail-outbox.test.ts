import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { caughtMail, startMailCatcher, waitForMail } from "../support/mail-catcher";

// The outbox in this process against a SQLite file and a maildev of this file's own. env() is
// read once, on first use, so the SMTP address and database are set before anything loads it.
const catcher = await startMailCatcher();
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-outbox-"));
process.env.DATABASE_PATH = path.join(dir, "outbox.sqlite");
process.env.NEXTAUTH_SECRET = "outbox-test-secret-outbox-test-secret";
process.env.SMTP_URL = catcher.smtpUrl;

const { prepareDatabase } = await import("@/lib/setup");
const { db } = await import("@/lib/db");
const { composeMail } = await import("@/lib/mail/message");
const { deliverDueMail, enqueueMail, settleDelivery } = await import("@/lib/mail/outbox");

beforeAll(async () => {
  await prepareDatabase(process.env.DATABASE_PATH!, { seed: false, bcryptCost: 10 });
});

afterAll(async () => {
  await settleDelivery();
  await db().sequelize.close();
  await catcher.stop();
  fs.rmSync(dir, { recursive: true, force: true });
});

function note(to: string, subject = "Shop is closed Friday") {
  return composeMail("notice", to, subject, {
    greeting: "Hi Ann,",
    paragraphs: ["The shop is closed on Friday for the saw-stop inspection."],
    action: { label: "See the calendar", url: "http://localhost:3000/my-classes" },
  });
}

async function caughtFor(address: string) {
  return (await caughtMail(catcher.apiUrl)).filter((m) => m.to.some((t) => t.address === address));
}

describe("the outbox", () => {
  it("delivers a queued message once, with a text and an HTML part", async () => {
    const to = "once@example.com";
    expect(await enqueueMail([note(to)])).toBe(1);
    const mail = await waitForMail(catcher.apiUrl, to, /Shop is closed/);
    expect(mail.text).toContain("The shop is closed on Friday");
    expect(mail.text).toContain("See the calendar: http://localhost:3000/my-classes");
    expect(mail.html).toContain('<a href="http://localhost:3000/my-classes"');
    await settleDelivery();

    // Later passes find nothing left to send.
    expect(await deliverDueMail()).toEqual({ sent: 0, failed: 0 });
    const row = await db().models.EmailOutbox.findOne({ where: { toAddress: to } });
    expect(row).toMatchObject({ status: "sent", tries: 1, lastError: null, claimedAt: null });
    expect(row?.sentAt).toBeInstanceOf(Date);
    expect(await caughtFor(to)).toHaveLength(1);
  });

  it("stores one row for a dedupe key queued twice, in the same batch or later, and sends it once", async () => {
    const to = "dedupe@example.com";
    const key = "test-dedupe:1";
    expect(await enqueueMail([{ ...note(to), dedupeKey: key }, { ...note(to), dedupeKey: key }])).toBe(1);
    const again = await db().sequelize.transaction((transaction) => enqueueMail([{ ...note(to), dedupeKey: key }], transaction));
    expect(again).toBe(0);
    expect(await db().models.EmailOutbox.count({ where: { dedupeKey: key } })).toBe(1);
    await waitForMail(catcher.apiUrl, to);
    await settleDelivery();
    expect(await caughtFor(to)).toHaveLength(1);
  });

  it("stores no mail when the action's transaction rolls back", async () => {
    const to = "rolled-back@example.com";
    await expect(
      db().sequelize.transaction(async (transaction) => {
        await enqueueMail([note(to)], transaction);
        throw new Error("the action failed");
      }),
    ).rejects.toThrow("the action failed");
    expect(await db().models.EmailOutbox.count({ where: { toAddress: to } })).toBe(0);
  });

  it("sends each message once when two passes run at the same time (each row is claimed first)", async () => {
    const addresses = Array.from({ length: 12 }, (_, i) => `racer${i}@example.com`);
    // Straight into the table, so no pass starts before the two below.
    await db().models.EmailOutbox.bulkCreate(addresses.map((to) => ({ ...note(to, "Race"), toAddress: to, nextTryAt: new Date() })));
    const [a, b] = await Promise.all([deliverDueMail(), deliverDueMail()]);
    expect(a.failed + b.failed).toBe(0);
    const rows = await db().models.EmailOutbox.findAll({ where: { subject: "Race" } });
    expect(rows.map((r) => [r.status, r.tries])).toEqual(addresses.map(() => ["sent", 1]));
    const caught = (await caughtMail(catcher.apiUrl)).filter((m) => m.subject === "Race");
    expect(caught.map((m) => m.to[0].address).sort()).toEqual([...addresses].sort());
  });
});
