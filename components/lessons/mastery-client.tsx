"use client";

import useSWR from "swr";
import type { SkillMastery } from "@/lib/practice/skills";

// null means "not signed in": mastery is kept for accounts only.
async function fetchMastery(url: string): Promise<SkillMastery[] | null> {
  const res = await fetch(url);
  if (res.status === 401) return null;
  if (!res.ok) throw new Error("Could not load your practice.");
  return ((await res.json()) as { mastery: SkillMastery[] }).mastery;
}

/** How far the reader has practised the lesson's skill, beside its progress in the outline. */
export function LessonMasteryBadge({ skill }: { skill: string }) {
  const { data } = useSWR("/api/practice/mastery", fetchMastery, { revalidateOnFocus: false });
  const mine = data?.find((m) => m.skill === skill);
  if (!mine || mine.finished === 0) return null;
  const mastered = mine.levels.filter((l) => l.mastered).length;
  return (
    <span data-mastery={skill} className={`rounded-sm px-2 py-0.5 text-xs font-semibold ${mine.mastered ? "bg-ok-bg text-ok" : "bg-chalk-light text-chalk-dark"}`}>
      {mine.mastered ? "Practice: all levels mastered" : `Practice: ${mastered} of 3 levels mastered`}
    </span>
  );
}
