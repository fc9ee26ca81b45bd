// A synthetic schedule in an invented scenario (a three-storey library annexe), for report tests
// and benchmarks: n surfaces on every orientation and several heights, duct runs on the roof and
// in a ceiling void, and three design cases.
import type { Buildup, DesignCase, DuctRunRow, Schedule, SurfaceRow, Zone } from "../../src/calc/index";

export const SAMPLE_CASES: DesignCase[] = [
  { id: "dc-winter", name: "Windy winter design day", kind: "heating", T_outdoor_C: -4, RH_outdoor_pct: 88, V_met_m_s: 8, wind_from_deg: 235, solar_W_m2: {} },
  {
    id: "dc-summer", name: "Sunny summer design day", kind: "cooling", T_outdoor_C: 31, RH_outdoor_pct: 42, V_met_m_s: 3.5, wind_from_deg: 200,
    solar_W_m2: { horizontal: 850, N: 120, NE: 260, E: 430, SE: 470, S: 420, SW: 470, W: 430, NW: 260 },
  },
  { id: "dc-still", name: "Still summer afternoon", kind: "cooling", T_outdoor_C: 29, RH_outdoor_pct: 55, V_met_m_s: 0, wind_from_deg: 0, solar_W_m2: { horizontal: 700, W: 520, SW: 480 } },
];

export function sampleSchedule(surfaces: number, ducts: number): Schedule {
  const zones: Zone[] = [
    { id: "z-read", name: "Reading room", floor_area_m2: 420, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
    { id: "z-stack", name: "Stack room", floor_area_m2: 260, T_heating_C: 18, T_cooling_C: 23, RH_inside_pct: 45 },
    { id: "z-study", name: "Study rooms", floor_area_m2: 180, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
  ];
  const buildups: Buildup[] = [
    { id: "b-wall", name: "Brick cavity wall", layers: [{ material: "brick", thickness_m: 0.1025, k_W_mK: 0.77 }, { material: "mineral wool", thickness_m: 0.15, k_W_mK: 0.035 }, { material: "block", thickness_m: 0.1, k_W_mK: 0.19 }], R_direct_m2K_W: null, absorptance: 0.65, emissivity: 0.9 },
    { id: "b-roof", name: "Warm flat roof", layers: [{ material: "PIR board", thickness_m: 0.14, k_W_mK: 0.022 }], R_direct_m2K_W: null, absorptance: 0.85, emissivity: 0.9 },
    { id: "b-panel", name: "Spandrel panel", layers: [], R_direct_m2K_W: 1.8, absorptance: 0.4, emissivity: 0.85 },
  ];
  const rows: SurfaceRow[] = [];
  for (let i = 0; i < surfaces; i++) {
    const roof = i % 7 === 6;
    rows.push({
      id: `s-${i + 1}`, zone_id: zones[i % 3].id, buildup_id: roof ? "b-roof" : i % 5 === 4 ? "b-panel" : "b-wall",
      label: `S-${String(i + 1).padStart(3, "0")} ${roof ? "Roof bay" : "Wall panel"} ${i + 1}`,
      area_m2: 6 + (i % 9) * 2.5, tilt_deg: roof ? (i % 2 ? 0 : 15) : 90, azimuth_deg: (i * 45) % 360, height_m: 2 + (i % 4) * 3.5,
      length_m: 4 + (i % 6) * 3, panel_height_m: roof ? 6 : 3, method: i % 11 === 10 ? "iso6946" : null, absorptance: null, emissivity: null,
    });
  }
  const ductRuns: DuctRunRow[] = [];
  for (let i = 0; i < ducts; i++) {
    const outdoor = i % 2 === 0;
    const round = i % 3 !== 2;
    ductRuns.push({
      id: `d-${i + 1}`, zone_id: zones[i % 3].id, label: `D-${String(i + 1).padStart(2, "0")} ${outdoor ? "Roof" : "Ceiling void"} supply`,
      shape: round ? "round" : "rect", diameter_m: round ? 0.25 + (i % 4) * 0.1 : null, width_m: round ? null : 0.6, height_m: round ? null : 0.3,
      length_m: 8 + (i % 5) * 6, flow_m3_s: 0.3 + (i % 4) * 0.25, T_entering_heating_C: 32, T_entering_cooling_C: 13, location: outdoor ? "outdoor" : "indoor",
      T_surround_C: outdoor ? null : 27, RH_surround_pct: null, elevation_m: outdoor ? 13 : null, insulation_thickness_m: i % 4 === 3 ? 0 : 0.025,
      insulation_k_W_mK: 0.037, jacket_emissivity: outdoor ? 0.25 : 0.9, margin_K: 1,
    });
  }
  return { site: { altitude_m: 85, terrain: "suburban", wind_law: "power", method: "boundary_layer" }, zones, buildups, surfaces: rows, ductRuns };
}
