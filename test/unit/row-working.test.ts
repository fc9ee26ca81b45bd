// A schedule row's working carries what the schedule adds to its surface case: the spread over
// the three exterior methods (chart series with the chosen one marked) and the inside-surface check
// against the zone's air. Values are compared with scheduleResults (the grid's and report's source).
import { describe, expect, test } from "vitest";
import { scheduleResults, surfaceRowWorking, type DesignCase, type Schedule } from "@/calc/index";

const winter: DesignCase = { id: "wi", name: "Winter", kind: "heating", T_outdoor_C: -4, RH_outdoor_pct: 90, V_met_m_s: 5, wind_from_deg: 225, solar_W_m2: {} };
const base = { area_m2: 25, azimuth_deg: 180, height_m: 6, length_m: 8, panel_height_m: 3, absorptance: null, emissivity: null };
const s: Schedule = {
  site: { altitude_m: 50, terrain: "suburban", wind_law: "power", method: "boundary_layer" },
  zones: [{ id: "z", name: "Hall", floor_area_m2: 200, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 50 }],
  buildups: [{ id: "skin", name: "Single skin", layers: [], R_direct_m2K_W: 0.01, absorptance: 0.5, emissivity: 0.9 }],
  surfaces: [
    { ...base, id: "skin", zone_id: "z", buildup_id: "skin", label: "Single-skin panel", tilt_deg: 90, method: "iso6946" },
    { ...base, id: "ground", zone_id: "z", buildup_id: "skin", label: "Slab", tilt_deg: 180, method: null, exposed_to: "ground" },
  ],
  ductRuns: [],
};
const at = (id: string) => surfaceRowWorking(s.site, winter, s.zones[0]!, s.buildups[0]!, s.surfaces.find((r) => r.id === id)!);
const value = (w: ReturnType<typeof at>, section: string, symbol: string) => w.lines.find((l) => l.section === section && l.symbol === symbol)?.value;

describe("schedule row working", () => {
  const w = at("skin");
  const row = scheduleResults(s, winter).surfaces[0]!;

  test("the method_spread series has the three methods, the row's own one marked, with the schedule's numbers", () => {
    const pts = w.charts.method_spread!;
    expect(pts.map((p) => p.method)).toEqual(["boundary_layer", "iso6946", "mcadams"]);
    expect(pts.filter((p) => p.chosen).map((p) => p.method)).toEqual(["iso6946"]);
    for (const p of pts) {
      expect(p.h_o_W_m2K).toBe(row.spread!.by_method[p.method].h_o_W_m2K);
      expect(p.Q_W).toBe(row.spread!.by_method[p.method].Q_W);
    }
    expect(value(w, "Spread between methods", "sensitive")).toBe(row.spread!.sensitive);
  });

  test("the Inside surface section gives T_si, T_dp, f_Rsi against f_Rsi,min and the verdict", () => {
    expect(value(w, "Inside surface", "T_si")).toBe(row.inside!.T_si_C);
    expect(value(w, "Inside surface", "T_dp,i")).toBe(row.inside!.T_dp_inside_C);
    expect(value(w, "Inside surface", "f_Rsi")).toBe(row.inside!.f_Rsi);
    expect(value(w, "Inside surface", "f_Rsi,min")).toBe(row.inside!.f_Rsi_min);
    expect(value(w, "Inside surface", "mould")).toBe(true);
    expect(String(value(w, "Inside surface", "inside"))).toMatch(/^(mould|condensation) risk/);
  });

  test("a surface over ground is not computed, with the schedule's message", () => {
    const g = at("ground");
    expect(g.result.ok).toBe(false);
    expect(!g.result.ok && g.result.error).toMatchObject({ code: "not_computed", field: "exposed_to" });
    expect(g.lines).toEqual([]);
  });
});
