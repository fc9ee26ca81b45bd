/**
 * One duct run for one design case: inside film, insulation, outside convection (natural, wind or
 * both) and radiation give UA per metre; the leaving air temperature follows the exponential law
 * T_L = T_env + (T_E − T_env) exp(−UA L/(ṁ c_p)); the outer surface temperature at both ends is
 * checked against the ambient dew point, and the least insulation that keeps it above is searched.
 */
import { T0 } from "./constants";
import { nuCombinedChurchill } from "./convection/combined";
import { insulationResistanceRect, insulationResistanceRound, leavingAirTemperature } from "./convection/duct-heat";
import { airProperties, airPropertiesInto, newAirProperties, type AirProperties } from "./properties/air";
import { dewPointHylandWexler } from "./psychrometrics/dew-point";
import { hRadiation } from "./radiation/radiation";
import { air, warnAir, warnRange, type Warnings } from "./kinds/common";
import { warnNaturalBranch } from "./kinds/external";
import { grashof, newNaturalBranch, nuPlateNatural, type NaturalBranch } from "./select";
import { nuCylinderCrossflowChurchillBernstein } from "./convection/forced-external";
import { nuHorizontalCylinderChurchillChu } from "./convection/natural";
import { ductGeometry, ductInternalCore, nuDuct, type DuctInternal, type DuctSection, type DuctShape } from "./kinds/internal";
import { solveFixedPoint } from "./solve";
import { addWarning } from "./validity";
import type { CalcWarning } from "./contract";

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
  /** v2: solar absorptance of the jacket (0 when absent). */
  absorptance: number;
  /** v2: irradiance on the horizontal, W/m² (0 when absent). */
  solar_W_m2: number;
  roughness_m: number;
  pressure_Pa: number;
}

/** Thickest insulation the minimum-thickness search tries, m (0.5 m in v2, as the schedule accepts), and its step (0.1 mm). */
export const MAX_INSULATION_M = 0.5;
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

/** Outside coefficients of the last evaluation, with the scratch objects reused by every call. */
interface Outside {
  h_conv: number;
  h_rad: number;
  /** The parts of h_conv: buoyant, and wind-driven (0 in still air). */
  h_natural: number;
  h_forced: number;
  props: AirProperties;
  branch: NaturalBranch;
}

function newOutside(): Outside {
  return { h_conv: 0, h_rad: 0, h_natural: 0, h_forced: 0, props: newAirProperties(), branch: newNaturalBranch() };
}

/** h of a natural-convection plate of length L at tilt, from film properties (warns via the branch). */
function hPlate(c: Outside, Tso: number, Ta: number, tilt: number, L: number, warnings: Warnings): number {
  const Ra = grashof(c.props, Tso - Ta, L) * c.props.Pr;
  const Nu = nuPlateNatural(Ra, c.props.Pr, tilt, Tso >= Ta, c.branch);
  warnNaturalBranch(c.branch, warnings);
  return (Nu * c.props.k_W_mK) / L;
}

/** h across a cylinder of diameter D in wind V (Churchill & Bernstein), film properties. */
function hCrossflow(c: Outside, V: number, D: number, warnings: Warnings): number {
  const Re = (V * D) / c.props.nu_m2_s;
  warnRange(warnings, "churchill-bernstein-cylinder", "RePr", Re * c.props.Pr);
  return (nuCylinderCrossflowChurchillBernstein(Re, c.props.Pr) * c.props.k_W_mK) / D;
}

/** Outside convection and radiation at outer surface temperature Tso (K), written into `c`. */
function outsideAt(d: DuctRunInput, o: OuterSection, Tso: number, V: number, warnings: Warnings, c: Outside): Outside {
  const Ta = d.T_ambient_C + T0;
  const Tf = (Tso + Ta) / 2;
  warnAir(Tf, warnings, "T_film_C");
  const props = airPropertiesInto(Tf, d.pressure_Pa, c.props);
  let h: number;
  if (d.shape === "round") {
    const Ra = grashof(props, Tso - Ta, o.D_o) * props.Pr;
    warnRange(warnings, "churchill-chu-horizontal-cylinder", "Ra", Ra);
    const hn = (nuHorizontalCylinderChurchillChu(Ra, props.Pr) * props.k_W_mK) / o.D_o;
    const hf = V > 0 ? hCrossflow(c, V, o.D_o, warnings) : 0;
    h = V > 0 ? nuCombinedChurchill(hf, hn, 4) : hn;
    c.h_natural = hn;
    c.h_forced = hf;
  } else {
    // Vertical sides on the outer height; top and bottom as horizontal plates on half the width.
    const side = hPlate(c, Tso, Ta, 90, o.H_o, warnings);
    const top = hPlate(c, Tso, Ta, 0, o.W_o / 2, warnings);
    const bottom = hPlate(c, Tso, Ta, 180, o.W_o / 2, warnings);
    const hn = (2 * o.H_o * side + o.W_o * (top + bottom)) / (2 * (o.H_o + o.W_o));
    // Wind across the duct on the equivalent diameter P_o/π; same length and k, so h combines as Nu.
    const hf = V > 0 ? hCrossflow(c, V, o.P_o / Math.PI, warnings) : 0;
    h = V > 0 ? nuCombinedChurchill(hf, hn, 3) : hn;
    c.h_natural = hn;
    c.h_forced = hf;
  }
  c.h_conv = h;
  c.h_rad = hRadiation(Tso, d.T_surround_C + T0, d.jacket_emissivity);
  return c;
}

