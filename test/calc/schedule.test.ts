// The schedule mapping: which temperatures, wind, solar and resistance a row sees in a design case.
// Expected values follow by hand from the definitions in src/calc/schedule (definition), with
// material conductivities as common practice.
import { describe, expect, test } from "vitest";
import {
  buildupResistance,
  calculateCase,
  ductRunCase,
  insideSurfaceResistance,
  pressureAtAltitude,
  scheduleResults,
  solarOnSurface,
  surfaceCase,
  type Buildup,
  type DesignCase,
  type DuctRunRow,
  type Site,
  type SurfaceRow,
  type Zone,
} from "../../src/calc/index";
import { expectClose, num, run } from "./helpers";

const site: Site = { altitude_m: 120, terrain: "suburban", wind_law: "power", method: "boundary_layer" };
const winter: DesignCase = { id: "dc-w", name: "Windy winter", kind: "heating", T_outdoor_C: -4, RH_outdoor_pct: 85, V_met_m_s: 7, wind_from_deg: 240, solar_W_m2: {} };
const summer: DesignCase = {
  id: "dc-s", name: "Sunny summer", kind: "cooling", T_outdoor_C: 31, RH_outdoor_pct: 45, V_met_m_s: 3, wind_from_deg: 200,
  solar_W_m2: { horizontal: 820, N: 110, NE: 250, E: 420, SE: 480, S: 430, SW: 480, W: 420, NW: 250 },
};
const zone: Zone = { id: "z1", name: "Reading room", floor_area_m2: 250, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 };
// Brick 102.5 mm (k 0.77) + mineral wool 150 mm (k 0.035): common-practice conductivities.
const wall: Buildup = {
  id: "b1", name: "Brick and wool",
  layers: [{ material: "brick", thickness_m: 0.1025, k_W_mK: 0.77 }, { material: "mineral wool", thickness_m: 0.15, k_W_mK: 0.035 }],
  R_direct_m2K_W: null, absorptance: 0.65, emissivity: 0.9,
};
const row: SurfaceRow = {
  id: "s1", zone_id: "z1", buildup_id: "b1", label: "West wall", area_m2: 36, tilt_deg: 90, azimuth_deg: 270,
  height_m: 4, length_m: 12, panel_height_m: 3, method: null, absorptance: null, emissivity: null,
};

describe("build-up resistance", () => {
  test("layers add as Σ t/k; a direct R stands when there are no layers", () => {
    expect(buildupResistance(wall)).toBeCloseTo(0.1025 / 0.77 + 0.15 / 0.035, 12); // 4.419 m²K/W
    expect(buildupResistance({ layers: [], R_direct_m2K_W: 2.2 })).toBe(2.2);
  });
});

describe("solar on a surface", () => {
  test.each([
    ["due west wall", 90, 270, 420],
    ["south-south-west wall, halfway between S and SW", 90, 202.5, 455],
    ["north wall", 90, 0, 110],
    ["flat roof", 0, 0, 820],
    ["roof pitched 45° to the south, halfway between horizontal and S", 45, 180, 625],
    ["soffit facing down", 180, 180, 0],
  ])("%s", (_label, tilt, azimuth, expected) => {
    expect(solarOnSurface(summer.solar_W_m2, tilt, azimuth)).toBeCloseTo(expected, 9);
  });
  test("an absent orientation counts as no sun", () => {
    expect(solarOnSurface({}, 90, 180)).toBe(0);
  });
});

describe("inside surface resistance by the direction of heat flow", () => {
  // ISO 6946:2017 Table 7 (from memory): R_si 0.10 upwards, 0.13 horizontal, 0.17 downwards;
  // "horizontal" covers heat flow within ±30° of the horizontal plane.
  test.each([
    ["wall, heating", 90, 21, -4, 0.13],
    ["wall, summer", 90, 24, 31, 0.13],
    ["flat roof, heating (heat flows up)", 0, 21, -4, 0.1],
    ["flat roof, summer (heat flows down)", 0, 24, 31, 0.17],
    ["35° pitched roof, heating", 35, 21, -4, 0.1],
    ["60° slope: 30° from the horizontal plane, still horizontal", 60, 21, -4, 0.13],
    ["soffit over outside air, heating (heat flows down)", 180, 21, -4, 0.17],
    ["soffit over outside air, summer (heat flows up)", 180, 24, 31, 0.1],
  ] as const)("%s → %f", (_what, tilt, Tin, Tout, R) => {
    expect(insideSurfaceResistance(tilt, Tin, Tout)).toBe(R);
  });
  test("the surface case carries it, and the roof's U follows", () => {
    const roof = { ...row, tilt_deg: 0 };
    expect(surfaceCase(site, winter, zone, wall, roof).R_si_m2K_W).toBe(0.1);
    expect(surfaceCase(site, summer, zone, wall, roof).R_si_m2K_W).toBe(0.17);
    const r = calculateCase(surfaceCase(site, winter, zone, wall, roof));
    expect(r.ok).toBe(true);
    if (r.ok) expect(1 / (r.U_W_m2K as number)).toBeCloseTo(0.1 + buildupResistance(wall) + 1 / (r.h_o_W_m2K as number), 9);
  });
});

