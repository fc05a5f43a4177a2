// The program admin's overview: every class with its students, published assignments, average
// and share of missing work. One query for the classes and their counts, then scoresFor's
// handful of grouped queries for every published assignment at once.
import "server-only";
import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import { assignmentRecord } from "@/lib/assignments/access";
import { scoresFor } from "@/lib/assignments/scores";
import { average } from "./summaries";

export type ClassOverview = {
  id: number;
  name: string;
  term: string;
  instructorName: string;
  archived: boolean;
  students: number;
  publishedAssignments: number;
  /** Mean percent over every (student, published assignment) pair; null with nothing to score. */
  average: number | null;
  /** Share (0–100) of those pairs whose work is missing. */
  missingPercent: number | null;
};

export async function allClassesOverview(user: SessionUser, now = new Date()): Promise<ClassOverview[]> {
  if (user.role !== "admin") throw new AppError("forbidden", "Only program admins see every class.");
  const classes = await db().sequelize.query<{ id: number; name: string; term: string; instructorName: string; archivedAt: string | null; students: number; published: number }>(
    `SELECT c.id, c.name, c.term, u.name AS instructorName, c.archived_at AS archivedAt,
       (SELECT COUNT(*) FROM enrollments e WHERE e.class_id = c.id AND e.status = 'active') AS students,
       (SELECT COUNT(*) FROM assignments s WHERE s.class_id = c.id AND s.status = 'published') AS published
     FROM classes c JOIN users u ON u.id = c.instructor_id
     ORDER BY c.archived_at IS NOT NULL, c.term DESC, c.name`,
    { type: QueryTypes.SELECT },
  );
  const assignments = (await db().models.Assignment.findAll({ where: { status: "published" } })).map(assignmentRecord);
  const scores = await scoresFor(assignments, null, now);
  const percentsOf = new Map<number, number[]>();
  const missingOf = new Map<number, number>();
  for (const a of assignments) {
    for (const s of scores.get(a.id) ?? []) {
      percentsOf.set(a.classId, [...(percentsOf.get(a.classId) ?? []), s.percent]);
      if (s.status === "missing") missingOf.set(a.classId, (missingOf.get(a.classId) ?? 0) + 1);
    }
  }
  return classes.map((c) => {
    const percents = percentsOf.get(c.id) ?? [];
    return {
      id: c.id,
      name: c.name,
      term: c.term,
      instructorName: c.instructorName,
      archived: c.archivedAt !== null,
      students: Number(c.students),
      publishedAssignments: Number(c.published),
      average: average(percents),
      missingPercent: percents.length === 0 ? null : Math.round(((missingOf.get(c.id) ?? 0) / percents.length) * 1000) / 10,
    };
  });
}
