/**
 * The working of a schedule row in a design case. A surface row's working is its `surface` case's
 * working plus what the schedule adds with the zone's air in hand: the same surface by all three
 * exterior methods (the spread of h_o and Q) and the inside-surface check of ISO 13788. A row over
 * ground is not computed. Duct runs are their `duct_run` case's working.
 */
import type { CalcResult } from "../contract";
import { EXTERIOR_METHODS, type ExteriorMethod, type SurfaceInput, type SurfaceResult } from "../surface";
import { ductRunCase, surfaceCase } from "../schedule/cases";
import { insideSurfaceCheck, methodSpread, METHOD_SENSITIVE_MIN_W_M2, METHOD_SENSITIVE_SHARE, MOULD_SURFACE_RH } from "../schedule/checks";
import { OVER_GROUND_MESSAGE, type RowResult } from "../schedule/results";
import type { Buildup, DesignCase, DuctRunRow, Site, SurfaceRow, Zone } from "../schedule/types";
import { working } from "./index";
import type { MethodSpreadPoint, Working, WorkingLine } from "./types";

const METHOD_NAMES: Record<MethodSpreadPoint["method"], string> = { boundary_layer: "boundary layer", iso6946: "ISO 6946", mcadams: "McAdams" };

/** A method's name as the working and the charts print it. */
export const methodName = (m: MethodSpreadPoint["method"]) => METHOD_NAMES[m];

// Short subscripts for people (the registry's method ids stay out of the working's symbols).
const METHOD_SYMBOLS: Record<ExteriorMethod, string> = { boundary_layer: "BL", iso6946: "ISO", mcadams: "McA" };

function line(section: string, label: string, symbol: string, value: WorkingLine["value"], unit = "", note?: string): WorkingLine {
  return note === undefined ? { section, label, symbol, value, unit } : { section, label, symbol, value, unit, note };
}

/**
 * A surface row in a design case: its working, the spread over the three methods and the
 * inside-surface check. `known` takes them from scheduleResults when the caller has them (the
 * report), so the two other methods are not computed a second time.
 */
export function surfaceRowWorking(site: Site, dc: DesignCase, zone: Zone, buildup: Buildup, row: SurfaceRow, known?: Pick<RowResult, "spread" | "inside">): Working {
  if (row.exposed_to === "ground") {
    const result: CalcResult = { id: row.id, ok: false, error: { code: "not_computed", field: "exposed_to", message: OVER_GROUND_MESSAGE } };
    return { kind: "surface", result, lines: [], methods: [], charts: { local_h: null, h_vs_wind: null, current: null, method_spread: null } };
  }
  const c = surfaceCase(site, dc, zone, buildup, row);
  const w = working(c);
  if (!w.result.ok) return w;
  const s = c as SurfaceInput;
  const r = w.result as unknown as SurfaceResult;
  const spread = known?.spread ?? methodSpread(s, r);
  const inside = known?.inside ?? insideSurfaceCheck(r.q_W_m2, c.R_si_m2K_W, c.T_inside_C, zone.RH_inside_pct, c.T_outside_C);

  const lines = [...w.lines];
  const S = "Spread between methods";
  for (const m of EXTERIOR_METHODS) {
    const b = spread.by_method[m];
    const chosen = m === s.method ? " (chosen)" : "";
    lines.push(line(S, `Outside coefficient, ${METHOD_NAMES[m]}${chosen}`, `h_o,${METHOD_SYMBOLS[m]}`, b.h_o_W_m2K, "W/m²K"));
    lines.push(line(S, `Heat flow, ${METHOD_NAMES[m]}${chosen}`, `Q_${METHOD_SYMBOLS[m]}`, b.Q_W, "W"));
  }
  lines.push(
    line(S, "Spread of Q over the chosen Q", "ΔQ/|Q|", spread.Q_spread_ratio, "", "(Q_max − Q_min)/|Q|; null when Q is 0"),
    line(S, "Method-sensitive", "sensitive", spread.sensitive, "", `the method choice moves Q by more than ${METHOD_SENSITIVE_SHARE * 100} % and ${METHOD_SENSITIVE_MIN_W_M2} W/m²`),
  );
  const I = "Inside surface";
  lines.push(
    line(I, "Zone air relative humidity", "RH_i", zone.RH_inside_pct, "%"),
    line(I, "Inside surface temperature", "T_si", inside.T_si_C, "°C", "T_in − q R_si"),
    line(I, "Dew point of the zone air", "T_dp,i", inside.T_dp_inside_C, "°C", "Hyland & Wexler"),
    line(I, "Least surface temperature against mould", "T_si,min", inside.T_si_min_C, "°C", `surface RH ${MOULD_SURFACE_RH * 100} % (ISO 13788)`),
    line(I, "Temperature factor", "f_Rsi", inside.f_Rsi, "", "(T_si − T_out)/(T_in − T_out); null unless the inside is 1 K or more warmer"),
    line(I, "Temperature factor needed", "f_Rsi,min", inside.f_Rsi_min, "", "(T_si,min − T_out)/(T_in − T_out)"),
    line(I, "Surface condensation risk", "condensation", inside.condensation_risk, "", "T_si < T_dp,i"),
    line(I, "Mould risk", "mould", inside.mould_risk, "", "T_si < T_si,min (f_Rsi < f_Rsi,min)"),
    line(I, "Verdict", "inside", insideVerdict(inside), ""),
  );
  const points: MethodSpreadPoint[] = EXTERIOR_METHODS.map((m) => ({ method: m, h_o_W_m2K: spread.by_method[m].h_o_W_m2K, Q_W: spread.by_method[m].Q_W, chosen: m === s.method }));
  return { ...w, lines, charts: { ...w.charts, method_spread: points } };
}

/** The inside-surface verdict in words. */
export function insideVerdict(i: { condensation_risk: boolean; mould_risk: boolean }): string {
  if (i.condensation_risk) return "condensation risk: water condenses on the inside face (and mould can grow)";
  if (i.mould_risk) return "mould risk: surface relative humidity at or above 80 %";
  return "no inside-surface risk: the face stays above the mould limit";
}

/** A duct run in a design case: its `duct_run` case's working. */
export function ductRunRowWorking(site: Site, dc: DesignCase, zone: Zone, row: DuctRunRow): Working {
  return working(ductRunCase(site, dc, zone, row));
}
