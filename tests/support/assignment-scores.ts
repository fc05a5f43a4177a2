// An independent recomputation of assignment scores straight from the stored rows, written out
// longhand (not through lib/assignments) so the integration test compares two ways of counting.
import { findKind, type Level } from "@/lib/problems";
import { withDatabase } from "./assignment-fixtures";

export const DAY_MS_FOR_TESTS = 24 * 3600 * 1000;

/** Earned points per student id for one assignment. */
export async function recomputedScores(file: string, assignmentId: number): Promise<Map<number, number>> {
  return withDatabase(file, async (db) => {
    const assignment = (await db.models.Assignment.findByPk(assignmentId, { raw: true }))!;
    const items = await db.models.AssignmentItem.findAll({ where: { assignmentId }, raw: true });
    const extensions = await db.models.AssignmentExtension.findAll({ where: { assignmentId }, raw: true });
    const earned = new Map<number, number>();
    for (const item of items) {
      const problems = await db.models.PracticeProblem.findAll({ where: { assignmentItemId: item.id }, raw: true });
      for (const problem of problems) {
        if (problem.variant === null || problem.variant >= item.problemCount) continue;
        const kind = findKind(problem.kind)!;
        const partCount = kind.parts(kind.generate(problem.seed, problem.level as Level)).length;
        const attempts = await db.models.Attempt.findAll({ where: { problemId: problem.id }, raw: true });
        const due = extensions.find((e) => e.studentId === problem.userId)?.dueAt ?? assignment.dueAt;
        let shares = 0;
        for (const part of new Set(attempts.map((a) => a.part))) {
          const right = attempts.filter((a) => a.part === part && a.verdict === "correct").sort((x, y) => x.submission - y.submission)[0];
          if (!right) continue;
          const lateBy = new Date(right.createdAt).getTime() - new Date(due).getTime();
          const days = lateBy > 0 ? Math.ceil(lateBy / DAY_MS_FOR_TESTS) : 0;
          shares += assignment.latePolicy === "penalty" ? Math.max(0, 1 - (days * (assignment.latePenaltyPercent ?? 0)) / 100) : 1;
        }
        earned.set(problem.userId!, (earned.get(problem.userId!) ?? 0) + (item.points * shares) / partCount);
      }
    }
    return earned;
  });
}
