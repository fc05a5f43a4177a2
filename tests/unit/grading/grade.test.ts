import { describe, expect, it } from "vitest";
import { Fraction } from "@/lib/layout";
import { gradeAnswer, readAnswer, toleranceOf } from "@/lib/grading/grade";
import type { ProblemPart } from "@/lib/problems/types";

const gap: ProblemPart = { key: "gap", label: "Gap", answer: "length", precision: 16 };
const count: ProblemPart = { key: "spaces", label: "Spaces", answer: "count", precision: 1 };
const boardFeet: ProblemPart = { key: "bf", label: "Board feet", answer: "number", precision: 12 };
const none = () => null;

describe("reading an answer", () => {
  it("reads tape notation the way the calculators do", () => {
    for (const text of ["22 3/4", '22-3/4"', "22.75", "1' 10 3/4\""]) {
      const read = readAnswer(gap, text);
      expect(read.ok && read.value.equals(new Fraction(91, 4))).toBe(true);
    }
  });

  it("says what could not be read, and takes whole numbers only for a count", () => {
    expect(readAnswer(gap, "22 3/")).toMatchObject({ ok: false });
    expect(readAnswer(gap, "  ")).toEqual({ ok: false, message: "Enter an answer." });
    expect(readAnswer(count, "7.5")).toMatchObject({ ok: false, message: expect.stringContaining("whole number") });
    expect(readAnswer(count, "12")).toMatchObject({ ok: true });
    expect(readAnswer(boardFeet, '9 1/3"')).toMatchObject({ ok: false, message: expect.stringContaining("without units") });
    expect(readAnswer(boardFeet, "9 1/3")).toMatchObject({ ok: true, readAs: "9 1/3" });
  });
});

describe("verdicts", () => {
  // The tolerance defaults to half the asked precision: 1/32" for sixteenths, which is also
  // the premium-grade joint gap of the architectural woodwork standards (REFERENCES.md, ANSI/AWI 0620).
  it("accepts half a graduation either way, inclusive", () => {
    expect(toleranceOf(gap).equals(new Fraction(1, 32))).toBe(true);
    const exact = new Fraction(2247, 100); // 22.47"
    expect(gradeAnswer(gap, exact, "22 1/2", none)).toMatchObject({ verdict: "correct" }); // 0.03 off
    // 22 7/16 is 0.0325" off: just past half a sixteenth, so close but not right.
    expect(gradeAnswer(gap, exact, "22 7/16", none)).toMatchObject({ verdict: "imprecise" });
  });

  it("calls one graduation off imprecise, and names the rounding slip", () => {
    // Arithmetic: 22.4" is 22 6.4/16, so the nearest sixteenth is 22 3/8 and 22 7/16 the other neighbour.
    const exact = new Fraction(224, 10);
    expect(gradeAnswer(gap, exact, "22 3/8", none)).toMatchObject({ verdict: "correct" });
    expect(gradeAnswer(gap, exact, "22 7/16", none)).toMatchObject({ verdict: "imprecise", pattern: "rounded-wrong-way" });
    // 22.3" is 22 4.8/16: nearest sixteenth 22 5/16, nearest eighth 22 1/4 — rounded too coarsely.
    expect(gradeAnswer(gap, new Fraction(223, 10), "22 1/4", none)).toMatchObject({ verdict: "imprecise", pattern: "wrong-precision" });
    // Asked to 1/32, 22.4" rounded to quarters is 22 1/2 — three graduations off, still a rounding slip, not a wrong method.
    expect(gradeAnswer({ ...gap, precision: 32 }, exact, "22 1/2", none)).toMatchObject({ verdict: "imprecise", pattern: "wrong-precision" });
    expect(gradeAnswer({ ...gap, precision: 32 }, exact, "22 5/8", none)).toMatchObject({ verdict: "incorrect", pattern: null });
  });

  it("prefers the kind's diagnosis and says it in the trade's words", () => {
    const graded = gradeAnswer(gap, new Fraction(12), "17 5/8", () => "divided-by-members");
    expect(graded).toMatchObject({ verdict: "incorrect", pattern: "divided-by-members" });
    expect(graded.message).toContain("number of spaces");
    expect(gradeAnswer(gap, new Fraction(12), "30", none)).toMatchObject({ verdict: "incorrect", pattern: null });
  });

  it("grades a count exactly: one off is wrong, never close", () => {
    expect(gradeAnswer(count, new Fraction(13), "13", none)).toMatchObject({ verdict: "correct" });
    expect(gradeAnswer(count, new Fraction(13), "12", none)).toMatchObject({ verdict: "incorrect" });
  });

  it("returns a message and no verdict for unreadable text", () => {
    expect(gradeAnswer(gap, new Fraction(12), "twelve", none)).toMatchObject({ verdict: null });
  });
});
