/**
 * One duct run for one design case: inside film, insulation, outside convection (natural, wind or
 * both) and radiation give UA per metre; the leaving air temperature follows the exponential law
 * T_L = T_env + (T_E − T_env) exp(−UA L/(ṁ c_p)); the outer surface temperature at both ends is
 * checked against the ambient dew point, and the least insulation that keeps it above is searched.
 */
import { T0 } from "./constants";
import { nuCombinedChurchill } from "./convection/combined";
import { insulationResistanceRect, insulationResistanceRound, leavingAirTemperature } from "./convection/duct-heat";
import { airProperties } from "./properties/air";
import { dewPointHylandWexler } from "./psychrometrics/dew-point";
import { hRadiation } from "./radiation/radiation";
import { air, warnRange, type Warnings } from "./kinds/common";
import { cylinderCrossflowCore, cylinderNaturalCore, plateNaturalCore } from "./kinds/external";
import { ductGeometry, ductInternalCore, type DuctInternal, type DuctSection, type DuctShape } from "./kinds/internal";
import { solveFixedPoint } from "./solve";
import { addWarning } from "./validity";

export interface DuctRunInput extends DuctSection {
  shape: DuctShape;
  length_m: number;
  flow_m3_s: number;
  T_entering_C: number;
  T_ambient_C: number;
  RH_ambient_pct: number;
  T_surround_C: number;
  insulation_thickness_m: number;
  insulation_k_W_mK: number;
  jacket_emissivity: number;
  location: "indoor" | "outdoor";
  V_wind_m_s: number;
  margin_K: number;
  roughness_m: number;
  pressure_Pa: number;
}

/** Thickest insulation the minimum-thickness search tries, m, and its step (0.1 mm). */
export const MAX_INSULATION_M = 0.2;
const STEP_M = 1e-4;
const TOL_K = 1e-4;

interface OuterSection {
  P_i: number;
  P_o: number;
  R_ins: number;
  /** Round: outer diameter; rect: outer width and height. */
  D_o: number;
  W_o: number;
  H_o: number;
}

function outerSection(d: DuctRunInput, t: number, P_i: number): OuterSection {
  if (d.shape === "round") {
    const Di = d.diameter_m as number;
    const Do = Di + 2 * t;
    const R_ins = insulationResistanceRound(Di, Do, d.insulation_k_W_mK);
    return { P_i, P_o: Math.PI * Do, R_ins, D_o: Do, W_o: 0, H_o: 0 };
  }
  const Wo = (d.width_m as number) + 2 * t;
  const Ho = (d.height_m as number) + 2 * t;
  const P_o = 2 * (Wo + Ho);
  const R_ins = insulationResistanceRect(t, P_i, P_o, d.insulation_k_W_mK);
  return { P_i, P_o, R_ins, D_o: 0, W_o: Wo, H_o: Ho };
}

interface Outside {
  h_conv: number;
  h_rad: number;
}

/** Outside convection and radiation at outer surface temperature Tso (K). */
function outsideAt(d: DuctRunInput, o: OuterSection, Tso: number, V: number, warnings: Warnings): Outside {
  const Ta = d.T_ambient_C + T0;
  const props = warnings === null ? airProperties((Tso + Ta) / 2, d.pressure_Pa) : air((Tso + Ta) / 2, d.pressure_Pa, warnings, "T_film_C");
  let h: number;
  if (d.shape === "round") {
    const hn = cylinderNaturalCore(props, Tso - Ta, o.D_o, warnings).h_W_m2K;
    h = V > 0 ? nuCombinedChurchill(cylinderCrossflowCore(props, V, o.D_o, warnings).h_W_m2K, hn, 4) : hn;
  } else {
    // Vertical sides on the outer height; top and bottom as horizontal plates on half the width.
    const side = plateNaturalCore(props, Tso, Ta, 90, o.H_o, warnings).h_W_m2K;
    const top = plateNaturalCore(props, Tso, Ta, 0, o.W_o / 2, warnings).h_W_m2K;
    const bottom = plateNaturalCore(props, Tso, Ta, 180, o.W_o / 2, warnings).h_W_m2K;
    const hn = (2 * o.H_o * side + o.W_o * (top + bottom)) / (2 * (o.H_o + o.W_o));
    // Wind across the duct on the equivalent diameter P_o/π; same length and k, so h combines as Nu.
    h = V > 0 ? nuCombinedChurchill(cylinderCrossflowCore(props, V, o.P_o / Math.PI, warnings).h_W_m2K, hn, 3) : hn;
  }
  return { h_conv: h, h_rad: hRadiation(Tso, d.T_surround_C + T0, d.jacket_emissivity) };
}

