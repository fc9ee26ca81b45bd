/**
 * The computed columns of the two sheets: which engine output, its quantity and how it reads. The
 * grid shows them live (recomputed in the browser) and the export writes them for a chosen case.
 * Besides the row's own result, surface rows carry the schedule's checks (src/calc/schedule/checks):
 * the band of h_o and Q over the three exterior methods and the inside-surface check.
 */
import type { RowResult } from "@/calc/index";
import type { TSheet } from "@/schemas/schedule";
import { formatShown, decimals } from "@/units/format";
import { toDisplay, unitLabel, type Quantity, type UnitSystem } from "@/units/units";

/** What a computed column reads: a row's result with the schedule's checks beside it. */
export type RowOutcome = Pick<RowResult, "result" | "spread" | "inside">;

export interface ResultColumn {
  key: string;
  title: string;
  /** Absent for words and flags. */
  quantity?: Quantity;
  digits?: number;
  /** Flags read as words: [true, false]. */
  flag?: readonly [string, string];
  /** What a null means (e.g. no insulation thickness avoids condensation). */
  nullText?: string;
  /** Summed in the totals row. */
  total?: boolean;
  /** Reads something other than the result's own `key` (SI number, word or flag); absent = result[key]. */
  read?: (r: RowOutcome) => unknown;
  /** A band: least and greatest (SI) over the three exterior methods, shown "min–max". */
  band?: (r: RowOutcome) => readonly [number, number] | undefined;
  /** Grid width in px, where the default does not fit the words. */
  width?: number;
}

/** The method-sensitive flag as it reads: "yes · 23 %" (Q moves more than 10 %) or "no · 4 %". */
export function sensitivityText(r: RowOutcome): string | null {
  const s = r.spread;
  if (s === undefined) return null;
  const pct = s.Q_spread_ratio === null ? "" : ` · ${Math.round(s.Q_spread_ratio * 100)} %`;
  return `${s.sensitive ? "yes" : "no"}${pct}`;
}

/** The inside-surface verdict (ISO 13788): condensation risk implies mould risk, so one word each. */
export function insideRiskText(r: RowOutcome): string | null {
  const i = r.inside;
  if (i === undefined) return null;
  return i.condensation_risk ? "condensation risk" : i.mould_risk ? "mould risk" : "none";
}

export const SURFACE_RESULTS: readonly ResultColumn[] = [
  { key: "V_local_m_s", title: "Local wind", quantity: "speed", digits: 1 },
  { key: "windward", title: "Exposure", flag: ["windward", "leeward"] },
  { key: "h_c_W_m2K", title: "h_c", quantity: "film", digits: 2 },
  { key: "h_r_W_m2K", title: "h_r", quantity: "film", digits: 2 },
  { key: "regime", title: "Regime" },
  { key: "h_o_W_m2K", title: "h_o", quantity: "film", digits: 2 },
  { key: "h_o_band", title: "h_o across methods", quantity: "film", digits: 1, width: 128, band: (r) => (r.spread ? [r.spread.h_o_min_W_m2K, r.spread.h_o_max_W_m2K] : undefined) },
  { key: "U_W_m2K", title: "U", quantity: "film", digits: 3 },
  { key: "T_surface_C", title: "Surface temperature", quantity: "temperature", digits: 1 },
  { key: "Q_band", title: "Q across methods", quantity: "power", digits: 0, width: 128, band: (r) => (r.spread ? [r.spread.Q_min_W, r.spread.Q_max_W] : undefined) },
  { key: "method_sensitive", title: "Method-sensitive (> 10 %)", width: 120, read: sensitivityText },
  { key: "T_si_C", title: "Inside surface T_si", quantity: "temperature", digits: 1, read: (r) => r.inside?.T_si_C },
  { key: "f_Rsi", title: "f_Rsi", digits: 2, width: 80, read: (r) => r.inside?.f_Rsi, nullText: "n/a (ΔT < 1 K)" },
  { key: "f_Rsi_min", title: "f_Rsi,min (mould)", digits: 2, width: 96, read: (r) => r.inside?.f_Rsi_min, nullText: "n/a (ΔT < 1 K)" },
  { key: "inside_risk", title: "Inside surface", width: 136, read: insideRiskText },
  { key: "Q_W", title: "Heat loss", quantity: "power", digits: 0, total: true },
];

export const DUCT_RUN_RESULTS: readonly ResultColumn[] = [
  { key: "h_i_W_m2K", title: "h_i", quantity: "film", digits: 1 },
  { key: "h_o_conv_W_m2K", title: "h_o", quantity: "film", digits: 2 },
  { key: "regime", title: "Inside flow" },
  { key: "T_leaving_C", title: "Leaving air", quantity: "temperature", digits: 2 },
  { key: "Q_W", title: "Heat to the air", quantity: "power", digits: 0, total: true },
  { key: "T_dp_C", title: "Dew point", quantity: "temperature", digits: 1 },
  { key: "condensation", title: "Condensation", flag: ["risk", "none"] },
  { key: "min_insulation_thickness_m", title: "Least insulation", quantity: "thickness", digits: 1, nullText: "none enough" },
];

export const RESULT_COLUMNS: Record<TSheet, readonly ResultColumn[]> = { surfaces: SURFACE_RESULTS, duct_runs: DUCT_RUN_RESULTS };

export function resultHeader(c: ResultColumn, system: UnitSystem): string {
  const unit = c.quantity ? unitLabel(c.quantity, system) : "";
  return unit ? `${c.title} (${unit})` : c.title;
}

/** A result as the person reads it: converted number, word, or null when the row has no result. */
export function resultValue(c: ResultColumn, r: RowOutcome | undefined, system: UnitSystem): number | string | null {
  if (!r || !r.result.ok) return null;
  if (c.band) {
    const b = resultBand(c, r, system);
    if (b === null) return null;
    const d = decimals(c.quantity!, c.digits ?? 1, system);
    // "14.2–18.9"; with a minus sign in the band an en dash misleads, so "−379 to −294".
    return b[0] < 0 ? `${formatShown(b[0], d)} to ${formatShown(b[1], d)}` : `${formatShown(b[0], d)}–${formatShown(b[1], d)}`;
  }
  const v = c.read ? c.read(r) : (r.result as Record<string, unknown>)[c.key];
  if (c.flag) return v === true ? c.flag[0] : v === false ? c.flag[1] : null;
  if (v === null) return c.nullText ?? null;
  if (v === undefined) return null;
  if (typeof v !== "number") return String(v);
  return c.quantity ? toDisplay(c.quantity, v, system) : v;
}

/** A band column's least and greatest value in the person's units; null without a band. */
export function resultBand(c: ResultColumn, r: RowOutcome | undefined, system: UnitSystem): [number, number] | null {
  if (!c.band || !r || !r.result.ok) return null;
  const b = c.band(r);
  if (b === undefined) return null;
  return [toDisplay(c.quantity!, b[0], system), toDisplay(c.quantity!, b[1], system)];
}

/** Why a row has no results, as the notes column says it; null when it has them. */
export function rowProblem(r: RowOutcome | undefined): { text: string; kind: "not_computed" | "error" } | null {
  if (!r || r.result.ok) return null;
  const e = r.result.error;
  if (e.code === "not_computed" && e.field === "exposed_to") return { text: "Not computed: over ground (ISO 13370)", kind: "not_computed" };
  if (e.code === "not_computed") return { text: `Not computed: ${e.message}`, kind: "not_computed" };
  return { text: `error: ${e.message}`, kind: "error" };
}
