// The schedule's v2 additions: cloud cover per design case, the inside-surface check of
// ISO 13788, the spread between exterior methods, surfaces over ground, ducts inside the zone
// they serve and distribution losses, and the exclusions printed with every total. Expected
// values are worked by hand from the standards and definitions named beside them.
import { describe, expect, test } from "vitest";
import {
  TOTAL_EXCLUSIONS,
  ductRunCase,
  insideSurfaceCheck,
  scheduleResults,
  surfaceCase,
  type Buildup,
  type DesignCase,
  type DuctRunRow,
  type Schedule,
  type SurfaceRow,
  type Zone,
} from "../../src/calc/index";
import { expectClose } from "./helpers";

const winter: DesignCase = { id: "w", name: "Winter", kind: "heating", T_outdoor_C: -4, RH_outdoor_pct: 85, V_met_m_s: 7, wind_from_deg: 240, solar_W_m2: {} };
const zone: Zone = { id: "z1", name: "Studio", floor_area_m2: 100, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 50 };
const wall: Buildup = { id: "b1", name: "Wall", layers: [], R_direct_m2K_W: 2.5, absorptance: 0.6, emissivity: 0.9 };
const thin: Buildup = { id: "b2", name: "Single skin", layers: [], R_direct_m2K_W: 0.05, absorptance: 0.6, emissivity: 0.9 };
const surface = (over: Partial<SurfaceRow> = {}): SurfaceRow => ({
  id: "s1", zone_id: "z1", buildup_id: "b1", label: "West wall", area_m2: 30, tilt_deg: 90, azimuth_deg: 240,
  height_m: 6, length_m: 10, panel_height_m: 3, method: null, absorptance: null, emissivity: null, ...over,
});
const duct = (over: Partial<DuctRunRow> = {}): DuctRunRow => ({
  id: "d1", zone_id: "z1", label: "Supply", shape: "round", diameter_m: 0.4, width_m: null, height_m: null, length_m: 20,
  flow_m3_s: 0.6, T_entering_heating_C: 35, T_entering_cooling_C: 13, location: "indoor", T_surround_C: 8,
  RH_surround_pct: null, elevation_m: null, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.04, jacket_emissivity: 0.9, margin_K: 0, ...over,
});
const schedule = (surfaces: SurfaceRow[], ductRuns: DuctRunRow[] = []): Schedule => ({
  site: { altitude_m: 0, terrain: "suburban", wind_law: "power", method: "iso6946" },
  zones: [zone],
  buildups: [wall, thin],
  surfaces,
  ductRuns,
});

describe("cloud cover per design case", () => {
  test("reaches every surface and the sky of outdoor ducts; absent is clear (0)", () => {
    const site = schedule([]).site;
    expect(surfaceCase(site, winter, zone, wall, surface()).cloud_cover).toBe(0);
    expect(surfaceCase(site, { ...winter, cloud_cover: 0.7 }, zone, wall, surface()).cloud_cover).toBe(0.7);
    // Overcast (1): the sky radiates at the outdoor air temperature (contract v2), so half sky
    // and half ground are both at −4 °C.
    const overcast = ductRunCase(site, { ...winter, cloud_cover: 1 }, zone, duct({ location: "outdoor", T_surround_C: null }));
    expectClose(overcast.T_surround_C as number, -4, 0, 1e-9);
  });
});