/**
 * Outer surface temperature (K) for air at Tair (K) behind the resistance Rin (K·m/W), with the
 * outside coefficients of the last evaluation (the returned T_s solves the balance with them).
 */
function surfaceTemperature(
  d: DuctRunInput,
  o: OuterSection,
  Tair: number,
  Rin: number,
  V: number,
  x0: number,
): { Ts: number; converged: boolean; c: Outside } {
  const Ta = d.T_ambient_C + T0;
  const Tsur = d.T_surround_C + T0;
  let c: Outside = { h_conv: 0, h_rad: 0 };
  const next = (Ts: number): number => {
    c = outsideAt(d, o, Ts, V, null);
    return (Tair / Rin + o.P_o * (c.h_conv * Ta + c.h_rad * Tsur)) / (1 / Rin + o.P_o * (c.h_conv + c.h_rad));
  };
  const s = solveFixedPoint(next, Math.min(Tair, Ta, Tsur), Math.max(Tair, Ta, Tsur), x0, TOL_K);
  return { Ts: s.x, converged: s.converged, c };
}

export interface DuctRunState {
  T_leaving_K: number;
  Q_W: number;
  UA_per_m: number;
  h_i: number;
  h_o_conv: number;
  h_o_rad: number;
  Ts_entering_K: number;
  Ts_leaving_K: number;
  T_env_K: number;
  mdot_kg_s: number;
  internal: ReturnType<typeof ductInternalCore>;
  converged: boolean;
}

/**
 * Evaluates the run at insulation thickness t (m) and wind speed V (m/s). With `bothEnds` false
 * only the end with the colder air gets its surface temperature (the other is NaN): that end has
 * the colder surface, which is all the condensation search needs.
 */
