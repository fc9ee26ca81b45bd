// The XLSX export's Breakdowns sheet, read back with exceljs: lines by orientation, element and
// build-up for every case, each zone's peak case, the rows left out, the rules; its totals agree
// with the Zone totals sheet, which is written from the zone totals by another path.
import ExcelJS from "exceljs";
import { describe, expect, test } from "vitest";
import type { TSchedule } from "../../src/schemas/schedule";
import { scheduleWorkbook } from "../../src/server/services/export-schedule";

const v = { version: 1 };
function schedule(unit_system: "SI" | "IP"): TSchedule {
  const surface = (id: string, label: string, zone_id: string, buildup_id: string, area_m2: number, tilt_deg: number, azimuth_deg: number, position: number, exposed_to: "outside_air" | "ground" = "outside_air") => ({
    ...v, id, label, zone_id, buildup_id, area_m2, tilt_deg, azimuth_deg, height_m: 3, length_m: 5, panel_height_m: 3, method: null, absorptance: null, emissivity: null, exposed_to, position,
  });
  return {
    project: { id: "p", name: "Breakdown test", reference: "BT-1", altitude_m: 50, terrain: "suburban", wind_law: "power", unit_system, default_method: "iso6946", created_at: "", updated_at: "", version: 1, archived_at: null },
    design_cases: [
      { ...v, id: "mild", name: "Mild winter", kind: "heating", T_outdoor_C: 5, RH_outdoor_pct: 85, V_met_m_s: 4, wind_from_deg: 200, cloud_cover: 1, solar_W_m2: {} },
      { ...v, id: "cold", name: "Cold winter", kind: "heating", T_outdoor_C: -10, RH_outdoor_pct: 85, V_met_m_s: 4, wind_from_deg: 200, cloud_cover: 1, solar_W_m2: {} },
      { ...v, id: "hot", name: "Hot sunny summer", kind: "cooling", T_outdoor_C: 30, RH_outdoor_pct: 40, V_met_m_s: 2, wind_from_deg: 200, cloud_cover: 0, solar_W_m2: { horizontal: 800, S: 400, N: 100 } },
      { ...v, id: "warm", name: "Warm dull summer", kind: "cooling", T_outdoor_C: 26, RH_outdoor_pct: 50, V_met_m_s: 2, wind_from_deg: 200, cloud_cover: 1, solar_W_m2: {} },
    ],
    zones: [
      { ...v, id: "z1", name: "Hall", floor_area_m2: 80, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 50 },
      { ...v, id: "z2", name: "Office", floor_area_m2: 40, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
    ],
    buildups: [
      { ...v, id: "b1", name: "Block wall", layers: [], R_direct_m2K_W: 2.5, absorptance: 0.6, emissivity: 0.9 },
      { ...v, id: "b2", name: "Double glazing", layers: [], R_direct_m2K_W: 0.2, absorptance: 0.3, emissivity: 0.84 },
      { ...v, id: "b3", name: "Warm roof", layers: [], R_direct_m2K_W: 5, absorptance: 0.8, emissivity: 0.9 },
    ],
    surfaces: [
      surface("s1", "Hall north wall", "z1", "b1", 30, 90, 0, 0),
      surface("s2", "Hall south window", "z1", "b2", 12, 90, 180, 1),
      surface("s3", "Office roof", "z2", "b3", 40, 0, 0, 2),
      surface("s4", "Office slab", "z2", "b1", 40, 180, 0, 3, "ground"),
    ],
    duct_runs: [],
  };
}

async function readBack(s: TSchedule, caseId: string) {
  const bytes = await scheduleWorkbook(s, { template: false }, s.design_cases.find((d) => d.id === caseId));
  const wb = new ExcelJS.Workbook();
  await wb.xlsx.load(bytes.buffer as ArrayBuffer);
  // Row n of the sheet at index n − 1; blank rows as empty lists (exceljs leaves holes).
  const rows = (name: string) => Array.from(wb.getWorksheet(name)!.getSheetValues(), (r) => (Array.isArray(r) ? r.slice(1) : [])).slice(1);
  return { wb, rows };
}

describe("XLSX export: the Breakdowns sheet", () => {
  test("lines by orientation, element and build-up for every case, the peak cases named, and the row left out", async () => {
    const { wb, rows } = await readBack(schedule("SI"), "cold");
    expect(wb.worksheets.map((w) => w.name)).toEqual(["Surfaces", "Duct runs", "Zone totals", "Breakdowns", "Read me"]);
    const b = rows("Breakdowns");
    const at = (first: string) => b.findIndex((r) => r[0] === first);

    const o = at("By orientation — surfaces to outside air; adds up to the fabric loss and gain");
    expect(b[o + 1]!.slice(0, 5)).toEqual(["Orientation", "Rows in the totals — Cold winter", "Area (m²) — Cold winter", "Heat loss (W) — Mild winter", "Heat gain (W) — Mild winter"]);
    // The areas typed above: the N wall, the S window, the roof; the slab over ground faces down but is not computed.
    expect(b.slice(o + 2, o + 6).map((r) => r.slice(0, 3))).toEqual([["N", 1, 30], ["S", 1, 12], ["Facing up (roofs)", 1, 40], ["Facing down (floors, soffits)", 0, 0]]);
    const e = at("By element type — surfaces and distribution ducts; adds up to the zones' heat loss and gain");
    expect(b.slice(e + 2, e + 6).map((r) => r.slice(0, 3))).toEqual([["Walls", 1, 30], ["Roofs", 1, 40], ["Exposed floors and soffits", 0, 0], ["Glazing", 1, 12]]);
    const bu = at("By build-up — surfaces to outside air; adds up to the fabric loss and gain");
    expect(b.slice(bu + 2, bu + 5).map((r) => r[0])).toEqual(["Block wall", "Double glazing", "Warm roof"]);

    // Physics, not the code: the colder heating case loses more from every zone, the sunnier, hotter cooling case gains more.
    const pk = at("Peak case of each zone");
    expect(b.slice(pk + 2, pk + 4).map((r) => [r[0], r[1], r[3]])).toEqual([["Hall", "Cold winter", "Hot sunny summer"], ["Office", "Cold winter", "Hot sunny summer"]]);
    expect(b.slice(pk + 2, pk + 4).every((r) => typeof r[2] === "number" && (r[2] as number) > 0 && typeof r[4] === "number" && (r[4] as number) > 0)).toBe(true);

    const left = at("Not in these totals");
    expect(b[left + 1]!.slice(0, 2)).toEqual(["Mild winter", "Not in these totals: 1 row not computed (over ground)."]);
    expect(String(b[left + 1]![2])).toContain("Office slab: over ground");
    expect(b.flat()).toContain("Totals exclude ventilation and infiltration; thermal bridges (linear and point); ground floors and other surfaces over ground (ISO 13370); solar gain through glazing; thermal mass (every total is steady state); internal gains from people, lighting and equipment.");
  });

  test("the element totals of the exported case equal the Zone totals sheet's heat loss and gain", async () => {
    const { rows } = await readBack(schedule("SI"), "hot");
    const z = rows("Zone totals");
    const col = (h: string) => z[0]!.indexOf(h);
    const zoneSum = (h: string) => z.slice(1, 3).reduce((a, r) => a + (r[col(h)] as number), 0);
    const b = rows("Breakdowns");
    const e = b.findIndex((r) => String(r[0]).startsWith("By element type"));
    const total = b.slice(e).find((r) => r[0] === "Total")!;
    const hot = b[e + 1]!.indexOf("Heat loss (W) — Hot sunny summer");
    // Both sheets round to six figures; the sums of rounded zone figures may differ in the last one.
    expect(total[hot] as number).toBeCloseTo(zoneSum("Heat loss (W)"), 0);
    expect(total[hot + 1] as number).toBeCloseTo(zoneSum("Heat gain (W)"), 0);
    expect(total[hot + 1] as number).toBeGreaterThan(0);
  });

  test("an IP project's sheet names Btu/h and ft²", async () => {
    const { rows } = await readBack(schedule("IP"), "cold");
    const heads = rows("Breakdowns").flat().map(String);
    expect(heads).toContain("Heat loss (Btu/h) — Cold winter");
    expect(heads).toContain("Area (ft²) — Cold winter");
  });
});
