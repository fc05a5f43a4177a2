// Request shapes of the instructor's assignment routes, beside the builder's own schema
// (schemas.ts). Pure zod, so pages, forms and route handlers share them.
import { z } from "zod";
import { TOLERANCES } from "./schemas";

const id = (what: string) => z.coerce.number({ error: `The ${what} id must be a number.` }).int({ error: `The ${what} id must be a whole number.` }).positive({ error: `The ${what} id must be a whole number.` });

export const classParamsSchema = z.object({ classId: id("class") });
export const assignmentParamsSchema = z.object({ assignmentId: id("assignment") });
export const extensionParamsSchema = z.object({ assignmentId: id("assignment"), studentId: id("student") });

export const duplicateSchema = z.object({ classId: id("class") });

export const listQuerySchema = z.object({ page: z.coerce.number().int().min(1).catch(1).default(1) });

/** A sample counter, not a seed: the server turns (kind, level, sample) into a seed no student ever gets. */
export const MAX_SAMPLE = 9999;

export const previewSchema = z.object({
  kind: z.string({ error: "Choose a problem kind." }).min(1, { error: "Choose a problem kind." }).max(40),
  level: z.coerce.number({ error: "Choose a level." }).int().min(1, { error: "Levels are 1, 2 and 3." }).max(3, { error: "Levels are 1, 2 and 3." }),
  tolerance: z.enum(TOLERANCES, { error: "Choose how close an answer must be." }).default("half"),
  sample: z.coerce.number({ error: "The sample number must be a number." }).int().min(0).max(MAX_SAMPLE, { error: `Samples go up to ${MAX_SAMPLE}.` }).default(0),
});

export type PreviewInput = z.input<typeof previewSchema>;
