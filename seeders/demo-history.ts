// CARP 110's past, so the gradebook and the charts have something to show on first start: the
// students' variants of every assignment that has opened, their tries graded by the real grader
// (with the slips each student tends to make, some late, some never started), lessons read and
// practised, a few practice problems, shop photos on the past assignments, and one score the
// instructor changed by hand.
//
// Written straight into the database being seeded, like the rest of the demo: the seeder runs
// before any server (the test harness seeds a file the app opens later, under a secret made after),
// so it cannot go through the request-scoped helpers, which open the app's own database. The rows
// are the ones those helpers write: see lib/assignments/variants.ts and lib/practice/tries.ts.
import crypto from "node:crypto";
import path from "node:path";
import { QueryTypes, type Transaction } from "sequelize";
import type { Database } from "@/lib/db";
import { sqliteDate } from "@/lib/group-commit";
import { closesAt, type LateRules } from "@/lib/assignments/policy";
import { variantSeed } from "@/lib/assignments/variants";
import { ATTEMPTS_PER_PROBLEM } from "@/lib/practice/limits";
import { createRandom, type Random } from "@/lib/problems/random";
import type { ErrorPattern } from "@/lib/problems";
import { insertRows } from "./demo-rows";
import { removeDemoPhotos, writeDemoPhoto, type DemoPhotoFile } from "./demo-photos";
import { demoOverrideRow, OVERRIDE_COLUMNS } from "./demo-override";
import { attemptParts, PROFILES, workProblem, type Profile } from "./demo-tries";

const MINUTE = 60_000;
const HOUR = 60 * MINUTE;
const DAY = 24 * HOUR;

type Student = { index: number; profile: Profile; late?: boolean; readsLessons?: boolean; photo?: string; overridden?: boolean };

const struggling = (slip: ErrorPattern): Profile => ({ ...PROFILES.struggling, slip });

/**
 * The students with a past, by their place in DEMO_STUDENTS. The others keep a blank record on
 * purpose: the test suites sign in as them and expect no tries, no photos and no lessons read,
 * and in the gradebook they are the ones who never started. Jonah ([9]) and Harlan ([7]) are
 * such fixtures for lessons, so Harlan works the assignments without reading a lesson.
 */
export const HISTORY_STUDENTS: readonly Student[] = [
  { index: 1, profile: PROFILES.strong, readsLessons: true, photo: "tape-marks.jpg" },
  { index: 10, profile: PROFILES.strong, readsLessons: true, photo: "IMG_2041.jpg" },
  { index: 2, profile: PROFILES.steady, readsLessons: true, photo: "hallway-layout.jpg" },
  { index: 8, profile: PROFILES.steady, readsLessons: true, photo: "marks from left end.jpg" },
  { index: 12, profile: PROFILES.steady, late: true, readsLessons: true },
  { index: 7, profile: PROFILES.steady, late: true, readsLessons: false },
  { index: 3, profile: struggling("divided-by-members"), readsLessons: true, photo: "my layout.jpg", overridden: true },
  { index: 11, profile: struggling("forgot-member-width"), readsLessons: true },
  { index: 13, profile: struggling("on-center-for-gap"), readsLessons: true },
];

/** Course order; the first lessons every student opens. */
const LESSONS = ["reading-a-tape", "fractions-for-layout", "lumber-sizes", "even-spacing", "mark-from-one-end", "board-and-batten-wall", "cut-lists-and-stock"];

const PHOTO_COMMENT = "Clean, square ticks. Next time put a V on the side of the line the batten goes, so whoever cuts knows which edge to hold to.";

const ATTEMPT_COLUMNS = ["problem_id", "user_id", "assignment_item_id", "kind", "level", "seed", "submission", "part", "raw", "value", "expected", "verdict", "pattern", "time_ms", "created_at"];
const PROBLEM_COLUMNS = ["id", "user_id", "assignment_item_id", "variant", "kind", "level", "seed", "attempts_allowed", "part_count", "attempts_used", "status", "finished_at", "last_try_at", "created_at", "updated_at"];

type Row = (string | number | null)[];
type Item = { id: number; kind: string; level: number; problemCount: number; points: number };
type OpenAssignment = LateRules & { id: number; opensAt: Date; attemptsAllowed: number; items: Item[] };

export type HistorySummary = { tries: number; problems: number; lessons: number; photos: number };

