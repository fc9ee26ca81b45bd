import "server-only";
import { randomUUID } from "node:crypto";

// A request id a proxy in front may already have given the request (kept when it looks like one).
const SAFE_ID = /^[A-Za-z0-9._:-]{8,128}$/;

/** The id this request is known by: the proxy's X-Request-Id when sane, else a new UUID. */
export function requestIdOf(headers?: Headers): string {
  const given = headers?.get("x-request-id");
  return given && SAFE_ID.test(given) ? given : randomUUID();
}

/**
 * Logs an unexpected error in full (message, stack, cause) under a reference id and returns the
 * id. The caller answers with a generic message and this id only: internal messages (SQL, file
 * paths, connection strings) go to the log, never to the person, who can quote the reference.
 */
export function logInternalError(where: string, error: unknown, id: string = randomUUID()): string {
  console.error(`[${id}] ${where} failed:`, error);
  return id;
}

/** The words a person sees for an internal error, with the reference to quote. */
export function internalMessage(id: string, extra = ""): string {
  return `Something went wrong on our side${extra}. If it happens again, quote reference ${id}.`;
}
