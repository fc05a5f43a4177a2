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
export type StoredAttempt = { part: string; raw: string; value: string; verdict: string; pattern: string | null; submission: number; createdAt: string };

/**
 * How close an answer must be: "half" a graduation (practice, and the default for assignments) or a
 * "full" graduation, which an instructor may allow for an assignment item. Counts stay exact.
 */
export type Tolerance = "half" | "full";

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

export function workOut(problem: Pick<StoredProblem, "kind" | "level" | "seed">, tolerance: Tolerance = "half"): WorkedProblem {
  const key = `${problem.kind}:${problem.level}:${problem.seed}:${tolerance}`;
  const kept = worked.get(key);
  if (kept) {
    // Map order is insertion order: moving a hit to the end makes the first key the least recently used.
    worked.delete(key);
    worked.set(key, kept);
    return kept;
  }
  const kind = kindOrThrow(problem.kind);
  const params = kind.generate(problem.seed, problem.level as Level);
  const parts = kind.parts(params).map((part) => (tolerance === "full" ? wholeGraduation(part) : part));
  const work: WorkedProblem = { kind, params, parts, expected: kind.solve(params) };
  worked.set(key, work);
  if (worked.size > WORKED_KEPT) worked.delete(worked.keys().next().value!);
  return work;
}

/** A part that accepts an answer a whole graduation off (never less than the kind already allows). */
function wholeGraduation(part: ProblemPart): ProblemPart {
  if (part.answer === "count") return part;
  const graduation = new Fraction(1, part.precision);
  return { ...part, tolerance: part.tolerance && part.tolerance.compare(graduation) > 0 ? part.tolerance : graduation };
}

function finalOf(revealed: boolean, { kind, params, parts, expected }: WorkedProblem): ProblemView["final"] {
  if (!revealed) return null;
  return {
    expected: Object.fromEntries(parts.map((p) => [p.key, expectedText(p, expected[p.key])])),
    stepsHtml: kind.explain(params).map(inlineMathToHtml),
  };
}

/**
 * `revealed` decides whether the answers go out. Practice reveals a problem once it is solved or out
 * of tries; an assignment decides by its own rule (lib/assignments/work.ts) and passes it in.
 */
export function buildUpdate(problem: StoredProblem, results: Record<string, PartResult | null>, work: WorkedProblem, revealed = problem.status !== "open"): ProblemUpdate {
  return {
    id: problem.id,
    status: problem.status,
    attemptsAllowed: problem.attemptsAllowed,
    attemptsUsed: problem.attemptsUsed,
    results: Object.fromEntries(work.parts.map((p) => [p.key, results[p.key] ?? null])),
    final: finalOf(revealed, work),
  };
}

export function buildView(problem: StoredProblem, results: Record<string, PartResult | null>, work: WorkedProblem = workOut(problem), revealed = problem.status !== "open"): ProblemView {
  const { kind, params, parts } = work;
  const level = problem.level as Level;
  work.prompt ??= (() => {
    const prompt = kind.render(params);
    return { html: mathTextToHtml(prompt.text), figure: prompt.figure ?? null };
  })();
  return {
    ...buildUpdate(problem, results, work, revealed),
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
