import { describe, expect, it } from "vitest";
import { activitySummary, average, bucketOf, dayKeys, distributionSummary, fillDays, lessonSummary, masterySummary, scoreBuckets, slipLesson, slipSummary } from "@/lib/progress/summaries";

describe("score buckets", () => {
  it.each([
    [0, 0],
    [9.99, 0],
    [10, 1],
    [59.9, 5],
    [89.99, 8],
    [90, 9],
    [100, 9],
    [-3, 0],
    [Number.NaN, 0],
  ])("%s %% falls in bucket %s", (percent, bucket) => {
    expect(bucketOf(percent)).toBe(bucket);
  });

  it("counts every score once, in ten buckets labelled by their range", () => {
    const buckets = scoreBuckets([0, 5, 45, 45.5, 100, 90, 72]);
    expect(buckets).toHaveLength(10);
    expect(buckets.map((b) => b.students)).toEqual([2, 0, 0, 0, 2, 0, 0, 1, 0, 2]);
    expect(buckets[9].label).toBe("90–100");
    expect(buckets.reduce((n, b) => n + b.students, 0)).toBe(7);
  });

  it("averages to one decimal, and says so when there is nothing to average", () => {
    expect(average([])).toBeNull();
    expect(average([50, 60, 70.5])).toBe(60.2);
  });
});

describe("days", () => {
  it("lists the days ending today in UTC, oldest first, and fills the quiet ones with zero", () => {
    const keys = dayKeys(new Date("2026-03-02T23:30:00Z"), 4);
    expect(keys).toEqual(["2026-02-27", "2026-02-28", "2026-03-01", "2026-03-02"]);
    expect(fillDays(keys, new Map([["2026-02-28", 3]]))).toEqual([
      { day: "2026-02-27", tries: 0 },
      { day: "2026-02-28", tries: 3 },
      { day: "2026-03-01", tries: 0 },
      { day: "2026-03-02", tries: 0 },
    ]);
  });
});

describe("slip lessons", () => {
  it("links a known slip to its lesson section and refuses an unknown key", () => {
    expect(slipLesson("divided-by-members")).toEqual({ name: "Divided by members", href: "/lessons/even-spacing#count-the-spaces-not-the-members" });
    expect(slipLesson("on-center-for-gap")?.href).toBe("/lessons/even-spacing");
    expect(slipLesson("no-such-slip")).toBeNull();
  });
});

describe("summaries for screen readers", () => {
  it("names the most common slip with its count and students", () => {
    expect(
      slipSummary([
        { name: "Divided by members", count: 14, students: 6 },
        { name: "Forgot kerf", count: 1, students: 1 },
      ]),
    ).toBe("Most common slip: divided by members, 14 times by 6 students. Next: forgot kerf, 1 time.");
    expect(slipSummary([])).toMatch(/No slips recorded yet/);
  });

  it("describes a score spread by its average, busiest bucket and the students below 60 %", () => {
    expect(distributionSummary("Battens", [95, 92, 40, 81])).toBe("Battens: class average 77 %. Most students (2) scored 90–100 %; 1 student below 60 %.");
    expect(distributionSummary("Battens", [])).toBe("Battens: no students to score yet.");
  });

  it("says which skill most and fewest students have mastered, or how far the first level has come", () => {
    expect(
      masterySummary(
        [
          { title: "Even spacing", mastered: 3, levelOne: 6 },
          { title: "Stairs", mastered: 0, levelOne: 1 },
          { title: "Reading a tape", mastered: 5, levelOne: 5 },
        ],
        8,
      ),
    ).toBe("Reading a tape: 5 of 8 students have mastered all three levels, the most of any skill. Fewest: Stairs, 0 of 8.");
    expect(
      masterySummary(
        [
          { title: "Stairs", mastered: 0, levelOne: 1 },
          { title: "Even spacing", mastered: 0, levelOne: 5 },
        ],
        18,
      ),
    ).toBe("No student has mastered a whole skill yet. Furthest along: Even spacing, where 5 of 18 students have mastered level 1.");
    expect(masterySummary([{ title: "Stairs", mastered: 0, levelOne: 0 }], 8)).toBe("No student has mastered a level yet (of 8 students).");
    expect(masterySummary([], 0)).toBe("No students in the class yet.");
  });

  it("names the most read lesson", () => {
    const lessons = [
      { title: "Reading a tape", read: 4, practised: 2 },
      { title: "Stair layout", read: 0, practised: 0 },
    ];
    expect(lessonSummary(lessons, 6)).toBe("Reading a tape is the most read lesson: 4 of 6 students finished it. 1 lesson of 2 have been finished by someone.");
    expect(lessonSummary(lessons.map((l) => ({ ...l, read: 0 })), 6)).toBe("No student has finished a lesson yet.");
  });

  it("totals the tries, the last week's share and the busiest day", () => {
    const days = dayKeys(new Date("2026-03-14T12:00:00Z"), 14).map((day, i) => ({ day, tries: i === 2 ? 9 : i >= 12 ? 1 : 0 }));
    expect(activitySummary(days)).toBe("11 tries in the last 2 weeks, 2 of them in the last 7 days. Busiest day: 2026-03-03 with 9.");
    expect(activitySummary(days.map((d) => ({ ...d, tries: 0 })))).toBe("No tries in the last 2 weeks.");
  });
});
