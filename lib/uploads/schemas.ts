import { z } from "zod";
import { MAX_COMMENT_LENGTH } from "./limits";

export const assignmentParamsSchema = z.object({
  assignmentId: z.coerce.number({ error: "The assignment id must be a number." }).int({ error: "The assignment id must be a whole number." }).positive({ error: "The assignment id must be a number." }),
});

export const uploadParamsSchema = z.object({
  uploadId: z.uuid({ error: "That is not a photo's id." }),
});

export const listQuerySchema = z.object({
  studentId: z.coerce.number({ error: "The student id must be a number." }).int({ error: "The student id must be a whole number." }).positive({ error: "The student id must be a number." }).optional(),
});

export const fileQuerySchema = z.object({
  size: z.enum(["thumb", "full"], { error: "Ask for size=thumb or size=full." }).default("full"),
});

export const commentSchema = z.object({
  comment: z
    .string({ error: "Write a comment (or leave it empty to remove it)." })
    .trim()
    .max(MAX_COMMENT_LENGTH, { error: `Keep the comment under ${MAX_COMMENT_LENGTH} characters.` }),
});

export type CommentInput = z.infer<typeof commentSchema>;
