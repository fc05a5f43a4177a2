import fs from "node:fs";
import os from "node:os";
import path from "node:path";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { freePort } from "../support/free-port";
import { startMailCatcher, waitForMail, linkIn, type MailCatcher } from "../support/mail-catcher";

// SMTP_URL points at a loopback port nobody listens on: the server is down for this whole file,
// until a test brings a real one up and hands its transport to a later pass.
const dir = fs.mkdtempSync(path.join(os.tmpdir(), "sixteenths-outbox-retry-"));
process.env.DATABASE_PATH = path.join(dir, "retry.sqlite");
process.env.NEXTAUTH_SECRET = "outbox-retry-secret-outbox-retry-secret";
process.env.SMTP_URL = `smtp://127.0.0.1:${await freePort()}`;
process.env.BCRYPT_COST = "10";

const { prepareDatabase } = await import("@/lib/setup");
const { db } = await import("@/lib/db");
const { createUser } = await import("@/lib/accounts/users");
const { requestPasswordReset } = await import("@/lib/accounts/password-reset");
const { deliverDueMail, retryDelayMs, settleDelivery } = await import("@/lib/mail/outbox");
const { createTransport } = await import("@/lib/mail/transport");

let catcher: MailCatcher | undefined;

beforeAll(async () => {
  await prepareDatabase(process.env.DATABASE_PATH!, { seed: false, bcryptCost: 10 });
});

afterAll(async () => {
  await settleDelivery();
  await db().sequelize.close();
  await catcher?.stop();
  fs.rmSync(dir, { recursive: true, force: true });
});

describe("the outbox while SMTP is down", () => {
  it("keeps the action and the message, retries later, and delivers once SMTP is back", async () => {
    const user = await createUser({ name: "Rowan Plumb", email: "rowan@example.com", password: "square and true" });
    const before = Date.now();
    // The action: a reset request stores its row and queues its mail; the send starts after commit and fails.
    await requestPasswordReset(user.email);
    await settleDelivery();

    const { EmailOutbox, PasswordReset } = db().models;
    const row = await EmailOutbox.findOne({ where: { toAddress: user.email } });
    expect(row).toMatchObject({ kind: "password-reset", status: "pending", tries: 1, claimedAt: null, sentAt: null });
    expect(row?.lastError).toMatch(/ECONNREFUSED|connect/i);
    expect(row!.nextTryAt.getTime()).toBeGreaterThanOrEqual(before + retryDelayMs(1));
    expect(await PasswordReset.count({ where: { userId: user.id, usedAt: null } })).toBe(1);

    catcher = await startMailCatcher();
    const live = createTransport(catcher.smtpUrl);
    // Not yet due: a pass now leaves it alone.
    expect(await deliverDueMail({ transport: live })).toEqual({ sent: 0, failed: 0 });
    // Once its retry time comes, the next pass sends it.
    const later = new Date(row!.nextTryAt.getTime() + 1_000);
    expect(await deliverDueMail({ transport: live, now: later })).toEqual({ sent: 1, failed: 0 });
    const mail = await waitForMail(catcher.apiUrl, user.email, /new Sixteenths password/);
    expect(linkIn(mail, "http://localhost:3000/reset-password/")).toMatch(/^http:\/\/localhost:3000\/reset-password\/[A-Za-z0-9_-]{43}$/);
    expect(await EmailOutbox.findByPk(row!.id)).toMatchObject({ status: "sent", tries: 2, lastError: null });
  });

  it("waits longer after each failure and gives up after the last try", async () => {
    expect([1, 2, 3, 4].map(retryDelayMs)).toEqual([15_000, 30_000, 60_000, 120_000]);
    expect(retryDelayMs(20)).toBe(60 * 60_000);

    const { EmailOutbox } = db().models;
    const row = await EmailOutbox.create({ kind: "notice", toAddress: "gone@example.com", subject: "Last try", text: "t", html: "<p>t</p>", tries: 11, nextTryAt: new Date() });
    expect(await deliverDueMail()).toEqual({ sent: 0, failed: 1 });
    expect(await EmailOutbox.findByPk(row.id)).toMatchObject({ status: "failed", tries: 12 });
    // A failed message is not picked up again.
    expect(await deliverDueMail({ now: new Date(Date.now() + 24 * 60 * 60_000) })).toEqual({ sent: 0, failed: 0 });
  });
});