/** What the duct-run evaluation computed on the way, for a row's working (src/calc/working). */
export interface DuctRunTrace {
  area_m2: number;
  P_i_m: number;
  P_o_m: number;
  D_o_m: number;
  W_o_m: number;
  H_o_m: number;
  R_ins_mK_W: number;
  R_i_mK_W: number;
  T_mean_K: number;
  inside_props: AirProperties | null;
  internal: DuctInternal | null;
  T_so_K: number;
  outside_props: AirProperties | null;
  h_natural: number;
  h_forced: number;
  natural_branch: string;
}

export function newDuctRunTrace(): DuctRunTrace {
  return {
    area_m2: 0, P_i_m: 0, P_o_m: 0, D_o_m: 0, W_o_m: 0, H_o_m: 0, R_ins_mK_W: 0, R_i_mK_W: 0, T_mean_K: 0,
    inside_props: null, internal: null, T_so_K: 0, outside_props: null, h_natural: 0, h_forced: 0, natural_branch: "",
  };
}

/**
 * Outer surface temperature (K) for air at Tair (K) behind the resistance Rin (K·m/W); `c` holds
 * the outside coefficients of the last evaluation (the returned T_s solves the balance with them).
 */
function surfaceTemperature(
  d: DuctRunInput,
  o: OuterSection,
  Tair: number,
  Rin: number,
  V: number,
  S: number,
  x0: number,
  c: Outside,
): { Ts: number; converged: boolean } {
  const Ta = d.T_ambient_C + T0;
  const Tsur = d.T_surround_C + T0;
  const next = (Ts: number): number => {
    outsideAt(d, o, Ts, V, null, c);
    return (Tair / Rin + S + o.P_o * (c.h_conv * Ta + c.h_rad * Tsur)) / (1 / Rin + o.P_o * (c.h_conv + c.h_rad));
  };
  // Sunshine can lift the jacket above every temperature of the problem: widen the upper bound
  // by the rise the absorbed sun alone would give through the inner resistance.
  const s = solveFixedPoint(next, Math.min(Tair, Ta, Tsur), Math.max(Tair, Ta, Tsur) + S * Rin, x0, TOL_K);
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
  /** The inside flow in full; only when warnings were asked for (the reported state). */
  internal: DuctInternal | null;
  converged: boolean;
}

// Scratch inside-air properties, refilled by every evaluateDuctRun (synchronous, not reentrant):
// the insulation search evaluates a run many times and allocation, not arithmetic, is its cost.
const PIN = newAirProperties();

/**
 * Evaluates the run at insulation thickness t (m) and wind speed V (m/s). With `bothEnds` false
 * only the end with the colder air gets its surface temperature (the other is NaN): that end has
 * the colder surface, which is all the condensation search needs.
 */
