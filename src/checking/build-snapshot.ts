/**
 * Freezes a schedule into a revision snapshot: the inputs as stored, the engine's results for
 * every design case (so a revision shows what was issued even if the engine later improves), and
 * the check states and comments of its rows.
 */
import { scheduleResults, type ExteriorMethod, type Schedule, type Terrain, type WindLaw } from "@/calc/index";
import type { RevisionSnapshot } from "./snapshot";

type Inputs = Omit<RevisionSnapshot, "format" | "results">;

/** The engine's view of a snapshot's (or a live schedule's) inputs. */
export function snapshotSchedule(s: Pick<RevisionSnapshot, "project" | "zones" | "buildups" | "surfaces" | "duct_runs">): Schedule {
  const p = s.project;
  return {
    site: { altitude_m: p.altitude_m, terrain: p.terrain as Terrain, wind_law: p.wind_law as WindLaw, method: p.default_method as ExteriorMethod },
    zones: s.zones,
    buildups: s.buildups,
    surfaces: s.surfaces,
    ductRuns: s.duct_runs,
  };
}

export function buildSnapshot(inputs: Inputs): RevisionSnapshot {
  const schedule = snapshotSchedule(inputs);
  return { format: 1, ...inputs, results: inputs.design_cases.map((dc) => scheduleResults(schedule, dc)) };
}
