// Pasting a spreadsheet block onto the grid and typing into one cell: what is saved (in SI) and
// what is refused (with the row and column named). Expected values are the typed ones converted
// by the exact definitions (1 ft = 0.3048 m, °F = °C·9/5 + 32) or the fields' own rules.
import { beforeAll, describe, expect, test } from "vitest";
import { editCell, loadRowSchemas } from "@/components/grid/cell-edits";
import { planPaste, readBlock } from "@/components/grid/paste-block";
import type { Row } from "@/components/schedule/schedule-cache";
import { SURFACE_COLUMNS, DUCT_RUN_COLUMNS } from "@/schedule/sheet-columns";

// Edits are checked with the row schemas, which the browser loads after the sheet is drawn.
beforeAll(() => loadRowSchemas());

const Z1 = "11111111-1111-4111-8111-111111111111";
const Z2 = "22222222-2222-4222-8222-222222222222";
const B1 = "33333333-3333-4333-8333-333333333333";
const lookups = { zones: [{ id: Z1, name: "Hall" }, { id: Z2, name: "Office" }], buildups: [{ id: B1, name: "Wall" }] };
const surface = (i: number): Row => ({
  id: `00000000-0000-4000-8000-00000000000${i}`,
  version: 1,
  position: i,
  label: `Panel ${i}`,
  zone_id: Z1,
  buildup_id: B1,
  area_m2: 10,
  tilt_deg: 90,
  azimuth_deg: 180,
  height_m: 2,
  length_m: 4,
  panel_height_m: 3,
  method: null,
  absorptance: null,
  emissivity: null,
  exposed_to: "outside_air",
});
const rows = [surface(1), surface(2), surface(3), surface(4)];
const columnIds = SURFACE_COLUMNS.map((c) => c.field).concat(["r:Q_W"]);
let n = 0;
const base = { sheet: "surfaces" as const, rows, columnIds, lookups, newId: () => `99999999-9999-4999-8999-00000000000${++n}` };

describe("readBlock", () => {
  test("tab-separated lines; the trailing newline a spreadsheet adds is not a line", () => {
    expect(readBlock("a\tb\r\nc\td\r\n")).toEqual([["a", "b"], ["c", "d"]]);
  });
});

describe("planPaste", () => {
  test("a 3×4 block onto area, tilt, azimuth and centroid height of three rows: three updates in SI", () => {
    const text = "12\t90\t0\t1.5\n14.5\t60\t90\t3\n9\t0\t0\t6\n";
    const plan = planPaste({ ...base, text, startRow: 1, startColumn: "area_m2", system: "SI" });
    expect(plan.problems).toEqual([]);
    expect(plan.ops).toEqual([
      { op: "update", sheet: "surfaces", id: rows[1]!.id, values: { area_m2: 12, tilt_deg: 90, azimuth_deg: 0, height_m: 1.5 } },
      { op: "update", sheet: "surfaces", id: rows[2]!.id, values: { area_m2: 14.5, tilt_deg: 60, azimuth_deg: 90, height_m: 3 } },
      { op: "update", sheet: "surfaces", id: rows[3]!.id, values: { area_m2: 9, tilt_deg: 0, azimuth_deg: 0, height_m: 6 } },
    ]);
  });

  test("IP values are stored in SI: 10 ft → 3.048 m", () => {
    const plan = planPaste({ ...base, text: "10", startRow: 0, startColumn: "height_m", system: "IP" });
    expect(plan.ops[0]).toMatchObject({ values: { height_m: expect.closeTo(3.048, 12) } });
  });

  test("zones by name and lines past the end become new rows copied from the last", () => {
    const plan = planPaste({ ...base, text: "New A\tOffice\nNew B\thall", startRow: 3, startColumn: "label", system: "SI" });
    expect(plan.problems).toEqual([]);
    expect(plan.ops[0]).toEqual({ op: "update", sheet: "surfaces", id: rows[3]!.id, values: { label: "New A", zone_id: Z2 } });
    expect(plan.ops[1]).toMatchObject({ op: "create", sheet: "surfaces", row: { label: "New B", zone_id: Z1, area_m2: 10, version: 0 } });
  });

  test("one bad cell refuses the whole block, naming line, row and column", () => {
    const plan = planPaste({ ...base, text: "12\t90\nabc\t90\n9\t200", startRow: 0, startColumn: "area_m2", system: "SI" });
    expect(plan.ops).toEqual([]);
    expect(plan.problems).toEqual([
      { line: 2, row: "Panel 2", column: "Area (m²)", message: '"abc" is not a number' },
      { line: 3, row: "Panel 3", column: "Tilt (°)", message: "Tilt must be between 0° and 180°" },
    ]);
  });

  test("pasting into a computed column is refused", () => {
    const plan = planPaste({ ...base, text: "1\t2", startRow: 0, startColumn: "emissivity", system: "SI" });
    expect(plan.problems).toEqual([{ line: 1, row: "Panel 1", column: "r:Q_W", message: "This column is computed and cannot be pasted into" }]);
  });
});

describe("editCell", () => {
  const col = (f: string) => SURFACE_COLUMNS.find((c) => c.field === f)!;
  test("a typed IP area is stored in m² (100 ft² = 9.290304 m²)", () => {
    const out = editCell("surfaces", rows[0]!, col("area_m2"), 100, "IP");
    expect(out).toEqual({ ok: true, values: { area_m2: expect.closeTo(9.290304, 9) } });
  });
  test("a negative area is refused with the rule in the person's units", () => {
    // The upper bound 100,000 m² is 1,076,391 ft²; messages give bounds to six significant figures.
    expect(editCell("surfaces", rows[0]!, col("area_m2"), -5, "IP")).toEqual({ ok: false, message: "Area must be greater than 0 ft² and at most 1076390 ft²" });
    expect(editCell("surfaces", rows[0]!, col("area_m2"), null, "SI")).toEqual({ ok: false, message: "Area is required" });
  });
  test("a blank override means the build-up's value", () => {
    expect(editCell("surfaces", { ...rows[0]!, absorptance: 0.3 }, col("absorptance"), null, "SI")).toEqual({ ok: true, values: { absorptance: null } });
  });
  test("a round duct switched to rectangular gets an equal-area square (400 mm → 354 mm)", () => {
    const duct: Row = { id: "d", version: 1, position: 0, label: "D", zone_id: Z1, shape: "round", diameter_m: 0.4, width_m: null, height_m: null, length_m: 10, flow_m3_s: 0.5, T_entering_heating_C: 30, T_entering_cooling_C: 14, location: "indoor", T_surround_C: 18, RH_surround_pct: null, elevation_m: null, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.035, jacket_emissivity: 0.9, margin_K: 0 };
    const shape = DUCT_RUN_COLUMNS.find((c) => c.field === "shape")!;
    // √(π·0.4²/4) = 0.35449 m, to the millimetre 0.354 m.
    expect(editCell("duct_runs", duct, shape, "rect", "SI")).toEqual({ ok: true, values: { width_m: 0.354, height_m: 0.354, shape: "rect" } });
  });
});
