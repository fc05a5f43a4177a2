import { describe, expect, it } from "vitest";
import { classAverage, fromHundredths, studentTotal, toHundredths } from "@/lib/gradebook/totals";
import { overrideFormSchema, overrideSchema } from "@/lib/gradebook/schemas";

describe("studentTotal", () => {
  it("sums points and leaves excused work out of both sides", () => {
    const cells = [
      { earned: 8, possible: 10, excused: false },
      { earned: 0, possible: 20, excused: true },
      { earned: 4.5, possible: 5, excused: false },
    ];
    expect(studentTotal(cells)).toEqual({ earned: 12.5, possible: 15, percent: 83.3 });
  });

  it("is 0 of 0 (0%) when everything is excused", () => {
    expect(studentTotal([{ earned: 3, possible: 10, excused: true }])).toEqual({ earned: 0, possible: 0, percent: 0 });
  });

  it("does not drift on tenths", () => {
    expect(studentTotal([0.1, 0.2, 0.7].map((earned) => ({ earned, possible: 1, excused: false }))).earned).toBe(1);
  });
});

describe("classAverage", () => {
  it("averages the percents of students whose work counts", () => {
    expect(classAverage([{ earned: 5, possible: 10, excused: false }, { earned: 10, possible: 10, excused: false }, { earned: 0, possible: 10, excused: true }])).toBe(75);
  });
  it("is null when nobody counts", () => {
    expect(classAverage([{ earned: 0, possible: 10, excused: true }])).toBeNull();
  });
});

describe("hundredths", () => {
  it("round-trips two-decimal points exactly", () => {
    for (const p of [0, 0.01, 2.7, 8.33, 100]) expect(fromHundredths(toHundredths(p))).toBe(p);
    expect(fromHundredths(null)).toBeNull();
  });
});

describe("overrideSchema", () => {
  it("takes exactly one of points, excused or clear, with a reason", () => {
    expect(overrideSchema.safeParse({ points: 7, reason: "Rechecked the marks" }).success).toBe(true);
    expect(overrideSchema.safeParse({ excused: true, reason: "Out for jury duty" }).success).toBe(true);
    expect(overrideSchema.safeParse({ clear: true, reason: "Entered on the wrong student" }).success).toBe(true);
  });
  it("names the field that is wrong", () => {
    const noReason = overrideSchema.safeParse({ points: 7 });
    expect(noReason.success).toBe(false);
    expect(noReason.error!.issues.map((i) => i.path.join("."))).toContain("reason");
    const both = overrideSchema.safeParse({ points: 7, excused: true, reason: "Both at once" });
    expect(both.error!.issues[0].path).toEqual(["points"]);
    const negative = overrideSchema.safeParse({ points: -1, reason: "Below zero" });
    expect(negative.error!.issues[0].path).toEqual(["points"]);
  });
  it("checks the typed points in the form", () => {
    const bad = overrideFormSchema.safeParse({ action: "points", points: "seven", reason: "Rechecked" });
    expect(bad.error!.issues[0].path).toEqual(["points"]);
    expect(overrideFormSchema.safeParse({ action: "excused", points: "", reason: "Rechecked" }).success).toBe(true);
  });
});
