import { describe, expect, it } from "vitest";

// Links are built from NEXTAUTH_URL, which env() reads (and checks) on first use.
process.env.NEXTAUTH_SECRET = "unit-test-secret-unit-test-secret-1234";
process.env.NEXTAUTH_URL = "https://shop.example.edu/sixteenths/";

const { passwordResetMail } = await import("@/lib/mail/templates/password-reset");
const { dueSoonMail } = await import("@/lib/mail/templates/due-soon");
const { utcWritten } = await import("@/lib/mail/links");

const due = {
  to: "ann@example.com",
  name: "Ann",
  assignmentId: 42,
  assignmentTitle: "Batten layout, hallway wall",
  classId: 7,
  className: "CARP 110 — Finish Carpentry I",
  dueAt: new Date("2027-03-12T17:00:00Z"),
};

describe("password reset e-mail", () => {
  const mail = passwordResetMail({ to: "ann@example.com", name: "Ann", token: "abc_DEF-123" });
  const link = "https://shop.example.edu/sixteenths/reset-password/abc_DEF-123";

  it("carries the link in both the text and the HTML part", () => {
    expect(mail.to).toBe("ann@example.com");
    expect(mail.kind).toBe("password-reset");
    expect(mail.text).toContain(link);
    expect(mail.html).toContain(`href="${link}"`);
  });

  it("says how long the link lasts and that ignoring it changes nothing", () => {
    expect(mail.text).toMatch(/works once and runs out in 1 hour/);
    expect(mail.text).toMatch(/ignore this e-mail/);
  });

  it("escapes a name in the HTML and keeps it as typed in the text", () => {
    const sneaky = passwordResetMail({ to: "ann@example.com", name: "<b>Ann</b>", token: "t" });
    expect(sneaky.html).toContain("Hi &lt;b&gt;Ann&lt;/b&gt;,");
    expect(sneaky.html).not.toContain("<b>Ann</b>");
    expect(sneaky.text).toContain("Hi <b>Ann</b>,");
  });
});

describe("due-soon e-mail", () => {
  const mail = dueSoonMail(due);
  const link = "https://shop.example.edu/sixteenths/my-classes/7/assignments/42";

  it("carries the assignment link in both parts", () => {
    expect(mail.kind).toBe("due-soon");
    expect(mail.text).toContain(link);
    expect(mail.html).toContain(`href="${link}"`);
  });

  it("names the assignment and the class and writes the due time out in UTC", () => {
    expect(mail.subject).toBe("Due within 24 hours: Batten layout, hallway wall");
    expect(mail.text).toContain("CARP 110 — Finish Carpentry I");
    expect(mail.text).toContain("Friday, March 12, 2027 at 5:00 PM UTC");
    expect(mail.html).toContain("Friday, March 12, 2027 at 5:00 PM UTC");
  });

  it("escapes markup in the title, class and name in the HTML part", () => {
    const sneaky = dueSoonMail({ ...due, name: "<b>Ann</b>", assignmentTitle: 'Stairs <script>alert("x")</script>', className: "A & B" });
    expect(sneaky.html).toContain("&lt;b&gt;Ann&lt;/b&gt;");
    expect(sneaky.html).not.toContain("<script>");
    expect(sneaky.html).toContain("A &amp; B");
  });
});

describe("utcWritten", () => {
  it("writes morning, noon and midnight plainly", () => {
    // 1 January 2027 falls on a Friday; the weekdays below count on from it.
    expect(utcWritten(new Date("2027-01-04T09:05:00Z"))).toBe("Monday, January 4, 2027 at 9:05 AM UTC");
    expect(utcWritten(new Date("2027-06-30T12:00:00Z"))).toBe("Wednesday, June 30, 2027 at 12:00 PM UTC");
    expect(utcWritten(new Date("2027-12-31T00:30:00Z"))).toBe("Friday, December 31, 2027 at 12:30 AM UTC");
  });
});
