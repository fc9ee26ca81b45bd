// Totals by orientation, element type and build-up, and each zone's peak case, on a small
// hand-made schedule whose row results are given by hand (not computed), so every expected sum
// below is hand-worked from the Q values in the table and the sign conventions of src/calc/zone.ts.
import { describe, expect, test } from "vitest";
import {
  caseBreakdowns, caseRowsOf, elementOf, isGlazing, leftOutSentence, orientationOf, scheduleBreakdowns, scheduleResults,
  type BreakdownLine, type Buildup, type CalcResult, type CaseRows, type DesignCase, type DuctRunRow, type Schedule, type SurfaceRow,
} from "../../src/calc/index";
import { SAMPLE_CASES, sampleSchedule } from "../support/sample-schedule";

const buildup = (id: string, name: string): Buildup => ({ id, name, layers: [], R_direct_m2K_W: 1, absorptance: 0.6, emissivity: 0.9 });
const surface = (id: string, zone_id: string, buildup_id: string, area_m2: number, tilt_deg: number, azimuth_deg: number, exposed_to: "outside_air" | "ground" = "outside_air"): SurfaceRow => ({
  id, zone_id, buildup_id, label: id, area_m2, tilt_deg, azimuth_deg, height_m: 3, length_m: 4, panel_height_m: 3, method: null, absorptance: null, emissivity: null, exposed_to,
});
const duct = (id: string, zone_id: string, in_served_zone = false): DuctRunRow => ({
  id, zone_id, label: id, shape: "round", diameter_m: 0.3, width_m: null, height_m: null, length_m: 10, flow_m3_s: 0.5, T_entering_heating_C: 30, T_entering_cooling_C: 13,
  location: "outdoor", T_surround_C: null, RH_surround_pct: null, elevation_m: null, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.037, jacket_emissivity: 0.9, margin_K: 1, in_served_zone,
});

