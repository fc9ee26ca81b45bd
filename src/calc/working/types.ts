/** A row's working: its derivation in calculation order, as the engine computed it. */
import type { CalcResult } from "../contract";

export interface WorkingLine {
  /** Group heading, in calculation order: "Inputs", "Wind", "Air properties", … */
  section: string;
  label: string;
  /** Symbol as printed, e.g. "Re_L", "h_c". */
  symbol: string;
  value: number | string | boolean | null;
  /** Unit ("" for dimensionless numbers and words). */
  unit: string;
  /** How the value follows: an equation or a remark ("default", "at T_f"). */
  note?: string;
  /** Registry id of the method this line applies. */
  method?: string;
}

export interface MethodUsed {
  id: string;
  title: string;
  equation: string;
  source: string;
  validity: string;
  evaluation: string;
}

export interface LocalHPoint {
  x_m: number;
  h_W_m2K: number;
  regime: "laminar" | "turbulent";
}

export interface WindPoint {
  V_m_s: number;
  h_forced_W_m2K: number;
  h_natural_W_m2K: number;
  h_combined_W_m2K: number;
}

/** One exterior method's outside coefficient and heat flow for the same surface and case. */
export interface MethodSpreadPoint {
  method: "boundary_layer" | "iso6946" | "mcadams";
  h_o_W_m2K: number;
  Q_W: number;
  /** The method the row uses. */
  chosen: boolean;
}

export interface WorkingCharts {
  /** Local forced-convection h along the surface in the direction of the wind. */
  local_h: LocalHPoint[] | null;
  /** Forced, natural and combined h against wind speed at the computed surface temperature. */
  h_vs_wind: WindPoint[] | null;
  /** The row's own point on h_vs_wind. */
  current: { V_m_s: number; h_W_m2K: number } | null;
  /** Schedule rows (surfaces): h_o and Q by each of the three exterior methods; absent elsewhere. */
  method_spread?: MethodSpreadPoint[] | null;
}

export interface Working {
  kind: string;
  result: CalcResult;
  lines: WorkingLine[];
  methods: MethodUsed[];
  charts: WorkingCharts;
}
