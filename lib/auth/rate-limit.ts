import { RateLimiterMemory } from "rate-limiter-flexible";
import { AppError } from "@/lib/errors";

// Suites that make many legitimate writes as one person within seconds (the access matrix builds
// some sixty copies of its fixtures as one instructor and one student) start their own app with
// every limit multiplied. Production leaves it unset; the rate-limit suite runs without it.
const scale = Math.max(1, Number(process.env.RATE_LIMIT_SCALE) || 1);

// In memory is enough for one server process; a second instance would need a shared store.
const limiters = {
  signIn: new RateLimiterMemory({ keyPrefix: "sign-in", points: 8 * scale, duration: 15 * 60 }),
  // A school shop signs up a whole class from one address, so allow a class-sized burst.
  signUp: new RateLimiterMemory({ keyPrefix: "sign-up", points: 40 * scale, duration: 60 * 60 }),
  // Far above what a student types (a try every two seconds), low enough to stop a script guessing.
  // The load benchmark raises it through the environment; nothing else should.
  answers: new RateLimiterMemory({ keyPrefix: "answers", points: (Number(process.env.ANSWERS_PER_MINUTE) || 30) * scale, duration: 60 }),
  newProblem: new RateLimiterMemory({ keyPrefix: "new-problem", points: 60 * scale, duration: 60 }),
  // Per address: enough for a few tries, too few to flood an inbox.
  passwordReset: new RateLimiterMemory({ keyPrefix: "password-reset", points: 5 * scale, duration: 15 * 60 }),
  // Per client: a shop class behind the school's one address may all forget at once; a script may not.
  passwordResetClient: new RateLimiterMemory({ keyPrefix: "password-reset-client", points: 30 * scale, duration: 15 * 60 }),
  // Per signed-in student: a mistyped code or two is normal; a script walking the code space is not.
  joinClass: new RateLimiterMemory({ keyPrefix: "join-class", points: 10 * scale, duration: 15 * 60 }),
  // Per address: a classroom accepting on the school's one IP, not a script trying tokens.
  acceptInvitation: new RateLimiterMemory({ keyPrefix: "accept-invitation", points: 40 * scale, duration: 15 * 60 }),
  // Per instructor, per request (an invite list, a resend or a roster import): a term's start
  // sends a few batches and some resends; a stolen account spamming strangers sends hundreds.
  sendInvitations: new RateLimiterMemory({ keyPrefix: "send-invitations", points: 30 * scale, duration: 60 * 60 }),
  // Per signed-in user: a student photographs a few layouts per assignment; each is re-encoded
  // by sharp, so a script uploading in a loop would tie up the server and fill the disk.
  photoUploads: new RateLimiterMemory({ keyPrefix: "photo-uploads", points: 30 * scale, duration: 15 * 60 }),
};

export type LimitName = keyof typeof limiters;

/** Spends one point for `key`; throws a 429 AppError with the wait when none are left. */
export async function consume(name: LimitName, key: string): Promise<void> {
  try {
    await limiters[name].consume(key);
  } catch (rejection) {
    if (rejection instanceof Error) throw rejection;
    // At least one second: a Retry-After of 0 would invite an immediate retry, and a 0 would drop the header.
    const wait = Math.max(1, Math.ceil(((rejection as { msBeforeNext?: number }).msBeforeNext ?? 60_000) / 1000));
    const minutes = Math.max(1, Math.ceil(wait / 60));
    throw new AppError("rate_limited", `Too many tries. Wait ${minutes} minute${minutes === 1 ? "" : "s"} and try again.`, undefined, wait);
  }
}

/** Gives the points back after a success, so a user who finally gets the password right starts fresh. */
export async function reset(name: LimitName, key: string): Promise<void> {
  await limiters[name].delete(key);
}

export function clientAddress(headers: Headers | Record<string, unknown> | undefined): string {
  const get = (k: string) => (headers instanceof Headers ? headers.get(k) : (headers?.[k] as string | undefined));
  return get("x-forwarded-for")?.split(",")[0]?.trim() || get("x-real-ip") || "local";
}
