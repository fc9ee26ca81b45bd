// fast-check generators of valid cases for every kind of the calculation contract,
// and the contract's list of inputs per kind, for the property-based tests.
import fc from "fast-check";

type Case = Record<string, unknown>;

export const num = (min: number, max: number) => fc.double({ min, max, noNaN: true });
export const temp = (min = -40, max = 120) => num(min, max);
const opt = <T>(a: fc.Arbitrary<T>) => fc.option(a, { nil: undefined });
/** 0 or a value from `min` up: denormal speeds are checked apart, in invalid-input.test.ts. */
const zeroOr = (min: number, max: number) => fc.oneof(fc.constant(0), num(min, max));
export const speed = (max: number) => zeroOr(1e-6, max);

/** Drop keys whose value is undefined, so optional inputs are absent, not undefined. */
export function strip(c: Case): Case {
  return Object.fromEntries(Object.entries(c).filter(([, v]) => v !== undefined));
}

const terrain = fc.constantFrom("city", "suburban", "open", "water");
const shapeDims = (min: number, max: number) =>
  fc.oneof(
    fc.record({ shape: fc.constant("round"), diameter_m: num(min, max) }),
    fc.record({ shape: fc.constant("rect"), width_m: num(min, max), height_m: num(min, max) }),
  );

const forcedPair = { T_surface_C: temp(), T_air_C: temp(), velocity_m_s: speed(40) };
const naturalPair = { T_surface_C: temp(), T_air_C: temp() };

export const surfaceFields = {
  area_m2: num(0.1, 500), tilt_deg: num(0, 180), azimuth_deg: num(0, 360), height_m: num(0.5, 100),
  length_m: num(0.5, 50), panel_height_m: num(0.5, 30), R_construction_m2K_W: num(0.01, 8),
  R_si_m2K_W: opt(num(0.02, 0.3)), T_inside_C: temp(-10, 40), T_outside_C: temp(-40, 45),
  V_met_m_s: speed(30), wind_from_deg: num(0, 360), terrain, law: opt(fc.constantFrom("power", "log")),
  emissivity: num(0.02, 1), absorptance: num(0, 1), solar_W_m2: opt(num(0, 1100)),
  method: fc.constantFrom("boundary_layer", "iso6946", "mcadams"), leeward_factor: opt(zeroOr(0.01, 1)),
};

export const ductRunFields = {
  length_m: num(0.5, 100), flow_m3_s: num(0.01, 5), T_entering_C: temp(-10, 60), T_ambient_C: temp(-30, 45),
  RH_ambient_pct: num(5, 100), T_surround_C: opt(temp(-30, 45)), insulation_thickness_m: num(0, 0.1),
  insulation_k_W_mK: num(0.02, 0.1), jacket_emissivity: num(0.03, 0.95),
  location: fc.constantFrom("indoor", "outdoor"), V_wind_m_s: opt(speed(20)), margin_K: opt(zeroOr(0.01, 3)),
};

/** One arbitrary of valid cases per kind. */
export const validCases: Record<string, fc.Arbitrary<Case>> = {
  air_properties: fc.record({ T_C: temp(-50, 150), pressure_Pa: opt(num(60000, 110000)) }).map((c) =>
    strip({ kind: "air_properties", ...c }),
  ),
  plate_forced: fc
    .record({ ...forcedPair, length_m: num(0.01, 50), xFrac: opt(num(0.001, 1)), Re_crit: opt(num(0, 3e6)) })
    .map(({ xFrac, ...c }) =>
      strip({ kind: "plate_forced", ...c, x_m: xFrac === undefined ? undefined : xFrac * c.length_m }),
    ),
  plate_natural: fc
    .record({ ...naturalPair, tilt_deg: num(0, 180), length_m: num(0.01, 30) })
    .map((c) => ({ kind: "plate_natural", ...c })),
  plate_combined: fc
    .record({ ...forcedPair, length_m: num(0.01, 50), tilt_deg: num(0, 180), height_m: num(0.01, 30) })
    .map((c) => ({ kind: "plate_combined", ...c })),
  cylinder_crossflow: fc
    .record({ ...forcedPair, diameter_m: num(0.001, 3) })
    .map((c) => ({ kind: "cylinder_crossflow", ...c })),
  cylinder_natural: fc
    .record({ ...naturalPair, diameter_m: num(0.001, 3) })
    .map((c) => ({ kind: "cylinder_natural", ...c })),
  sphere_forced: fc
    .record({ ...forcedPair, diameter_m: num(0.001, 3) })
    .map((c) => ({ kind: "sphere_forced", ...c })),
  sphere_natural: fc
    .record({ ...naturalPair, diameter_m: num(0.001, 3) })
    .map((c) => ({ kind: "sphere_natural", ...c })),
  duct_internal: fc
    .tuple(shapeDims(0.05, 2), fc.record({ flow_m3_s: num(0.001, 10), T_air_C: temp(), T_wall_C: opt(temp()), roughness_m: opt(num(0, 0.003)) }))
    .map(([dims, c]) => strip({ kind: "duct_internal", ...dims, ...c })),
  wind_at_height: fc
    .record({ V_met_m_s: speed(40), height_m: num(0.5, 600), terrain, law: opt(fc.constantFrom("power", "log")), met_height_m: opt(num(2, 100)) })
    .map((c) => strip({ kind: "wind_at_height", ...c })),
  radiation: fc
    .record({ T_surface_C: temp(-50, 150), T_surround_C: temp(-50, 150), emissivity: num(0, 1) })
    .map((c) => ({ kind: "radiation", ...c })),
  dew_point: fc.record({ T_C: temp(-40, 60), RH_pct: num(0.5, 100) }).map((c) => ({ kind: "dew_point", ...c })),
  surface: fc.record(surfaceFields).map((c) => strip({ kind: "surface", ...c })),
  duct_run: fc
    .tuple(shapeDims(0.15, 1.5), fc.record(ductRunFields))
    .map(([dims, c]) => strip({ kind: "duct_run", ...dims, ...c })),
};

