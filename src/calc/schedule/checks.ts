/**
 * Checks a schedule adds to each surface row in a design case: the inside-surface temperature
 * with ISO 13788's temperature factor (surface condensation and mould), and the spread of the
 * outside coefficient and heat flow over the three exterior methods.
 */
import { dewPointHylandWexler } from "../psychrometrics/dew-point";
import { EXTERIOR_METHODS, surfaceCore, type ExteriorMethod, type SurfaceInput, type SurfaceResult } from "../surface";

/** Surface relative humidity above which mould can grow (ISO 13788:2012, §5: 0.8). */
export const MOULD_SURFACE_RH = 0.8;
/**
 * Inside-over-outside difference below which f_Rsi is not stated, K: it divides by T_i − T_e, and
 * ISO 13788's factor describes a face cooled from outside, not a cooling case.
 */
const MIN_DT_FOR_FACTOR_K = 1;

export interface InsideSurfaceCheck {
  /** Inside surface temperature, °C: T_i − q·R_si. */
  T_si_C: number;
  /** Dew point of the zone air, °C. */
  T_dp_inside_C: number;
  /** Lowest inside surface temperature that keeps the surface below 80 % RH, °C. */
  T_si_min_C: number;
  /** ISO 13788 temperature factor (T_si − T_e)/(T_i − T_e); null unless the inside is 1 K or more warmer. */
  f_Rsi: number | null;
  /** The factor the surface needs against mould, (T_si,min − T_e)/(T_i − T_e); null likewise. */
  f_Rsi_min: number | null;
  /** T_si below the zone air's dew point: water condenses on the inside face. */
  condensation_risk: boolean;
  /** Surface RH at or above 80 %: mould can grow (ISO 13788). */
  mould_risk: boolean;
}

/**
 * Inside-surface check of a surface in a design case (ISO 13788:2012, §5, steady state with the
 * design case standing in for the month): T_si = T_i − q R_si; the zone air's vapour pressure at
 * T_i and RH_i; condensation when T_si < T_dp; mould when the surface RH p_v/p_sat(T_si) ≥ 0.8,
 * i.e. T_si < T_si,min where p_sat(T_si,min) = p_v/0.8; f_Rsi against f_Rsi,min.
 * @param q_W_m2 heat flow density through the surface, W/m², positive outward
 * @param R_si inside surface resistance, m²K/W
 * @param T_i inside air temperature, °C; @param RH_i its relative humidity, %
 * @param T_e outside air temperature, °C
 * @see ISO 13788:2012, Hygrothermal performance of building components — Internal surface
 *   temperature to avoid critical surface humidity and interstitial condensation, §5 and annex A.
 */
export function insideSurfaceCheck(q_W_m2: number, R_si: number, T_i: number, RH_i: number, T_e: number): InsideSurfaceCheck {
  const T_si = T_i - q_W_m2 * R_si;
  const T_dp = dewPointHylandWexler(T_i, RH_i);
  // p_sat(T_si,min) = p_v/0.8 = (RH_i/0.8)% of p_sat(T_i): the dew point of that vapour pressure.
  const T_min = dewPointHylandWexler(T_i, RH_i / MOULD_SURFACE_RH);
  const dT = T_i - T_e;
  const factor = dT >= MIN_DT_FOR_FACTOR_K;
  return {
    T_si_C: T_si,
    T_dp_inside_C: T_dp,
    T_si_min_C: T_min,
    f_Rsi: factor ? (T_si - T_e) / dT : null,
    f_Rsi_min: factor ? (T_min - T_e) / dT : null,
    condensation_risk: T_si < T_dp,
    mould_risk: T_si < T_min,
  };
}

/** Share of a row's heat flow the method choice may move before the row is method-sensitive. */
export const METHOD_SENSITIVE_SHARE = 0.1;
/**
 * Least spread of heat flow density, W/m², that makes a row method-sensitive: below it the
 * difference between methods is smaller than the uncertainty of the U-value itself (common
 * practice), however large a share of a small net flow it is (a summer wall whose sun and sky
 * nearly cancel its U·ΔT).
 */
export const METHOD_SENSITIVE_MIN_W_M2 = 1;

export interface MethodSpread {
  /** h_o and Q by exterior method. */
  by_method: Record<ExteriorMethod, { h_o_W_m2K: number; Q_W: number }>;
  h_o_min_W_m2K: number;
  h_o_max_W_m2K: number;
  Q_min_W: number;
  Q_max_W: number;
  /** (Q_max − Q_min)/|Q| of the chosen method; null when that Q is 0. */
  Q_spread_ratio: number | null;
  /** The method choice moves Q by more than 10 % of the chosen method's Q, and by more than 1 W/m². */
  sensitive: boolean;
}

/**
 * The same surface by all three exterior methods (boundary layer, ISO 6946, McAdams), with the
 * chosen method's result passed in so it is not computed twice: the band of h_o and Q, and whether
 * the choice of method moves Q by more than 10 % (a method-sensitive row).
 */
export function methodSpread(s: SurfaceInput, chosen: SurfaceResult): MethodSpread {
  const by = {} as MethodSpread["by_method"];
  let hMin = Infinity;
  let hMax = -Infinity;
  let qMin = Infinity;
  let qMax = -Infinity;
  for (const m of EXTERIOR_METHODS) {
    const r = m === s.method ? chosen : surfaceCore({ ...s, method: m }, []);
    by[m] = { h_o_W_m2K: r.h_o_W_m2K, Q_W: r.Q_W };
    if (r.h_o_W_m2K < hMin) hMin = r.h_o_W_m2K;
    if (r.h_o_W_m2K > hMax) hMax = r.h_o_W_m2K;
    if (r.Q_W < qMin) qMin = r.Q_W;
    if (r.Q_W > qMax) qMax = r.Q_W;
  }
  const Q = Math.abs(chosen.Q_W);
  const ratio = Q > 0 ? (qMax - qMin) / Q : null;
  return {
    by_method: by,
    h_o_min_W_m2K: hMin,
    h_o_max_W_m2K: hMax,
    Q_min_W: qMin,
    Q_max_W: qMax,
    Q_spread_ratio: ratio,
    sensitive: (ratio === null || ratio > METHOD_SENSITIVE_SHARE) && s.area_m2 > 0 && (qMax - qMin) / s.area_m2 > METHOD_SENSITIVE_MIN_W_M2,
  };
}
