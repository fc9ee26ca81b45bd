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
import { air, warnRanges, type Warnings } from "./kinds/common";
import { cylinderCrossflowCore, cylinderNaturalCore, plateNaturalCore } from "./kinds/external";
import { ductGeometry, ductInternalCore, type DuctSection, type DuctShape } from "./kinds/internal";
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
const TOL_K = 1e-5;

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

/** Outer surface temperature (K) for air at Tair (K) behind the resistance Rin (K·m/W). */
function surfaceTemperature(d: DuctRunInput, o: OuterSection, Tair: number, Rin: number, V: number, x0: number): { Ts: number; converged: boolean } {
  const Ta = d.T_ambient_C + T0;
  const Tsur = d.T_surround_C + T0;
  const next = (Ts: number): number => {
    const c = outsideAt(d, o, Ts, V, null);
    return (Tair / Rin + o.P_o * (c.h_conv * Ta + c.h_rad * Tsur)) / (1 / Rin + o.P_o * (c.h_conv + c.h_rad));
  };
  const s = solveFixedPoint(next, Math.min(Tair, Ta, Tsur), Math.max(Tair, Ta, Tsur), x0, TOL_K);
  return { Ts: s.x, converged: s.converged };
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

/** Evaluates the run at insulation thickness t (m) and wind speed V (m/s). */
export function evaluateDuctRun(d: DuctRunInput, t: number, V: number, warnings: Warnings): DuctRunState {
  const g = ductGeometry(d);
  const o = outerSection(d, t, g.perimeter_m);
  const TE = d.T_entering_C + T0;
  const Ta = d.T_ambient_C + T0;
  const Tsur = d.T_surround_C + T0;
  const mdot = airProperties(TE, d.pressure_Pa).rho_kg_m3 * d.flow_m3_s;
  let Tm = TE;
  let Tso = (TE + Ta) / 2;
  let converged = true;
  let st: Omit<DuctRunState, "Ts_entering_K" | "Ts_leaving_K" | "converged"> | undefined;
  let Rin = 0;
  for (let i = 0; i < 100; i++) {
    const pin = airProperties(Tm, d.pressure_Pa);
    const internal = ductInternalCore(pin, d.shape, g, d.flow_m3_s, d.roughness_m, null);
    Rin = 1 / (internal.h_W_m2K * o.P_i) + o.R_ins;
    const s = surfaceTemperature(d, o, Tm, Rin, V, Tso);
    converged &&= s.converged;
    Tso = s.Ts;
    const c = outsideAt(d, o, Tso, V, null);
    const ho = c.h_conv + c.h_rad;
    const UA = 1 / (Rin + 1 / (ho * o.P_o));
    const Tenv = (c.h_conv * Ta + c.h_rad * Tsur) / ho;
    const cp = pin.cp_J_kgK;
    const TL = leavingAirTemperature(TE, Tenv, UA, d.length_m, mdot, cp);
    st = {
      T_leaving_K: TL,
      Q_W: mdot * cp * (TL - TE),
      UA_per_m: UA,
      h_i: internal.h_W_m2K,
      h_o_conv: c.h_conv,
      h_o_rad: c.h_rad,
      T_env_K: Tenv,
      mdot_kg_s: mdot,
      internal,
    };
    const TmNew = (TE + TL) / 2;
    if (Math.abs(TmNew - Tm) < TOL_K) break;
    Tm = TmNew;
    if (i === 99) converged = false;
  }
  const run = st as NonNullable<typeof st>;
  if (warnings !== null) {
    // Warnings of the state reported: inside flow at the mean temperature, outside at T_so.
    const pin = air(Tm, d.pressure_Pa, warnings, "T_mean_C");
    ductInternalCore(pin, d.shape, g, d.flow_m3_s, d.roughness_m, warnings);
    outsideAt(d, o, Tso, V, warnings);
  }
  const sE = surfaceTemperature(d, o, TE, Rin, V, Tso);
  const sL = surfaceTemperature(d, o, run.T_leaving_K, Rin, V, Tso);
  return {
    ...run,
    Ts_entering_K: sE.Ts,
    Ts_leaving_K: sL.Ts,
    converged: converged && sE.converged && sL.converged,
  };
}

/** True when the colder end of the outer surface is below the dew point plus margin. */
function condenses(st: DuctRunState, TdpK: number, margin: number): boolean {
  return Math.min(st.Ts_entering_K, st.Ts_leaving_K) < TdpK + margin;
}

/**
 * Least insulation thickness, a multiple of 0.1 mm, for which condensation is false in still air;
 * 0 when the bare duct is safe, null when 0.2 m does not avoid it. The surface temperature rises
 * with thickness, so the flag changes once and a bisection over the steps finds it.
 */
export function minInsulationThickness(d: DuctRunInput, TdpK: number): number | null {
  const test = (n: number): boolean => condenses(evaluateDuctRun(d, n * STEP_M, 0, null), TdpK, d.margin_K);
  if (!test(0)) return 0;
  let hiN = Math.round(MAX_INSULATION_M / STEP_M);
  if (test(hiN)) return null;
  let loN = 0;
  while (hiN - loN > 1) {
    const mid = (loN + hiN) >> 1;
    if (test(mid)) loN = mid;
    else hiN = mid;
  }
  return hiN / 10000;
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
  warnRanges(warnings, "dew-point-hyland-wexler", { T_C: d.T_ambient_C });
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
    condensation: condenses(st, TdpK, d.margin_K),
    min_insulation_thickness_m: minInsulationThickness(d, TdpK),
    regime: st.internal.regime,
    correlation: "duct-run-exponential",
    Re: st.internal.Re,
    velocity_m_s: st.internal.velocity_m_s,
    T_env_C: st.T_env_K - T0,
    mass_flow_kg_s: st.mdot_kg_s,
  };
}
