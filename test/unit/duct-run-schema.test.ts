// The cooling-case surround of a duct run in the shared rules: the zod schema, the sheet's
// column (heading, units, blank meaning) and the grid's column. Expected messages follow from the
// field's spec in src/schemas/schedule-fields.ts (−50…150 °C, as T_surround_C) and the exact
// definition °F = °C·9/5 + 32 (−50 °C = −58 °F, 150 °C = 302 °F).
import { describe, expect, test } from "vitest";
import { sheetColumnDefs } from "@/components/grid/column-defs";
import { ZDuctRunValues, type TSchedule } from "@/schemas/schedule";
import { DUCT_RUN_NUMBERS, numberProblem } from "@/schemas/schedule-fields";
import { DUCT_RUN_COLUMNS, columnHeader, matchHeaders } from "@/schedule/sheet-columns";

const ZONE = "11111111-1111-4111-8111-111111111111";
const run = {
  label: "Void supply", zone_id: ZONE, shape: "round", diameter_m: 0.4, width_m: null, height_m: null, length_m: 12, flow_m3_s: 0.8,
  T_entering_heating_C: 32, T_entering_cooling_C: 13, location: "indoor", T_surround_C: 19, T_surround_cooling_C: 28, RH_surround_pct: null,
  elevation_m: null, insulation_thickness_m: 0.025, insulation_k_W_mK: 0.035, jacket_emissivity: 0.1, margin_K: 1, in_served_zone: false, jacket_absorptance: null,
};
const issues = (value: unknown) => {
  const r = ZDuctRunValues.safeParse({ ...run, T_surround_cooling_C: value });
  return r.success ? [] : r.error.issues.map((i) => ({ path: i.path.join("."), message: i.message }));
};

describe("T_surround_cooling_C in the duct-run schema", () => {
  test.each([
    ["a summer void temperature", 28],
    ["blank (as heating)", null],
    ["the lower bound", -50],
    ["the upper bound", 150],
  ])("accepts %s", (_label, value) => {
    expect(issues(value)).toEqual([]);
  });

  test.each([
    ["text", "warm", "Surrounding air, cooling must be a number"],
    ["below −50 °C", -50.5, "Surrounding air, cooling must be between -50 °C and 150 °C"],
    ["above 150 °C", 151, "Surrounding air, cooling must be between -50 °C and 150 °C"],
    ["left out (a create fills the blank first; a whole row must carry it)", undefined, "Surrounding air, cooling is required"],
  ])("refuses %s, naming the field", (_label, value, message) => {
    expect(issues(value)).toEqual([{ path: "T_surround_cooling_C", message }]);
  });

  test("the message is in the person's units", () => {
    expect(numberProblem(DUCT_RUN_NUMBERS.T_surround_cooling_C, 200, "IP")).toBe("Surrounding air, cooling must be between -58 °F and 302 °F");
  });
});

describe("T_surround_cooling_C in the sheet and the grid", () => {
  const col = DUCT_RUN_COLUMNS.find((c) => c.field === "T_surround_cooling_C")!;

  test("a column after the heating surround, optional, headed in either unit system", () => {
    const fields = DUCT_RUN_COLUMNS.map((c) => c.field);
    expect(fields.indexOf("T_surround_cooling_C")).toBe(fields.indexOf("T_surround_C") + 1);
    expect(col.optional).toBe(true);
    expect(columnHeader(col, "SI")).toBe("Surrounding air, cooling (°C)");
    expect(columnHeader(col, "IP")).toBe("Surrounding air, cooling (°F)");
  });

  test("files without the column still import (it is not missing); its heading is matched by name and unit", () => {
    const old = ["Label", "Zone", "Shape", "Length (m)", "Airflow (m³/s)", "Entering air, heating (°C)", "Entering air, cooling (°C)", "Location", "Insulation (mm)", "Insulation conductivity (W/(m·K))", "Jacket emissivity", "Condensation margin (K)"];
    expect(matchHeaders(old, "duct_runs").missing.map((c) => c.field)).toEqual([]);
    const m = matchHeaders([...old, "Surrounding air, cooling (°F)", "T_surround_cooling_C"], "duct_runs");
    expect(m.columns.slice(-2).map((c) => [c?.col.field, c?.system])).toEqual([
      ["T_surround_cooling_C", "IP"],
      ["T_surround_cooling_C", "stored"],
    ]);
    expect(m.ignored).toEqual([]);
  });

  test("the grid's column says what a blank means", () => {
    const s = { project: { default_method: "boundary_layer" }, zones: [], buildups: [] } as unknown as TSchedule;
    const def = sheetColumnDefs("duct_runs", s, "SI").find((d) => d.colId === "T_surround_cooling_C")!;
    expect(def.headerName).toBe("Surrounding air, cooling (°C)");
    expect(def.headerTooltip).toBe("Surrounding air, cooling (°C); blank = as heating");
  });
});