const schedule: Schedule = {
  site: { altitude_m: 0, terrain: "suburban", wind_law: "power", method: "iso6946" },
  zones: [
    { id: "A", name: "Zone A", floor_area_m2: 100, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
    { id: "B", name: "Zone B", floor_area_m2: 50, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
    { id: "C", name: "Zone C", floor_area_m2: 20, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
  ],
  buildups: [buildup("b-wall", "Brick wall"), buildup("b-roof", "Flat roof"), buildup("b-win", "Double-glazed window"), buildup("b-gw", "Glass-wool timber wall")],
  surfaces: [
    surface("s1", "A", "b-wall", 10, 90, 0), // N wall
    surface("s2", "A", "b-gw", 20, 90, 100), // E wall (glass wool is insulation, not glazing)
    surface("s3", "A", "b-wall", 5, 90, 22.5), // on the N/NE boundary: NE
    surface("s4", "A", "b-roof", 50, 0, 0), // roof, facing up
    surface("s5", "B", "b-win", 8, 90, 180), // S glazing
    surface("s6", "B", "b-wall", 12, 180, 0), // soffit, facing down
    surface("s7", "B", "b-wall", 30, 180, 0, "ground"), // over ground: not computed
    surface("s8", "A", "b-wall", 6, 90, 315), // NW wall whose row has an error
    surface("s9", "A", "b-win", 3, 30, 180), // sloped rooflight: glazing, facing up
    surface("s10", "A", "b-wall", 4, 60, 270), // tilt 60: still within 30° of vertical, a W wall
  ],
  ductRuns: [duct("d1", "A"), duct("d2", "B"), duct("d3", "A", true), duct("d4", "B")],
};

const dc = (id: string, kind: "heating" | "cooling"): DesignCase => ({ id, name: `Case ${id}`, kind, T_outdoor_C: 0, RH_outdoor_pct: 80, V_met_m_s: 3, wind_from_deg: 0, solar_W_m2: {} });
const CASES = [dc("h", "heating"), dc("m", "heating"), dc("c", "cooling"), dc("c2", "cooling")];

// Q_W by hand: surfaces positive out (heat loss), ducts the heat to their air. s7 is over ground,
// s8 has an error and d4 no result at all, in every case.
const Q: Record<string, Record<string, number>> = {
  h: { s1: 400, s2: 300, s3: 100, s4: 500, s5: -40, s6: 200, s9: 60, s10: 50, d1: -300, d2: 80, d3: -50 },
  m: { s1: 200, s2: 100, s3: 0, s4: 300, s5: 0, s6: 300, s9: 0, s10: 0, d1: -100, d2: 0, d3: 0 },
  c: { s1: -10, s2: -20, s3: 0, s4: -400, s5: -150, s6: 20, s9: -90, s10: -5, d1: 60, d2: 40, d3: 30 },
  c2: { s1: 0, s2: 0, s3: 0, s4: -100, s5: -300, s6: 0, s9: 0, s10: 0, d1: 0, d2: 0, d3: 0 },
};

function rowsOf(caseId: string): CaseRows {
  const result = (id: string): CalcResult | undefined => {
    if (id === "s7") return { id, ok: false, error: { code: "not_computed", field: "exposed_to", message: "over ground" } };
    if (id === "s8") return { id, ok: false, error: { code: "invalid_input", field: "area_m2", message: "area_m2 must be > 0" } };
    const q = Q[caseId]![id];
    return q === undefined ? undefined : ({ id, ok: true, correlation: "test", warnings: [], Q_W: q } as unknown as CalcResult);
  };
  return { design_case_id: caseId, surface: result, duct: result };
}

const line = (lines: BreakdownLine[], key: string) => lines.find((l) => l.key === key);
const pick = (lines: BreakdownLine[]) => lines.map((l) => [l.key, l.rows, l.area_m2, l.loss_W, l.gain_W]);

describe("orientation and element type of a surface", () => {
  test("45° sectors centred on the compass points, boundaries to the clockwise side, 30° about vertical", () => {
    expect(orientationOf(90, 0)).toBe("N");
    expect(orientationOf(90, 22.4)).toBe("N");
    expect(orientationOf(90, 22.5)).toBe("NE");
    expect(orientationOf(90, 337.4)).toBe("NW");
    expect(orientationOf(90, 337.5)).toBe("N");
    expect(orientationOf(90, 360)).toBe("N");
    expect(orientationOf(90, 202)).toBe("S");
    expect(orientationOf(60, 90)).toBe("E");
    expect(orientationOf(59.9, 90)).toBe("up");
    expect(orientationOf(120, 90)).toBe("E");
    expect(orientationOf(120.1, 90)).toBe("down");
    expect(elementOf(0, buildup("x", "Warm roof"))).toBe("roof");
    expect(elementOf(90, buildup("x", "Warm roof"))).toBe("wall"); // by tilt: the name says nothing of walls and roofs
    expect(elementOf(180, undefined)).toBe("floor");
    expect(elementOf(10, buildup("x", "Rooflight"))).toBe("glazing");
  });

  test("glazing from the build-up's name; glass used as insulation is not glazing", () => {
    for (const n of ["Double-glazed window", "Triple glazing", "Retained single-glazed spandrel", "Structural glass fin wall", "Windows, north", "Roof light"]) expect(isGlazing({ name: n }), n).toBe(true);
    for (const n of ["Glass-wool timber wall", "Glass fibre panel", "Foam glass plinth", "Cellular glass roof", "Fibreglass insulated wall", "Brick wall"]) expect(isGlazing({ name: n }), n).toBe(false);
  });
});

describe("breakdowns of one design case (hand-worked)", () => {
  const h = caseBreakdowns(schedule, CASES[0]!, rowsOf("h"));

  test("by orientation: surfaces only; every bin the schedule has a surface in is listed, even with no row counted", () => {
    // hand-worked: N s1 400; NE s3 100; E s2 300; S s5 −40 → gain 40; W s10 50; NW only s8 (error): 0 rows;
    // up s4 500 + s9 60 = 560 over 50 + 3 m²; down s6 200 (s7 over ground not counted).
    expect(pick(h.orientation)).toEqual([
      ["N", 1, 10, 400, 0], ["NE", 1, 5, 100, 0], ["E", 1, 20, 300, 0], ["S", 1, 8, 0, 40], ["W", 1, 4, 50, 0], ["NW", 0, 0, 0, 0], ["up", 2, 53, 560, 0], ["down", 1, 12, 200, 0],
    ]);
  });

  test("by element type: ducts crossing outside space add the heat their air loses to loss; ducts in their zone are left out", () => {
    // hand-worked: wall s1+s2+s3+s10 = 400+300+100+50 = 850 over 10+20+5+4 = 39 m²; roof s4 500; floor s6 200;
    // glazing s9 60 loss and s5 40 gain over 11 m²; duct d1 −300 (air cools) → loss 300, d2 +80 → gain 80; d3 left out.
    expect(pick(h.element)).toEqual([
      ["wall", 4, 39, 850, 0], ["roof", 1, 50, 500, 0], ["floor", 1, 12, 200, 0], ["glazing", 2, 11, 60, 40], ["duct", 2, null, 300, 80],
    ]);
    // hand-worked: 850 + 500 + 200 + 60 + 300 = 1910 loss; 40 + 80 = 120 gain.
    expect([h.loss_W, h.gain_W]).toEqual([1910, 120]);
  });

  test("by build-up, in the schedule's order", () => {
    // hand-worked: brick s1 400 + s3 100 + s6 200 + s10 50 = 750 over 10+5+12+4 = 31 m²; roof 500; window 60/40 over 11 m²; glass-wool wall 300.
    expect(pick(h.buildup)).toEqual([["b-wall", 4, 31, 750, 0], ["b-roof", 1, 50, 500, 0], ["b-win", 2, 11, 60, 40], ["b-gw", 1, 20, 300, 0]]);
    expect(h.buildup.map((l) => l.label)).toEqual(["Brick wall", "Flat roof", "Double-glazed window", "Glass-wool timber wall"]);
  });

  test("the zones add up as the zone totals do, and the element lines add up to them", () => {
    // hand-worked: A = 400+300+100+500+60+50 + 300 (d1) = 1710 loss, no gain (d3 in its zone); B = 200 loss, 40 + 80 = 120 gain.
    expect(h.zones).toEqual([
      { zone_id: "A", name: "Zone A", loss_W: 1710, gain_W: 0 },
      { zone_id: "B", name: "Zone B", loss_W: 200, gain_W: 120 },
      { zone_id: "C", name: "Zone C", loss_W: 0, gain_W: 0 },
    ]);
    expect(h.zones.reduce((a, z) => a + z.loss_W, 0)).toBe(h.loss_W);
  });

  test("rows not computed, with errors or in their zone are counted and named, not dropped silently", () => {
    expect(h.left_out.map((l) => [l.label, l.reason])).toEqual([["s7", "not_computed"], ["s8", "error"], ["d3", "in_zone"], ["d4", "error"]]);
    expect(h.left_out.find((l) => l.label === "s8")?.message).toBe("area_m2 must be > 0");
    expect(h.left_out.find((l) => l.label === "d4")?.message).toBe("no result");
    expect(leftOutSentence(h.left_out)).toBe("Not in these totals: 1 row not computed (over ground); 2 rows with errors; 1 duct run inside the zone it serves (for reference).");
    expect(leftOutSentence([])).toBe("Every row is in these totals.");
  });

  test("a cooling case: negative surface flows are gains, a duct's heat to its air is a gain", () => {
    const c = caseBreakdowns(schedule, CASES[2]!, rowsOf("c"));
    // hand-worked: walls s1 −10, s2 −20, s3 0, s10 −5 → gain 35, loss 0; roof −400 → gain 400; floor s6 +20 → loss 20;
    // glazing s5 −150, s9 −90 → gain 240; ducts d1 +60, d2 +40 → gain 100.
    expect(pick(c.element)).toEqual([["wall", 4, 39, 0, 35], ["roof", 1, 50, 0, 400], ["floor", 1, 12, 20, 0], ["glazing", 2, 11, 0, 240], ["duct", 2, null, 0, 100]]);
    expect(line(c.orientation, "up")).toMatchObject({ rows: 2, gain_W: 490, loss_W: 0 }); // 400 + 90
    expect([c.loss_W, c.gain_W]).toEqual([20, 775]);
  });
});

describe("peak case of each zone", () => {
  const all = scheduleBreakdowns(schedule, CASES, CASES.map((c) => rowsOf(c.id)));

  test("the heating case with the largest loss and the cooling case with the largest gain, named", () => {
    // hand-worked: A loses 1710 in h and 200+100+300+100 = 700 in m → h; B loses 200 in h, 300 in m → m.
    // A gains 10+20+400+90+5+60 = 585 in c and 100 in c2 → c; B gains 150+40 = 190 in c, 300 in c2 → c2.
    expect(all.peaks).toEqual([
      { zone_id: "A", name: "Zone A", heating: { design_case_id: "h", name: "Case h", W: 1710 }, cooling: { design_case_id: "c", name: "Case c", W: 585 } },
      { zone_id: "B", name: "Zone B", heating: { design_case_id: "m", name: "Case m", W: 300 }, cooling: { design_case_id: "c2", name: "Case c2", W: 300 } },
      { zone_id: "C", name: "Zone C", heating: null, cooling: null }, // no rows: no peak to name
    ]);
    expect(all.cases.map((c) => c.design_case_id)).toEqual(["h", "m", "c", "c2"]);
  });

  test("a case without results is skipped rather than counted as zero", () => {
    const some = scheduleBreakdowns(schedule, CASES, [rowsOf("m"), rowsOf("c2")]);
    expect(some.cases.map((c) => c.design_case_id)).toEqual(["m", "c2"]);
    expect(some.peaks[0]?.heating?.design_case_id).toBe("m");
  });
});

describe("on the engine's own results", () => {
  test("the element lines add up to the zone totals of scheduleResults in every case, and orientation and build-up to the fabric", () => {
    const s = sampleSchedule(40, 6);
    for (const dc of SAMPLE_CASES) {
      const r = scheduleResults(s, dc);
      const b = caseBreakdowns(s, dc, caseRowsOf(r));
      const sum = (xs: number[]) => xs.reduce((a, x) => a + x, 0);
      expect(b.loss_W).toBeCloseTo(sum(r.zones.map((z) => z.loss_W)), 6);
      expect(b.gain_W).toBeCloseTo(sum(r.zones.map((z) => z.gain_W)), 6);
      for (const lines of [b.orientation, b.buildup]) {
        expect(sum(lines.map((l) => l.loss_W))).toBeCloseTo(sum(r.zones.map((z) => z.surfaces_loss_W)), 6);
        expect(sum(lines.map((l) => l.gain_W))).toBeCloseTo(sum(r.zones.map((z) => z.surfaces_gain_W)), 6);
      }
      expect(sum(b.orientation.map((l) => l.rows)) + b.left_out.filter((l) => l.sheet === "surfaces").length).toBe(s.surfaces.length);
    }
  });
});
