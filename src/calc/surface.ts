/**
 * One external surface for one design case: wind at the surface, exterior convection by the
 * chosen method, long-wave radiation to sky and ground, and the outside-face energy balance
 * (T_inside − T_s)/(R_si + R) + α·G = h_c (T_s − T_out) + h_r (T_s − T_r), solved for T_s.
 */
import { SIGMA, T0 } from "./constants";
import { airProperties, airPropertiesOf, newAirProperties, type AirProperties } from "./properties/air";
import { hcIso6946, hcMcAdams } from "./convection/empirical";
import { hRadiation, radiantTemperature, skyTemperatureCloudy, skyViewFactor } from "./radiation/radiation";
import { warnAir } from "./kinds/common";
import { warnPlateCombined } from "./kinds/external";
import { regimeFromRichardson } from "./convection/combined";
import type { CalcWarning } from "./contract";
import { newPlateCombinedInputs, newPlateCombinedState, plateCombinedAt, type PlateCombinedState } from "./select";
import { windSpeedAt } from "./kinds/wind";
import type { Terrain } from "./wind/wind-profile";
import { exposureWeight } from "./wind/wind-profile";
import { addWarning, checkRange } from "./validity";
import { METHOD_BY_ID } from "./registry";

export type ExteriorMethod = "boundary_layer" | "iso6946" | "mcadams";
export const EXTERIOR_METHODS: readonly ExteriorMethod[] = ["boundary_layer", "iso6946", "mcadams"];

/** Inputs of the `surface` kind, already checked; optional ones take the contract's defaults. */
export interface SurfaceInput {
  area_m2: number;
  tilt_deg: number;
  azimuth_deg: number;
  height_m: number;
  length_m: number;
  panel_height_m: number;
  R_construction_m2K_W: number;
  /** Default 0.13 m²K/W. */
  R_si_m2K_W?: number;
  T_inside_C: number;
  T_outside_C: number;
  V_met_m_s: number;
  wind_from_deg: number;
  terrain: Terrain;
  /** Default "power". */
  law?: "power" | "log";
  /** Default 10 m. */
  met_height_m?: number;
  emissivity: number;
  absorptance: number;
  /** Default 0 W/m². */
  solar_W_m2?: number;
  method: ExteriorMethod;
  /** Default 0.25. */
  leeward_factor?: number;
  /** v2. Critical Reynolds number of the boundary-layer method; default 0 (turbulent from the leading edge). */
  Re_crit?: number;
  /** v2. Cloud cover, fraction 0 (clear, the default) … 1 (overcast). */
  cloud_cover?: number;
  /** Default 101 325 Pa. */
  pressure_Pa?: number;
}

export const SURFACE_DEFAULTS = {
  R_si_m2K_W: 0.13,
  law: "power",
  met_height_m: 10,
  solar_W_m2: 0,
  leeward_factor: 0.25,
  Re_crit: 0,
  cloud_cover: 0,
  pressure_Pa: 101325,
} as const;

/** The `surface` result of the contract, envelope included (built once, in its final shape). */
export type SurfaceResult = {
  id: string | null;
  ok: true;
  V_local_m_s: number;
  V_surface_m_s: number;
  windward: boolean;
  exposure: number;
  h_c_W_m2K: number;
  h_r_W_m2K: number;
  h_o_W_m2K: number;
  T_surface_C: number;
  T_sky_C: number;
  T_solair_C: number;
  U_W_m2K: number;
  q_W_m2: number;
  Q_W: number;
  q_air_W_m2: number;
  q_sky_solar_W_m2: number;
  regime: string;
  correlation: string;
  warnings: CalcWarning[];
};

/** What surfaceCore computed on the way, for a row's working (src/calc/working). */
export interface SurfaceTrace {
  law: "power" | "log";
  met_height_m: number;
  leeward_factor: number;
  Re_crit: number;
  cloud_cover: number;
  pressure_Pa: number;
  R_in_m2K_W: number;
  absorbed_solar_W_m2: number;
  F_sky: number;
  T_sky_K: number;
  T_radiant_K: number;
  /** Surface temperature at which h_c and h_r were last evaluated (within 0.001 K of T_s). */
  T_eval_K: number;
  iterations: number;
  /** Film properties of the last evaluation. */
  props: AirProperties;
  /** Boundary-layer method: the combined coefficient and its parts. */
  combined: PlateCombinedState | null;
}

export function newSurfaceTrace(): SurfaceTrace {
  return {
    law: "power", met_height_m: 0, leeward_factor: 0, Re_crit: 0, cloud_cover: 0, pressure_Pa: 0, R_in_m2K_W: 0, absorbed_solar_W_m2: 0, F_sky: 0,
    T_sky_K: 0, T_radiant_K: 0, T_eval_K: 0, iterations: 0, props: newAirProperties(), combined: null,
  };
}

