// One error shape for every JSON response: { error: { code, message, fields? } }.
export type FieldErrors = Record<string, string>;

export type ErrorCode =
  | "bad_request"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "too_large"
  | "rate_limited"
  | "unavailable"
  | "internal";

const statusOf: Record<ErrorCode, number> = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  too_large: 413,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
};

export class AppError extends Error {
  readonly status: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldErrors,
    readonly retryAfterSeconds?: number,
  ) {
    super(message);
    this.name = "AppError";
    this.status = statusOf[code];
  }
}

export type ErrorBody = { error: { code: ErrorCode; message: string; fields?: FieldErrors } };

export function errorBody(error: AppError): ErrorBody {
  return { error: { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}) } };
}

/** Turns zod issues into one message per field, keyed by the dotted path. */
export function fieldErrorsFrom(issues: ReadonlyArray<{ path: ReadonlyArray<PropertyKey>; message: string }>): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of issues) {
    const key = issue.path.map(String).join(".") || "_";
    fields[key] ??= issue.message;
  }
  return fields;
}
