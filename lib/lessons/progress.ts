import { Transaction } from "sequelize";
import { db } from "@/lib/db";
import { AppError } from "@/lib/errors";
import type { SessionUser } from "@/lib/auth/roles";
import type { ProgressStatus } from "@/models/lesson-progress";

const RANK: Record<ProgressStatus, number> = { opened: 0, completed: 1, practised: 2 };

export type ProgressMap = Record<string, ProgressStatus>;

export async function progressFor(user: SessionUser): Promise<ProgressMap> {
  const rows = await db().models.LessonProgress.findAll({ where: { userId: user.id }, attributes: ["lessonSlug", "status"] });
  return Object.fromEntries(rows.map((r) => [r.lessonSlug, r.status]));
}

/** Records progress; it only ever moves forward, so opening a finished lesson again keeps it finished. */
export async function recordProgress(user: SessionUser, slug: string, status: ProgressStatus, knownSlugs: string[]): Promise<ProgressStatus> {
  if (!knownSlugs.includes(slug)) throw new AppError("not_found", "There is no lesson with that name.", { slug: "There is no lesson with that name." });
  const { LessonProgress } = db().models;
  const now = new Date();
  // IMMEDIATE takes SQLite's write lock up front. A deferred transaction reads first and upgrades
  // later, and two of those racing for the same new row (the page recording "opened" while the
  // reader presses "Mark lesson complete") deadlock: one fails at once with SQLITE_BUSY, which the
  // busy timeout cannot wait out. Taken up front, the second simply queues behind the first.
  return db().sequelize.transaction({ type: Transaction.TYPES.IMMEDIATE }, async (transaction) => {
    const [row, created] = await LessonProgress.findOrCreate({
      where: { userId: user.id, lessonSlug: slug },
      defaults: { userId: user.id, lessonSlug: slug, status, openedAt: now, completedAt: status === "opened" ? null : now },
      transaction,
    });
    if (!created && RANK[status] > RANK[row.status]) {
      row.status = status;
      if (status !== "opened" && !row.completedAt) row.completedAt = now;
      await row.save({ transaction });
    }
    return row.status;
  });
}
