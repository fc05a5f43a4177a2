// Score overrides: history rows, the newest in force. Kept apart from the gradebook so the
// student's own pages (lib/assignments) can read what is in force without pulling the gradebook in.
import "server-only";
import { Op, QueryTypes, Transaction } from "sequelize";
import { db } from "@/lib/db";
import type { OverrideEntry, OverrideNotice } from "./types";
import { fromHundredths } from "./totals";

type InForceRow = { assignmentId: number; studentId: number; points: number | null; excused: number; cleared: number; reason: string; createdAt: string };

/** The override in force per `${assignmentId}:${studentId}`; a cleared one is none. One grouped query. */
export async function overridesInForce(assignmentIds: readonly number[], studentId: number | null = null): Promise<Map<string, OverrideNotice>> {
  if (assignmentIds.length === 0) return new Map();
  const rows = await db().sequelize.query<InForceRow>(
    `SELECT o.assignment_id AS assignmentId, o.student_id AS studentId, o.points, o.excused, o.cleared, o.reason, o.created_at AS createdAt
     FROM score_overrides o
     JOIN (SELECT MAX(id) AS id FROM score_overrides WHERE assignment_id IN (${assignmentIds.map(() => "?").join(", ")})${studentId === null ? "" : " AND student_id = ?"}
           GROUP BY assignment_id, student_id) newest ON newest.id = o.id`,
    { replacements: [...assignmentIds, ...(studentId === null ? [] : [studentId])], type: QueryTypes.SELECT },
  );
  const result = new Map<string, OverrideNotice>();
  for (const r of rows) {
    if (r.cleared) continue;
    result.set(`${r.assignmentId}:${r.studentId}`, { earned: r.excused ? null : fromHundredths(r.points), excused: Boolean(r.excused), reason: r.reason, at: new Date(r.createdAt).toISOString() });
  }
  return result;
}

export async function overrideHistory(assignmentId: number, studentId: number, transaction?: Transaction): Promise<OverrideEntry[]> {
  const { ScoreOverride, User } = db().models;
  const rows = await ScoreOverride.findAll({
    where: { assignmentId, studentId: { [Op.eq]: studentId } },
    include: [{ model: User, as: "author", attributes: ["name"] }],
    order: [["id", "DESC"]],
    transaction,
  });
  return rows.map((r) => ({
    id: r.id,
    action: r.excused ? "excused" : r.cleared ? "cleared" : "points",
    points: fromHundredths(r.points),
    fromPoints: fromHundredths(r.fromPoints),
    toPoints: fromHundredths(r.toPoints),
    reason: r.reason,
    byName: (r as unknown as { author?: { name: string } | null }).author?.name ?? "a former instructor",
    at: r.createdAt.toISOString(),
  }));
}
