/**
 * A stored schedule as the engine reads it. The tables keep the engine's field names, so this is
 * mostly a matter of choosing the site and the design case; the browser and the server both call
 * it, so their results cannot drift apart.
 */
import { scheduleResults, type DesignCase, type Schedule, type ScheduleResults } from "@/calc/index";
import type { TDesignCase, TSchedule } from "@/schemas/schedule";

export function engineSchedule(s: Pick<TSchedule, "project" | "zones" | "buildups" | "surfaces" | "duct_runs">): Schedule {
  const p = s.project;
  return {
    site: { altitude_m: p.altitude_m, terrain: p.terrain, wind_law: p.wind_law, method: p.default_method },
    zones: s.zones,
    buildups: s.buildups,
    surfaces: s.surfaces,
    ductRuns: s.duct_runs,
  };
}

export function engineDesignCase(dc: TDesignCase): DesignCase {
  return { id: dc.id, name: dc.name, kind: dc.kind, T_outdoor_C: dc.T_outdoor_C, RH_outdoor_pct: dc.RH_outdoor_pct, V_met_m_s: dc.V_met_m_s, wind_from_deg: dc.wind_from_deg, solar_W_m2: dc.solar_W_m2, cloud_cover: dc.cloud_cover };
}

/** Every row's results and the zone totals of one design case. */
export function resultsFor(s: TSchedule, dc: TDesignCase): ScheduleResults {
  return scheduleResults(engineSchedule(s), engineDesignCase(dc));
}
