// The computed columns as a person reads them (grid and export alike): the bands over the three
// exterior methods, the method-sensitive flag, the inside-surface check, the quick filters and
// the note of a row that is not computed. Rows are computed by the engine (scheduleResults); the
// expected words follow from the engine's own flags, never from numbers typed in here.
import { describe, expect, test } from "vitest";
import { scheduleResults, type DesignCase, type Schedule } from "@/calc/index";
import { passesRowFilter } from "@/components/grid/grid-context";
import { SURFACE_RESULTS, insideRiskText, resultBand, resultHeader, resultValue, rowProblem, sensitivityText } from "@/schedule/result-columns";
import { toDisplay } from "@/units/units";

const col = (key: string) => SURFACE_RESULTS.find((c) => c.key === key)!;

// The brief's cases: a sunny roof in summer (tilt 0, α 0.6, 820 W/m² horizontal, 31 °C out, 24 °C in, R 2.5)
// and a single-skin panel (R 0.01) in a −4 °C winter against a 20 °C / 50 % zone.
const summer: DesignCase = { id: "su", name: "Summer", kind: "cooling", T_outdoor_C: 31, RH_outdoor_pct: 40, V_met_m_s: 3, wind_from_deg: 180, solar_W_m2: { horizontal: 820 } };
const winter: DesignCase = { id: "wi", name: "Winter", kind: "heating", T_outdoor_C: -4, RH_outdoor_pct: 90, V_met_m_s: 5, wind_from_deg: 225, solar_W_m2: {} };
const base = { area_m2: 25, azimuth_deg: 180, height_m: 6, length_m: 8, panel_height_m: 3, method: null, absorptance: null, emissivity: null };
const schedule: Schedule = {
  site: { altitude_m: 50, terrain: "suburban", wind_law: "power", method: "boundary_layer" },
  zones: [{ id: "z", name: "Hall", floor_area_m2: 200, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 50 }],
  buildups: [
    { id: "roof", name: "Roof", layers: [], R_direct_m2K_W: 2.5, absorptance: 0.6, emissivity: 0.9 },
    { id: "skin", name: "Single skin", layers: [], R_direct_m2K_W: 0.01, absorptance: 0.5, emissivity: 0.9 },
    { id: "wall", name: "Wall", layers: [], R_direct_m2K_W: 3, absorptance: 0.5, emissivity: 0.9 },
  ],
  surfaces: [
    { ...base, id: "roof", zone_id: "z", buildup_id: "roof", label: "Sunny roof", tilt_deg: 0 },
    { ...base, id: "skin", zone_id: "z", buildup_id: "skin", label: "Single-skin panel", tilt_deg: 90 },
    { ...base, id: "wall", zone_id: "z", buildup_id: "wall", label: "Wall", tilt_deg: 90 },
    { ...base, id: "ground", zone_id: "z", buildup_id: "wall", label: "Floor over ground", tilt_deg: 180, exposed_to: "ground" },
  ],
  ductRuns: [],
};
const inSummer = new Map(scheduleResults(schedule, summer).surfaces.map((r) => [r.row_id, r]));
const inWinter = new Map(scheduleResults(schedule, winter).surfaces.map((r) => [r.row_id, r]));

