import type { ErrorBody, ErrorCode, FieldErrors } from "@/lib/errors";

export type ApiFailure = { ok: false; status: number; code: ErrorCode; message: string; fields: FieldErrors };
export type ApiResult<T> = { ok: true; data: T } | ApiFailure;

/**
 * One fetch for the pages that talk to our JSON routes: JSON in, JSON out, and every failure —
 * the one error shape, a 500 without a body, or no network at all — turned into words.
 */
export async function callApi<T>(url: string, method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE", body?: unknown): Promise<ApiResult<T>> {
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, code: "unavailable", message: "Could not reach Sixteenths. Check your connection and try again; nothing was lost on this page.", fields: {} };
  }
  if (response.status === 204) return { ok: true, data: undefined as T };
  const json = (await response.json().catch(() => null)) as (T & Partial<ErrorBody>) | null;
  if (response.ok && json) return { ok: true, data: json };
  return {
    ok: false,
    status: response.status,
    code: json?.error?.code ?? "internal",
    message: json?.error?.message ?? "Something went wrong on our side. Try again in a moment.",
    fields: json?.error?.fields ?? {},
  };
}