describe("inside-surface check (ISO 13788:2012, §5)", () => {
  test("20 °C / 50 % inside, 0 °C outside: T_si,min ≈ 12.6 °C and f_Rsi,min ≈ 0.63", () => {
    // Hand calculation with ASHRAE saturation pressures (Fundamentals 2017, ch. 1, from memory):
    // p_v = 0.5 × 2339 = 1169.6 Pa; mould at 80 % surface RH → p_sat(T_si,min) = 1462 Pa, which lies
    // between p_ws(12 °C) = 1403 and p_ws(13 °C) = 1498 Pa: T_si,min ≈ 12.62 °C; f = 12.62/20.
    const c = insideSurfaceCheck(10, 0.13, 20, 50, 0);
    expectClose(c.T_si_min_C, 12.62, 0, 0.05);
    expectClose(c.f_Rsi_min as number, 0.631, 0, 0.003);
    // T_si = 20 − 10 × 0.13 = 18.7 °C; f_Rsi = 18.7/20 = 0.935 (definition).
    expectClose(c.T_si_C, 18.7, 1e-12);
    expectClose(c.f_Rsi as number, 0.935, 1e-12);
    expect(c.mould_risk).toBe(false);
    expect(c.condensation_risk).toBe(false);
    // The zone air's dew point, 9.26 °C (psychrolib 1.1.1, GetTDewPointFromRelHum(20, 0.5), from memory).
    expectClose(c.T_dp_inside_C, 9.26, 0, 0.05);
  });

  test("a poor surface (T_si 11 °C) is at risk of mould but not of condensation; at 8 °C of both", () => {
    const q = (20 - 11) / 0.13;
    const a = insideSurfaceCheck(q, 0.13, 20, 50, 0);
    expect(a.mould_risk).toBe(true);
    expect(a.condensation_risk).toBe(false);
    const b = insideSurfaceCheck((20 - 8) / 0.13, 0.13, 20, 50, 0);
    expect(b.mould_risk && b.condensation_risk).toBe(true);
  });

  test("no factor when inside and outside are within 1 K (it would divide by nearly 0)", () => {
    const c = insideSurfaceCheck(0.5, 0.13, 20, 50, 19.5);
    expect(c.f_Rsi).toBeNull();
    expect(c.f_Rsi_min).toBeNull();
  });

  test("every computed surface row carries it, from its own q and R_si", () => {
    const r = scheduleResults(schedule([surface(), surface({ id: "s2", buildup_id: "b2" })]), winter);
    for (const row of r.surfaces) {
      expect(row.result.ok).toBe(true);
      const q = (row.result as unknown as { q_W_m2: number }).q_W_m2;
      expectClose(row.inside!.T_si_C, 20 - q * 0.13, 1e-12);
    }
    // A single skin of R 0.05 in −4 °C wind is cold inside: mould risk flagged; the wall is safe.
    expect(r.surfaces[1].inside!.mould_risk).toBe(true);
    expect(r.surfaces[0].inside!.mould_risk).toBe(false);
  });
});

describe("spread between the exterior methods", () => {
  test("each method's h_o and Q, the band, and the chosen one inside it", () => {
    const r = scheduleResults(schedule([surface()]), winter).surfaces[0];
    const s = r.spread!;
    const chosen = r.result as unknown as { h_o_W_m2K: number; Q_W: number };
    expect(Object.keys(s.by_method).sort()).toEqual(["boundary_layer", "iso6946", "mcadams"]);
    expect(s.by_method.iso6946.Q_W).toBe(chosen.Q_W);
    for (const m of Object.values(s.by_method)) {
      expect(m.h_o_W_m2K).toBeGreaterThanOrEqual(s.h_o_min_W_m2K);
      expect(m.h_o_W_m2K).toBeLessThanOrEqual(s.h_o_max_W_m2K);
    }
    expectClose(s.Q_spread_ratio as number, (s.Q_max_W - s.Q_min_W) / Math.abs(chosen.Q_W), 1e-12);
  });

  test("a winter wall (R 2.5) is not method-sensitive; a sunlit roof in summer is (its sol-air temperature hangs on h_o)", () => {
    // Winter: R_si + R = 2.63 m²K/W against 1/h_o of 0.04–0.10: U moves by about 2 %. Summer roof
    // under 820 W/m² with α 0.6: αG/h_o is about 492/h_o K, 36 K at h_o 13.6 and 28 K at 17.8, so the
    // heat gain moves by far more than 10 % between methods (definitions of the contract).
    const r = scheduleResults(schedule([surface()]), winter);
    expect(r.surfaces[0].spread!.sensitive).toBe(false);
    const summer: DesignCase = { id: "s", name: "Summer", kind: "cooling", T_outdoor_C: 31, RH_outdoor_pct: 45, V_met_m_s: 3, wind_from_deg: 200, solar_W_m2: { horizontal: 820 } };
    const roof = scheduleResults(schedule([surface({ tilt_deg: 0, azimuth_deg: 0 })]), summer).surfaces[0].spread!;
    expect(roof.sensitive).toBe(true);
    expect(roof.Q_spread_ratio as number).toBeGreaterThan(0.1);
  });
});

