import { z } from "zod";

// Read once, on first use rather than at import, so `next build` never needs secrets.
const schema = z.object({
  NODE_ENV: z.enum(["development", "test", "production"]).default("development"),
  DATABASE_PATH: z.string().min(1).default("data/sixteenths.sqlite"),
  NEXTAUTH_SECRET: z
    .string({ error: "NEXTAUTH_SECRET is missing: run `npm run demo` once (it writes .env.local) or set it to a random string of 32 or more characters." })
    .min(32, { error: "NEXTAUTH_SECRET is too short: use a random string of 32 or more characters (`openssl rand -base64 32`)." }),
  NEXTAUTH_URL: z.url({ error: "NEXTAUTH_URL must be the app's full address, e.g. http://localhost:3000." }).default("http://localhost:3000"),
  SMTP_URL: z.string().regex(/^smtps?:\/\//, { error: "SMTP_URL must start with smtp:// or smtps://, e.g. smtp://127.0.0.1:1025." }).default("smtp://127.0.0.1:1025"),
  MAIL_FROM: z.string().min(3).default("Sixteenths <no-reply@sixteenths.local>"),
  BCRYPT_COST: z.coerce
    .number()
    .int()
    .min(10, { error: "BCRYPT_COST must be at least 10." })
    .max(15, { error: "BCRYPT_COST above 15 makes every sign-in take seconds." })
    .default(12),
});

export type Env = z.infer<typeof schema>;

export class EnvError extends Error {
  constructor(readonly problems: string[]) {
    super(`Sixteenths cannot start; fix the environment (.env.local):\n${problems.map((p) => `  - ${p}`).join("\n")}`);
    this.name = "EnvError";
  }
}

type Source = Record<string, string | undefined>;

export function parseEnv(source: Source): Env {
  // An empty value in a .env file means "not set", not "set to the empty string".
  const cleaned = Object.fromEntries(Object.entries(source).filter(([, v]) => v !== undefined && v !== ""));
  const result = schema.safeParse(cleaned);
  if (!result.success) {
    throw new EnvError(result.error.issues.map((issue) => issue.message));
  }
  return result.data;
}

let cached: Env | undefined;

export function env(): Env {
  cached ??= parseEnv(process.env);
  return cached;
}
