import { QueryTypes } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import type { EnrollmentStatus } from "@/models/enrollment";
import { classForTeacher, type ClassSummary } from "./queries";
import { ROSTER_PAGE_SIZE, type RosterQuery } from "./schemas";

export type RosterEntry = {
  /** Students and invitations share one list; the key tells them apart. */
  key: string;
  studentId: number | null;
  invitationId: number | null;
  name: string;
  email: string;
  status: EnrollmentStatus;
  /** Joined, removed or invited at. */
  since: string;
  /** For an invitation: when its link runs out. */
  expiresAt: string | null;
  expired: boolean;
};

export type RosterPage = {
  summary: ClassSummary;
  roster: RosterEntry[];
  counts: Record<"all" | EnrollmentStatus, number>;
  query: RosterQuery;
  page: number;
  pageCount: number;
  total: number;
};

type Row = { student_id: number | null; invitation_id: number | null; name: string; email: string; status: EnrollmentStatus; since: string; expires_at: string | null };

// Enrolled students and the open invitations (people who may not have an account yet) in one list,
// so search, filter and pages work across both in SQL rather than in memory.
const ENTRIES = `
  SELECT e.student_id AS student_id, NULL AS invitation_id, u.name AS name, u.email AS email, e.status AS status, e.updated_at AS since, NULL AS expires_at
    FROM enrollments e JOIN users u ON u.id = e.student_id
   WHERE e.class_id = :classId
  UNION ALL
  SELECT NULL, i.id, COALESCE(NULLIF(i.name, ''), i.email), i.email, 'invited', i.created_at, i.expires_at
    FROM invitations i
   WHERE i.class_id = :classId AND i.accepted_at IS NULL AND i.revoked_at IS NULL`;

const SEARCH = `(:like IS NULL OR name LIKE :like ESCAPE '\\' OR email LIKE :like ESCAPE '\\')`;

const toIso = (value: string | Date) => new Date(value).toISOString();

export async function rosterPage(user: SessionUser, classId: number, query: RosterQuery): Promise<RosterPage> {
  const summary = await classForTeacher(user, classId);
  const like = query.q ? `%${query.q.replace(/[\\%_]/g, (c) => `\\${c}`)}%` : null;
  const { sequelize } = db();
  const grouped = await sequelize.query<{ status: EnrollmentStatus; n: number }>(
    `SELECT status, COUNT(*) AS n FROM (${ENTRIES}) WHERE ${SEARCH} GROUP BY status`,
    { replacements: { classId, like }, type: QueryTypes.SELECT },
  );
  const counts = { all: 0, active: 0, invited: 0, removed: 0 };
  for (const g of grouped) {
    counts[g.status] = Number(g.n);
    counts.all += Number(g.n);
  }
  const total = query.status === "all" ? counts.all : counts[query.status];
  const pageCount = Math.max(1, Math.ceil(total / ROSTER_PAGE_SIZE));
  const page = Math.min(query.page, pageCount);
  const rows = await sequelize.query<Row>(
    `SELECT * FROM (${ENTRIES})
      WHERE ${SEARCH} AND (:status = 'all' OR status = :status)
      ORDER BY CASE status WHEN 'active' THEN 0 WHEN 'invited' THEN 1 ELSE 2 END, name COLLATE NOCASE, email
      LIMIT :limit OFFSET :offset`,
    { replacements: { classId, like, status: query.status, limit: ROSTER_PAGE_SIZE, offset: (page - 1) * ROSTER_PAGE_SIZE }, type: QueryTypes.SELECT },
  );
  const now = Date.now();
  const roster = rows.map((r) => ({
    key: r.student_id !== null ? `s${r.student_id}` : `i${r.invitation_id}`,
    studentId: r.student_id,
    invitationId: r.invitation_id,
    name: r.name,
    email: r.email,
    status: r.status,
    since: toIso(r.since),
    expiresAt: r.expires_at ? toIso(r.expires_at) : null,
    expired: r.expires_at ? new Date(r.expires_at).getTime() <= now : false,
  }));
  return { summary, roster, counts, query: { ...query, page }, page, pageCount, total };
}

async function enrollmentOf(classId: number, studentId: number) {
  const enrollment = await db().models.Enrollment.findOne({ where: { classId, studentId } });
  if (!enrollment) throw new AppError("not_found", "That student is not on this class's roster.");
  return enrollment;
}

/** The student leaves the roster; their tries, scores and uploads stay, so adding them back restores everything. */
export async function removeStudent(user: SessionUser, classId: number, studentId: number): Promise<void> {
  await classForTeacher(user, classId);
  const enrollment = await enrollmentOf(classId, studentId);
  if (enrollment.status === "removed") throw new AppError("conflict", "That student was already removed.");
  await enrollment.update({ status: "removed" });
}

export async function readdStudent(user: SessionUser, classId: number, studentId: number): Promise<void> {
  const summary = await classForTeacher(user, classId);
  if (summary.archivedAt) throw new AppError("conflict", "This class is archived. Restore it before changing the roster.");
  const enrollment = await enrollmentOf(classId, studentId);
  if (enrollment.status === "active") throw new AppError("conflict", "That student is already active.");
  await enrollment.update({ status: "active" });
}

export type ClassStudent = { studentId: number; name: string; email: string; status: "active" | "invited" };

/** Everyone with an account on the class (not removed), by name: for pickers such as extensions. */
export async function classStudents(user: SessionUser, classId: number): Promise<ClassStudent[]> {
  await classForTeacher(user, classId);
  const rows = await db().sequelize.query<{ studentId: number; name: string; email: string; status: "active" | "invited" }>(
    `SELECT u.id AS studentId, u.name AS name, u.email AS email, e.status AS status
       FROM enrollments e JOIN users u ON u.id = e.student_id
      WHERE e.class_id = :classId AND e.status <> 'removed'
      ORDER BY u.name COLLATE NOCASE`,
    { replacements: { classId }, type: QueryTypes.SELECT },
  );
  return rows;
}
