/**
 * Results of one design case kept up to date edit by edit. The schedule cache replaces only the
 * rows (and zones, build-ups) an edit touched, so comparing object identities says which rows
 * need the engine again: those, plus the totals of their zones. Anything that moves every row
 * (the site, the design case) asks for a whole recalculation, which the caller runs elsewhere (a
 * Web Worker). The answer equals scheduleResults' for the same schedule: every row goes through
 * the same per-row functions and each zone is summed in the schedule's order.
 */
import { ductRunRowResult, surfaceRowResult, zoneTotalsOf, type RowResult, type ScheduleResults, type ZoneTotalsRow } from "@/calc/index";
import type { TDesignCase, TSchedule } from "@/schemas/schedule";
import { engineDesignCase, engineSchedule } from "./engine-schedule";

/** One case's results and the schedule they were computed from. */
export interface CaseResults {
  schedule: TSchedule;
  caseKey: string;
  results: ScheduleResults;
  /** Every row's outcome by row id, surfaces and duct runs alike. */
  byRow: Map<string, RowResult>;
}

export type UpdatePlan =
  | { kind: "same" }
  | { kind: "full"; reason: string }
  | { kind: "rows"; surfaces: Set<string>; ducts: Set<string>; zones: Set<string> };

/** What the engine reads of a design case, as a string: equal strings, equal results. */
export const caseKey = (dc: TDesignCase) => JSON.stringify(engineDesignCase(dc));
const siteKey = (s: TSchedule) => JSON.stringify(engineSchedule({ ...s, surfaces: [], duct_runs: [], zones: [], buildups: [] }).site);

/** Ids whose object differs between two lists (added, removed or replaced). */
function changedIds<T extends { id: string }>(before: readonly T[], after: readonly T[]): Set<string> {
  const out = new Set<string>();
  if (before === after) return out;
  const old = new Map(before.map((x) => [x.id, x]));
  for (const x of after) {
    if (old.get(x.id) !== x) out.add(x.id);
    old.delete(x.id);
  }
  for (const id of old.keys()) out.add(id);
  return out;
}

/**
 * Which rows and zones of `prev` must be computed again for `next`; "full" when there is no
 * previous result, the site or the case changed, or more than `maxRows` rows would be.
 */
export function planUpdate(prev: CaseResults | undefined, next: TSchedule, dc: TDesignCase, maxRows = 250): UpdatePlan {
  if (!prev) return { kind: "full", reason: "no results yet" };
  if (prev.caseKey !== caseKey(dc)) return { kind: "full", reason: "design case changed" };
  const s = prev.schedule;
  if (s === next) return { kind: "same" };
  if (s.project !== next.project && siteKey(s) !== siteKey(next)) return { kind: "full", reason: "site changed" };
  const zonesChanged = changedIds(s.zones, next.zones);
  const buildupsChanged = changedIds(s.buildups, next.buildups);
  const surfaces = changedIds(s.surfaces, next.surfaces);
  const ducts = changedIds(s.duct_runs, next.duct_runs);
  const zones = new Set(zonesChanged);
  if (zonesChanged.size || buildupsChanged.size) {
    for (const r of next.surfaces) if (zonesChanged.has(r.zone_id) || buildupsChanged.has(r.buildup_id)) surfaces.add(r.id);
    for (const r of next.duct_runs) if (zonesChanged.has(r.zone_id)) ducts.add(r.id);
  }
  if (surfaces.size + ducts.size > maxRows) return { kind: "full", reason: `${surfaces.size + ducts.size} rows changed` };
  // A row that moved between zones changes both zones' totals; a removed row its old zone's.
  const zoneOf = (list: readonly { id: string; zone_id: string }[], ids: Set<string>) => {
    for (const r of list) if (ids.has(r.id)) zones.add(r.zone_id);
  };
  zoneOf(s.surfaces, surfaces);
  zoneOf(next.surfaces, surfaces);
  zoneOf(s.duct_runs, ducts);
  zoneOf(next.duct_runs, ducts);
  if (!surfaces.size && !ducts.size && !zones.size && s.zones === next.zones) return { kind: "same" };
  return { kind: "rows", surfaces, ducts, zones };
}

/** Wraps a whole recalculation (from the worker or computed here) with the schedule it was made from. */
export function caseResultsOf(schedule: TSchedule, dc: TDesignCase, results: ScheduleResults): CaseResults {
  const byRow = new Map<string, RowResult>();
  for (const r of results.surfaces) byRow.set(r.row_id, r);
  for (const r of results.duct_runs) byRow.set(r.row_id, r);
  return { schedule, caseKey: caseKey(dc), results, byRow };
}

/** Applies a "rows" plan: the named rows through the engine, the named zones summed again, the rest kept. */
export function applyPlan(prev: CaseResults, next: TSchedule, dc: TDesignCase, plan: Extract<UpdatePlan, { kind: "rows" }>): CaseResults {
  const e = engineSchedule(next);
  const edc = engineDesignCase(dc);
  const zones = new Map(e.zones.map((z) => [z.id, z]));
  const buildups = new Map(e.buildups.map((b) => [b.id, b]));
  const byRow = new Map(prev.byRow);
  for (const id of byRow.keys()) if (plan.surfaces.has(id) || plan.ducts.has(id)) byRow.delete(id);
  const surfaces = e.surfaces.map((row) => {
    if (!plan.surfaces.has(row.id)) return prev.byRow.get(row.id)!;
    const r = surfaceRowResult(e.site, edc, zones.get(row.zone_id), buildups.get(row.buildup_id), row);
    byRow.set(row.id, r);
    return r;
  });
  const ducts = e.ductRuns.map((row) => {
    if (!plan.ducts.has(row.id)) return prev.byRow.get(row.id)!;
    const r = ductRunRowResult(e.site, edc, zones.get(row.zone_id), row);
    byRow.set(row.id, r);
    return r;
  });
  const before = new Map<string, ZoneTotalsRow>(prev.results.zones.map((z) => [z.zone_id, z]));
  const totals = e.zones.map((z) => (plan.zones.has(z.id) || !before.has(z.id) ? zoneTotalsOf(z, e.surfaces, surfaces, e.ductRuns, ducts) : before.get(z.id)!));
  return { schedule: next, caseKey: prev.caseKey, results: { design_case_id: dc.id, surfaces, duct_runs: ducts, zones: totals }, byRow };
}

/** Brings `prev` up to `next` when that is a small change; undefined when a whole recalculation is needed. */
export function updateCaseResults(prev: CaseResults | undefined, next: TSchedule, dc: TDesignCase, maxRows?: number): { state: CaseResults; changed: Set<string> } | undefined {
  const plan = planUpdate(prev, next, dc, maxRows);
  if (plan.kind === "full") return undefined;
  if (plan.kind === "same") return { state: prev!.schedule === next ? prev! : { ...prev!, schedule: next }, changed: new Set() };
  return { state: applyPlan(prev!, next, dc, plan), changed: new Set([...plan.surfaces, ...plan.ducts]) };
}
