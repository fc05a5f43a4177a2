import { z } from "zod";
import { emailSchema, passwordSchema } from "./schemas";

// Shared by the forms and the routes; no server code here, so client components may import it.

export const resetRequestSchema = z.object({ email: emailSchema });
export type ResetRequestInput = z.input<typeof resetRequestSchema>;

/** What the request answers for every address, known or not, so nobody can learn who has an account. */
export const RESET_REQUESTED_MESSAGE = "If an account uses that address, a link to choose a new password is on its way.";

const tokenSchema = z
  .string({ error: "The link is missing its code. Open it from the e-mail again." })
  .trim()
  .min(1, { error: "The link is missing its code. Open it from the e-mail again." })
  .max(200, { error: "That link is not one we sent. Open it from the e-mail again." });

export const resetConfirmSchema = z.object({ token: tokenSchema, password: passwordSchema });

/** The form asks twice, so a typo does not lock the person out; the route needs the password once. */
export const resetFormSchema = z
  .object({ password: passwordSchema, confirm: z.string({ error: "Type the new password again." }).min(1, { error: "Type the new password again." }) })
  .refine((v) => v.password === v.confirm, { path: ["confirm"], error: "The two passwords differ. Type the same one in both boxes." });
export type ResetFormInput = z.input<typeof resetFormSchema>;
