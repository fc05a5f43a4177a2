// No lost work under load and a crash: 100 students answer 20 practice problems each against the
// built app; after about 40 % of the answers are acknowledged the server is killed with SIGKILL
// and started again on the same database, and every unacknowledged answer is retried with its
// idempotency key. Then the database is checked: every acknowledged answer stored exactly once.
// Exits non-zero if any answer was lost or counted twice.
//
//   npm run build && npm run bench:load
//   LOAD_STUDENTS=20 LOAD_ANSWERS=5 npm run bench:load   # a smaller run
import { hasBuild, runLoad } from "@/tests/support/load-run";

const positive = (name: string, fallback: number) => {
  const value = Number(process.env[name] ?? fallback);
  if (!Number.isInteger(value) || value < 1) throw new Error(`${name} must be a whole number above 0.`);
  return value;
};

async function main() {
  if (!hasBuild()) {
    console.error("No production build found: run `npm run build` first.");
    process.exit(2);
  }
  const students = positive("LOAD_STUDENTS", 100);
  const answersEach = positive("LOAD_ANSWERS", 20);
  const report = await runLoad({ students, answersEach, killAfter: 0.4, deadlineMs: 100_000, log: (line) => console.log(`  ${line}`) });

  const rows: [string, string | number][] = [
    ["students", report.students],
    ["answers sent", report.sent],
    ["acknowledged (2xx)", report.acknowledged],
    ["stored tries", report.stored],
    ["lost (must be 0)", report.lost],
    ["duplicates (must be 0)", report.duplicates],
    ["stored, never acknowledged", report.unacknowledged],
    ["refused (4xx)", report.refused],
    ["retries", report.retries],
    ["replayed replies", report.replays],
    ["killed after (acknowledged)", report.killedAtAcknowledged],
    ["restart", `${(report.restartMs / 1000).toFixed(1)} s`],
    ["requests", report.requests],
    ["requests/s", report.requestsPerSecond],
    ["total time", `${(report.totalMs / 1000).toFixed(1)} s`],
  ];
  console.log("\nAnswers under load with one SIGKILL and a restart");
  for (const [name, value] of rows) console.log(`  ${name.padEnd(30)} ${value}`);

  const incomplete = report.acknowledged < report.sent;
  if (incomplete) console.log(`\n  ${report.sent - report.acknowledged} answers were still unacknowledged at the deadline.`);
  if (report.lost > 0 || report.duplicates > 0) {
    console.error("\nFAIL: every acknowledged answer must be stored exactly once.");
    process.exit(1);
  }
  console.log("\nOK: every acknowledged answer is stored exactly once.");
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
