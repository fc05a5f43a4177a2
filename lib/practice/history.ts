import "server-only";
import { Op } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { findKind, PROBLEM_KINDS, SKILLS, type Level, type Skill } from "@/lib/problems";
import { createRandom, newSeed } from "@/lib/problems/random";
import { masteryOf, weakestSkill, type FinishedProblem, type SkillMastery } from "./skills";
import type { ProblemStatus } from "./view";

export const HISTORY_PAGE_SIZE = 20;
// Mastery only looks at the last five per level; a few hundred recent problems is plenty.
const MASTERY_LOOKBACK = 600;

export type HistoryRow = { id: string; kind: string; title: string; level: number; status: ProblemStatus; attemptsUsed: number; createdAt: string; finishedAt: string | null };
export type HistoryPage = { problems: HistoryRow[]; page: number; pages: number; total: number };

export async function practiceHistory(user: SessionUser, page: number): Promise<HistoryPage> {
  const { rows, count } = await db().models.PracticeProblem.findAndCountAll({
    // The history lists practice only; assignment problems live on their assignment's page.
    where: { userId: user.id, assignmentItemId: null },
    order: [["createdAt", "DESC"]],
    limit: HISTORY_PAGE_SIZE,
    offset: (page - 1) * HISTORY_PAGE_SIZE,
  });
  return {
    problems: rows.map((r) => ({
      id: r.id,
      kind: r.kind,
      title: findKind(r.kind)?.title ?? r.kind,
      level: r.level,
      status: r.status as ProblemStatus,
      attemptsUsed: r.attemptsUsed,
      createdAt: r.createdAt.toISOString(),
      finishedAt: r.finishedAt?.toISOString() ?? null,
    })),
    page,
    pages: Math.max(1, Math.ceil(count / HISTORY_PAGE_SIZE)),
    total: count,
  };
}

export async function masteryFor(user: SessionUser | null): Promise<SkillMastery[]> {
  const skills = SKILLS.filter((s) => PROBLEM_KINDS.some((k) => k.skill === s));
  if (!user) return masteryOf(skills, []);
  // Finished assignment problems count too: they are the same kinds, graded the same way.
  const rows = await db().models.PracticeProblem.findAll({
    where: { userId: user.id, status: { [Op.ne]: "open" } },
    attributes: ["kind", "level", "status"],
    order: [["finishedAt", "DESC"]],
    limit: MASTERY_LOOKBACK,
    raw: true,
  });
  const finished: FinishedProblem[] = [];
  for (const row of rows) {
    const kind = findKind(row.kind);
    if (kind) finished.push({ skill: kind.skill, level: row.level, solved: row.status === "solved" });
  }
  return masteryOf(skills, finished);
}

/**
 * "Next problem": a kind of the weakest skill (or of the skill asked for, as a lesson does) at
 * the level the learner has reached.
 */
export function nextProblemChoice(user: SessionUser | null, mastery: SkillMastery[], onlySkill?: string): { kind: string; level: Level } {
  const available = new Set<Skill>(PROBLEM_KINDS.map((k) => k.skill));
  const random = createRandom(newSeed());
  const asked = onlySkill ? mastery.find((m) => m.skill === onlySkill) : undefined;
  if (onlySkill && !asked) throw new AppError("bad_request", "There are no problems for that skill.", { skill: "Choose a skill from the practice page." });
  const skill = asked ?? (user ? weakestSkill(mastery, available) : random.pick(mastery));
  const kinds = PROBLEM_KINDS.filter((k) => k.skill === skill?.skill);
  const kind = random.pick(kinds.length > 0 ? kinds : PROBLEM_KINDS);
  return { kind: kind.key, level: skill?.currentLevel ?? 1 };
}

/** Students work up through the levels; instructors and admins may open any level to preview it. */
export function levelAllowed(user: SessionUser | null, mastery: SkillMastery[], kindKey: string, level: Level): boolean {
  if (!user || user.role !== "student") return true;
  const kind = findKind(kindKey);
  const skill = mastery.find((m) => m.skill === kind?.skill);
  return !skill || skill.levels[level - 1].open;
}
