import { describe, expect, it } from "vitest";
import { masteryOf, weakestSkill, type FinishedProblem } from "@/lib/practice/skills";

const run = (level: number, results: string): FinishedProblem[] => [...results].map((c) => ({ skill: "even-spacing", level, solved: c === "y" }));

describe("mastery: four of the last five solved at a level", () => {
  it("masters a level and opens the next only with four of the last five", () => {
    const [m] = masteryOf(["even-spacing"], run(1, "yyynn"));
    expect(m.levels[0]).toMatchObject({ mastered: false, solvedOfLastFive: 3, open: true });
    expect(m.levels[1].open).toBe(false);
    const [n] = masteryOf(["even-spacing"], run(1, "yynyy"));
    expect(n.levels[0].mastered).toBe(true);
    expect(n.levels[1].open).toBe(true);
    expect(n.currentLevel).toBe(2);
  });

  it("looks only at the newest five (the list is newest first)", () => {
    const [m] = masteryOf(["even-spacing"], run(1, "nnyyyyyyyy"));
    expect(m.levels[0]).toMatchObject({ solvedOfLastFive: 3, mastered: false });
  });

  it("does not count a higher level that is not open yet", () => {
    const [m] = masteryOf(["even-spacing"], run(2, "yyyyy"));
    expect(m.levels[1].mastered).toBe(false);
    expect(m.currentLevel).toBe(1);
  });

  it("sends the learner to the skill with the least mastered", () => {
    const mastery = masteryOf(["even-spacing", "stairs"], run(1, "yyyyy"));
    expect(weakestSkill(mastery, new Set(["even-spacing", "stairs"]))?.skill).toBe("stairs");
  });
});
