/**
 * The contract's case kinds: each reads its inputs (naming the field of any bad one), calls the
 * engine and returns the outputs with `correlation` and `warnings`.
 */
import { CaseReader, InputError, PRESSURE, readPressure, rule, type CalcResult, type CalcWarning } from "../contract";
import { ductRunCore, type DuctRunInput } from "../duct-run";
import { hRadiation } from "../radiation/radiation";
import { dewPointHylandWexler } from "../psychrometrics/dew-point";
import { EXTERIOR_METHODS, SURFACE_DEFAULTS, surfaceCore, type SurfaceInput } from "../surface";
import { TERRAINS } from "../wind/wind-profile";
import { air, toK, warnRange } from "./common";
import {
  RE_CRIT_DEFAULT,
  cylinderCrossflowCore,
  cylinderNaturalCore,
  plateCombinedCore,
  plateForcedCore,
  plateNaturalCore,
  sphereForcedCore,
  sphereNaturalCore,
} from "./external";
import { ROUGHNESS_DEFAULT_M, ductGeometry, ductInternalCore, type DuctSection } from "./internal";
import { WIND_LAWS, windAtHeight } from "./wind";

type KindFn = (r: CaseReader, id: string | null) => CalcResult;

const POS = rule({ gt: 0 });
const NONNEG = rule({ min: 0 });
const FRACTION = rule({ min: 0, max: 1 });
const TILT = rule({ min: 0, max: 180, why: "0 faces up, 90 is vertical, 180 faces down" });
const BEARING = rule({ min: 0, max: 360 });
const SOLAR = rule({ min: 0, max: 1500, why: "beyond the solar constant" });
const RH = rule({ gt: 0, max: 100, why: "no dew point exists in perfectly dry air" });
const NO_FLOW_DUCT = rule({ gt: 0, why: "a duct without flow has no inside film" });
const NO_FLOW_RUN = rule({ gt: 0, why: "a duct run without flow has no leaving temperature" });
const THICKNESS = rule({ min: 0, max: 1 });
// A met mast reads the wind at least 1 m above the ground (10 m is the standard height); below
// that the reading says nothing about the site wind (WMO No. 8, §5.1.2: common practice).
const MET_HEIGHT = rule({ min: 1, why: "a met-mast reading is taken at least 1 m above the ground (10 m is standard)" });
const MARGIN = rule({ min: 0, max: 50 });
const SHAPES = ["round", "rect"] as const;
const LOCATIONS = ["indoor", "outdoor"] as const;

/** The inputs of the two schedule kinds, read by name (see CaseReader). */
type SurfaceRaw = Partial<Record<keyof SurfaceInput, unknown>>;
type DuctRunRaw = Partial<Record<keyof DuctRunInput, unknown>>;

/** Surface and air temperatures in kelvin, with the film-temperature properties. */
function filmCase(r: CaseReader, w: CalcWarning[]) {
  const Ts = toK(r.tempC("T_surface_C"));
  const Ta = toK(r.tempC("T_air_C"));
  const p = readPressure(r);
  return { Ts, Ta, p, props: () => air((Ts + Ta) / 2, p, w, "T_film_C") };
}

function ductSection(r: CaseReader): DuctSection {
  const shape = r.oneOf("shape", SHAPES);
  if (shape === "round") return { shape, diameter_m: r.num("diameter_m", POS) };
  return { shape, width_m: r.num("width_m", POS), height_m: r.num("height_m", POS) };
}

/** Reads and checks a `duct_run` case (errors name the field), defaults applied. */
export function readDuctRun(r: CaseReader): DuctRunInput {
  const v = r.raw as DuctRunRaw;
  const shape = r.oneOfAt("shape", v.shape, SHAPES);
  const round = shape === "round";
  const T_ambient_C = r.tempCAt("T_ambient_C", v.T_ambient_C);
  // One object shape for both sections (no spread): the engine's hot loops read it many times.
  return {
    shape,
    diameter_m: round ? r.numAt("diameter_m", v.diameter_m, POS) : undefined,
    width_m: round ? undefined : r.numAt("width_m", v.width_m, POS),
    height_m: round ? undefined : r.numAt("height_m", v.height_m, POS),
    length_m: r.numAt("length_m", v.length_m, NONNEG),
    flow_m3_s: r.numAt("flow_m3_s", v.flow_m3_s, NO_FLOW_RUN),
    T_entering_C: r.tempCAt("T_entering_C", v.T_entering_C),
    T_ambient_C,
    RH_ambient_pct: r.numAt("RH_ambient_pct", v.RH_ambient_pct, RH),
    T_surround_C: r.tempCAt("T_surround_C", v.T_surround_C, T_ambient_C),
    insulation_thickness_m: r.numAt("insulation_thickness_m", v.insulation_thickness_m, THICKNESS),
    insulation_k_W_mK: r.numAt("insulation_k_W_mK", v.insulation_k_W_mK, POS),
    jacket_emissivity: r.numAt("jacket_emissivity", v.jacket_emissivity, FRACTION),
    location: r.oneOfAt("location", v.location, LOCATIONS),
    V_wind_m_s: r.optNumAt("V_wind_m_s", v.V_wind_m_s, 0, NONNEG),
    margin_K: r.optNumAt("margin_K", v.margin_K, 0, MARGIN),
    absorptance: r.optNumAt("absorptance", v.absorptance, 0, FRACTION),
    solar_W_m2: r.optNumAt("solar_W_m2", v.solar_W_m2, 0, SOLAR),
    roughness_m: r.optNumAt("roughness_m", v.roughness_m, ROUGHNESS_DEFAULT_M, NONNEG),
    pressure_Pa: r.optNumAt("pressure_Pa", v.pressure_Pa, 101325, PRESSURE),
  };
}

