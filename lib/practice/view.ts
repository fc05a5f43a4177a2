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

/** What one try changes: an answer's reply leaves out the prompt and drawing the learner already has. */
export type ProblemUpdate = Pick<ProblemView, "id" | "status" | "attemptsUsed" | "attemptsAllowed" | "results" | "final">;

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

/** A stored problem rebuilt from its seed: the kind, its parameters, parts and exact answers. */
export type WorkedProblem = {
  kind: AnyProblemKind;
  params: unknown;
  parts: ProblemPart[];
  expected: Record<string, Fraction>;
  /** The typeset prompt, made on first use. */
  prompt?: { html: string; figure: ProblemFigure | null };
};

// A problem is opened and answered several times, and some generators search (a cut list is
// packed for every draw), so rebuilt problems are kept: the seed fixes them for good.
const WORKED_KEPT = 5000;
const worked = new Map<string, WorkedProblem>();

export function workOut(problem: Pick<StoredProblem, "kind" | "level" | "seed">): WorkedProblem {
  const key = `${problem.kind}:${problem.level}:${problem.seed}`;
  const kept = worked.get(key);
  if (kept) {
    // Map order is insertion order: moving a hit to the end makes the first key the least recently used.
    worked.delete(key);
    worked.set(key, kept);
    return kept;
  }
  const kind = kindOrThrow(problem.kind);
  const params = kind.generate(problem.seed, problem.level as Level);
  const work: WorkedProblem = { kind, params, parts: kind.parts(params), expected: kind.solve(params) };
  worked.set(key, work);
  if (worked.size > WORKED_KEPT) worked.delete(worked.keys().next().value!);
  return work;
}

function finalOf(problem: StoredProblem, { kind, params, parts, expected }: WorkedProblem): ProblemView["final"] {
  if (problem.status === "open") return null;
  return {
    expected: Object.fromEntries(parts.map((p) => [p.key, expectedText(p, expected[p.key])])),
    stepsHtml: kind.explain(params).map(inlineMathToHtml),
  };
}

export function buildUpdate(problem: StoredProblem, results: Record<string, PartResult | null>, work: WorkedProblem): ProblemUpdate {
  return {
    id: problem.id,
    status: problem.status,
    attemptsAllowed: problem.attemptsAllowed,
    attemptsUsed: problem.attemptsUsed,
    results: Object.fromEntries(work.parts.map((p) => [p.key, results[p.key] ?? null])),
    final: finalOf(problem, work),
  };
}

export function buildView(problem: StoredProblem, results: Record<string, PartResult | null>, work: WorkedProblem = workOut(problem)): ProblemView {
  const { kind, params, parts } = work;
  const level = problem.level as Level;
  work.prompt ??= (() => {
    const prompt = kind.render(params);
    return { html: mathTextToHtml(prompt.text), figure: prompt.figure ?? null };
  })();
  return {
    ...buildUpdate(problem, results, work),
    kind: kind.key,
    title: kind.title,
    skill: kind.skill,
    skillTitle: SKILL_TITLES[kind.skill],
    level,
    levelLabel: kind.levels.find((l) => l.level === level)?.label ?? `Level ${level}`,
    promptHtml: work.prompt.html,
    figure: work.prompt.figure,
    parts: parts.map(partView),
    lessonHref: lessonHref(kind.lesson),
  };
}
