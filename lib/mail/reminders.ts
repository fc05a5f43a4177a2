import { QueryTypes } from "sequelize";
import { effectiveDue, type LateRules } from "@/lib/assignments/policy";
import { db } from "@/lib/db";
import { sqliteDate } from "@/lib/group-commit";
import { enqueueMail, type QueuedMail } from "./outbox";
import { dueSoonMail } from "./templates/due-soon";

const WINDOW_MS = 24 * 60 * 60_000;

type Candidate = {
  assignmentId: number;
  title: string;
  classId: number;
  className: string;
  dueAt: string;
  latePolicy: LateRules["latePolicy"];
  studentId: number;
  studentName: string;
  email: string;
  extensionDueAt: string | null;
  extraAttempts: number | null;
  hasExtension: number | null;
};

const readDate = (text: string) => new Date(text);

/**
 * Queues one "due within 24 hours" e-mail for each active student of a published assignment
 * whose own due date (an extension's, when they have one) falls in (now, now + 24 h] and who
 * has not finished every problem. The dedupe key makes a second run, or a tenth, queue nothing
 * new. The caller delivers (`deliverDueMail`); answers how many reminders were new.
 */
export async function queueDueReminders(now = new Date()): Promise<number> {
  const { sequelize } = db();
  const until = new Date(now.getTime() + WINDOW_MS);
  // Dates are stored as Sequelize writes them (sqliteDate), so the text compares in time order.
  const candidates = await sequelize.query<Candidate>(
    `SELECT a.id AS assignmentId, a.title, a.class_id AS classId, c.name AS className, a.due_at AS dueAt, a.late_policy AS latePolicy,
            u.id AS studentId, u.name AS studentName, u.email,
            x.id AS hasExtension, x.due_at AS extensionDueAt, x.extra_attempts AS extraAttempts
       FROM assignments a
       JOIN classes c ON c.id = a.class_id AND c.archived_at IS NULL
       JOIN enrollments e ON e.class_id = a.class_id AND e.status = 'active'
       JOIN users u ON u.id = e.student_id
       LEFT JOIN assignment_extensions x ON x.assignment_id = a.id AND x.student_id = e.student_id
      WHERE a.status = 'published'
        AND COALESCE(x.due_at, a.due_at) > :from AND COALESCE(x.due_at, a.due_at) <= :until`,
    { replacements: { from: sqliteDate(now), until: sqliteDate(until) }, type: QueryTypes.SELECT },
  );
  const due = candidates.flatMap((c) => {
    const extension = c.hasExtension ? { dueAt: c.extensionDueAt ? readDate(c.extensionDueAt) : null, extraAttempts: c.extraAttempts ?? 0 } : null;
    const dueAt = effectiveDue({ dueAt: readDate(c.dueAt), latePolicy: c.latePolicy, lateUntil: null, latePenaltyPercent: null }, extension);
    return dueAt.getTime() > now.getTime() && dueAt.getTime() <= until.getTime() ? [{ ...c, dueAt }] : [];
  });
  if (due.length === 0) return 0;

  const finished = await finishedCheck([...new Set(due.map((c) => c.assignmentId))]);
  const messages: QueuedMail[] = due
    .filter((c) => !finished(c.assignmentId, c.studentId))
    .map((c) => ({
      ...dueSoonMail({ to: c.email, name: c.studentName, assignmentId: c.assignmentId, assignmentTitle: c.title, classId: c.classId, className: c.className, dueAt: c.dueAt }),
      dedupeKey: `due-soon:${c.assignmentId}:${c.studentId}`,
    }));
  return sequelize.transaction((transaction) => enqueueMail(messages, transaction, { deliver: false }));
}

/**
 * Whether a student has finished an assignment: for each of its items, `problem_count` distinct
 * variants that are solved or out of tries. Two grouped queries for all the assignments at once.
 */
async function finishedCheck(assignmentIds: number[]): Promise<(assignmentId: number, studentId: number) => boolean> {
  const { sequelize } = db();
  const itemCounts = await sequelize.query<{ assignmentId: number; items: number }>(
    `SELECT assignment_id AS assignmentId, COUNT(*) AS items FROM assignment_items WHERE assignment_id IN (:ids) GROUP BY assignment_id`,
    { replacements: { ids: assignmentIds }, type: QueryTypes.SELECT },
  );
  const doneItems = await sequelize.query<{ assignmentId: number; studentId: number; items: number }>(
    `SELECT assignmentId, studentId, COUNT(*) AS items FROM (
       SELECT i.assignment_id AS assignmentId, p.user_id AS studentId
         FROM assignment_items i
         JOIN practice_problems p ON p.assignment_item_id = i.id AND p.status IN ('solved', 'failed')
        WHERE i.assignment_id IN (:ids)
        GROUP BY i.id, p.user_id
       HAVING COUNT(DISTINCT p.variant) >= i.problem_count
     ) GROUP BY assignmentId, studentId`,
    { replacements: { ids: assignmentIds }, type: QueryTypes.SELECT },
  );
  const needed = new Map(itemCounts.map((r) => [r.assignmentId, r.items]));
  const done = new Map(doneItems.map((r) => [`${r.assignmentId}:${r.studentId}`, r.items]));
  // An assignment without items asks nothing, so nobody is behind on it.
  return (assignmentId, studentId) => (done.get(`${assignmentId}:${studentId}`) ?? 0) >= (needed.get(assignmentId) ?? 0);
}
