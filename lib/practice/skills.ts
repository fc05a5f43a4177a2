// Mastery, kept per skill and level: four of the last five finished problems solved at a level
// masters it and opens the next. Pure, so the rule is tested without a database.
import type { Level, Skill } from "@/lib/problems/types";

export const SKILL_TITLES: Record<Skill, string> = {
  "tape-reading": "Reading a tape",
  fractions: "Fractions for layout",
  lumber: "Lumber sizes and board feet",
  "even-spacing": "Even spacing",
  marking: "Marking from one end",
  guards: "Fewest members and guards",
  "wall-grid": "Board-and-batten walls",
  "cut-list": "Cut lists and stock",
  stairs: "Stairs",
};

export const MASTERY_WINDOW = 5;
export const MASTERY_NEEDED = 4;

export type FinishedProblem = { skill: Skill; level: number; solved: boolean };

export type LevelMastery = { level: Level; finished: number; solvedOfLastFive: number; mastered: boolean; open: boolean };
export type SkillMastery = { skill: Skill; title: string; levels: LevelMastery[]; currentLevel: Level; mastered: boolean; finished: number };

/** `finished` newest first. */
export function masteryOf(skills: readonly Skill[], finished: readonly FinishedProblem[]): SkillMastery[] {
  return skills.map((skill) => {
    const mine = finished.filter((p) => p.skill === skill);
    let previousMastered = true;
    const levels = ([1, 2, 3] as Level[]).map((level) => {
      const atLevel = mine.filter((p) => p.level === level);
      const lastFive = atLevel.slice(0, MASTERY_WINDOW);
      const solvedOfLastFive = lastFive.filter((p) => p.solved).length;
      const mastered = solvedOfLastFive >= MASTERY_NEEDED;
      const open = previousMastered;
      previousMastered = mastered && open;
      return { level, finished: atLevel.length, solvedOfLastFive, mastered: mastered && open, open };
    });
    const firstUnmastered = levels.find((l) => !l.mastered);
    return {
      skill,
      title: SKILL_TITLES[skill],
      levels,
      currentLevel: firstUnmastered?.level ?? 3,
      mastered: !firstUnmastered,
      finished: mine.length,
    };
  });
}

/** The skill to practise next: the least mastered, then the one with the worst recent record, then course order. */
export function weakestSkill(mastery: readonly SkillMastery[], available: ReadonlySet<Skill>): SkillMastery | undefined {
  const candidates = mastery.filter((m) => available.has(m.skill) && !m.mastered);
  const pool = candidates.length > 0 ? candidates : mastery.filter((m) => available.has(m.skill));
  const score = (m: SkillMastery) => {
    const current = m.levels[m.currentLevel - 1];
    return m.levels.filter((l) => l.mastered).length * 10 + current.solvedOfLastFive;
  };
  return [...pool].sort((a, b) => score(a) - score(b))[0];
}