export function evaluateDuctRun(d: DuctRunInput, t: number, V: number, warnings: Warnings, bothEnds = true): DuctRunState {
  const g = ductGeometry(d);
  const o = outerSection(d, t, g.perimeter_m);
  const TE = d.T_entering_C + T0;
  const Ta = d.T_ambient_C + T0;
  const Tsur = d.T_surround_C + T0;
  const mdot = airProperties(TE, d.pressure_Pa).rho_kg_m3 * d.flow_m3_s;
  // Coefficients at the mean air temperature, which depends on the leaving temperature, and
  // outside coefficients at the outer surface temperature: one joint fixed-point iteration on
  // (T_mean, T_so), with secant steps on T_so kept inside the temperatures of the problem.
  const lo = Math.min(TE, Ta, Tsur);
  const hi = Math.max(TE, Ta, Tsur);
  let Tm = TE;
  let Rin = 1 / (ductInternalCore(airProperties(TE, d.pressure_Pa), d.shape, g, d.flow_m3_s, d.roughness_m, null, false).h_W_m2K * o.P_i) + o.R_ins;
  const h0 = 8 + 4 * V; // a typical still-air or windy outside coefficient, for the first guess only
  let Tso = (Tm / Rin + o.P_o * h0 * Ta) / (1 / Rin + o.P_o * h0);
  let converged = false;
  let internal: DuctInternal | undefined;
  let c: Outside = { h_conv: 0, h_rad: 0 };
  let UA = 0;
  let TL = TE;
  let Tenv = Ta;
  let cp = 0;
  let prevX = NaN;
  let prevG = NaN;
  for (let i = 0; i < 200; i++) {
    const pin = airProperties(Tm, d.pressure_Pa);
    internal = ductInternalCore(pin, d.shape, g, d.flow_m3_s, d.roughness_m, null, false);
    Rin = 1 / (internal.h_W_m2K * o.P_i) + o.R_ins;
    c = outsideAt(d, o, Tso, V, null);
    const ho = c.h_conv + c.h_rad;
    const TsoNew = (Tm / Rin + o.P_o * (c.h_conv * Ta + c.h_rad * Tsur)) / (1 / Rin + o.P_o * ho);
    UA = 1 / (Rin + 1 / (ho * o.P_o));
    Tenv = (c.h_conv * Ta + c.h_rad * Tsur) / ho;
    cp = pin.cp_J_kgK;
    TL = leavingAirTemperature(TE, Tenv, UA, d.length_m, mdot, cp);
    const TmNew = (TE + TL) / 2;
    const gap = TsoNew - Tso;
    if (Math.abs(gap) < TOL_K && Math.abs(TmNew - Tm) < TOL_K) {
      converged = true;
      Tso = TsoNew;
      break;
    }
    let x = TsoNew;
    if (prevG === prevG && gap !== prevG) {
      const sec = Tso - (gap * (Tso - prevX)) / (gap - prevG);
      if (sec > lo && sec < hi) x = sec;
    }
    prevX = Tso;
    prevG = gap;
    Tso = x;
    Tm = TmNew;
  }
  if (warnings !== null) {
    // Warnings of the state reported: inside flow at the mean temperature, outside at T_so.
    const pin = air(Tm, d.pressure_Pa, warnings, "T_mean_C");
    internal = ductInternalCore(pin, d.shape, g, d.flow_m3_s, d.roughness_m, warnings);
    outsideAt(d, o, Tso, V, warnings);
  }
  let TsE = NaN;
  let TsL = NaN;
  // First guess at an end: the mean surface temperature moved by the share of the outside film.
  const Rout = 1 / ((c.h_conv + c.h_rad) * o.P_o);
  const shift = Rout / (Rin + Rout);
  if (bothEnds || TE <= TL) {
    const sE = surfaceTemperature(d, o, TE, Rin, V, Tso + (TE - Tm) * shift);
    TsE = sE.Ts;
    converged &&= sE.converged;
  }
  if (bothEnds || TL < TE) {
    const sL = surfaceTemperature(d, o, TL, Rin, V, Tso + (TL - Tm) * shift);
    TsL = sL.Ts;
    converged &&= sL.converged;
  }
  return {
    T_leaving_K: TL,
    Q_W: mdot * cp * (TL - TE),
    UA_per_m: UA,
    h_i: (internal as DuctInternal).h_W_m2K,
    h_o_conv: c.h_conv,
    h_o_rad: c.h_rad,
    Ts_entering_K: TsE,
    Ts_leaving_K: TsL,
    T_env_K: Tenv,
    mdot_kg_s: mdot,
    internal: internal as DuctInternal,
    converged,
  };
}

/** The colder of the two end surface temperatures, K (NaN ends are skipped). */
function coldestSurface(st: DuctRunState): number {
  if (st.Ts_entering_K !== st.Ts_entering_K) return st.Ts_leaving_K;
  if (st.Ts_leaving_K !== st.Ts_leaving_K) return st.Ts_entering_K;
  return Math.min(st.Ts_entering_K, st.Ts_leaving_K);
}

/**
 * Least insulation thickness, a multiple of 0.1 mm, for which condensation is false in still air;
 * 0 when the bare duct is safe, null when 0.2 m does not avoid it. The colder surface warms as
 * insulation is added, so the flag changes once along the steps: the search keeps a bracket of
 * steps [condensing, safe] and narrows it by the Illinois variant of regula falsi on the margin
 * (surface temperature − dew point − margin), which ends on neighbouring steps.
 */
export function minInsulationThickness(d: DuctRunInput, TdpK: number): number | null {
  const limit = TdpK + d.margin_K;
  const margins = new Map<number, number>();
  const margin = (n: number): number => {
    let m = margins.get(n);
    if (m === undefined) {
      m = coldestSurface(evaluateDuctRun(d, n * STEP_M, 0, null, false)) - limit;
      margins.set(n, m);
    }
    return m;
  };
  if (margin(0) >= 0) return 0;
  const nMax = Math.round(MAX_INSULATION_M / STEP_M);
  // A first estimate from the resistances with the outside coefficients at the limiting surface
  // temperature; the exact evaluations then settle the step, starting next to the estimate.
  const est = estimateSteps(d, limit, nMax);
  let nLo = 0;
  let gLo = margin(0);
  let nHi = nMax;
  let gHi = NaN;
  for (const n of [est, est - 1]) {
    if (n <= nLo || n >= nHi) continue;
    const g = margin(n);
    if (g < 0) {
      nLo = n;
      gLo = g;
    } else {
      nHi = n;
      gHi = g;
    }
  }
  if (gHi !== gHi) {
    gHi = margin(nMax);
    if (gHi < 0) return null;
  }
  let side = 0;
  while (nHi - nLo > 1) {
    const x = nLo + ((nHi - nLo) * gLo) / (gLo - gHi);
    const n = Math.min(nHi - 1, Math.max(nLo + 1, Math.round(x)));
    const gn = margin(n);
    if (gn < 0) {
      nLo = n;
      gLo = gn;
      if (side === -1) gHi /= 2;
      side = -1;
    } else {
      nHi = n;
      gHi = gn;
      if (side === 1) gLo /= 2;
      side = 1;
    }
  }
  return nHi / 10000;
}

