import "server-only";

/** True for PostgreSQL's unique_violation (23505), optionally on a named constraint or index. */
export function isUniqueViolation(error: unknown, constraint?: string): boolean {
  const e = error as { code?: string; constraint?: string } | null;
  return e?.code === "23505" && (constraint === undefined || e.constraint === constraint);
}