describe("surface case", () => {
  test("heating case: heating set point, outdoor air, site wind and pressure, build-up R and finishes", () => {
    const c = surfaceCase(site, winter, zone, wall, row);
    expect(c).toMatchObject({
      kind: "surface", T_inside_C: 21, T_outside_C: -4, V_met_m_s: 7, wind_from_deg: 240, terrain: "suburban", law: "power",
      absorptance: 0.65, emissivity: 0.9, solar_W_m2: 0, method: "boundary_layer",
    });
    expect(c.R_construction_m2K_W).toBeCloseTo(buildupResistance(wall), 12);
    expect(c.pressure_Pa).toBe(pressureAtAltitude(120));
  });
  test("cooling case: cooling set point and the irradiance for the face; row overrides win", () => {
    const c = surfaceCase(site, summer, zone, wall, { ...row, method: "iso6946", absorptance: 0.3 });
    expect(c).toMatchObject({ T_inside_C: 24, T_outside_C: 31, solar_W_m2: 420, method: "iso6946", absorptance: 0.3, emissivity: 0.9 });
    const r = calculateCase(c);
    expect(r.ok).toBe(true);
    // A sunlit wall in summer gains heat: q negative by the contract's sign.
    if (r.ok) expect(r.q_W_m2 as number).toBeLessThan(0);
  });
});

const duct: DuctRunRow = {
  id: "d1", zone_id: "z1", label: "Roof supply", shape: "round", diameter_m: 0.4, width_m: null, height_m: null, length_m: 18,
  flow_m3_s: 0.7, T_entering_heating_C: 35, T_entering_cooling_C: 13, location: "outdoor", T_surround_C: null, RH_surround_pct: null,
  elevation_m: 12, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.037, jacket_emissivity: 0.9, margin_K: 1,
};

