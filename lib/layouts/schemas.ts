import { z } from "zod";
import { CALCULATOR_KINDS } from "@/lib/calculators";

export const layoutNameSchema = z
  .string({ error: "Give the layout a name." })
  .trim()
  .min(1, { error: "Give the layout a name." })
  .max(120, { error: "Keep the name under 120 characters." });

// The calculator's query string; bounded so a saved layout cannot grow without limit.
const paramsSchema = z
  .string({ error: "The layout's settings are missing." })
  .max(4000, { error: "That layout has too many settings to save." })
  .refine((s) => !s.startsWith("?"), { error: "Send the settings without the leading ?." });

export const createLayoutSchema = z.object({
  kind: z.enum(CALCULATOR_KINDS, { error: "That is not one of our calculators." }),
  name: layoutNameSchema,
  params: paramsSchema,
});

export const renameLayoutSchema = z.object({ name: layoutNameSchema });

export const layoutIdSchema = z.object({ id: z.coerce.number({ error: "The layout id must be a number." }).int().positive() });