// Scratch objects of the iteration, refilled on every call: the engine is synchronous and
// surfaceCore does not call itself, so one set per module instance is enough. The iteration hands
// its numbers to the property and convection functions in these objects' fields (see
// airPropertiesOf): number arguments would be boxed into fresh heap numbers on every call.
const PROPS = newAirProperties();
const STATE = newPlateCombinedState();
const INPUTS = newPlateCombinedInputs();

// A Newton step smaller than this means T_s is within it of the root (the contract asks 0.001 K).
const TOL_K = 1e-3;

const MCADAMS_RANGE = METHOD_BY_ID["mcadams-wind"].ranges.V_surface_m_s;

/**
 * Solves the outside-face balance and returns the `surface` result of the contract. The result
 * is built in its final shape here, not copied, because large schedules spend their time on it.
 */
export function surfaceCore(
  s: SurfaceInput,
  warnings: CalcWarning[],
  id: string | null = null,
  trace: SurfaceTrace | null = null,
): SurfaceResult {
  const d = SURFACE_DEFAULTS;
  const law = s.law === undefined ? d.law : s.law;
  const metHeight = s.met_height_m === undefined ? d.met_height_m : s.met_height_m;
  const leeward = s.leeward_factor === undefined ? d.leeward_factor : s.leeward_factor;
  const Vlocal = windSpeedAt(s.V_met_m_s, s.height_m, s.terrain, law, metHeight, warnings);
  const w = exposureWeight(s.wind_from_deg, s.azimuth_deg, s.tilt_deg);
  const windward = w >= 0.5;
  const Vs = Vlocal * (leeward + (1 - leeward) * w);
  const ReCrit = s.Re_crit === undefined ? d.Re_crit : s.Re_crit;
  const cloud = s.cloud_cover === undefined ? d.cloud_cover : s.cloud_cover;
  const Tin = s.T_inside_C + T0;
  const To = s.T_outside_C + T0;
  const Rin = (s.R_si_m2K_W === undefined ? d.R_si_m2K_W : s.R_si_m2K_W) + s.R_construction_m2K_W;
  const solar = s.absorptance * (s.solar_W_m2 === undefined ? d.solar_W_m2 : s.solar_W_m2);
  const Tsky = skyTemperatureCloudy(To, cloud);
  const Fsky = skyViewFactor(s.tilt_deg);
  const Tr = radiantTemperature(Fsky, Tsky, To);
  const p = s.pressure_Pa === undefined ? d.pressure_Pa : s.pressure_Pa;

  const hcFixed = s.method === "iso6946" ? hcIso6946(Vs) : s.method === "mcadams" ? hcMcAdams(Vs) : -1;
  // The balance F(T_s) = (T_in − T_s)/R_in + α·G − h_c (T_s − T_out) − h_r (T_s − T_r) falls
  // monotonically with T_s; Newton steps on it, kept inside a shrinking bracket. The slope counts
  // the buoyant part's growth with ΔT (h_N ∝ ΔT^k, k = ¼ laminar, ⅓ turbulent, so
  // d(h_c ΔT)/dT_s = h_c + k h_N³/h_c² for the cube-law combination) and radiation's 4εσT_s³.
  let hc = hcFixed;
  let hr = 0;
  const props = PROPS;
  const state = hcFixed < 0 ? STATE : null;
  let lo = Math.min(Tin, To, Tr);
  let hi = Math.max(Tin, To, Tr) + solar * Rin;
  const hGuess = (hcFixed >= 0 ? hcFixed : hcIso6946(Vs)) + 5;
  let x = (Tin / Rin + solar + hGuess * To) / (1 / Rin + hGuess);
  let converged = false;
  let iterations = 0;
  const eps = s.emissivity;
  const inputs = INPUTS;
  if (state !== null) {
    inputs.Ta = To;
    inputs.V = Vs;
    inputs.L = s.length_m;
    inputs.tiltDeg = s.tilt_deg;
    inputs.H = s.panel_height_m;
    inputs.ReCrit = ReCrit;
    props.p_Pa = p;
  }
  while (iterations < 100) {
    iterations++;
    let slopeN = 0;
    if (state !== null) {
      props.T_K = (x + To) / 2;
      airPropertiesOf(props);
      inputs.Ts = x;
      plateCombinedAt(props, inputs, state);
      hc = state.h;
      const hN = state.hN;
      if (hc > 0) slopeN = ((state.natural.turbulent ? 1 / 3 : 1 / 4) * hN * hN * hN) / (hc * hc);
    }
    hr = hRadiation(x, Tr, eps);
    const F = (Tin - x) / Rin + solar - hc * (x - To) - hr * (x - Tr);
    if (F > 0) lo = Math.max(lo, x);
    else hi = Math.min(hi, x);
    const step = F / (1 / Rin + hc + slopeN + 4 * eps * SIGMA * x * x * x);
    if (Math.abs(step) < TOL_K) {
      converged = true;
      break;
    }
    const xn = x + step;
    x = xn > lo && xn < hi ? xn : (lo + hi) / 2;
  }
  if (!converged) addWarning(warnings, "not_converged", "the surface balance did not converge to 0.001 K");
  // T_s from the linearised balance with the coefficients just evaluated: the reported h_c and h_r
  // then close the balance exactly (they are taken within 0.0001 K of T_s).
  const Ts = (Tin / Rin + solar + hc * To + hr * Tr) / (1 / Rin + hc + hr);
  if (hcFixed >= 0) {
    warnAir((Ts + To) / 2, warnings, "T_film_C");
    if (s.method === "mcadams") checkRange(warnings, "mcadams-wind", METHOD_BY_ID["mcadams-wind"].title, "V_surface_m_s", Vs, MCADAMS_RANGE);
  } else {
    // Range warnings of the state reported, worded once.
    warnAir((x + To) / 2, warnings, "T_film_C");
    if (state !== null) warnPlateCombined(state, ReCrit, warnings);
  }
  const regime = state === null ? "empirical" : regimeFromRichardson(state.Ri);
  if (trace !== null) {
    // The state the result was computed from, copied out of the scratch objects.
    trace.law = law;
    trace.met_height_m = metHeight;
    trace.leeward_factor = leeward;
    trace.Re_crit = ReCrit;
    trace.cloud_cover = cloud;
    trace.pressure_Pa = p;
    trace.R_in_m2K_W = Rin;
    trace.absorbed_solar_W_m2 = solar;
    trace.F_sky = Fsky;
    trace.T_sky_K = Tsky;
    trace.T_radiant_K = Tr;
    trace.T_eval_K = x;
    trace.iterations = iterations;
    trace.props = state === null ? airProperties((Ts + To) / 2, p) : { ...props };
    trace.combined = state === null ? null : { ...state, natural: { ...state.natural } };
  }
  const ho = hc + hr;
  const q = (Tin - Ts) / Rin;
  let Tsolair: number;
  let U: number;
  if (ho > 0) {
    Tsolair = (hc * To + hr * Tr + solar) / ho;
    U = 1 / (Rin + 1 / ho);
  } else {
    // No exterior exchange at all (ε = 0 and no convection): the face is adiabatic.
    addWarning(warnings, "no_exterior_exchange", "h_o is 0: the outside face exchanges no heat; U is 0");
    Tsolair = Ts;
    U = 0;
  }
  // The part of q a checker reconciles with U·ΔT; the rest is what the sky adds and the sun removes.
  const qAir = U * (Tin - To);
  return {
    id,
    ok: true,
    V_local_m_s: Vlocal,
    V_surface_m_s: Vs,
    windward,
    exposure: w,
    h_c_W_m2K: hc,
    h_r_W_m2K: hr,
    h_o_W_m2K: ho,
    T_surface_C: Ts - T0,
    T_sky_C: Tsky - T0,
    T_solair_C: Tsolair - T0,
    U_W_m2K: U,
    q_W_m2: q,
    Q_W: q * s.area_m2,
    q_air_W_m2: qAir,
    q_sky_solar_W_m2: q - qAir,
    regime,
    correlation: state !== null ? "churchill-combined-plate" : s.method === "iso6946" ? "iso6946-simplified" : "mcadams-wind",
    // An array that grew by push holds room for 16 or more; the result keeps an exact copy (most
    // of a large schedule's results stay in memory until the answer is written).
    warnings: warnings.length === 0 ? warnings : warnings.slice(),
  };
}

/**
 * True when every number of a `surface` result is finite (calculateCase's check for this kind):
 * x·0 is 0 for finite x and NaN otherwise. Reading the fields by name keeps them unboxed, where a
 * loop over the keys would copy each number into a new heap number.
 */
export function surfaceResultFinite(r: SurfaceResult): boolean {
  return (
    r.V_local_m_s * 0 + r.V_surface_m_s * 0 + r.exposure * 0 + r.h_c_W_m2K * 0 + r.h_r_W_m2K * 0 + r.h_o_W_m2K * 0 +
      r.T_surface_C * 0 + r.T_sky_C * 0 + r.T_solair_C * 0 + r.U_W_m2K * 0 + r.q_W_m2 * 0 + r.Q_W * 0 +
      r.q_air_W_m2 * 0 + r.q_sky_solar_W_m2 * 0 ===
    0
  );
}
