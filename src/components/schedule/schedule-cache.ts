/**
 * Pure edits of the cached schedule, for optimistic updates and their rollback: each returns a
 * new schedule object with only the touched rows replaced, so the grid re-renders just those.
 */
import type { TSchedule, TSheet } from "@/schemas/schedule";

export type Row = Record<string, unknown> & { id: string; version: number };
export type ListName = "design_cases" | "zones" | "buildups" | TSheet;

export function rowsOf(s: TSchedule, list: ListName): Row[] {
  return s[list] as unknown as Row[];
}

function withList(s: TSchedule, list: ListName, rows: Row[]): TSchedule {
  return { ...s, [list]: rows };
}

export function findRow(s: TSchedule | undefined, list: ListName, id: string): Row | undefined {
  return s ? rowsOf(s, list).find((r) => r.id === id) : undefined;
}

/** Merges values into rows by id (rows not present are left alone). */
export function mergeRows(s: TSchedule, list: ListName, patches: { id: string; values: Record<string, unknown> }[]): TSchedule {
  const by = new Map(patches.map((p) => [p.id, p.values]));
  return withList(s, list, rowsOf(s, list).map((r) => (by.has(r.id) ? ({ ...r, ...by.get(r.id) } as Row) : r)));
}

export function removeRows(s: TSchedule, list: ListName, ids: Set<string>): TSchedule {
  return withList(s, list, rowsOf(s, list).filter((r) => !ids.has(r.id)));
}

/** Adds rows (or replaces those with the same id) keeping the sheet's order: by position, else name. */
export function upsertRows(s: TSchedule, list: ListName, rows: Row[]): TSchedule {
  const ids = new Set(rows.map((r) => r.id));
  const all = [...rowsOf(s, list).filter((r) => !ids.has(r.id)), ...rows];
  const positioned = list === "surfaces" || list === "duct_runs";
  all.sort((a, b) => (positioned ? (a.position as number) - (b.position as number) : String(a.name).localeCompare(String(b.name))));
  return withList(s, list, all);
}

export function pick(row: Record<string, unknown>, keys: string[]): Record<string, unknown> {
  return Object.fromEntries(keys.map((k) => [k, row[k]]));
}
