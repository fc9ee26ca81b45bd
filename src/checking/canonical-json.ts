/**
 * JSON with every object's keys sorted, so that two equal values give equal text whatever order
 * their keys came in (PostgreSQL's jsonb does not keep the order they were written in).
 */
export function canonicalJson(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v !== null && typeof v === "object" && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}