export function evaluateDuctRun(
  d: DuctRunInput,
  t: number,
  V: number,
  warnings: Warnings,
  bothEnds = true,
  c: Outside = newOutside(),
  trace: DuctRunTrace | null = null,
  sun = true,
): DuctRunState {
  const g = ductGeometry(d);
  const round = d.shape === "round";
  const o = outerSection(d, t, g.perimeter_m);
  // Absorbed sun per metre, W/m (v2): the irradiance on the horizontal over the jacket's outer
  // width, the shadow the duct casts (common practice for a horizontal run).
  const S = sun ? d.absorptance * d.solar_W_m2 * (round ? o.D_o : o.W_o) : 0;
  const TE = d.T_entering_C + T0;
  const Ta = d.T_ambient_C + T0;
  const Tsur = d.T_surround_C + T0;
  const p = d.pressure_Pa;
  const pin = airPropertiesInto(TE, p, PIN);
  const mdot = pin.rho_kg_m3 * d.flow_m3_s;
  const velocity = d.flow_m3_s / g.area_m2;
  // Inside film (bulk properties at the mean air temperature) as a resistance per metre.
  const insideR = (Tm: number): number => {
    airPropertiesInto(Tm, p, pin);
    const Re = (velocity * g.Dh_m) / pin.nu_m2_s;
    hi = (nuDuct(Re, pin.Pr, g, round) * pin.k_W_mK) / g.Dh_m;
    return 1 / (hi * o.P_i) + o.R_ins;
  };
  let hi = 0;
  // Coefficients at the mean air temperature, which depends on the leaving temperature, and
  // outside coefficients at the outer surface temperature: one joint fixed-point iteration on
  // (T_mean, T_so), with secant steps on T_so kept inside the temperatures of the problem.
  const lo = Math.min(TE, Ta, Tsur);
  let Tm = TE;
  let Rin = insideR(TE);
  // The sun can lift the jacket above every air temperature, by at most S·R_in.
  const up = Math.max(TE, Ta, Tsur) + S * Rin;
  const h0 = 8 + 4 * V; // a typical still-air or windy outside coefficient, for the first guess only
  let Tso = (Tm / Rin + S + o.P_o * h0 * Ta) / (1 / Rin + o.P_o * h0);
  let converged = false;
  let hConv = 0;
  let hRad = 0;
  let UA = 0;
  let TL = TE;
  let Tenv = Ta;
  let cp = 0;
  let prevX = NaN;
  let prevG = NaN;
  for (let i = 0; i < 200; i++) {
    Rin = insideR(Tm);
    cp = pin.cp_J_kgK;
    outsideAt(d, o, Tso, V, null, c);
    hConv = c.h_conv;
    hRad = c.h_rad;
    const ho = hConv + hRad;
    const TsoNew = (Tm / Rin + S + o.P_o * (hConv * Ta + hRad * Tsur)) / (1 / Rin + o.P_o * ho);
    UA = 1 / (Rin + 1 / (ho * o.P_o));
    Tenv = (hConv * Ta + hRad * Tsur + S / o.P_o) / ho;
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
      if (sec > lo && sec < up) x = sec;
    }
    prevX = Tso;
    prevG = gap;
    Tso = x;
    Tm = TmNew;
  }
  let internal: DuctInternal | null = null;
  if (warnings !== null) {
    // The reported state in full, with its warnings: inside flow at T_mean, outside at T_so.
    internal = ductInternalCore(air(Tm, p, warnings, "T_mean_C"), d.shape, g, d.flow_m3_s, d.roughness_m, warnings);
    outsideAt(d, o, Tso, V, warnings, c);
    if (trace !== null) {
      trace.area_m2 = g.area_m2;
      trace.P_i_m = o.P_i;
      trace.P_o_m = o.P_o;
      trace.D_o_m = o.D_o;
      trace.W_o_m = o.W_o;
      trace.H_o_m = o.H_o;
      trace.R_ins_mK_W = o.R_ins;
      trace.R_i_mK_W = Rin - o.R_ins;
      trace.T_mean_K = Tm;
      trace.inside_props = airProperties(Tm, p);
      trace.internal = internal;
      trace.T_so_K = Tso;
      trace.outside_props = { ...c.props };
      trace.h_natural = c.h_natural;
      trace.h_forced = c.h_forced;
      trace.natural_branch = d.shape === "round" ? "churchill-chu-horizontal-cylinder" : "plates";
    }
  }
  let TsE = NaN;
  let TsL = NaN;
  // First guess at an end: the mean surface temperature moved by the share of the outside film.
  const Rout = 1 / ((hConv + hRad) * o.P_o);
  const shift = Rout / (Rin + Rout);
  if (bothEnds || TE <= TL) {
    const sE = surfaceTemperature(d, o, TE, Rin, V, S, Tso + (TE - Tm) * shift, c);
    TsE = sE.Ts;
    converged &&= sE.converged;
  }
  if (bothEnds || TL < TE) {
    const sL = surfaceTemperature(d, o, TL, Rin, V, S, Tso + (TL - Tm) * shift, c);
    TsL = sL.Ts;
    converged &&= sL.converged;
  }
  return {
    T_leaving_K: TL,
    Q_W: mdot * cp * (TL - TE),
    UA_per_m: UA,
    h_i: hi,
    h_o_conv: hConv,
    h_o_rad: hRad,
    Ts_entering_K: TsE,
    Ts_leaving_K: TsL,
    T_env_K: Tenv,
    mdot_kg_s: mdot,
    internal,
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
 * 0 when the bare duct is safe, null when no thickness up to 0.5 m avoids it. The colder surface
 * warms as the first insulation is added; on a thick round jacket it can cool again (the larger
 * diameter's free convection weakens while its radiation to a colder surround does not), so the
 * safe steps form one band. The search keeps a bracket of steps [condensing, safe] on the rising
 * side and narrows it by the Illinois variant of regula falsi on the margin (surface temperature −
 * dew point − margin), which ends on neighbouring steps.
 */
export function minInsulationThickness(d: DuctRunInput, TdpK: number): number | null {
  const limit = TdpK + d.margin_K;
  const margins = new Map<number, number>();
  const c = newOutside();
  const margin = (n: number): number => {
    let m = margins.get(n);
    if (m === undefined) {
      m = coldestSurface(evaluateDuctRun(d, n * STEP_M, 0, null, false, c, null, false)) - limit;
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
    if (gHi < 0) {
      // Still condensing at 0.5 m: either no thickness helps, or the safe thicknesses lie between
      // two bounds, because a thick jacket's larger diameter loses free convection to the room
      // while keeping its radiation to a cold surround. Look for any safe step (golden-section
      // search for the warmest), then the least safe step lies below it.
      const safe = safeStep(margin, nMax);
      if (safe === null) return null;
      nHi = safe;
      gHi = margin(safe);
      if (nLo >= nHi) {
        nLo = 0;
        gLo = margin(0);
      }
    }
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
 * A step in [0, nMax] whose margin is not negative, or null when there is none: a golden-section
 * search for the step of the warmest colder-end surface (the margin rises with the first
 * insulation and may fall again on a thick jacket), which stops at the first safe step it meets.
 */
function safeStep(margin: (n: number) => number, nMax: number): number | null {
  const r = (Math.sqrt(5) - 1) / 2;
  let a = 0;
  let b = nMax;
  let x1 = Math.round(b - r * (b - a));
  let x2 = Math.round(a + r * (b - a));
  while (b - a > 3) {
    const g1 = margin(x1);
    if (g1 >= 0) return x1;
    const g2 = margin(x2);
    if (g2 >= 0) return x2;
    if (g1 < g2) {
      a = x1;
      x1 = x2;
      x2 = Math.round(a + r * (b - a));
    } else {
      b = x2;
      x2 = x1;
      x1 = Math.round(b - r * (b - a));
    }
    if (x1 >= x2) x2 = Math.min(b, x1 + 1);
  }
  for (let n = a; n <= b; n++) if (margin(n) >= 0) return n;
  return null;
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
  const pin = airProperties(TE, d.pressure_Pa);
  const Re = (d.flow_m3_s / g.area_m2) * g.Dh_m / pin.nu_m2_s;
  const Ri = 1 / ((nuDuct(Re, pin.Pr, g, d.shape === "round") * pin.k_W_mK / g.Dh_m) * g.perimeter_m);
  let lo = 0;
  let up = nMax;
  const o0 = outerSection(d, 0, g.perimeter_m);
  const c = outsideAt(d, o0, limit, 0, null, newOutside());
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

export function ductRunCore(d: DuctRunInput, warnings: CalcWarning[], trace: DuctRunTrace | null = null): DuctRunResult {
  const st = evaluateDuctRun(d, d.insulation_thickness_m, d.V_wind_m_s, warnings, true, newOutside(), trace);
  if (!st.converged) addWarning(warnings, "not_converged", "the duct-run balance did not converge");
  warnRange(warnings, "dew-point-hyland-wexler", "T_C", d.T_ambient_C);
  const Tdp = dewPointHylandWexler(d.T_ambient_C, d.RH_ambient_pct);
  const TdpK = Tdp + T0;
  const condensation = coldestSurface(st) < TdpK + d.margin_K;
  const minT = minInsulationThickness(d, TdpK);
  if (condensation && (minT === null || minT < d.insulation_thickness_m)) {
    // Insulation moves the jacket towards the surroundings' temperature, not above it: where that
    // lies below the dew point plus margin (a cold night sky, a chilled void), the cure is vapour
    // sealing, a warmer surround or a different route, and a thickness would mislead.
    addWarning(
      warnings,
      "surroundings_below_dew_point",
      minT === null
        ? `no insulation up to ${MAX_INSULATION_M} m keeps the jacket above the dew point${d.margin_K > 0 ? " plus margin" : ""}: its surroundings hold it below; more insulation is no cure (seal the jacket against vapour, or change the route or the surround)`
        : `the jacket is below the dew point${d.margin_K > 0 ? " plus margin" : ""} with ${d.insulation_thickness_m} m of insulation although ${minT} m would keep it above: its surroundings are colder than the dew point, so more insulation is no cure`,
    );
  }
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
    condensation,
    min_insulation_thickness_m: minT,
    regime: (st.internal as DuctInternal).regime,
    correlation: "duct-run-exponential",
    Re: (st.internal as DuctInternal).Re,
    velocity_m_s: (st.internal as DuctInternal).velocity_m_s,
    T_env_C: st.T_env_K - T0,
    mass_flow_kg_s: st.mdot_kg_s,
  };
}
