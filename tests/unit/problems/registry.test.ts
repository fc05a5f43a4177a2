// Every registered kind, graded by the real grader: the solver's own rounded answers are right,
// the prompt never carries them, and every lesson link the feedback gives lands on a heading.
import fs from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { gradeAnswer } from "@/lib/grading/grade";
import { roundedAnswer } from "@/lib/problems/kit";
import { ERROR_PATTERNS, LEVELS, PROBLEM_KINDS, SKILLS } from "@/lib/problems";
import { headingId } from "@/lib/lessons/text";

const SEEDS_PER_LEVEL = 150;
const lessonsDir = path.join(process.cwd(), "content", "lessons");
const anchors = new Map<string, Set<string>>();
for (const file of fs.readdirSync(lessonsDir).filter((f) => f.endsWith(".mdx"))) {
  const slug = file.replace(/^\d{2}-/, "").replace(/\.mdx$/, "");
  const ids = new Set<string>();
  for (const line of fs.readFileSync(path.join(lessonsDir, file), "utf8").split("\n")) {
    const m = /^(##|###) (.+?)\s*$/.exec(line);
    if (m) ids.add(headingId(m[2]));
  }
  anchors.set(slug, ids);
}

describe("the problem registry", () => {
  it("has a kind for every skill, with unique keys and three levels each", () => {
    expect(new Set(PROBLEM_KINDS.map((k) => k.key)).size).toBe(PROBLEM_KINDS.length);
    for (const skill of SKILLS) expect(PROBLEM_KINDS.some((k) => k.skill === skill), skill).toBe(true);
    for (const kind of PROBLEM_KINDS) expect(kind.levels.map((l) => l.level)).toEqual([1, 2, 3]);
  });

  it("links every kind and every slip to a lesson heading that exists", () => {
    const links = [...PROBLEM_KINDS.map((k) => k.lesson), ...Object.values(ERROR_PATTERNS).map((p) => p.lesson)];
    for (const link of links) {
      expect(anchors.has(link.slug), link.slug).toBe(true);
      if (link.section) expect(anchors.get(link.slug)!.has(link.section), `${link.slug}#${link.section}`).toBe(true);
    }
  });

  for (const kind of PROBLEM_KINDS) {
    it(`${kind.key}: the rounded solution is graded correct on every level, and the solve is deterministic`, () => {
      for (const level of LEVELS) {
        for (let seed = 0; seed < SEEDS_PER_LEVEL; seed++) {
          const params = kind.generate(seed * 7919 + level, level);
          const expected = kind.solve(params);
          expect(kind.solve(kind.generate(seed * 7919 + level, level))).toEqual(expected);
          for (const part of kind.parts(params)) {
            const answer = part.answer === "count" ? expected[part.key] : roundedAnswer(expected[part.key], part.precision);
            const text = part.answer === "count" ? answer.toString() : answer.toFraction(true);
            const graded = gradeAnswer(part, expected[part.key], text, (v) => kind.diagnose(params, part.key, v));
            expect(graded.verdict, `${kind.key} L${level} seed ${seed} ${part.key}: ${text}`).toBe("correct");
          }
        }
      }
    }, 60_000);
  }
});