/** What one student's sitting at one problem leaves: its row, its tries' rows, and when they stopped. */
function workOneProblem(
  problem: { id: string; userId: number; itemId: number | null; variant: number | null; kind: string; level: number; seed: number; attemptsAllowed: number },
  student: Student,
  random: Random,
  start: number,
  until: number,
  out: { problems: Row[]; attempts: Row[]; solvedLessons: Set<string> },
): number {
  const work = workProblem(problem.kind, problem.level, problem.seed);
  const right = new Set<string>();
  let used = 0;
  let at = start;
  let finishedAt: number | null = null;
  let lastTryAt: number | null = null;
  while (used < problem.attemptsAllowed) {
    const timeMs = random.int(student.profile.seconds[0], student.profile.seconds[1]) * 1000;
    if (at + timeMs > until) break;
    at += timeMs;
    used += 1;
    lastTryAt = at;
    const open = work.parts.filter((p) => !right.has(p.key));
    for (const graded of attemptParts(work, open, student.profile, used, random)) {
      if (graded.grade.verdict === "correct") right.add(graded.part);
      out.attempts.push([problem.id, problem.userId, problem.itemId, problem.kind, problem.level, problem.seed, used, graded.part, graded.raw, graded.value, graded.expected, graded.grade.verdict, graded.grade.pattern, timeMs, sqliteDate(new Date(at))]);
    }
    if (right.size === work.parts.length) {
      finishedAt = at;
      out.solvedLessons.add(work.kind.lesson.slug);
      break;
    }
    // Reading the feedback and working it again on paper.
    at += random.int(20, 90) * 1000;
  }
  const status = right.size === work.parts.length ? "solved" : used >= problem.attemptsAllowed ? "failed" : "open";
  if (status === "failed") finishedAt = at;
  const created = sqliteDate(new Date(start));
  const updated = sqliteDate(new Date(used > 0 ? at : start));
  out.problems.push([problem.id, problem.userId, problem.itemId, problem.variant, problem.kind, problem.level, problem.seed, problem.attemptsAllowed, work.parts.length, used, status, finishedAt === null ? null : sqliteDate(new Date(finishedAt)), lastTryAt === null ? null : sqliteDate(new Date(lastTryAt)), created, updated]);
  return at + random.int(1, 4) * MINUTE;
}

/**
 * When a student sits down to an assignment, or null when they have not yet: on time before the
 * due date, a day or two after it for the late ones (the penalty's days), partway through the
 * window for one still open.
 */
function sittingStart(assignment: OpenAssignment, student: Student, random: Random, now: number): number | null {
  const opens = assignment.opensAt.getTime();
  const due = assignment.dueAt.getTime();
  if (opens > now - 2 * HOUR) return null;
  if (due < now && student.late && assignment.latePolicy === "penalty") {
    const start = due + random.int(6, 40) * HOUR;
    return start < now - HOUR ? start : null;
  }
  const end = Math.min(due, now) - 2 * HOUR;
  if (end <= opens) return null;
  return opens + Math.floor(((end - opens) * random.int(15, 85)) / 100);
}

/** How many of an assignment's problems a student gets through before the due date has come. */
function problemsTaken(total: number, assignment: OpenAssignment, student: Student, now: number): number {
  if (assignment.dueAt.getTime() < now) return total;
  if (student.profile.name === "strong") return total;
  return student.profile.name === "steady" ? Math.ceil(total / 2) : 1;
}

async function historyExists(database: Database, userIds: number[], transaction: Transaction | null): Promise<boolean> {
  const [row] = await database.sequelize.query<{ n: number }>(`SELECT COUNT(*) AS n FROM practice_problems WHERE user_id IN (${userIds.map(() => "?").join(", ")})`, {
    replacements: userIds,
    type: QueryTypes.SELECT,
    transaction,
  });
  return row.n > 0;
}

/**
 * Writes the class's history once: when any history student already has a problem (an earlier
 * seeding, or their own work since), nothing is added. `now` is the moment of seeding; every row
 * is dated before it, relative to the assignments' stored dates.
 */
