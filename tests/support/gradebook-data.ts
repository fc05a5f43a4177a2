// Tries written straight into a test app's SQLite file for a generated class: right and wrong
// answers, some after the due date, so the gradebook has real rows to add up.
import crypto from "node:crypto";
import { variantSeed } from "@/lib/assignments/variants";
import { findKind, type Level } from "@/lib/problems";
import { withDatabase } from "./assignment-fixtures";

export type GeneratedWork = { itemId: number; kind: string; level: Level; problemCount: number };

/** A small deterministic generator, so a failing run can be repeated. */
export function randomFrom(seed: number): () => number {
  let s = seed >>> 0;
  return () => {
    s = (s * 1664525 + 1013904223) >>> 0;
    return s / 2 ** 32;
  };
}

/**
 * For each student and variant: up to `tries` tries, each part right with probability `rightShare`,
 * timed `startAt + n hours` (so a start before the due date and many tries can run late).
 */
export async function generateTries(file: string, secret: string, studentId: number, items: GeneratedWork[], opts: { tries: number; rightShare: number; startAt: Date; random: () => number }): Promise<void> {
  await withDatabase(file, async (db) => {
    for (const item of items) {
      const kind = findKind(item.kind)!;
      for (let variant = 0; variant < item.problemCount; variant++) {
        const seed = variantSeed(secret, item.itemId, studentId, variant);
        const parts = kind.parts(kind.generate(seed, item.level));
        const id = crypto.randomUUID();
        const attempts: Record<string, unknown>[] = [];
        const solved = new Set<string>();
        let used = 0;
        let lastTryAt: Date | null = null;
        for (let t = 1; t <= opts.tries && solved.size < parts.length; t++) {
          used = t;
          const at = new Date(opts.startAt.getTime() + (t - 1 + variant) * 3600_000 * (1 + opts.random() * 20));
          lastTryAt = at;
          for (const p of parts) {
            if (solved.has(p.key)) continue;
            const right = opts.random() < opts.rightShare;
            if (right) solved.add(p.key);
            attempts.push({ problemId: id, userId: studentId, assignmentItemId: item.itemId, kind: item.kind, level: item.level, seed, submission: t, part: p.key, raw: right ? "right" : "=1+2", value: "1/1", expected: "1/1", verdict: right ? "correct" : "incorrect", pattern: null, timeMs: 30_000 + Math.round(opts.random() * 60_000), createdAt: at });
          }
        }
        const status = solved.size === parts.length ? "solved" : used >= opts.tries ? "failed" : "open";
        await db.models.PracticeProblem.create({ id, userId: studentId, visitorId: null, assignmentItemId: item.itemId, variant, kind: item.kind, level: item.level, seed, attemptsAllowed: opts.tries, attemptsUsed: used, lastTryAt, status, finishedAt: status === "open" ? null : new Date() });
        if (attempts.length > 0) await db.models.Attempt.bulkCreate(attempts as never[]);
      }
    }
  });
}
