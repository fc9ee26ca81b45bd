/**
 * The contract's case kinds: each reads its inputs (naming the field of any bad one), calls the
 * engine and returns the outputs with `correlation` and `warnings`.
 */
import { CaseReader, InputError, readPressure, type CalcResult, type CalcWarning } from "../contract";
import { ductRunCore } from "../duct-run";
import { hRadiation } from "../radiation/radiation";
import { dewPointHylandWexler } from "../psychrometrics/dew-point";
import { EXTERIOR_METHODS, surfaceCore } from "../surface";
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

const POS = { gt: 0 };
const NONNEG = { min: 0 };
const FRACTION = { min: 0, max: 1 };
const TILT = { min: 0, max: 180, why: "0 faces up, 90 is vertical, 180 faces down" };
const BEARING = { min: 0, max: 360 };

/** Surface and air temperatures in kelvin, with the film-temperature properties. */
function filmCase(r: CaseReader, w: CalcWarning[]) {
  const Ts = toK(r.tempC("T_surface_C"));
  const Ta = toK(r.tempC("T_air_C"));
  const p = readPressure(r);
  return { Ts, Ta, p, props: () => air((Ts + Ta) / 2, p, w, "T_film_C") };
}

function ductSection(r: CaseReader): DuctSection {
  const shape = r.oneOf("shape", ["round", "rect"] as const);
  if (shape === "round") return { shape, diameter_m: r.num("diameter_m", POS) };
  return { shape, width_m: r.num("width_m", POS), height_m: r.num("height_m", POS) };
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
    const x = r.has("x_m") ? r.num("x_m", { gt: 0, max: L, why: "x is measured from the leading edge, within the plate" }) : undefined;
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
    const { forced: _f, natural: _n, ...o } = plateCombinedCore(c.props(), c.Ts, c.Ta, V, L, tilt, H, w);
    return { id, ok: true, ...o, warnings: w };
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
    const flow = r.num("flow_m3_s", { gt: 0, why: "a duct without flow has no inside film" });
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
    const Hmet = r.optNum("met_height_m", 10, POS);
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
    const RH = r.num("RH_pct", { gt: 0, max: 100, why: "no dew point exists in perfectly dry air" });
    readPressure(r);
    warnRange(w, "dew-point-hyland-wexler", "T_C", T);
    return { id, ok: true, T_dp_C: dewPointHylandWexler(T, RH), correlation: "dew-point-hyland-wexler", warnings: w };
  },

  surface(r, id) {
    const w: CalcWarning[] = [];
    const R_construction = r.num("R_construction_m2K_W", NONNEG);
    const R_si = r.optNum("R_si_m2K_W", 0.13, NONNEG);
    if (R_construction + R_si <= 0) {
      throw new InputError("R_construction_m2K_W", "R_construction_m2K_W + R_si_m2K_W must be > 0");
    }
    const s = surfaceCore(
      {
        area_m2: r.num("area_m2", NONNEG),
        tilt_deg: r.num("tilt_deg", TILT),
        azimuth_deg: r.num("azimuth_deg", BEARING),
        height_m: r.num("height_m", NONNEG),
        length_m: r.num("length_m", POS),
        panel_height_m: r.num("panel_height_m", POS),
        R_construction_m2K_W: R_construction,
        R_si_m2K_W: R_si,
        T_inside_C: r.tempC("T_inside_C"),
        T_outside_C: r.tempC("T_outside_C"),
        V_met_m_s: r.num("V_met_m_s", NONNEG),
        wind_from_deg: r.num("wind_from_deg", BEARING),
        terrain: r.oneOf("terrain", TERRAINS),
        law: r.oneOf("law", WIND_LAWS, "power"),
        met_height_m: r.optNum("met_height_m", 10, POS),
        emissivity: r.num("emissivity", FRACTION),
        absorptance: r.num("absorptance", FRACTION),
        solar_W_m2: r.optNum("solar_W_m2", 0, { min: 0, max: 1500, why: "beyond the solar constant" }),
        method: r.oneOf("method", EXTERIOR_METHODS),
        leeward_factor: r.optNum("leeward_factor", 0.25, FRACTION),
        pressure_Pa: readPressure(r),
      },
      w,
    );
    // Written out field by field: the contract's output names, and a fast path for large schedules.
    return {
      id,
      ok: true,
      V_local_m_s: s.V_local_m_s,
      V_surface_m_s: s.V_surface_m_s,
      windward: s.windward,
      h_c_W_m2K: s.h_c_W_m2K,
      h_r_W_m2K: s.h_r_W_m2K,
      h_o_W_m2K: s.h_o_W_m2K,
      T_surface_C: s.T_surface_C,
      T_sky_C: s.T_sky_C,
      T_radiant_C: s.T_radiant_C,
      F_sky: s.F_sky,
      T_solair_C: s.T_solair_C,
      U_W_m2K: s.U_W_m2K,
      q_W_m2: s.q_W_m2,
      Q_W: s.Q_W,
      regime: s.regime,
      Re: s.combined === null ? null : s.combined.forced.Re,
      Ri: s.combined === null ? null : s.combined.Ri,
      Nu_forced: s.combined === null ? null : s.combined.Nu_forced,
      Nu_natural: s.combined === null ? null : s.combined.Nu_natural,
      correlation: s.correlation,
      warnings: w,
    };
  },

  duct_run(r, id) {
    const w: CalcWarning[] = [];
    const section = ductSection(r);
    const T_ambient_C = r.tempC("T_ambient_C");
    const o = ductRunCore(
      {
        ...section,
        length_m: r.num("length_m", NONNEG),
        flow_m3_s: r.num("flow_m3_s", { gt: 0, why: "a duct run without flow has no leaving temperature" }),
        T_entering_C: r.tempC("T_entering_C"),
        T_ambient_C,
        RH_ambient_pct: r.num("RH_ambient_pct", { gt: 0, max: 100, why: "no dew point exists in perfectly dry air" }),
        T_surround_C: r.tempC("T_surround_C", T_ambient_C),
        insulation_thickness_m: r.num("insulation_thickness_m", { min: 0, max: 1 }),
        insulation_k_W_mK: r.num("insulation_k_W_mK", POS),
        jacket_emissivity: r.num("jacket_emissivity", FRACTION),
        location: r.oneOf("location", ["indoor", "outdoor"] as const),
        V_wind_m_s: r.optNum("V_wind_m_s", 0, NONNEG),
        margin_K: r.optNum("margin_K", 0, { min: 0, max: 50 }),
        roughness_m: r.optNum("roughness_m", ROUGHNESS_DEFAULT_M, NONNEG),
        pressure_Pa: readPressure(r),
      },
      w,
    );
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
      Re: o.Re,
      velocity_m_s: o.velocity_m_s,
      T_env_C: o.T_env_C,
      mass_flow_kg_s: o.mass_flow_kg_s,
      correlation: o.correlation,
      warnings: w,
    };
  },
};

export const KIND_NAMES = Object.keys(KINDS);