export async function seedDemoHistory(database: Database, classId: number, studentEmails: readonly string[], now: number): Promise<HistorySummary | null> {
  const { sequelize, models } = database;
  const users = await models.User.findAll({ where: { email: studentEmails.slice() }, attributes: ["id", "email"] });
  const idOf = new Map(users.map((u) => [u.email, u.id]));
  const students = HISTORY_STUDENTS.filter((s) => idOf.has(studentEmails[s.index]));
  if (students.length === 0) return null;
  const schoolClass = await models.SchoolClass.findByPk(classId);
  if (!schoolClass) return null;
  const historyIds = students.map((s) => idOf.get(studentEmails[s.index])!);
  // Checked again inside the writing transaction; this early look keeps a second start instant.
  if (await historyExists(database, historyIds, null)) return null;

  const assignments: OpenAssignment[] = [];
  for (const a of await models.Assignment.findAll({ where: { classId, status: "published" }, order: [["opensAt", "ASC"]] })) {
    const items = await models.AssignmentItem.findAll({ where: { assignmentId: a.id }, order: [["position", "ASC"]] });
    assignments.push({ id: a.id, opensAt: a.opensAt, dueAt: a.dueAt, latePolicy: a.latePolicy, lateUntil: a.lateUntil, latePenaltyPercent: a.latePenaltyPercent, attemptsAllowed: a.attemptsAllowed, items: items.map((i) => ({ id: i.id, kind: i.kind, level: i.level, problemCount: i.problemCount, points: i.points })) });
  }
  // Variant seeds are made like the app's, but under a fixed key: the stored seed is what the app
  // reads, and a fixed key gives every fresh demo the same history.
  const secret = "sixteenths demo history";
  // Photos live beside the database (lib/uploads/files.ts), here the file being seeded rather than the app's.
  const { storage } = (sequelize as unknown as { options: { storage: string } }).options;
  const uploadsFolder = path.join(path.dirname(path.resolve(storage)), "uploads");

  const out = { problems: [] as Row[], attempts: [] as Row[], solvedLessons: new Set<string>() };
  const lessonRows: Row[] = [];
  const photos: { file: DemoPhotoFile; row: Row }[] = [];
  const overrides: Row[] = [];
  // The instructor's one change by hand: on the first past assignment under the daily penalty.
  const overridden = assignments.find((a) => a.dueAt.getTime() < now && a.latePolicy === "penalty") ?? assignments.find((a) => a.dueAt.getTime() < now);
  try {
    for (const student of students) {
      const userId = idOf.get(studentEmails[student.index])!;
      const random = createRandom(7_000 + student.index);
      out.solvedLessons = new Set();
      let firstVisit = now;
      let pastSeen = 0;
      for (const assignment of assignments) {
        let at = sittingStart(assignment, student, random, now);
        if (at === null) continue;
        firstVisit = Math.min(firstVisit, at);
        // Tries only while the assignment takes them; those who are not late finish by the due date.
        const closes = student.late ? closesAt(assignment, null).getTime() : assignment.dueAt.getTime();
        const until = Math.min(closes, now - MINUTE);
        for (const item of assignment.items) {
          const taken = problemsTaken(item.problemCount, assignment, student, now);
          for (let variant = 0; variant < item.problemCount; variant++) {
            const seed = variantSeed(secret, item.id, userId, variant);
            const problem = { id: crypto.randomUUID(), userId, itemId: item.id, variant, kind: item.kind, level: item.level, seed, attemptsAllowed: assignment.attemptsAllowed };
            // Opening an assignment makes every variant; a student who skips one leaves it untouched.
            const skips = variant >= taken || (student.profile.name === "struggling" && random.chance(1, 6));
            at = workOneProblem(problem, student, random, at, skips ? at : until, out);
          }
        }
        const photoAt = at + random.int(2, 20) * MINUTE;
        const past = assignment.dueAt.getTime() < now;
        // Half photograph their marks for the first past assignment, half for the second.
        if (student.photo && past && pastSeen === student.index % 2 && photoAt < Math.min(until, now)) {
          const file = await writeDemoPhoto(uploadsFolder, random);
          const commented = photos.length === 0;
          const commentAt = photoAt + random.int(3, 30) * HOUR;
          photos.push({
            file,
            row: [crypto.randomUUID(), assignment.id, userId, file.storedName, file.thumbName, file.mime, file.bytes, file.width, file.height, student.photo, commented ? PHOTO_COMMENT : null, commented ? schoolClass.instructorId : null, commented ? sqliteDate(new Date(Math.min(commentAt, now - MINUTE))) : null, sqliteDate(new Date(photoAt)), sqliteDate(new Date(photoAt))],
          });
        }
        if (past) pastSeen += 1;
      }
      if (student.overridden && overridden) {
        overrides.push(demoOverrideRow(overridden, userId, schoolClass.instructorId, { columns: PROBLEM_COLUMNS, rows: out.problems }, { columns: ATTEMPT_COLUMNS, rows: out.attempts }, now));
      }
      const practiceFrom = Math.min(firstVisit, now - 10 * DAY);
      practiceProblems(student, userId, random, practiceFrom, now - MINUTE, out);
      if (student.readsLessons) lessonRows.push(...lessonProgress(student, userId, random, firstVisit - 3 * DAY, now - HOUR, out.solvedLessons));
    }

    const written = await sequelize.transaction(async (transaction) => {
      if (await historyExists(database, historyIds, transaction)) return false;
      await insertRows(sequelize, transaction, "practice_problems", PROBLEM_COLUMNS, out.problems);
      await insertRows(sequelize, transaction, "attempts", ATTEMPT_COLUMNS, out.attempts);
      await insertRows(sequelize, transaction, "lesson_progress", ["user_id", "lesson_slug", "status", "opened_at", "completed_at", "created_at", "updated_at"], lessonRows);
      await insertRows(sequelize, transaction, "uploads", ["id", "assignment_id", "student_id", "stored_name", "thumb_name", "mime", "bytes", "width", "height", "original_name", "comment", "comment_by", "commented_at", "created_at", "updated_at"], photos.map((p) => p.row));
      await insertRows(sequelize, transaction, "score_overrides", OVERRIDE_COLUMNS, overrides);
      return true;
    });
    if (!written) {
      await removeDemoPhotos(uploadsFolder, photos.map((p) => p.file));
      return null;
    }
  } catch (error) {
    await removeDemoPhotos(uploadsFolder, photos.map((p) => p.file));
    throw error;
  }
  return { tries: new Set(out.attempts.map((r) => `${r[0]}:${r[6]}`)).size, problems: out.problems.length, lessons: lessonRows.length, photos: photos.length };
}

