// The totals' arithmetic (pure): excused work leaves both sides of a student's fraction, and a
// class average counts only the students whose work counts.
import { percentOf, roundPoints } from "@/lib/assignments/student-status";

type Counted = { earned: number; possible: number; excused: boolean };

export function studentTotal(cells: readonly Counted[]): { earned: number; possible: number; percent: number } {
  const counted = cells.filter((c) => !c.excused);
  const earned = roundPoints(counted.reduce((sum, c) => sum + c.earned, 0));
  const possible = roundPoints(counted.reduce((sum, c) => sum + c.possible, 0));
  return { earned, possible, percent: percentOf(earned, possible) };
}

/** The mean of the counted students' percents on one assignment, or null when nobody counts. */
export function classAverage(cells: readonly Counted[]): number | null {
  const counted = cells.filter((c) => !c.excused && c.possible > 0);
  if (counted.length === 0) return null;
  const mean = counted.reduce((sum, c) => sum + (c.earned / c.possible) * 100, 0) / counted.length;
  return Math.round(mean * 10) / 10;
}

/** Hundredths of a point, as score_overrides stores them, and back. */
export const toHundredths = (points: number) => Math.round(points * 100);
export const fromHundredths = (hundredths: number | null) => (hundredths === null ? null : hundredths / 100);
