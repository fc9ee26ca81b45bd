/**
 * A case's working: the derivation of its result in calculation order, for the checker and the
 * report. `surface` and `duct_run` trace every step of the engine; the single-correlation kinds
 * list their inputs, the correlation and their outputs.
 */
import { calculateCase } from "../calculate";
import { CaseReader } from "../contract";
import { readDuctRun } from "../kinds/index";
import type { SurfaceInput } from "../surface";
import { ductRunWorking } from "./duct-run";
import { LineWriter } from "./lines";
import { surfaceWorking } from "./surface";
import type { Working } from "./types";

export type { Working, WorkingLine, MethodUsed, WorkingCharts, LocalHPoint, WindPoint, MethodSpreadPoint } from "./types";

const NO_CHARTS = { local_h: null, h_vs_wind: null, current: null };

export function working(c: unknown): Working {
  const result = calculateCase(c);
  const raw = (c !== null && typeof c === "object" ? c : {}) as Record<string, unknown>;
  const kind = typeof raw.kind === "string" ? raw.kind : "";
  if (!result.ok) return { kind, result, lines: [], methods: [], charts: NO_CHARTS };
  // The case passed every check above, so it can go to the engine's cores as it is.
  if (kind === "surface") return surfaceWorking(raw as unknown as SurfaceInput, result.id);
  if (kind === "duct_run") return ductRunWorking(readDuctRun(new CaseReader(raw)), result);
  const w = new LineWriter("Inputs");
  for (const [k, v] of Object.entries(raw)) {
    if (k !== "id" && k !== "kind" && (typeof v === "number" || typeof v === "string" || typeof v === "boolean")) w.add(k, k, v);
  }
  w.to("Results");
  for (const [k, v] of Object.entries(result)) {
    if (k === "id" || k === "ok" || k === "warnings" || k === "correlation") continue;
    if (typeof v === "number" || typeof v === "string" || typeof v === "boolean" || v === null) w.add(k, k, v);
  }
  w.use(result.correlation);
  for (const x of result.warnings) if (x.method !== undefined) w.use(x.method);
  return { kind, result, lines: w.lines, methods: w.methods(), charts: NO_CHARTS };
}