describe("duct-run case", () => {
  test("outdoor run: outdoor air and RH, wind at its elevation, entering temperature by the case's kind", () => {
    const c = ductRunCase(site, summer, zone, duct);
    expect(c).toMatchObject({ T_entering_C: 13, T_ambient_C: 31, RH_ambient_pct: 45, location: "outdoor", diameter_m: 0.4 });
    // Power law (contract): 3 m/s at 10 m open → 12 m suburban: 3 (270/10)^0.14 (12/370)^0.22.
    expect(c.V_wind_m_s).toBeCloseTo(3 * Math.pow(27, 0.14) * Math.pow(12 / 370, 0.22), 9);
    expect(ductRunCase(site, winter, zone, duct).T_entering_C).toBe(35);
  });
  test("outdoor run: radiates to half sky (Swinbank) and half ground at the outdoor air temperature", () => {
    // Swinbank (1963), T_sky = 0.0552 T_air^1.5 (K); F_sky of a horizontal cylinder ½ (common
    // practice, as a vertical plane: Duffie & Beckman §3.16); T_r⁴ = ½ T_sky⁴ + ½ T_ground⁴.
    const T = -4 + 273.15;
    const Tsky = 0.0552 * Math.pow(T, 1.5); // 243.7 K
    const expected = Math.pow(0.5 * Tsky ** 4 + 0.5 * T ** 4, 0.25) - 273.15; // about −15.8 °C
    const c = ductRunCase(site, winter, zone, duct);
    expect(c.T_surround_C).toBeCloseTo(expected, 9);
    expect(c.T_surround_C).toBeLessThan(-14);
    expect(c.T_surround_C).toBeGreaterThan(-18);
    // The cold sky takes the jacket below what air alone would leave it at.
    const withSky = calculateCase(c);
    const airOnly = calculateCase({ ...c, T_surround_C: c.T_ambient_C });
    expect(withSky.ok && airOnly.ok).toBe(true);
    if (withSky.ok && airOnly.ok) {
      expect(withSky.T_surface_leaving_C as number).toBeLessThan(airOnly.T_surface_leaving_C as number);
      expect(withSky.h_o_rad_W_m2K as number).toBeGreaterThan(0);
    }
    // Indoors, or in a space of its own temperature, no sky.
    expect("T_surround_C" in ductRunCase(site, winter, zone, { ...duct, location: "indoor" })).toBe(false);
    expect("T_surround_C" in ductRunCase(site, winter, zone, { ...duct, T_surround_C: 5 })).toBe(false);
  });
  test("run in a ceiling void: the void's temperature, the zone air's moisture (its dew point), no wind", () => {
    const c = ductRunCase(site, summer, zone, { ...duct, location: "indoor", T_surround_C: 28, shape: "rect", diameter_m: null, width_m: 0.6, height_m: 0.3 });
    expect(c).toMatchObject({ T_ambient_C: 28, V_wind_m_s: 0, width_m: 0.6, height_m: 0.3 });
    expect("diameter_m" in c).toBe(false);
    // The zone air, 24 °C at 50 %, has a dew point of 12.95 °C (psychrolib 1.1.1,
    // GetTDewPointFromRelHum(24, 0.5)); the void carries that moisture, not 50 % at 28 °C
    // (whose dew point would be 16.6 °C, ASHRAE psychrometric chart, from memory).
    const dp = run({ kind: "dew_point", T_C: c.T_ambient_C, RH_pct: c.RH_ambient_pct });
    expectClose(num(dp, "T_dp_C"), 12.95, 0, 0.05);
    expect(c.RH_ambient_pct).toBeLessThan(50);
  });
  test("a void colder than the zone air's dew point is saturated (RH 100 %), the unsafe side of v1", () => {
    const c = ductRunCase(site, summer, zone, { ...duct, location: "indoor", T_surround_C: 10 });
    expect(c.RH_ambient_pct).toBe(100);
  });
  test("a run inside the zone it serves crosses the zone air: its set point and RH in the case", () => {
    const c = ductRunCase(site, winter, zone, { ...duct, location: "outdoor", T_surround_C: 5, in_served_zone: true });
    expect(c).toMatchObject({ T_ambient_C: 21, RH_ambient_pct: 50, V_wind_m_s: 0, location: "indoor" });
    expect("T_surround_C" in c).toBe(false);
  });
});

