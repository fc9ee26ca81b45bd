/**
 * The computed columns of the two sheets: which engine output, its quantity and how it reads. The
 * grid shows them live (recomputed in the browser) and the export writes them for a chosen case.
 */
import type { CalcResult } from "@/calc/index";
import type { TSheet } from "@/schemas/schedule";
import { toDisplay, unitLabel, type Quantity, type UnitSystem } from "@/units/units";

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
}

export const SURFACE_RESULTS: readonly ResultColumn[] = [
  { key: "V_local_m_s", title: "Local wind", quantity: "speed", digits: 1 },
  { key: "windward", title: "Exposure", flag: ["windward", "leeward"] },
  { key: "h_c_W_m2K", title: "h_c", quantity: "film", digits: 2 },
  { key: "h_r_W_m2K", title: "h_r", quantity: "film", digits: 2 },
  { key: "regime", title: "Regime" },
  { key: "U_W_m2K", title: "U", quantity: "film", digits: 3 },
  { key: "T_surface_C", title: "Surface temperature", quantity: "temperature", digits: 1 },
  { key: "Q_W", title: "Q", quantity: "power", digits: 0, total: true },
];

export const DUCT_RUN_RESULTS: readonly ResultColumn[] = [
  { key: "h_i_W_m2K", title: "h_i", quantity: "film", digits: 1 },
  { key: "h_o_conv_W_m2K", title: "h_o", quantity: "film", digits: 2 },
  { key: "regime", title: "Inside flow" },
  { key: "T_leaving_C", title: "Leaving air", quantity: "temperature", digits: 2 },
  { key: "Q_W", title: "Q", quantity: "power", digits: 0, total: true },
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
export function resultValue(c: ResultColumn, r: CalcResult | undefined, system: UnitSystem): number | string | null {
  if (!r || !r.ok) return null;
  const v = (r as Record<string, unknown>)[c.key];
  if (c.flag) return v === true ? c.flag[0] : v === false ? c.flag[1] : null;
  if (v === null || v === undefined) return c.nullText ?? null;
  if (typeof v !== "number") return String(v);
  return c.quantity ? toDisplay(c.quantity, v, system) : v;
}
