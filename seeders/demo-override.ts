// One score the instructor changed by hand, so the gradebook shows the mark, the drill-down shows
// the history and the student's page shows the reason on first start. The "from" is the score the
// student's tries earn, counted the way lib/assignments/scores.ts counts it (each part at the share
// of the try in which it first came out right), so the history reads true.
import { problemCredit, roundPoints } from "@/lib/assignments/student-status";
import type { LateRules } from "@/lib/assignments/policy";
import { sqliteDate } from "@/lib/group-commit";

type Value = string | number | null;
type Table = { columns: readonly string[]; rows: readonly Value[][] };
type Scored = LateRules & { id: number; items: { id: number; points: number; problemCount: number }[] };

export const OVERRIDE_REASON =
  "Checked the wall in the shop: every batten mark was right from the left end. On paper the span was divided by the battens instead of the spaces; we went over it together, so the layout counts.";

export const OVERRIDE_COLUMNS = ["assignment_id", "student_id", "points", "excused", "cleared", "reason", "from_points", "to_points", "created_by", "created_at"];

const hundredths = (points: number) => Math.round(points * 100);

/** The earned points of one student's problems on one assignment, from the rows about to be written. */
function earnedFrom(assignment: Scored, userId: number, problems: Table, attempts: Table): number {
  const p = (name: string) => problems.columns.indexOf(name);
  const a = (name: string) => attempts.columns.indexOf(name);
  const pointsOf = new Map(assignment.items.map((i) => [i.id, i.points]));
  let earned = 0;
  for (const problem of problems.rows) {
    const itemId = problem[p("assignment_item_id")] as number;
    if (problem[p("user_id")] !== userId || !pointsOf.has(itemId)) continue;
    const firstRight = new Map<string, Date>();
    for (const row of attempts.rows) {
      if (row[a("problem_id")] !== problem[p("id")] || row[a("verdict")] !== "correct") continue;
      const at = new Date(row[a("created_at")] as string);
      const part = row[a("part")] as string;
      if (!firstRight.has(part) || at < firstRight.get(part)!) firstRight.set(part, at);
    }
    earned += problemCredit(pointsOf.get(itemId)!, problem[p("part_count")] as number, [...firstRight.values()], assignment, null);
  }
  return roundPoints(earned);
}

/** The override row: about a third of the points given back, never above what the assignment is worth. */
export function demoOverrideRow(assignment: Scored, userId: number, instructorId: number, problems: Table, attempts: Table, now: number): Value[] {
  const possible = assignment.items.reduce((sum, i) => sum + i.points * i.problemCount, 0);
  const from = earnedFrom(assignment, userId, problems, attempts);
  const to = Math.min(possible, Math.ceil(from + possible / 3));
  // Two days after the due date: the next shop session.
  const at = Math.min(assignment.dueAt.getTime() + 2 * 24 * 3600 * 1000, now - 60_000);
  return [assignment.id, userId, hundredths(to), 0, 0, OVERRIDE_REASON, hundredths(from), hundredths(to), instructorId, sqliteDate(new Date(at))];
}
