/**
 * A whole schedule for one design case: every surface and duct run through the engine, and the
 * zone totals. The same function serves the browser (instant recalculation) and the server
 * (authoritative results).
 */
import type { CalcResult } from "../contract";
import { calculateCase } from "../calculate";
import { zoneTotals, type ZoneRowResult, type ZoneTotals } from "../zone";
import { ductRunCase, surfaceCase } from "./cases";
import { insideSurfaceCheck, methodSpread, type InsideSurfaceCheck, type MethodSpread } from "./checks";
import type { SurfaceInput, SurfaceResult } from "../surface";
import type { Buildup, DesignCase, DuctRunRow, Site, SurfaceRow, Zone } from "./types";

export interface Schedule {
  site: Site;
  zones: Zone[];
  buildups: Buildup[];
  surfaces: SurfaceRow[];
  ductRuns: DuctRunRow[];
}

export interface RowResult {
  row_id: string;
  result: CalcResult;
  /** Surfaces computed: the three exterior methods' band of h_o and Q (v2). */
  spread?: MethodSpread;
  /** Surfaces computed: inside-surface temperature and ISO 13788's factor against the zone air (v2). */
  inside?: InsideSurfaceCheck;
}

export interface ScheduleResults {
  design_case_id: string;
  surfaces: RowResult[];
  duct_runs: RowResult[];
  zones: ({ zone_id: string; name: string; floor_area_m2: number } & ZoneTotals)[];
}

function missing(row_id: string, field: string, message: string, code: "invalid_input" | "not_computed" = "invalid_input"): RowResult {
  return { row_id, result: { id: row_id, ok: false, error: { code, field, message } } };
}

/** The answer for a surface over ground: outside Filmsheet's scope, flagged, left out of totals. */
export const OVER_GROUND_MESSAGE =
  "over ground: heat loss to the ground needs ISO 13370 and is not computed here; the row is left out of the totals";

/**
 * One surface row's results: the same answer whether the whole schedule is computed or only this
 * row (the browser recalculates just the rows an edit touched, so nothing else may feed in).
 */
export function surfaceRowResult(site: Site, dc: DesignCase, zone: Zone | undefined, buildup: Buildup | undefined, row: SurfaceRow): RowResult {
  if (zone === undefined) return missing(row.id, "zone_id", `zone ${row.zone_id} is not in this project`);
  if (buildup === undefined) return missing(row.id, "buildup_id", `build-up ${row.buildup_id} is not in this project`);
  if (row.exposed_to === "ground") return missing(row.id, "exposed_to", OVER_GROUND_MESSAGE, "not_computed");
  const c = surfaceCase(site, dc, zone, buildup, row);
  const result = calculateCase(c);
  if (!result.ok) return { row_id: row.id, result };
  const r = result as unknown as SurfaceResult;
  return {
    row_id: row.id,
    result,
    spread: methodSpread(c as SurfaceInput, r),
    inside: insideSurfaceCheck(r.q_W_m2, c.R_si_m2K_W, c.T_inside_C, zone.RH_inside_pct, c.T_outside_C),
  };
}

/** One duct run's results (see surfaceRowResult). */
export function ductRunRowResult(site: Site, dc: DesignCase, zone: Zone | undefined, row: DuctRunRow): RowResult {
  if (zone === undefined) return missing(row.id, "zone_id", `zone ${row.zone_id} is not in this project`);
  return { row_id: row.id, result: calculateCase(ductRunCase(site, dc, zone, row)) };
}

export type ZoneTotalsRow = ScheduleResults["zones"][number];

/**
 * One zone's totals from every row's results (results[i] belongs to rows[i]), summed in the
 * schedule's order so that a zone totalled alone equals the same zone in a whole recalculation.
 */
export function zoneTotalsOf(z: Zone, surfaces: readonly SurfaceRow[], surfaceResults: readonly RowResult[], ductRuns: readonly DuctRunRow[], ductResults: readonly RowResult[]): ZoneTotalsRow {
  const rows: ZoneRowResult[] = [];
  surfaces.forEach((row, i) => {
    const r = surfaceResults[i]!.result;
    if (row.zone_id === z.id && r.ok) rows.push({ source: "surface", Q_W: r.Q_W as number });
  });
  ductRuns.forEach((row, i) => {
    const r = ductResults[i]!.result;
    if (row.zone_id === z.id && r.ok) rows.push({ source: "duct_run", Q_W: r.Q_W as number, in_zone: row.in_served_zone === true });
  });
  return { zone_id: z.id, name: z.name, floor_area_m2: z.floor_area_m2, ...zoneTotals(rows, z.floor_area_m2) };
}

export function scheduleResults(s: Schedule, dc: DesignCase): ScheduleResults {
  const zones = new Map(s.zones.map((z) => [z.id, z]));
  const buildups = new Map(s.buildups.map((b) => [b.id, b]));
  const surfaces = s.surfaces.map((row) => surfaceRowResult(s.site, dc, zones.get(row.zone_id), buildups.get(row.buildup_id), row));
  const ductRuns = s.ductRuns.map((row) => ductRunRowResult(s.site, dc, zones.get(row.zone_id), row));
  const totals = s.zones.map((z) => zoneTotalsOf(z, s.surfaces, surfaces, s.ductRuns, ductRuns));
  return { design_case_id: dc.id, surfaces, duct_runs: ductRuns, zones: totals };
}