/** A fixed valid case per kind, with every input the contract lists (optional ones included). */
export const sampleCases: Record<string, Case> = {
  air_properties: { kind: "air_properties", T_C: 20, pressure_Pa: 101325 },
  plate_forced: { kind: "plate_forced", T_surface_C: 40, T_air_C: 20, velocity_m_s: 3, length_m: 2, x_m: 1, Re_crit: 5e5 },
  plate_natural: { kind: "plate_natural", T_surface_C: 40, T_air_C: 20, tilt_deg: 90, length_m: 2 },
  plate_combined: { kind: "plate_combined", T_surface_C: 40, T_air_C: 20, velocity_m_s: 1, length_m: 2, tilt_deg: 90, height_m: 3 },
  cylinder_crossflow: { kind: "cylinder_crossflow", T_surface_C: 40, T_air_C: 20, velocity_m_s: 3, diameter_m: 0.3 },
  cylinder_natural: { kind: "cylinder_natural", T_surface_C: 40, T_air_C: 20, diameter_m: 0.3 },
  sphere_forced: { kind: "sphere_forced", T_surface_C: 40, T_air_C: 20, velocity_m_s: 3, diameter_m: 0.3 },
  sphere_natural: { kind: "sphere_natural", T_surface_C: 40, T_air_C: 20, diameter_m: 0.3 },
  duct_internal: { kind: "duct_internal", shape: "rect", width_m: 0.6, height_m: 0.3, flow_m3_s: 0.8, T_air_C: 15, T_wall_C: 20, roughness_m: 0.00009 },
  wind_at_height: { kind: "wind_at_height", V_met_m_s: 5, height_m: 25, terrain: "suburban", law: "power", met_height_m: 10 },
  radiation: { kind: "radiation", T_surface_C: 10, T_surround_C: -5, emissivity: 0.9 },
  dew_point: { kind: "dew_point", T_C: 24, RH_pct: 50 },
  surface: {
    kind: "surface", area_m2: 20, tilt_deg: 90, azimuth_deg: 200, height_m: 6, length_m: 8, panel_height_m: 3,
    R_construction_m2K_W: 2.5, R_si_m2K_W: 0.13, T_inside_C: 21, T_outside_C: -4, V_met_m_s: 6,
    wind_from_deg: 240, terrain: "suburban", law: "power", emissivity: 0.9, absorptance: 0.7, solar_W_m2: 150,
    method: "boundary_layer", leeward_factor: 0.25,
  },
  duct_run: {
    kind: "duct_run", shape: "round", diameter_m: 0.45, length_m: 20, flow_m3_s: 0.9, T_entering_C: 14,
    T_ambient_C: 30, RH_ambient_pct: 60, T_surround_C: 35, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.035,
    jacket_emissivity: 0.9, location: "outdoor", V_wind_m_s: 2, margin_K: 1,
  },
};

/** Inputs the contract makes optional (absent is fine; present must be valid). */
export const optionalInputs = new Set([
  "pressure_Pa", "x_m", "Re_crit", "T_wall_C", "roughness_m", "law", "met_height_m", "R_si_m2K_W",
  "solar_W_m2", "leeward_factor", "T_surround_C", "V_wind_m_s", "margin_K",
]);

/** Inputs that take a word from a list. */
export const wordInputs = new Set(["kind", "shape", "terrain", "law", "method", "location"]);

/**
 * Out-of-physics numbers per input (the contract: negative length, emissivity > 1, RH > 100 …),
 * looked up as "kind.input" first, then "input". A duct run of zero length is a real (empty)
 * run; a plate or panel of zero length has no film coefficient.
 */
export const outOfPhysics: Record<string, number[]> = {
  "duct_run.length_m": [-1],
  length_m: [-1, 0], diameter_m: [-0.1, 0], width_m: [-0.1, 0], height_m: [-1], panel_height_m: [-1, 0],
  area_m2: [-5], flow_m3_s: [-0.1], velocity_m_s: [-1], V_met_m_s: [-1], V_wind_m_s: [-1],
  emissivity: [-0.1, 1.1], jacket_emissivity: [-0.1, 1.1], absorptance: [-0.1, 1.1], RH_pct: [0, -1, 101],
  RH_ambient_pct: [0, -1, 101], insulation_thickness_m: [-0.01], insulation_k_W_mK: [-0.03, 0],
  R_construction_m2K_W: [-1], R_si_m2K_W: [-0.1], pressure_Pa: [-101325, 0], roughness_m: [-0.001],
  T_C: [-300], T_surface_C: [-300], T_air_C: [-300], T_inside_C: [-300], T_outside_C: [-300],
  T_entering_C: [-300], T_ambient_C: [-300], T_surround_C: [-300], solar_W_m2: [-100],
  x_m: [-0.5, 3], margin_K: [],
};
