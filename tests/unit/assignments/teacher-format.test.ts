import { describe, expect, it } from "vitest";
import { assignmentPublishedMail, dueDateText } from "@/lib/mail/templates/assignment-published";
import { copyTitle, latePolicyText, toleranceText } from "@/lib/assignments/teacher-format";
import { assignmentSchema } from "@/lib/assignments/schemas";

describe("toleranceText", () => {
  it("is half a graduation when standard and a whole one when lenient", () => {
    expect(toleranceText({ answer: "length", precision: 16 }, "half")).toBe('within ±1/32"');
    expect(toleranceText({ answer: "length", precision: 16 }, "full")).toBe('within ±1/16"');
    expect(toleranceText({ answer: "number", precision: 4 }, "half")).toBe("within ±1/8");
  });

  it("keeps counts exact whatever the tolerance", () => {
    expect(toleranceText({ answer: "count", precision: 1 }, "full")).toBe("exact count");
  });
});

describe("latePolicyText", () => {
  it("says when a daily penalty has taken every point", () => {
    expect(latePolicyText({ latePolicy: "penalty", latePenaltyPercent: 15, lateUntilText: null })).toBe("Late work loses 15% of its points per day late (closes after 7 days)");
    expect(latePolicyText({ latePolicy: "none", latePenaltyPercent: null, lateUntilText: null })).toMatch(/closes at the due date/);
    expect(latePolicyText({ latePolicy: "until", latePenaltyPercent: null, lateUntilText: "May 3" })).toMatch(/until May 3/);
  });
});

describe("copyTitle", () => {
  it("adds (copy) and stays within the 160 characters a title may have", () => {
    expect(copyTitle("Stair layout")).toBe("Stair layout (copy)");
    const long = copyTitle("x".repeat(160));
    expect(long).toHaveLength(160);
    expect(long.endsWith(" (copy)")).toBe(true);
    expect(assignmentSchema.shape.title.safeParse(long).success).toBe(true);
  });
});

describe("the assignment-published e-mail", () => {
  const dueAt = new Date("2027-03-09T23:59:00Z");
  const mail = assignmentPublishedMail({ to: "ines@shop.example", studentName: "Ines Albright", className: "CARP 110", title: "Battens <hall>", dueAt, classId: 4, assignmentId: 17, baseUrl: "https://sixteenths.example" });

  it("writes the due date in UTC, whatever zone the server runs in", () => {
    expect(dueDateText(dueAt)).toBe("Tuesday, March 9, 2027, 11:59 PM UTC");
    expect(mail.text).toContain("due Tuesday, March 9, 2027, 11:59 PM UTC");
  });

  it("links the student's own assignment page and escapes the title in HTML", () => {
    expect(mail.subject).toBe("New assignment in CARP 110: Battens <hall>");
    expect(mail.text).toContain("https://sixteenths.example/my-classes/4/assignments/17");
    expect(mail.text.startsWith("Hi Ines,")).toBe(true);
    expect(mail.html).toContain("Battens &lt;hall&gt;");
    expect(mail.html).not.toContain("<hall>");
  });
});
