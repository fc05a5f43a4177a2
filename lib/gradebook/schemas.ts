// What the override form and route accept: the same schema in the browser (react-hook-form) and
// on the server, so the field messages match.
import { z } from "zod";

const reason = z
  .string({ error: "Say why the score is changed." })
  .trim()
  .min(3, { error: "Say why the score is changed, e.g. “Marks checked on the wall, all within 1/16″”." })
  .max(500, { error: "Keep the reason under 500 characters." });

// One object rather than a union, so a bad body gets a message on the field that is wrong.
export const overrideSchema = z
  .object({
    points: z.number({ error: "Enter the points as a number." }).finite({ error: "Enter the points as a number." }).min(0, { error: "Points cannot be below 0." }).optional(),
    excused: z.literal(true, { error: "Send excused: true to excuse the work." }).optional(),
    clear: z.literal(true, { error: "Send clear: true to go back to the computed score." }).optional(),
    reason,
  })
  .strict()
  .superRefine((v, ctx) => {
    const chosen = [v.points !== undefined, v.excused === true, v.clear === true].filter(Boolean).length;
    if (chosen !== 1) ctx.addIssue({ code: "custom", path: ["points"], message: "Give the new points, or excuse the work, or clear the change — one of the three." });
  });
export type OverrideInput = z.infer<typeof overrideSchema>;

/** The form's shape: one choice, and points as typed. */
export const overrideFormSchema = z
  .object({
    action: z.enum(["points", "excused", "clear"]),
    points: z.string().trim(),
    reason,
  })
  .superRefine((v, ctx) => {
    if (v.action !== "points") return;
    const n = Number(v.points);
    if (v.points === "" || !Number.isFinite(n)) ctx.addIssue({ code: "custom", path: ["points"], message: "Enter the points as a number, e.g. 8.5." });
    else if (n < 0) ctx.addIssue({ code: "custom", path: ["points"], message: "Points cannot be below 0." });
  });
export type OverrideForm = z.infer<typeof overrideFormSchema>;

export function formToOverride(form: OverrideForm): OverrideInput {
  if (form.action === "excused") return { excused: true, reason: form.reason };
  if (form.action === "clear") return { clear: true, reason: form.reason };
  return { points: Number(form.points), reason: form.reason };
}