describe("method-sensitive needs more than 1 W/m² of spread (common practice: within a U-value's own uncertainty)", () => {
  test("a large share of a tiny net flow is not method-sensitive", () => {
    // A summer wall whose sun and sky nearly cancel its U·ΔT: Q small, its spread a large share
    // of it, yet a fraction of a watt per square metre.
    const summer: DesignCase = { id: "s", name: "Summer", kind: "cooling", T_outdoor_C: 24, RH_outdoor_pct: 45, V_met_m_s: 3, wind_from_deg: 200, solar_W_m2: { N: 60 }, cloud_cover: 1 };
    const r = scheduleResults(schedule([surface({ azimuth_deg: 0 })]), { ...summer }).surfaces[0];
    const s = r.spread!;
    const perArea = (s.Q_max_W - s.Q_min_W) / 30;
    expect(perArea).toBeLessThan(1);
    expect(s.Q_spread_ratio as number).toBeGreaterThan(0.1);
    expect(s.sensitive).toBe(false);
  });
});

describe("surfaces over ground", () => {
  test("are not computed, say why, and stay out of the zone totals", () => {
    const floor = surface({ id: "f1", tilt_deg: 180, exposed_to: "ground" });
    const r = scheduleResults(schedule([surface(), floor]), winter);
    const f = r.surfaces[1].result;
    expect(f.ok).toBe(false);
    if (!f.ok) expect(f.error).toMatchObject({ code: "not_computed", field: "exposed_to" });
    const only = scheduleResults(schedule([surface()]), winter);
    expect(r.zones[0].loss_W).toBe(only.zones[0].loss_W);
  });
});

describe("duct runs in the totals: distribution losses on their own line, runs inside their zone left out", () => {
  test("a run through a cold void is a distribution loss; the same run inside its zone adds nothing", () => {
    const cold = scheduleResults(schedule([surface()], [duct()]), winter);
    const inside = scheduleResults(schedule([surface()], [duct({ in_served_zone: true })]), winter);
    const none = scheduleResults(schedule([surface()]), winter);
    const Q = (cold.duct_runs[0].result as unknown as { Q_W: number }).Q_W;
    expect(Q).toBeLessThan(0);
    expectClose(cold.zones[0].ducts_loss_W, -Q, 1e-12);
    expectClose(cold.zones[0].loss_W, none.zones[0].loss_W - Q, 1e-12);
    expect(inside.zones[0].loss_W).toBe(none.zones[0].loss_W);
    expect(inside.zones[0].ducts_loss_W).toBe(0);
    // Heat the run gives to its own zone is reported for reference: −Q of the air.
    const Qin = (inside.duct_runs[0].result as unknown as { Q_W: number }).Q_W;
    expectClose(inside.zones[0].ducts_in_zone_W, -Qin, 1e-12);
  });
});

describe("exclusions printed with every total", () => {
  test("name ventilation and infiltration, thermal bridges, ground floors, solar through glazing and thermal mass", () => {
    const text = TOTAL_EXCLUSIONS.map((e) => e.text).join(" | ");
    for (const w of [/ventilation and infiltration/, /thermal bridges/, /ground floors/, /solar gain through glazing/, /thermal mass/]) expect(text).toMatch(w);
  });
});
