import type { ErrorBody, FieldErrors } from "@/lib/errors";

export type ApiResult<T> = { ok: true; data: T } | { ok: false; status: number; message: string; fields: FieldErrors };

/** One fetch for the class pages: JSON in, JSON out, and the one error shape turned into words. */
export async function callApi<T>(url: string, method: "GET" | "POST" | "PATCH" | "DELETE", body?: unknown): Promise<ApiResult<T>> {
  let response: Response;
  try {
    response = await fetch(url, {
      method,
      headers: body === undefined ? undefined : { "content-type": "application/json" },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
  } catch {
    return { ok: false, status: 0, message: "Could not reach Sixteenths. Check your connection and try again.", fields: {} };
  }
  const json = (await response.json().catch(() => null)) as (T & Partial<ErrorBody>) | null;
  if (response.ok && json) return { ok: true, data: json };
  return {
    ok: false,
    status: response.status,
    message: json?.error?.message ?? "That did not work. Try again in a moment.",
    fields: json?.error?.fields ?? {},
  };
}
