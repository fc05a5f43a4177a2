import "server-only";
import { formatMeasure, Fraction, roundTo } from "@/lib/layout";
import { ERROR_PATTERNS, findKind, isErrorPattern, type AnyProblemKind, type Level, type ProblemFigure, type ProblemPart } from "@/lib/problems";
import type { Verdict } from "@/lib/grading/grade";
import { inlineMathToHtml, mathTextToHtml, partView, type PartView } from "./present";
import { SKILL_TITLES } from "./skills";

export type ProblemStatus = "open" | "solved" | "failed";

export type PartResult = {
  raw: string;
  readAs: string;
  verdict: Verdict;
  message: string;
  pattern: string | null;
  patternName: string | null;
  lessonHref: string | null;
};

export type ProblemView = {
  id: string;
  kind: string;
  title: string;
  skill: string;
  skillTitle: string;
  level: Level;
  levelLabel: string;
  status: ProblemStatus;
  attemptsAllowed: number;
  attemptsUsed: number;
  promptHtml: string;
  figure: ProblemFigure | null;
  parts: PartView[];
  /** The latest graded answer of each part (null before the first try). */
  results: Record<string, PartResult | null>;
  lessonHref: string;
  /** Only once the problem is final: the answers and the worked solution. */
  final: { expected: Record<string, string>; stepsHtml: string[] } | null;
};

export type StoredProblem = { id: string; kind: string; level: number; seed: number; status: ProblemStatus; attemptsAllowed: number; attemptsUsed: number };
export type StoredAttempt = { part: string; raw: string; value: string; verdict: string; pattern: string | null; submission: number };

export function kindOrThrow(key: string): AnyProblemKind {
  const kind = findKind(key);
  if (!kind) throw new Error(`unknown problem kind ${key}`);
  return kind;
}

export function lessonHref(lesson: { slug: string; section?: string }): string {
  return `/lessons/${lesson.slug}${lesson.section ? `#${lesson.section}` : ""}`;
}

/** How an expected value is shown once a problem is final: rounded as asked, and the exact value when it differs. */
export function expectedText(part: ProblemPart, expected: Fraction): string {
  if (part.answer === "count") return expected.toString();
  if (part.answer === "number") {
    const rounded = roundTo(expected, part.precision).rounded;
    const text = (v: Fraction) => (v.d === 1n ? v.toString() : v.toFraction(true));
    return rounded.equals(expected) ? text(expected) : `${text(rounded)} (exactly ${expected.round(4).toString()})`;
  }
  const shown = formatMeasure(expected, { denominator: part.precision, style: part.style ?? "inches" });
  if (shown.error.equals(0)) return shown.text;
  const fine = formatMeasure(expected, { denominator: 64, style: part.style ?? "inches" });
  return `${shown.text} (exactly ${fine.error.equals(0) ? fine.text : `${expected.round(4).toString()}"`})`;
}

export function partResult(row: StoredAttempt, readAs: string, message: string): PartResult {
  const pattern = row.pattern && isErrorPattern(row.pattern) ? ERROR_PATTERNS[row.pattern] : null;
  return {
    raw: row.raw,
    readAs,
    verdict: row.verdict as Verdict,
    message,
    pattern: pattern?.key ?? null,
    patternName: pattern?.name ?? null,
    lessonHref: pattern ? lessonHref(pattern.lesson) : null,
  };
}

export function buildView(problem: StoredProblem, results: Record<string, PartResult | null>): ProblemView {
  const kind = kindOrThrow(problem.kind);
  const level = problem.level as Level;
  const params = kind.generate(problem.seed, level);
  const prompt = kind.render(params);
  const parts = kind.parts(params);
  const isFinal = problem.status !== "open";
  let final: ProblemView["final"] = null;
  if (isFinal) {
    const expected = kind.solve(params);
    final = {
      expected: Object.fromEntries(parts.map((p) => [p.key, expectedText(p, expected[p.key])])),
      stepsHtml: kind.explain(params).map(inlineMathToHtml),
    };
  }
  return {
    id: problem.id,
    kind: kind.key,
    title: kind.title,
    skill: kind.skill,
    skillTitle: SKILL_TITLES[kind.skill],
    level,
    levelLabel: kind.levels.find((l) => l.level === level)?.label ?? `Level ${level}`,
    status: problem.status,
    attemptsAllowed: problem.attemptsAllowed,
    attemptsUsed: problem.attemptsUsed,
    promptHtml: mathTextToHtml(prompt.text),
    figure: prompt.figure ?? null,
    parts: parts.map(partView),
    results: Object.fromEntries(parts.map((p) => [p.key, results[p.key] ?? null])),
    lessonHref: lessonHref(kind.lesson),
    final,
  };
}