describe("result columns: v2 surface checks", () => {
  test("the sunny roof in summer is method-sensitive, and the flag says so with its percentage", () => {
    const r = inSummer.get("roof")!;
    expect(r.spread!.sensitive).toBe(true);
    const pct = Math.round(r.spread!.Q_spread_ratio! * 100);
    expect(pct).toBeGreaterThan(10);
    expect(resultValue(col("method_sensitive"), r, "SI")).toBe(`yes · ${pct} %`);
    expect(sensitivityText(r)).toMatch(/^yes · \d+ %$/);
  });

  test("a well-insulated wall in winter is not method-sensitive", () => {
    const r = inWinter.get("wall")!;
    expect(r.spread!.sensitive).toBe(false);
    expect(resultValue(col("method_sensitive"), r, "SI")).toMatch(/^no · \d+ %$/);
  });

  test.each([
    ["h_o_band", "SI", 1, (r: NonNullable<ReturnType<typeof inSummer.get>>) => [r.spread!.h_o_min_W_m2K, r.spread!.h_o_max_W_m2K], "film"],
    ["Q_band", "SI", 0, (r: NonNullable<ReturnType<typeof inSummer.get>>) => [r.spread!.Q_min_W, r.spread!.Q_max_W], "power"],
    ["Q_band", "IP", 0, (r: NonNullable<ReturnType<typeof inSummer.get>>) => [r.spread!.Q_min_W, r.spread!.Q_max_W], "power"],
  ] as const)("band %s in %s reads min–max in the person's units", (key, system, digits, pick, q) => {
    const r = inSummer.get("roof")!;
    const [lo, hi] = pick(r);
    const band = resultBand(col(key), r, system)!;
    expect(band[0]).toBeCloseTo(toDisplay(q, lo, system), 9);
    expect(band[1]).toBeCloseTo(toDisplay(q, hi, system), 9);
    expect(band[0]).toBeLessThan(band[1]);
    const f = (v: number) => new Intl.NumberFormat("en-GB", { minimumFractionDigits: digits + (system === "IP" && (q as string) === "film" ? 1 : 0), maximumFractionDigits: digits + (system === "IP" && (q as string) === "film" ? 1 : 0) }).format(v);
    expect(resultValue(col(key), r, system)).toBe(band[0] < 0 ? `${f(band[0])} to ${f(band[1])}` : `${f(band[0])}–${f(band[1])}`);
  });

  test("the single-skin panel in winter is at inside-surface risk; T_si and f_Rsi read from the check", () => {
    const r = inWinter.get("skin")!;
    expect(r.inside!.mould_risk).toBe(true);
    expect(resultValue(col("inside_risk"), r, "SI")).toBe(r.inside!.condensation_risk ? "condensation risk" : "mould risk");
    expect(resultValue(col("T_si_C"), r, "SI")).toBe(r.inside!.T_si_C);
    expect(resultValue(col("T_si_C"), r, "IP")).toBeCloseTo(r.inside!.T_si_C * 1.8 + 32, 9);
    expect(resultValue(col("f_Rsi"), r, "SI")).toBe(r.inside!.f_Rsi);
    expect(resultValue(col("f_Rsi_min"), r, "SI")).toBe(r.inside!.f_Rsi_min);
    expect(r.inside!.f_Rsi!).toBeLessThan(r.inside!.f_Rsi_min!);
    expect(insideRiskText(inWinter.get("wall")!)).toBe("none");
  });

  test("quick filters: method-sensitive and inside-risk rows only", () => {
    const keep = (f: Parameters<typeof passesRowFilter>[0], m: typeof inSummer) => [...m.values()].filter((r) => passesRowFilter(f, r)).map((r) => r.row_id);
    expect(keep("all", inWinter)).toEqual(["roof", "skin", "wall", "ground"]);
    expect(keep("method_sensitive", inSummer)).toContain("roof");
    expect(keep("method_sensitive", inSummer)).not.toContain("ground");
    expect(keep("inside_risk", inWinter)).toEqual(["skin"]);
  });

  test("a surface over ground reads 'Not computed' (not an error), with no results in its columns", () => {
    const r = inWinter.get("ground")!;
    expect(rowProblem(r)).toEqual({ text: "Not computed: over ground (ISO 13370)", kind: "not_computed" });
    for (const c of SURFACE_RESULTS) expect(resultValue(c, r, "SI")).toBeNull();
    expect(rowProblem(inWinter.get("wall"))).toBeNull();
    expect(rowProblem({ result: { id: "x", ok: false, error: { code: "invalid_input", field: "zone_id", message: "zone z9 is not in this project" } } })).toEqual({ text: "error: zone z9 is not in this project", kind: "error" });
  });

  test("headings keep their units in true case", () => {
    expect(resultHeader(col("h_o_band"), "SI")).toBe("h_o across methods (W/(m²·K))");
    expect(resultHeader(col("Q_band"), "IP")).toBe("Q across methods (Btu/h)");
    expect(resultHeader(col("T_si_C"), "SI")).toBe("Inside surface T_si (°C)");
  });
});
