import { DataTypes, type QueryInterface } from "sequelize";

// What the gradebook reads, shaped so a full class is summed from small indexes (see
// scripts/bench-gradebook.ts and lib/assignments/scores.ts):
// - a problem's last try is kept on the problem, written with the try in the same statement, so
//   "last activity" needs no pass over every try;
// - right tries have their own covering index (problem, time), so the points are summed from the
//   right tries alone, without reading each try's row;
// - a covering index holds every column of a problem the sum reads, in the order it is read
//   (item, student, variant), so no problem row is fetched either;
// - a part once right is not asked again (lib/practice/tries.ts), so it has at most one right try.
//   The sum counts right tries and relies on that; the unique index makes it a rule of the table.
const RIGHT_TRIES = "attempts_right_tries";
const ONE_RIGHT = "attempts_one_right_try_per_part";
const PROBLEM_SCORES = "practice_problems_score_reads";

export async function up({ context: qi }: { context: QueryInterface }) {
  await qi.addColumn("practice_problems", "last_try_at", { type: DataTypes.DATE, allowNull: true });
  await qi.sequelize.query("UPDATE practice_problems SET last_try_at = (SELECT MAX(a.created_at) FROM attempts a WHERE a.problem_id = practice_problems.id)");
  await qi.addIndex("attempts", ["problem_id", "created_at"], { name: RIGHT_TRIES, where: { verdict: "correct" } });
  await qi.addIndex("attempts", ["problem_id", "part"], { name: ONE_RIGHT, unique: true, where: { verdict: "correct" } });
  await qi.addIndex("practice_problems", ["assignment_item_id", "user_id", "variant", "id", "part_count", "status", "attempts_used", "last_try_at"], { name: PROBLEM_SCORES });
}

// SQLite's own DROP COLUMN, as in 0009: Sequelize's removeColumn would rebuild the table.
export async function down({ context: qi }: { context: QueryInterface }) {
  await qi.removeIndex("practice_problems", PROBLEM_SCORES);
  await qi.removeIndex("attempts", ONE_RIGHT);
  await qi.removeIndex("attempts", RIGHT_TRIES);
  await qi.sequelize.query("ALTER TABLE practice_problems DROP COLUMN last_try_at");
}
