// The assignment builder's contract: the form (react-hook-form + zodResolver) and the API parse
// the same schema. Dates travel as ISO 8601 strings with an offset; the browser turns the
// instructor's local date and time into one, so the server never guesses a time zone.
import { z } from "zod";
import type { LatePolicy, RevealRule } from "@/models/assignment";
import type { Tolerance } from "@/models/assignment-item";

// Type-only imports above keep Sequelize out of the browser bundle; `satisfies` keeps these
// lists in step with the models'.
export const LATE_POLICIES = ["none", "until", "penalty"] as const satisfies readonly LatePolicy[];
export const REVEAL_RULES = ["when-final", "after-due"] as const satisfies readonly RevealRule[];
export const TOLERANCES = ["half", "full"] as const satisfies readonly Tolerance[];

export const MAX_ITEMS = 12;
export const MAX_PROBLEMS_PER_ITEM = 10;
export const MAX_ATTEMPTS = 10;
export const MAX_EXTRA_ATTEMPTS = 10;

const isoDate = (what: string) => z.iso.datetime({ offset: true, error: `Enter the ${what} as a date and time.` });

export const assignmentItemSchema = z.object({
  kind: z.string({ error: "Choose a problem kind." }).min(1, { error: "Choose a problem kind." }).max(40),
  level: z.coerce.number({ error: "Choose a level." }).int().min(1, { error: "Levels are 1, 2 and 3." }).max(3, { error: "Levels are 1, 2 and 3." }),
  problemCount: z.coerce
    .number({ error: "Enter how many problems." })
    .int({ error: "Use a whole number of problems." })
    .min(1, { error: "An item needs at least one problem." })
    .max(MAX_PROBLEMS_PER_ITEM, { error: `At most ${MAX_PROBLEMS_PER_ITEM} problems per item.` }),
  tolerance: z.enum(TOLERANCES, { error: "Choose how close an answer must be." }),
  points: z.coerce
    .number({ error: "Enter the points for each problem." })
    .int({ error: "Use whole points." })
    .min(1, { error: "Each problem is worth at least 1 point." })
    .max(100, { error: "At most 100 points per problem." }),
});

export const assignmentSchema = z
  .object({
    title: z.string({ error: "Give the assignment a title." }).trim().min(1, { error: "Give the assignment a title." }).max(160, { error: "Keep the title under 160 characters." }),
    instructions: z.string().max(5000, { error: "Keep the instructions under 5,000 characters." }).default(""),
    opensAt: isoDate("opening"),
    dueAt: isoDate("due date"),
    latePolicy: z.enum(LATE_POLICIES, { error: "Choose a late-work policy." }),
    /** For "until": the last moment late work is taken. */
    lateUntil: isoDate("last day for late work").nullable().default(null),
    /** For "penalty": percent of the points taken off per day (or part of a day) late. */
    latePenaltyPercent: z.coerce.number().int().min(1, { error: "A penalty is at least 1% a day." }).max(100, { error: "A penalty is at most 100% a day." }).nullable().default(null),
    attemptsAllowed: z.coerce
      .number({ error: "Enter the tries allowed per problem." })
      .int()
      .min(1, { error: "Allow at least one try per problem." })
      .max(MAX_ATTEMPTS, { error: `At most ${MAX_ATTEMPTS} tries per problem.` }),
    reveal: z.enum(REVEAL_RULES, { error: "Choose when students see the worked solutions." }),
    items: z.array(assignmentItemSchema).min(1, { error: "Add at least one item of problems." }).max(MAX_ITEMS, { error: `At most ${MAX_ITEMS} items.` }),
  })
  .superRefine((a, ctx) => {
    if (Date.parse(a.dueAt) <= Date.parse(a.opensAt)) ctx.addIssue({ code: "custom", path: ["dueAt"], message: "The due date must come after the opening date." });
    if (a.latePolicy === "until") {
      if (!a.lateUntil) ctx.addIssue({ code: "custom", path: ["lateUntil"], message: "Say until when late work is taken." });
      else if (Date.parse(a.lateUntil) <= Date.parse(a.dueAt)) ctx.addIssue({ code: "custom", path: ["lateUntil"], message: "Late work must be taken until after the due date." });
    }
    if (a.latePolicy === "penalty" && a.latePenaltyPercent === null) ctx.addIssue({ code: "custom", path: ["latePenaltyPercent"], message: "Enter the penalty per day late." });
  });

export type AssignmentInput = z.input<typeof assignmentSchema>;
export type AssignmentData = z.output<typeof assignmentSchema>;

export const extensionSchema = z
  .object({
    studentId: z.coerce.number().int().positive(),
    dueAt: isoDate("new due date").nullable().default(null),
    extraAttempts: z.coerce.number().int().min(0).max(MAX_EXTRA_ATTEMPTS, { error: `At most ${MAX_EXTRA_ATTEMPTS} extra tries.` }).default(0),
    note: z.string().trim().max(300, { error: "Keep the note under 300 characters." }).nullable().default(null),
  })
  .refine((e) => e.dueAt !== null || e.extraAttempts > 0, { path: ["dueAt"], message: "Give a new due date, extra tries, or both." });

export type ExtensionInput = z.input<typeof extensionSchema>;
