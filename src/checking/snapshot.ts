/**
 * What an issued revision holds, frozen as JSON: every input of the schedule, the engine's results
 * for every design case, each row's check state and comment thread. Format 1; a later format
 * must still read these (issued revisions are never rewritten).
 */
import type { Buildup, DesignCase, DuctRunRow, ScheduleResults, SurfaceRow, Zone } from "@/calc/index";
import type { TCheckSheet, TCheckState } from "./check-machine";

export interface SnapshotProject {
  id: string;
  name: string;
  reference: string;
  altitude_m: number;
  terrain: string;
  wind_law: string;
  unit_system: string;
  default_method: string;
}

type Versioned = { version: number };

export interface SnapshotCheck {
  sheet: TCheckSheet;
  row_id: string;
  state: TCheckState;
  checked_by_name: string | null;
  checked_at: string | null;
}

export interface SnapshotComment {
  sheet: TCheckSheet;
  row_id: string;
  author_name: string;
  kind: string;
  body: string;
  created_at: string;
}

export interface RevisionSnapshot {
  format: 1;
  project: SnapshotProject;
  design_cases: (DesignCase & Versioned)[];
  zones: (Zone & Versioned)[];
  buildups: (Buildup & Versioned)[];
  surfaces: (SurfaceRow & Versioned & { position: number })[];
  duct_runs: (DuctRunRow & Versioned & { position: number })[];
  /** One entry per design case, in the order of design_cases. */
  results: ScheduleResults[];
  checks: SnapshotCheck[];
  comments: SnapshotComment[];
  /** Who last edited the rows issued (the report's authors); absent in the first revisions made. */
  authors?: string[];
}

/**
 * Inputs added after revisions were first issued, with the value their absence means (the engine
 * reads an absent key the same way). A revision is never rewritten; readers fill these in so a
 * revision issued before a field existed shows, compares and reports as what it meant.
 */
export const LATER_INPUT_DEFAULTS = {
  design_cases: { cloud_cover: 0 },
  surfaces: { exposed_to: "outside_air" },
  duct_runs: { T_surround_cooling_C: null, in_served_zone: false, jacket_absorptance: null },
} as const;

const filled = <T extends object>(rows: readonly T[], defaults: Record<string, unknown>): T[] =>
  rows.map((r) => {
    const missing = Object.keys(defaults).filter((k) => !(k in r));
    return missing.length === 0 ? r : ({ ...Object.fromEntries(missing.map((k) => [k, defaults[k]])), ...r } as T);
  });

/** A stored snapshot with every later input present (absent keys take their defaults). */
export function withInputDefaults(s: RevisionSnapshot): RevisionSnapshot {
  return {
    ...s,
    design_cases: filled(s.design_cases, LATER_INPUT_DEFAULTS.design_cases),
    surfaces: filled(s.surfaces, LATER_INPUT_DEFAULTS.surfaces),
    duct_runs: filled(s.duct_runs, LATER_INPUT_DEFAULTS.duct_runs),
  };
}
