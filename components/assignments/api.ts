import type { ErrorBody } from "@/lib/errors";

export type ApiResult<T> = { ok: true; data: T } | { ok: false; error: ErrorBody["error"] };

/** JSON in, JSON out, and one shape for every failure — including no network at all. */
export async function callApi<T>(url: string, method: string, body?: unknown): Promise<ApiResult<T>> {
  try {
    const res = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    if (res.status === 204) return { ok: true, data: undefined as T };
    const json = await res.json().catch(() => null);
    if (res.ok) return { ok: true, data: json as T };
    return { ok: false, error: (json as ErrorBody | null)?.error ?? { code: "internal", message: "Something went wrong on our side. Try again in a moment." } };
  } catch {
    return { ok: false, error: { code: "unavailable", message: "Could not reach Sixteenths. Check your connection and try again; nothing was lost on this page." } };
  }
}