export const KINDS: Readonly<Record<string, KindFn>> = {
  air_properties(r, id) {
    const warnings: CalcWarning[] = [];
    const T = toK(r.tempC("T_C"));
    const p = readPressure(r);
    const a = air(T, p, warnings);
    const { T_K: _t, p_Pa: _p, ...props } = a;
    return { id, ok: true, ...props, correlation: "air-lemmon-jacobsen", warnings };
  },

  plate_forced(r, id) {
    const w: CalcWarning[] = [];
    const c = filmCase(r, w);
    const V = r.num("velocity_m_s", NONNEG);
    const L = r.num("length_m", POS);
    const x = r.has("x_m") ? r.num("x_m", rule({ gt: 0, max: L, why: "x is measured from the leading edge, within the plate" })) : undefined;
    const ReCrit = r.optNum("Re_crit", RE_CRIT_DEFAULT, NONNEG);
    const { correlation_x: _cx, ...o } = plateForcedCore(c.props(), V, L, ReCrit, x, w);
    return { id, ok: true, ...o, warnings: w };
  },

  plate_natural(r, id) {
    const w: CalcWarning[] = [];
    const c = filmCase(r, w);
    const tilt = r.num("tilt_deg", TILT);
    const L = r.num("length_m", POS);
    const { Ra_effective: _r, ...o } = plateNaturalCore(c.props(), c.Ts, c.Ta, tilt, L, w);
    return { id, ok: true, ...o, warnings: w };
  },

  plate_combined(r, id) {
    const w: CalcWarning[] = [];
    const c = filmCase(r, w);
    const V = r.num("velocity_m_s", NONNEG);
    const L = r.num("length_m", POS);
    const tilt = r.num("tilt_deg", TILT);
    const H = r.num("height_m", POS);
    return { id, ok: true, ...plateCombinedCore(c.props(), c.Ts, c.Ta, V, L, tilt, H, w), warnings: w };
  },

  cylinder_crossflow(r, id) {
    const w: CalcWarning[] = [];
    const c = filmCase(r, w);
    const V = r.num("velocity_m_s", NONNEG);
    const D = r.num("diameter_m", POS);
    return { id, ok: true, ...cylinderCrossflowCore(c.props(), V, D, w), warnings: w };
  },

  cylinder_natural(r, id) {
    const w: CalcWarning[] = [];
    const c = filmCase(r, w);
    const D = r.num("diameter_m", POS);
    return { id, ok: true, ...cylinderNaturalCore(c.props(), c.Ts - c.Ta, D, w), warnings: w };
  },

  sphere_forced(r, id) {
    const w: CalcWarning[] = [];
    const Ts = toK(r.tempC("T_surface_C"));
    const Ta = toK(r.tempC("T_air_C"));
    const p = readPressure(r);
    const V = r.num("velocity_m_s", NONNEG);
    const D = r.num("diameter_m", POS);
    return { id, ok: true, ...sphereForcedCore(Ts, Ta, V, D, p, w), warnings: w };
  },

  sphere_natural(r, id) {
    const w: CalcWarning[] = [];
    const c = filmCase(r, w);
    const D = r.num("diameter_m", POS);
    return { id, ok: true, ...sphereNaturalCore(c.props(), c.Ts - c.Ta, D, w), warnings: w };
  },

  duct_internal(r, id) {
    const w: CalcWarning[] = [];
    const section = ductSection(r);
    const flow = r.num("flow_m3_s", NO_FLOW_DUCT);
    const T = toK(r.tempC("T_air_C"));
    if (r.has("T_wall_C")) r.tempC("T_wall_C"); // accepted and checked; no wall correction in v1
    const rough = r.optNum("roughness_m", ROUGHNESS_DEFAULT_M, NONNEG);
    const p = readPressure(r);
    const props = air(T, p, w, "T_air_C");
    return { id, ok: true, ...ductInternalCore(props, section.shape, ductGeometry(section), flow, rough, w), warnings: w };
  },

  wind_at_height(r, id) {
    const w: CalcWarning[] = [];
    const V = r.num("V_met_m_s", NONNEG);
    const H = r.num("height_m", NONNEG);
    const terrain = r.oneOf("terrain", TERRAINS);
    const law = r.oneOf("law", WIND_LAWS, "power");
    const Hmet = r.optNum("met_height_m", 10, MET_HEIGHT);
    readPressure(r);
    return { id, ok: true, ...windAtHeight(V, H, terrain, law, Hmet, w), warnings: w };
  },

  radiation(r, id) {
    const Ts = toK(r.tempC("T_surface_C"));
    const Tr = toK(r.tempC("T_surround_C"));
    const e = r.num("emissivity", FRACTION);
    readPressure(r);
    return { id, ok: true, h_r_W_m2K: hRadiation(Ts, Tr, e), correlation: "radiation-linearised", warnings: [] };
  },

  dew_point(r, id) {
    const w: CalcWarning[] = [];
    const T = r.tempC("T_C");
    const rh = r.num("RH_pct", RH);
    readPressure(r);
    warnRange(w, "dew-point-hyland-wexler", "T_C", T);
    return { id, ok: true, T_dp_C: dewPointHylandWexler(T, rh), correlation: "dew-point-hyland-wexler", warnings: w };
  },

  surface(r, id) {
    // Every input is checked by name; the checked case itself then goes to the engine (no copy).
    const v = r.raw as SurfaceRaw;
    const R_construction = r.numAt("R_construction_m2K_W", v.R_construction_m2K_W, NONNEG);
    const R_si = r.optNumAt("R_si_m2K_W", v.R_si_m2K_W, SURFACE_DEFAULTS.R_si_m2K_W, NONNEG);
    if (R_construction + R_si <= 0) {
      throw new InputError("R_construction_m2K_W", "R_construction_m2K_W + R_si_m2K_W must be > 0");
    }
    r.numAt("area_m2", v.area_m2, NONNEG);
    r.numAt("tilt_deg", v.tilt_deg, TILT);
    r.numAt("azimuth_deg", v.azimuth_deg, BEARING);
    r.numAt("height_m", v.height_m, NONNEG);
    r.numAt("length_m", v.length_m, POS);
    r.numAt("panel_height_m", v.panel_height_m, POS);
    r.tempCAt("T_inside_C", v.T_inside_C);
    r.tempCAt("T_outside_C", v.T_outside_C);
    r.numAt("V_met_m_s", v.V_met_m_s, NONNEG);
    r.numAt("wind_from_deg", v.wind_from_deg, BEARING);
    r.oneOfAt("terrain", v.terrain, TERRAINS);
    r.oneOfAt("law", v.law, WIND_LAWS, SURFACE_DEFAULTS.law);
    r.optNumAt("met_height_m", v.met_height_m, SURFACE_DEFAULTS.met_height_m, MET_HEIGHT);
    r.numAt("emissivity", v.emissivity, FRACTION);
    r.numAt("absorptance", v.absorptance, FRACTION);
    r.optNumAt("solar_W_m2", v.solar_W_m2, SURFACE_DEFAULTS.solar_W_m2, SOLAR);
    r.oneOfAt("method", v.method, EXTERIOR_METHODS);
    r.optNumAt("leeward_factor", v.leeward_factor, SURFACE_DEFAULTS.leeward_factor, FRACTION);
    r.optNumAt("Re_crit", v.Re_crit, SURFACE_DEFAULTS.Re_crit, NONNEG);
    r.optNumAt("cloud_cover", v.cloud_cover, SURFACE_DEFAULTS.cloud_cover, FRACTION);
    r.optNumAt("pressure_Pa", v.pressure_Pa, SURFACE_DEFAULTS.pressure_Pa, PRESSURE);
    return surfaceCore(v as SurfaceInput, [], id);
  },

  duct_run(r, id) {
    const w: CalcWarning[] = [];
    const o = ductRunCore(readDuctRun(r), w);
    return {
      id,
      ok: true,
      T_leaving_C: o.T_leaving_C,
      Q_W: o.Q_W,
      UA_per_m_W_mK: o.UA_per_m_W_mK,
      h_i_W_m2K: o.h_i_W_m2K,
      h_o_conv_W_m2K: o.h_o_conv_W_m2K,
      h_o_rad_W_m2K: o.h_o_rad_W_m2K,
      T_surface_entering_C: o.T_surface_entering_C,
      T_surface_leaving_C: o.T_surface_leaving_C,
      T_dp_C: o.T_dp_C,
      condensation: o.condensation,
      min_insulation_thickness_m: o.min_insulation_thickness_m,
      regime: o.regime,
      correlation: o.correlation,
      warnings: w,
    };
  },
};

export const KIND_NAMES = Object.keys(KINDS);