/** Practice at the first skills between classes: strong students master a level, others are partway. */
function practiceProblems(student: Student, userId: number, random: Random, from: number, until: number, out: { problems: Row[]; attempts: Row[]; solvedLessons: Set<string> }): void {
  const plan: [string, number, number][] =
    student.profile.name === "strong"
      ? [["tape-reading", 1, 5], ["tape-reading", 2, 2], ["fraction-arithmetic", 1, 4], ["even-gap", 1, 3]]
      : student.profile.name === "steady"
        ? [["tape-reading", 1, 4], ["fraction-arithmetic", 1, 3], ["even-gap", 1, random.int(1, 3)]]
        : [["tape-reading", 1, 3], ["even-gap", 1, random.int(2, 4)]];
  let at = from + random.int(1, 3) * DAY;
  for (const [kind, level, count] of plan) {
    for (let n = 0; n < count && at < until; n++) {
      const problem = { id: crypto.randomUUID(), userId, itemId: null, variant: null, kind, level, seed: random.int(1, 2 ** 31 - 2), attemptsAllowed: ATTEMPTS_PER_PROBLEM };
      at = workOneProblem(problem, student, random, at, until, out);
    }
    at += random.int(1, 2) * DAY + random.int(0, 5) * HOUR;
  }
}

/** Lessons opened in course order; most read through, the ones whose problems they solved practised. */
function lessonProgress(student: Student, userId: number, random: Random, from: number, until: number, solved: ReadonlySet<string>): Row[] {
  const reach = student.profile.name === "strong" ? random.int(6, 7) : student.profile.name === "steady" ? random.int(4, 6) : random.int(2, 4);
  return LESSONS.slice(0, reach).map((slug, i) => {
    const opened = Math.min(from + i * DAY + random.int(0, 8) * HOUR, until - HOUR);
    const finished = i < reach - 1 || random.chance(1, 2);
    const status = solved.has(slug) && finished ? "practised" : finished ? "completed" : "opened";
    const completed = finished ? sqliteDate(new Date(opened + random.int(8, 35) * MINUTE)) : null;
    return [userId, slug, status, sqliteDate(new Date(opened)), completed, sqliteDate(new Date(opened)), completed ?? sqliteDate(new Date(opened))];
  });
}
