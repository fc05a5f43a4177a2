import { beforeAll, describe, expect, it, vi } from "vitest";
import { invitationMail } from "@/lib/mail/templates/invitation";

describe("invitation e-mail", () => {
  beforeAll(() => {
    // Links are built from the app's own address; env() reads it on first use.
    vi.stubEnv("NEXTAUTH_URL", "https://shop.example.edu");
    vi.stubEnv("NEXTAUTH_SECRET", "a".repeat(40));
  });

  it("names the class, the instructor, the link and when it runs out, in text and HTML", () => {
    const mail = invitationMail({
      to: "avery@example.com",
      name: "Avery <Castellanos>",
      className: "CARP 110 — Finish Carpentry I",
      term: "Spring 2027",
      instructorName: "Dana Whitlock",
      token: "abc_DEF-123",
      expiresAt: new Date(Date.UTC(2027, 0, 17, 12)),
    });
    expect(mail).toMatchObject({ kind: "invitation", to: "avery@example.com", subject: "Dana Whitlock added you to CARP 110 — Finish Carpentry I" });
    expect(mail.text).toContain("Hello Avery <Castellanos>,");
    expect(mail.text).toMatch(/Join the class: https:\/\/shop\.example\.edu\/invite\/abc_DEF-123\n/);
    expect(mail.text).toContain("Sunday, January 17, 2027 at 12:00 PM UTC");
    expect(mail.html).toContain('href="https://shop.example.edu/invite/abc_DEF-123"');
    // What the instructor typed is escaped, never markup.
    expect(mail.html).toContain("Avery &lt;Castellanos&gt;");
  });
});
