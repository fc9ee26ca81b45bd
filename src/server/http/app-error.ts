import "server-only";

/** Every error code the API can answer with, and its HTTP status: the one place they map. */
export const ERROR_STATUS = {
  bad_request: 400,
  invalid_input: 422,
  unauthenticated: 401,
  // The firm's plan does not include this (free-plan limits); the message names the upgrade path.
  plan_limit: 402,
  forbidden: 403,
  cross_site_request: 403,
  not_found: 404,
  conflict: 409,
  gone: 410,
  payload_too_large: 413,
  too_many_requests: 429,
  unavailable: 503,
  internal: 500,
} as const;
export type AppErrorCode = keyof typeof ERROR_STATUS;

/**
 * A failure the caller is meant to see. Throw it from services and handlers; `route()` turns it
 * into `{ "error": { code, message, details? } }` with the mapped status. Other tenants' ids
 * are `not_found`, never `forbidden`, so their existence does not leak.
 */
export class AppError extends Error {
  readonly code: AppErrorCode;
  readonly details?: unknown;

  constructor(code: AppErrorCode, message: string, details?: unknown) {
    super(message);
    this.name = "AppError";
    this.code = code;
    this.details = details;
  }

  get status(): number {
    return ERROR_STATUS[this.code];
  }
}
