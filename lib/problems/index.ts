// Every problem kind, in course order. Pure: safe to import anywhere, but only the server grades.
import { SPACING_KINDS } from "./kinds-spacing";
import { STOCK_KINDS } from "./kinds-stock";
import type { AnyProblemKind, Skill } from "./types";

export * from "./types";
export { ERROR_PATTERNS, isErrorPattern, type ErrorPattern, type ErrorPatternInfo } from "./patterns";

const SKILL_ORDER: Skill[] = ["tape-reading", "fractions", "lumber", "even-spacing", "marking", "guards", "wall-grid", "cut-list", "stairs"];

export const PROBLEM_KINDS: readonly AnyProblemKind[] = [...STOCK_KINDS, ...SPACING_KINDS].sort((a, b) => SKILL_ORDER.indexOf(a.skill) - SKILL_ORDER.indexOf(b.skill));

export function findKind(key: string): AnyProblemKind | undefined {
  return PROBLEM_KINDS.find((k) => k.key === key);
}

export function kindsForSkill(skill: string): AnyProblemKind[] {
  return PROBLEM_KINDS.filter((k) => k.skill === skill);
}

export const SKILLS: readonly Skill[] = SKILL_ORDER;
