// Speed of grading, side by side in one run. In process: graded parts per second over a mix of
// every problem kind (parse, solve, compare, diagnose — what the answer route does besides the
// database). Over HTTP, with the built app on loopback: the answer route beside GET /api/health
// on the same server, driven by autocannon from this second process, as a ratio. Every answer is
// a first try at a fresh problem of one of the kinds and levels, opened beforehand as a student would.
// It only prints; nothing here passes or fails.
//
//   npm run build && npx tsx scripts/bench-grading.ts
import { randomUUID } from "node:crypto";
import autocannon from "autocannon";
import { openDatabase } from "@/lib/db";
import { gradeAnswer } from "@/lib/grading/grade";
import { LEVELS, PROBLEM_KINDS } from "@/lib/problems";
import { roundedAnswer } from "@/lib/problems/kit";
import { startApp } from "../tests/support/app-server";

const MEASURE_MS = 2000;
const ROUNDS = 3;
const ROUND_SECONDS = 3;

type Round = { health: number; answers: number; stored: number; refused: number; p99: number };

function gradingMix() {
  // A fixed mix: every kind at every level, 50 seeds each, answered with the rounded solution plus a slip-sized error.
  const cases = PROBLEM_KINDS.flatMap((kind) =>
    LEVELS.flatMap((level) =>
      Array.from({ length: 50 }, (_, i) => {
        const params = kind.generate(i * 104729 + level, level);
        return { kind, params, parts: kind.parts(params), texts: Object.fromEntries(kind.parts(params).map((p) => [p.key, p.answer === "count" ? "7" : roundedAnswer(kind.solve(params)[p.key], p.precision).add(1, 8).toFraction(true)])) };
      }),
    ),
  );
  let parts = 0;
  const start = performance.now();
  while (performance.now() - start < MEASURE_MS) {
    for (const c of cases) {
      const expected = c.kind.solve(c.params);
      for (const part of c.parts) {
        gradeAnswer(part, expected[part.key], c.texts[part.key], (v) => c.kind.diagnose(c.params, part.key, v));
        parts++;
      }
    }
  }
  return (parts / (performance.now() - start)) * 1000;
}

async function http() {
  const app = await startApp({ seed: false, env: { ANSWERS_PER_MINUTE: "100000000" } });
  try {
    // Problems of every kind and level, written straight into the database (as the route would)
    // and owned by one visitor, so every request is a real graded try of a fresh open problem.
    const visitorId = randomUUID();
    const database = openDatabase(app.databasePath);
    const problems = Array.from({ length: 6000 }, (_, i) => {
      const kind = PROBLEM_KINDS[i % PROBLEM_KINDS.length];
      const level = LEVELS[Math.floor(i / PROBLEM_KINDS.length) % LEVELS.length];
      return { id: randomUUID(), userId: null, visitorId, kind: kind.key, level, seed: i, attemptsAllowed: 3 };
    });
    await database.models.PracticeProblem.bulkCreate(problems);
    await database.sequelize.close();
    const bodies = problems.map((p) => {
      const kind = PROBLEM_KINDS.find((k) => k.key === p.kind)!;
      return JSON.stringify({ answers: Object.fromEntries(kind.parts(kind.generate(p.seed, p.level)).map((part) => [part.key, part.answer === "count" ? "1" : "1 1/16"])) });
    });

    // A student opens a problem before answering it (the problem page, or a lesson's embed), so
    // the problems to be answered are opened first, outside the timed runs.
    const opened = problems.slice(0, 4000);
    const open = async (id: string, tries = 3): Promise<void> => {
      try {
        const res = await fetch(`${app.url}/api/practice/${id}`, { headers: { cookie: `sixteenths-visitor=${visitorId}` } });
        if (!res.ok) throw new Error(`GET ${id}: ${res.status}`);
        await res.text();
      } catch (error) {
        // A kept-alive socket the server has just closed fails once; a fresh one does not.
        if (tries <= 1) throw error;
        await open(id, tries - 1);
      }
    };
    for (let i = 0; i < opened.length; i += 16) await Promise.all(opened.slice(i, i + 16).map((p) => open(p.id)));

    const run = (opts: autocannon.Options) => new Promise<autocannon.Result>((resolve, reject) => autocannon({ connections: 32, ...opts }, (err, result) => (err ? reject(err) : resolve(result))));
    await run({ url: `${app.url}/api/health`, duration: 2 }); // warm up the server before any figure is taken
    let n = 0;
    const answerRun = (duration: number) =>
      run({
        url: app.url,
        // Each request goes to the next opened problem, never the same one twice.
        duration,
        requests: [
          {
            method: "POST",
            headers: { "content-type": "application/json", cookie: `sixteenths-visitor=${visitorId}` },
            setupRequest: (req) => {
              const i = n++ % opened.length;
              return { ...req, path: `/api/practice/${opened[i].id}/answers`, body: bodies[i] };
            },
          },
        ],
      });
    await answerRun(1); // loads the route's code, as the health warm-up does for its own
    // The machine is shared and noisy, so the two are measured in alternating rounds of the
    // same length, and the middle round's ratio is the figure.
    const rounds: Round[] = [];
    for (let r = 0; r < ROUNDS; r++) {
      const health = await run({ url: `${app.url}/api/health`, duration: ROUND_SECONDS });
      const answers = await answerRun(ROUND_SECONDS);
      rounds.push({ health: health.requests.average, answers: answers.requests.average, stored: answers["2xx"], refused: answers.non2xx, p99: answers.latency.p99 });
    }
    return rounds;
  } finally {
    await app.stop();
  }
}

async function main() {
  const perSecond = gradingMix();
  console.log(`Grading in process: ${Math.round(perSecond).toLocaleString("en-US")} graded parts / s over ${PROBLEM_KINDS.length} kinds (target ≥ 10,000)`);
  const rounds = await http();
  for (const [i, r] of rounds.entries()) {
    console.log(
      `Round ${i + 1}: GET /api/health ${Math.round(r.health)} req/s · POST /api/practice/{id}/answers ${Math.round(r.answers)} req/s ` +
        `(${r.stored} graded and stored, ${r.refused} not 2xx, p99 ${r.p99} ms) · ratio ${(r.answers / r.health).toFixed(2)}`,
    );
  }
  const ratios = rounds.map((r) => r.answers / r.health).sort((a, b) => a - b);
  console.log(`Ratio answers / health, middle round: ${ratios[Math.floor(ratios.length / 2)].toFixed(2)} (target ≥ 0.5)`);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