/**
 * Estimated number of insulation steps for which the surface at the colder end (air at the entering
 * temperature, still air) sits at `limit`: a bisection on the thickness with the inside film of
 * the bare duct and the outside coefficients at the limit temperature held fixed.
 */
function estimateSteps(d: DuctRunInput, limit: number, nMax: number): number {
  const g = ductGeometry(d);
  const TE = d.T_entering_C + T0;
  const Ta = d.T_ambient_C + T0;
  const Tsur = d.T_surround_C + T0;
  const hi = ductInternalCore(airProperties(TE, d.pressure_Pa), d.shape, g, d.flow_m3_s, d.roughness_m, null, false).h_W_m2K;
  const Ri = 1 / (hi * g.perimeter_m);
  let lo = 0;
  let up = nMax;
  const o0 = outerSection(d, 0, g.perimeter_m);
  const c = outsideAt(d, o0, limit, 0, null);
  const ho = c.h_conv + c.h_rad;
  const Tenv = (c.h_conv * Ta + c.h_rad * Tsur) / ho;
  const Tair = Math.min(TE, Tenv);
  while (up - lo > 1) {
    const mid = (lo + up) >> 1;
    const o = outerSection(d, mid * STEP_M, g.perimeter_m);
    const Rout = 1 / (ho * o.P_o);
    const Ts = Tenv - ((Tenv - Tair) * Rout) / (Ri + o.R_ins + Rout);
    if (Ts < limit) lo = mid;
    else up = mid;
  }
  return up;
}

export interface DuctRunResult {
  T_leaving_C: number;
  Q_W: number;
  UA_per_m_W_mK: number;
  h_i_W_m2K: number;
  h_o_conv_W_m2K: number;
  h_o_rad_W_m2K: number;
  T_surface_entering_C: number;
  T_surface_leaving_C: number;
  T_dp_C: number;
  condensation: boolean;
  min_insulation_thickness_m: number | null;
  regime: string;
  correlation: string;
  Re: number;
  velocity_m_s: number;
  T_env_C: number;
  mass_flow_kg_s: number;
}

export function ductRunCore(d: DuctRunInput, warnings: Warnings): DuctRunResult {
  const st = evaluateDuctRun(d, d.insulation_thickness_m, d.V_wind_m_s, warnings);
  if (!st.converged) addWarning(warnings, "not_converged", "the duct-run balance did not converge");
  warnRange(warnings, "dew-point-hyland-wexler", "T_C", d.T_ambient_C);
  const Tdp = dewPointHylandWexler(d.T_ambient_C, d.RH_ambient_pct);
  const TdpK = Tdp + T0;
  return {
    T_leaving_C: st.T_leaving_K - T0,
    Q_W: st.Q_W,
    UA_per_m_W_mK: st.UA_per_m,
    h_i_W_m2K: st.h_i,
    h_o_conv_W_m2K: st.h_o_conv,
    h_o_rad_W_m2K: st.h_o_rad,
    T_surface_entering_C: st.Ts_entering_K - T0,
    T_surface_leaving_C: st.Ts_leaving_K - T0,
    T_dp_C: Tdp,
    condensation: coldestSurface(st) < TdpK + d.margin_K,
    min_insulation_thickness_m: minInsulationThickness(d, TdpK),
    regime: st.internal.regime,
    correlation: "duct-run-exponential",
    Re: st.internal.Re,
    velocity_m_s: st.internal.velocity_m_s,
    T_env_C: st.T_env_K - T0,
    mass_flow_kg_s: st.mdot_kg_s,
  };
}
