/**
 * A whole schedule for one design case: every surface and duct run through the engine, and the
 * zone totals. The same function serves the browser (instant recalculation) and the server
 * (authoritative results).
 */
import type { CalcResult } from "../contract";
import { calculateCase } from "../calculate";
import { zoneTotals, type ZoneTotals } from "../zone";
import { ductRunCase, surfaceCase } from "./cases";
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
}

export interface ScheduleResults {
  design_case_id: string;
  surfaces: RowResult[];
  duct_runs: RowResult[];
  zones: ({ zone_id: string; name: string; floor_area_m2: number } & ZoneTotals)[];
}

function missing(row_id: string, field: string, message: string): RowResult {
  return { row_id, result: { id: row_id, ok: false, error: { code: "invalid_input", field, message } } };
}

export function scheduleResults(s: Schedule, dc: DesignCase): ScheduleResults {
  const zones = new Map(s.zones.map((z) => [z.id, z]));
  const buildups = new Map(s.buildups.map((b) => [b.id, b]));
  const surfaces = s.surfaces.map((row): RowResult => {
    const zone = zones.get(row.zone_id);
    const buildup = buildups.get(row.buildup_id);
    if (zone === undefined) return missing(row.id, "zone_id", `zone ${row.zone_id} is not in this project`);
    if (buildup === undefined) return missing(row.id, "buildup_id", `build-up ${row.buildup_id} is not in this project`);
    return { row_id: row.id, result: calculateCase(surfaceCase(s.site, dc, zone, buildup, row)) };
  });
  const ductRuns = s.ductRuns.map((row): RowResult => {
    const zone = zones.get(row.zone_id);
    if (zone === undefined) return missing(row.id, "zone_id", `zone ${row.zone_id} is not in this project`);
    return { row_id: row.id, result: calculateCase(ductRunCase(s.site, dc, zone, row)) };
  });
  const totals = s.zones.map((z) => {
    const rows: { source: "surface" | "duct_run"; Q_W: number }[] = [];
    s.surfaces.forEach((row, i) => {
      const r = surfaces[i].result;
      if (row.zone_id === z.id && r.ok) rows.push({ source: "surface", Q_W: r.Q_W as number });
    });
    s.ductRuns.forEach((row, i) => {
      const r = ductRuns[i].result;
      if (row.zone_id === z.id && r.ok) rows.push({ source: "duct_run", Q_W: r.Q_W as number });
    });
    return { zone_id: z.id, name: z.name, floor_area_m2: z.floor_area_m2, ...zoneTotals(rows, z.floor_area_m2) };
  });
  return { design_case_id: dc.id, surfaces, duct_runs: ductRuns, zones: totals };
}
