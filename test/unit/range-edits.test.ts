// Fills and clears of a range: stored values copied down a column without rounding, text read in
// the person's units across columns, computed columns left alone, a required column refused by
// name with nothing sent, and a fill that breaks a row refused whole.
import { beforeAll, describe, expect, test } from "vitest";
import { loadRowSchemas } from "@/components/grid/cell-edits";
import { planClear, planFill, withoutHeader } from "@/components/grid/range-edits";
import { tiledSources } from "@/components/grid/cell-range";
import type { Row } from "@/components/schedule/schedule-cache";
import { SURFACE_COLUMNS, DUCT_RUN_COLUMNS } from "@/schedule/sheet-columns";

// Edits are checked with the row schemas, which the browser loads after the sheet is drawn.
beforeAll(() => loadRowSchemas());

const Z1 = "11111111-1111-4111-8111-111111111111";
const B1 = "33333333-3333-4333-8333-333333333333";
const lookups = { zones: [{ id: Z1, name: "Hall" }], buildups: [{ id: B1, name: "Wall" }] };
const surface = (i: number, over: Partial<Row> = {}): Row => ({
  id: `00000000-0000-4000-8000-00000000000${i}`, version: 1, position: i, label: `Panel ${i}`, zone_id: Z1, buildup_id: B1, area_m2: 10 + i, tilt_deg: 90,
  azimuth_deg: 180, height_m: 2, length_m: 4, panel_height_m: 3, method: null, absorptance: null, emissivity: null, exposed_to: "outside_air", ...over,
});
const rows = [surface(1, { area_m2: 12.3456789, absorptance: 0.7 }), surface(2), surface(3), surface(4)];
const columnIds = [...SURFACE_COLUMNS.map((c) => c.field), "r:Q_W"];
const col = (f: string) => columnIds.indexOf(f);
const base = { sheet: "surfaces" as const, rows, columnIds, lookups, system: "SI" as const, textOf: () => "" };

describe("planFill", () => {
  test("fill down copies the stored value exactly (not the two decimals shown) and changes only rows that differ", () => {
    const b = { top: 0, bottom: 3, left: col("area_m2"), right: col("tilt_deg") };
    const plan = planFill({ ...base, pairs: tiledSources({ ...b, bottom: 0 }, b) });
    expect(plan.problems).toEqual([]);
    expect(plan.ops).toEqual([2, 3, 4].map((i) => ({ op: "update", sheet: "surfaces", id: surface(i).id, values: { area_m2: 12.3456789 } })));
    expect(plan.cells).toBe(3);
  });

  test("a blank override fills as blank, putting the rows back to their build-up's value", () => {
    const withValues = [surface(1), surface(2, { absorptance: 0.5 })];
    const b = { top: 0, bottom: 1, left: col("absorptance"), right: col("absorptance") };
    const plan = planFill({ ...base, rows: withValues, pairs: tiledSources({ ...b, bottom: 0 }, b) });
    expect(plan.ops).toEqual([{ op: "update", sheet: "surfaces", id: surface(2).id, values: { absorptance: null } }]);
  });

  test("fill right reads the shown text in the person's units: 10 ft shown in IP stores 3.048 m", () => {
    const plan = planFill({ ...base, system: "IP", pairs: [{ source: { row: 0, col: col("height_m") }, target: { row: 0, col: col("length_m") } }], textOf: () => "10" });
    expect(plan.ops[0]).toMatchObject({ values: { length_m: expect.closeTo(3.048, 12) } });
  });

  test("computed columns in the range are left alone", () => {
    const plan = planFill({ ...base, pairs: [{ source: { row: 0, col: col("r:Q_W") }, target: { row: 1, col: col("r:Q_W") } }] });
    expect(plan).toEqual({ ops: [], problems: [], cells: 0 });
  });

  test("a fill that makes a row invalid is refused whole, naming row and column once", () => {
    const plan = planFill({
      ...base,
      pairs: [
        { source: { row: 0, col: col("label") }, target: { row: 1, col: col("tilt_deg") } },
        { source: { row: 0, col: col("area_m2") }, target: { row: 2, col: col("area_m2") } },
      ],
      textOf: () => "Panel 1",
    });
    expect(plan.ops).toEqual([]);
    expect(plan.problems).toEqual([{ row: "Panel 2", column: "Tilt (°)", message: '"Panel 1" is not a number' }]);
  });
});

describe("planClear", () => {
  test("overrides and the method go blank; v2 choices go to their default", () => {
    const b = { top: 0, bottom: 1, left: col("method"), right: col("emissivity") };
    const plan = planClear({ ...base, bounds: b });
    expect(plan.problems).toEqual([]);
    expect(plan.ops).toEqual([{ op: "update", sheet: "surfaces", id: rows[0]!.id, values: { absorptance: null } }]);
    const exposure = planClear({ ...base, rows: [surface(1, { exposed_to: "ground" })], bounds: { top: 0, bottom: 0, left: col("exposed_to"), right: col("exposed_to") } });
    expect(exposure.ops[0]).toMatchObject({ values: { exposed_to: "outside_air" } });
  });

  test("a range over required columns is refused, each named once, and nothing is sent", () => {
    const plan = planClear({ ...base, bounds: { top: 0, bottom: 3, left: col("label"), right: col("area_m2") } });
    expect(plan.ops).toEqual([]);
    expect(plan.problems.map((p) => p.message)).toEqual([
      "Label is required and cannot be blank",
      "Zone is required and cannot be blank",
      "Build-up is required and cannot be blank",
      "Area (m²) is required and cannot be blank",
    ]);
  });

  test("a blank that breaks the row's own rule is refused: a round duct without its diameter", () => {
    const duct: Row = {
      id: "00000000-0000-4000-8000-000000000009", version: 1, position: 0, label: "D1", zone_id: Z1, shape: "round", diameter_m: 0.3, width_m: null, height_m: null, length_m: 10, flow_m3_s: 0.3,
      T_entering_heating_C: 30, T_entering_cooling_C: 14, location: "indoor", T_surround_C: 18, T_surround_cooling_C: null, RH_surround_pct: null, elevation_m: null,
      insulation_thickness_m: 0.025, insulation_k_W_mK: 0.035, jacket_emissivity: 0.9, jacket_absorptance: null, margin_K: 0, in_served_zone: false,
    };
    const ids = DUCT_RUN_COLUMNS.map((c) => c.field);
    const at = ids.indexOf("diameter_m");
    const plan = planClear({ sheet: "duct_runs", rows: [duct], columnIds: ids, system: "SI", bounds: { top: 0, bottom: 0, left: at, right: at } });
    expect(plan.ops).toEqual([]);
    expect(plan.problems).toHaveLength(1);
    expect(plan.problems[0]).toMatchObject({ row: "D1" });
  });
});

test("withoutHeader drops a leading heading the line already names", () => {
  expect(withoutHeader('Area (m²): "abc" is not a number', "Area (m²)")).toBe('"abc" is not a number');
  expect(withoutHeader("Tilt must be between 0° and 180°", "Tilt (°)")).toBe("Tilt must be between 0° and 180°");
});
