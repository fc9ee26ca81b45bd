// Deterministic schedules for the engine and CLI benchmarks: surface rows and duct runs, each
// under three design cases, so every run times the same work.

/** Small deterministic generator (mulberry32). */
export function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const pick = <T>(r: () => number, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;
const between = (r: () => number, lo: number, hi: number) => lo + (hi - lo) * r();

const surfaceDesignCases = [
  { T_outside_C: -5, T_inside_C: 20, V_met_m_s: 6, wind_from_deg: 240, solar_W_m2: 0 },
  { T_outside_C: 32, T_inside_C: 24, V_met_m_s: 3, wind_from_deg: 200, solar_W_m2: 700 },
  { T_outside_C: 12, T_inside_C: 21, V_met_m_s: 1.5, wind_from_deg: 90, solar_W_m2: 250 },
];

const ductDesignCases = [
  { T_entering_C: 13, T_ambient_C: 32, RH_ambient_pct: 55, T_surround_C: 45, V_wind_m_s: 2 },
  { T_entering_C: 35, T_ambient_C: -5, RH_ambient_pct: 80, T_surround_C: -12, V_wind_m_s: 5 },
  { T_entering_C: 16, T_ambient_C: 22, RH_ambient_pct: 70, T_surround_C: 22, V_wind_m_s: 0 },
];

/** `rows` surface rows (boundary-layer method) × 3 design cases; with ids "S<row>-<case>" if asked. */
export function surfaceCases(rows: number, withIds = false): Record<string, unknown>[] {
  const r = rng(6946);
  const list = Array.from({ length: rows }, () => ({
    kind: "surface", area_m2: between(r, 2, 200), tilt_deg: pick(r, [0, 15, 35, 90, 90, 90, 180]),
    azimuth_deg: between(r, 0, 360), height_m: between(r, 1, 60), length_m: between(r, 1, 30),
    panel_height_m: between(r, 1, 12), R_construction_m2K_W: between(r, 0.2, 6), T_inside_C: 20,
    T_outside_C: 0, V_met_m_s: 0, wind_from_deg: 0, terrain: pick(r, ["city", "suburban", "open", "water"]),
    law: pick(r, ["power", "log"]), emissivity: between(r, 0.1, 0.95), absorptance: between(r, 0.2, 0.9),
    method: "boundary_layer",
  }));
  return surfaceDesignCases.flatMap((dc, k) => list.map((row, i) => ({ ...(withIds ? { id: `S${i}-${k}` } : {}), ...row, ...dc })));
}

/** `rows` duct runs × 3 design cases (each result includes the minimum-insulation search). */
export function ductCases(rows: number, withIds = false): Record<string, unknown>[] {
  const r = rng(1977);
  const list = Array.from({ length: rows }, () => {
    const round = r() < 0.5;
    const dims = round
      ? { shape: "round", diameter_m: between(r, 0.1, 1.2) }
      : { shape: "rect", width_m: between(r, 0.2, 1.6), height_m: between(r, 0.15, 0.8) };
    return {
      kind: "duct_run", ...dims, length_m: between(r, 2, 60), flow_m3_s: between(r, 0.05, 4),
      insulation_thickness_m: pick(r, [0, 0.013, 0.025, 0.05]), insulation_k_W_mK: between(r, 0.03, 0.045),
      jacket_emissivity: pick(r, [0.05, 0.3, 0.9]), location: pick(r, ["indoor", "outdoor"]),
      margin_K: pick(r, [0, 0.5, 1]), T_entering_C: 0, T_ambient_C: 0, RH_ambient_pct: 50,
    };
  });
  return ductDesignCases.flatMap((dc, k) => list.map((row, i) => ({ ...(withIds ? { id: `D${i}-${k}` } : {}), ...row, ...dc })));
}
