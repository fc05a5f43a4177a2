import { z } from "zod";

export const emailSchema = z
  .string({ error: "Enter your e-mail address." })
  .trim()
  .toLowerCase()
  .min(1, { error: "Enter your e-mail address." })
  .max(254, { error: "That e-mail address is too long." })
  .pipe(z.email({ error: "That does not look like an e-mail address (name@example.com)." }));

const WEAK = new Set(["password", "password1", "1234567890", "qwertyuiop", "carpentry1", "sixteenths", "letmein123"]);

export const passwordSchema = z
  .string({ error: "Choose a password." })
  .min(10, { error: "Use at least 10 characters for your password." })
  .max(200, { error: "Keep the password under 200 characters." })
  .refine((p) => new Set(p).size >= 4, { error: "That password repeats too few characters; mix in more." })
  .refine((p) => !WEAK.has(p.toLowerCase()), { error: "That password is one of the first ones people guess; choose another." });

export const nameSchema = z
  .string({ error: "Enter your name." })
  .trim()
  .min(1, { error: "Enter your name." })
  .max(120, { error: "Keep the name under 120 characters." });

export const signUpSchema = z.object({
  name: nameSchema,
  email: emailSchema,
  password: passwordSchema,
});
export type SignUpInput = z.input<typeof signUpSchema>;

export const signInSchema = z.object({
  email: emailSchema,
  password: z.string().min(1, { error: "Enter your password." }).max(200),
});