describe("duct-run surround by the design case's kind", () => {
  // Expected values are the row's own inputs, picked by the rule stated in the task and in
  // src/calc/schedule/types.ts (definition): heating takes T_surround_C; cooling takes
  // T_surround_cooling_C, or T_surround_C when that is blank; both blank = the outdoor air.
  const voidRun: DuctRunRow = { ...duct, location: "indoor", elevation_m: null, T_surround_C: 19, T_surround_cooling_C: 28 };
  const swinbank = (T_C: number) => {
    // Swinbank (1963) T_sky = 0.0552 T^1.5 K, half sky and half ground (as in the test above).
    const T = T_C + 273.15;
    return Math.pow(0.5 * (0.0552 * Math.pow(T, 1.5)) ** 4 + 0.5 * T ** 4, 0.25) - 273.15;
  };

  test.each([
    ["cooling, both given: the cooling surround", summer, { T_surround_C: 19, T_surround_cooling_C: 28 }, 28],
    ["heating, both given: the heating surround", winter, { T_surround_C: 19, T_surround_cooling_C: 28 }, 19],
    ["cooling, cooling surround blank: the heating one", summer, { T_surround_C: 19, T_surround_cooling_C: null }, 19],
    ["cooling, cooling surround absent (a revision issued before it existed): the heating one", summer, { T_surround_C: 19, T_surround_cooling_C: undefined }, 19],
    ["heating, only a cooling surround: the outdoor air (−4 °C)", winter, { T_surround_C: null, T_surround_cooling_C: 28 }, -4],
    ["cooling, only a cooling surround: that surround", summer, { T_surround_C: null, T_surround_cooling_C: 0 }, 0],
  ] as const)("indoor run, %s", (_label, dc, surround, expected) => {
    const c = ductRunCase(site, dc, zone, { ...voidRun, ...surround });
    expect(c.T_ambient_C).toBe(expected);
    expect(c.V_wind_m_s).toBe(0);
    expect("T_surround_C" in c).toBe(false);
  });

  test("humidity follows the surround of the case: the zone's RH in a space, the outdoor RH in the outdoor air", () => {
    // Zone RH 50 %, winter outdoor 85 % (fixtures above).
    const onlyCooling = { ...voidRun, T_surround_C: null, T_surround_cooling_C: 28 };
    // 28 °C carrying the 24 °C / 50 % zone air's moisture: 50 % × p_ws(24)/p_ws(28), with the
    // saturation pressures 2985.0 and 3781.9 Pa (ASHRAE Fundamentals 2017, ch. 1, table 3, from memory).
    expectClose(ductRunCase(site, summer, zone, onlyCooling).RH_ambient_pct, (50 * 2985.0) / 3781.9, 0.003);
    expect(ductRunCase(site, winter, zone, onlyCooling).RH_ambient_pct).toBe(85);
  });

  test("both blank: an outdoor run sees the outdoor air and radiates to sky and ground in either kind of case", () => {
    const open = { ...duct, T_surround_C: null, T_surround_cooling_C: null };
    for (const dc of [summer, winter]) {
      const c = ductRunCase(site, dc, zone, open);
      expect(c.T_ambient_C).toBe(dc.T_outdoor_C);
      expect(c.RH_ambient_pct).toBe(dc.RH_outdoor_pct);
      expect(c.T_surround_C).toBeCloseTo(swinbank(dc.T_outdoor_C), 9);
    }
  });

  test("an outdoor run given a cooling surround only (say a summer enclosure) sees no sky in cooling, the sky in heating", () => {
    const enclosed = { ...duct, T_surround_C: null, T_surround_cooling_C: 35 };
    const cool = ductRunCase(site, summer, zone, enclosed);
    expect(cool.T_ambient_C).toBe(35);
    expect("T_surround_C" in cool).toBe(false);
    const heat = ductRunCase(site, winter, zone, enclosed);
    expect(heat.T_ambient_C).toBe(-4);
    expect(heat.T_surround_C).toBeCloseTo(swinbank(-4), 9);
  });

  test("a warmer cooling surround gains more heat into cold supply air (direction only)", () => {
    // Q_W is the heat gained by the air (contract sign); 13 °C supply in a 28 °C void against 19 °C.
    const warm = calculateCase(ductRunCase(site, summer, zone, voidRun));
    const cool = calculateCase(ductRunCase(site, summer, zone, { ...voidRun, T_surround_cooling_C: null }));
    expect(warm.ok && cool.ok).toBe(true);
    if (warm.ok && cool.ok) {
      expect(cool.Q_W as number).toBeGreaterThan(0);
      expect(warm.Q_W as number).toBeGreaterThan(cool.Q_W as number);
    }
  });
});

describe("schedule results", () => {
  test("every row is computed and the zone total is the sum of its rows by sign", () => {
    const second: SurfaceRow = { ...row, id: "s2", label: "North wall", azimuth_deg: 0, area_m2: 20 };
    const res = scheduleResults({ site, zones: [zone], buildups: [wall], surfaces: [row, second], ductRuns: [duct] }, winter);
    expect(res.surfaces.map((s) => s.result.ok)).toEqual([true, true]);
    expect(res.duct_runs[0].result.ok).toBe(true);
    const q = res.surfaces.map((s) => (s.result.ok ? (s.result.Q_W as number) : NaN));
    const d = res.duct_runs[0].result.ok ? (res.duct_runs[0].result.Q_W as number) : NaN;
    expect(d).toBeLessThan(0); // warm supply air losing heat on a winter roof
    expect(res.zones[0].loss_W).toBeCloseTo(q[0] + q[1] - d, 9);
    expect(res.zones[0].loss_W_m2).toBeCloseTo(res.zones[0].loss_W / 250, 12);
  });
  test("a row pointing at a missing zone or build-up answers an error naming the field, the others still compute", () => {
    const res = scheduleResults({ site, zones: [zone], buildups: [wall], surfaces: [{ ...row, buildup_id: "nope" }, row], ductRuns: [] }, winter);
    expect(res.surfaces[0].result).toMatchObject({ ok: false, error: { field: "buildup_id" } });
    expect(res.surfaces[1].result.ok).toBe(true);
  });
});
