import { Op } from "sequelize";
import { beforeAll, describe, expect, it } from "vitest";
import { waitForMail } from "../support/mail-catcher";
import { call, createClass, enroll, mailURL, makePerson, uniqueEmail, withDb, type Person } from "./classes-helpers";

type Preview = { rows: { line: number; email: string; status: string; message: string | null; note: string | null }[]; counts: Record<string, number>; fileError: string | null };
type Committed = Preview & { batch: string; sent: number };
type Progress = { total: number; sent: number; waiting: number; done: boolean };

let lead: Person;
let klass: { id: number };

const importCsv = <T>(csv: string, dryRun: boolean) => call<T>("POST", `/api/classes/${klass.id}/roster/import`, { cookie: lead.cookie, body: { csv, dryRun } });

async function counts() {
  return withDb(async ({ models }) => ({
    invitations: await models.Invitation.count({ where: { classId: klass.id } }),
    openInvitations: await models.Invitation.count({ where: { classId: klass.id, acceptedAt: null, revokedAt: null } }),
    outbox: await models.EmailOutbox.count({ where: { dedupeKey: { [Op.like]: `invitations:${klass.id}:%` } } }),
  }));
}

beforeAll(async () => {
  lead = await makePerson("instructor", "importer");
  klass = await createClass(lead);
});

describe("roster CSV import", () => {
  it("previews good, bad and duplicate rows without writing, then writes exactly the good ones in one go", async () => {
    const active = await makePerson("student", "enrolled");
    await enroll(klass.id, active.id);
    const invitedBefore = uniqueEmail("pending");
    expect((await call("POST", `/api/classes/${klass.id}/invitations`, { cookie: lead.cookie, body: { addresses: invitedBefore } })).status).toBe(201);

    const good = [uniqueEmail("rosa"), uniqueEmail("felix"), uniqueEmail("imani")];
    const csv = [
      "Full Name;Email Address",
      `Rosa Delgado;${good[0].toUpperCase()}`,
      `Felix Tran;${good[1]}`,
      `;${good[2]}`,
      "Bad Address;rosa-at-example.com",
      `Rosa Again;${good[0]}`,
      "No Mail;",
      `Already Here;${active.email}`,
      `Pending Person;${invitedBefore}`,
    ].join("\n");
    const before = await counts();

    const preview = await importCsv<Preview>(csv, true);
    expect(preview.status).toBe(200);
    expect(preview.body.fileError).toBeNull();
    expect(preview.body.rows.map((r) => [r.line, r.status])).toEqual([
      [2, "invite"],
      [3, "invite"],
      [4, "invite"],
      [5, "error"],
      [6, "error"],
      [7, "error"],
      [8, "error"],
      [9, "resend"],
    ]);
    expect(preview.body.rows[2].note).toMatch(/No name given/);
    expect(preview.body.rows[3].message).toMatch(/not an e-mail address/);
    expect(preview.body.rows[4].message).toMatch(/Same e-mail as line 2/);
    expect(preview.body.rows[5].message).toMatch(/No e-mail address/);
    expect(preview.body.rows[6].message).toMatch(/Already an active student/);
    expect(preview.body.counts).toEqual({ invite: 3, resend: 1, error: 4 });
    expect(await counts()).toEqual(before);

    const committed = await importCsv<Committed>(csv, false);
    expect(committed.status).toBe(201);
    expect(committed.body.sent).toBe(4);
    const after = await counts();
    expect(after.invitations).toBe(before.invitations + 4);
    // The re-sent address's old invitation was cancelled: still one open invitation per address.
    expect(after.openInvitations).toBe(before.openInvitations + 3);
    expect(after.outbox).toBe(before.outbox + 4);
    const written = await withDb(({ models }) => models.Invitation.findAll({ where: { classId: klass.id, acceptedAt: null, revokedAt: null }, raw: true }));
    expect(written.map((w) => w.email).sort()).toEqual([...good, invitedBefore].sort());
    expect(written.find((w) => w.email === good[2])!.name).toBe(good[2].split("@")[0]);

    await expect
      .poll(async () => (await call<Progress>("GET", `/api/classes/${klass.id}/invitations/batches/${committed.body.batch}`, { cookie: lead.cookie })).body, { timeout: 15_000 })
      .toEqual({ total: 4, sent: 4, waiting: 0, retrying: [], failed: [], done: true });
    for (const email of good) await waitForMail(mailURL, email, /added you to/);
  });

  it("writes nothing when no row can be invited, when a column is missing, or when the file is too big", async () => {
    const before = await counts();
    const allBad = await importCsv<{ error: { message: string } }>("Name,Email\nNo One,nobody-at-all\n", false);
    expect(allBad.status).toBe(400);
    expect(allBad.body.error.message).toMatch(/No row in the file can be invited/);
    const noColumn = await importCsv<{ error: { fields: Record<string, string> } }>("Name,Phone\nAvery,555-0100\n", false);
    expect(noColumn.status).toBe(400);
    expect(noColumn.body.error.fields.csv).toMatch(/No e-mail column/);
    const tooMany = ["Name,Email", ...Array.from({ length: 501 }, (_, i) => `S ${i},s${i}.${Date.now()}@example.com`)].join("\n");
    expect((await importCsv(tooMany, false)).status).toBe(400);
    const tooBig = `Name,Email\n${"x".repeat(1_000_001)}`;
    const big = await importCsv<{ error: { fields: Record<string, string> } }>(tooBig, true);
    expect(big.status).toBe(400);
    expect(big.body.error.fields.csv).toMatch(/over 1 MB/);
    expect(await counts()).toEqual(before);
  });

  it("refuses a request that does not say whether it is a preview", async () => {
    const reply = await call<{ error: { fields: Record<string, string> } }>("POST", `/api/classes/${klass.id}/roster/import`, { cookie: lead.cookie, body: { csv: "Name,Email" } });
    expect(reply.status).toBe(400);
    expect(reply.body.error.fields).toHaveProperty("dryRun");
  });
});
