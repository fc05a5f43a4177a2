// Pure helpers behind the progress charts: bucketing, day keys and the one-or-two sentence
// summaries a screen reader hears in place of a chart. No database, so each rule is unit-tested.
import { ERROR_PATTERNS, isErrorPattern } from "@/lib/problems/patterns";

export const BUCKET_LABELS = ["0–9", "10–19", "20–29", "30–39", "40–49", "50–59", "60–69", "70–79", "80–89", "90–100"] as const;

export type ScoreBucket = { label: (typeof BUCKET_LABELS)[number]; students: number };

/** Ten buckets of ten points each; 100 % joins the top one so a full score is not a bucket of its own. */
export function bucketOf(percent: number): number {
  if (!Number.isFinite(percent) || percent <= 0) return 0;
  return Math.min(9, Math.floor(percent / 10));
}

export function scoreBuckets(percents: readonly number[]): ScoreBucket[] {
  const counts = BUCKET_LABELS.map(() => 0);
  for (const p of percents) counts[bucketOf(p)] += 1;
  return BUCKET_LABELS.map((label, i) => ({ label, students: counts[i] }));
}

export function average(values: readonly number[]): number | null {
  if (values.length === 0) return null;
  return Math.round((values.reduce((sum, v) => sum + v, 0) / values.length) * 10) / 10;
}

/** The `days` calendar days (UTC, "YYYY-MM-DD") ending with `now`'s day, oldest first. */
export function dayKeys(now: Date, days: number): string[] {
  const end = Date.UTC(now.getUTCFullYear(), now.getUTCMonth(), now.getUTCDate());
  return Array.from({ length: days }, (_, i) => new Date(end - (days - 1 - i) * 86_400_000).toISOString().slice(0, 10));
}

export function fillDays(keys: readonly string[], counts: ReadonlyMap<string, number>): { day: string; tries: number }[] {
  return keys.map((day) => ({ day, tries: counts.get(day) ?? 0 }));
}

/** Where a slip is taught: the lesson section named beside the pattern. */
export function slipLesson(pattern: string): { name: string; href: string } | null {
  if (!isErrorPattern(pattern)) return null;
  const info = ERROR_PATTERNS[pattern];
  return { name: info.name, href: `/lessons/${info.lesson.slug}${info.lesson.section ? `#${info.lesson.section}` : ""}` };
}

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

export function distributionSummary(title: string, percents: readonly number[]): string {
  if (percents.length === 0) return `${title}: no students to score yet.`;
  const buckets = scoreBuckets(percents);
  const top = buckets.reduce((best, b) => (b.students > best.students ? b : best), buckets[0]);
  const below = percents.filter((p) => p < 60).length;
  return `${title}: class average ${average(percents)} %. Most students (${top.students}) scored ${top.label} %; ${plural(below, "student")} below 60 %.`;
}

export type SlipCount = { name: string; count: number; students: number };

export function slipSummary(slips: readonly SlipCount[]): string {
  if (slips.length === 0) return "No slips recorded yet: nobody has given a wrong answer the grader could name.";
  const [first, second] = slips;
  const lead = `Most common slip: ${first.name.toLowerCase()}, ${plural(first.count, "time")} by ${plural(first.students, "student")}.`;
  return second ? `${lead} Next: ${second.name.toLowerCase()}, ${plural(second.count, "time")}.` : lead;
}

export type SkillCount = { title: string; mastered: number; levelOne: number };

/** Whole skills first; while nobody has a whole skill, the first level shows where the class is moving. */
export function masterySummary(skills: readonly SkillCount[], students: number): string {
  if (students === 0) return "No students in the class yet.";
  if (skills.length === 0) return "No skills to show.";
  const byWhole = [...skills].sort((a, b) => b.mastered - a.mastered);
  const best = byWhole[0];
  const worst = byWhole[byWhole.length - 1];
  if (best.mastered > 0) return `${best.title}: ${best.mastered} of ${students} students have mastered all three levels, the most of any skill. Fewest: ${worst.title}, ${worst.mastered} of ${students}.`;
  const started = [...skills].sort((a, b) => b.levelOne - a.levelOne)[0];
  if (started.levelOne === 0) return `No student has mastered a level yet (of ${plural(students, "student")}).`;
  return `No student has mastered a whole skill yet. Furthest along: ${started.title}, where ${started.levelOne} of ${students} students have mastered level 1.`;
}

export type LessonCount = { title: string; read: number; practised: number };

export function lessonSummary(lessons: readonly LessonCount[], students: number): string {
  if (students === 0) return "No students in the class yet.";
  const readAny = lessons.filter((l) => l.read > 0);
  if (readAny.length === 0) return "No student has finished a lesson yet.";
  const most = [...lessons].sort((a, b) => b.read - a.read)[0];
  return `${most.title} is the most read lesson: ${most.read} of ${students} students finished it. ${plural(readAny.length, "lesson")} of ${lessons.length} have been finished by someone.`;
}

export function activitySummary(days: readonly { day: string; tries: number }[]): string {
  const total = days.reduce((sum, d) => sum + d.tries, 0);
  if (total === 0) return `No tries in the last ${Math.round(days.length / 7)} weeks.`;
  const busiest = days.reduce((best, d) => (d.tries > best.tries ? d : best), days[0]);
  const lastWeek = days.slice(-7).reduce((sum, d) => sum + d.tries, 0);
  return `${plural(total, "try", "tries")} in the last ${Math.round(days.length / 7)} weeks, ${lastWeek} of them in the last 7 days. Busiest day: ${busiest.day} with ${busiest.tries}.`;
}
