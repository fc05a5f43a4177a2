import type { ErrorBody } from "@/lib/errors";

export type SendResult<T> = { ok: true; problem: T; late?: boolean } | { ok: false; error: ErrorBody["error"]; retryable: boolean };

/** What the student sees while the answers travel: the first send, then each retry. */
export type SendingState = { phase: "saving" } | { phase: "retrying"; attempt: number };

// Two retries, a second and then three seconds apart: enough to ride out a server restart or a
// dropped Wi-Fi packet in the shop, short enough that nobody sits wondering.
const RETRY_WAITS_MS = [1000, 3000];

/**
 * A version-4 UUID for one submission. `crypto.randomUUID` exists only on secure pages (https or
 * localhost), and a school may serve the app over plain http on its own network.
 */
export function newSubmissionKey(): string {
  if (typeof crypto.randomUUID === "function") return crypto.randomUUID();
  const bytes = crypto.getRandomValues(new Uint8Array(16));
  bytes[6] = (bytes[6] & 0x0f) | 0x40;
  bytes[8] = (bytes[8] & 0x3f) | 0x80;
  const hex = [...bytes].map((b) => b.toString(16).padStart(2, "0")).join("");
  return `${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}`;
}

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Posts one submission, retrying a lost connection or a server failure with the SAME key: the
 * server stores a keyed submission at most once and answers a repeat with its first reply, so a
 * retry can never spend a second try. Refusals (4xx) are final and come back as they are.
 */
export async function sendAnswers<T>(url: string, body: unknown, key: string, onState: (state: SendingState) => void): Promise<SendResult<T>> {
  let last: SendResult<T> = { ok: false, retryable: true, error: { code: "unavailable", message: "Could not reach Sixteenths." } };
  for (let attempt = 0; attempt <= RETRY_WAITS_MS.length; attempt++) {
    if (attempt > 0) {
      onState({ phase: "retrying", attempt });
      await wait(RETRY_WAITS_MS[attempt - 1]);
    } else {
      onState({ phase: "saving" });
    }
    last = await sendOnce<T>(url, body, key);
    if (last.ok || !last.retryable) return last;
  }
  return last;
}

async function sendOnce<T>(url: string, body: unknown, key: string): Promise<SendResult<T>> {
  let res: Response;
  try {
    res = await fetch(url, { method: "POST", headers: { "content-type": "application/json", "Idempotency-Key": key }, body: JSON.stringify(body) });
  } catch {
    return { ok: false, retryable: true, error: { code: "unavailable", message: "Could not reach Sixteenths. Check your connection; your answers are still in the boxes, and pressing Check answers again will not use up a try." } };
  }
  const json = (await res.json().catch(() => null)) as ({ problem: T; late?: boolean } & Partial<ErrorBody>) | null;
  if (res.ok && json) return { ok: true, problem: json.problem, late: json.late };
  const serverFault = res.status >= 500 || !json;
  return {
    ok: false,
    retryable: serverFault,
    error: json?.error ?? { code: "internal", message: "The server did not answer properly. Your answers are still in the boxes, and pressing Check answers again will not use up a try." },
  };
}
