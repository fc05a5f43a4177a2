import { z } from "zod";
import { MAX_ANSWER_LENGTH } from "./limits";

const levelSchema = z.union([z.literal(1), z.literal(2), z.literal(3)], { error: "Level must be 1, 2 or 3." });

export const newProblemSchema = z.union(
  [
    z.object({ kind: z.string({ error: "Choose a problem kind." }).min(1, { error: "Choose a problem kind." }).max(40, { error: "That kind name is too long." }), level: levelSchema }).strict(),
    z.object({ next: z.literal(true) }).strict(),
    z.object({ skill: z.string().min(1).max(40) }).strict(),
  ],
  { error: 'Send { "kind": "…", "level": 1 } for a chosen problem, { "skill": "…" } for one of a skill at your level, or { "next": true } for the next one.' },
);

export const answersSchema = z
  .object({
    answers: z.record(
      z.string().max(40),
      z.string({ error: "Each answer is text, like 22 3/4." }).max(MAX_ANSWER_LENGTH, { error: `An answer is at most ${MAX_ANSWER_LENGTH} characters.` }),
      { error: "Send the answers as { part: text }." },
    ),
    timeMs: z.number().int().min(0).max(24 * 3600 * 1000).optional(),
  })
  .strict();

export const historyQuerySchema = z.object({ page: z.coerce.number({ error: "Page must be a number." }).int().min(1, { error: "Pages start at 1." }).max(10_000).default(1) });
