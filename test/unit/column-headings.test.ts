// Every heading of the schedule grid, in SI and in IP, carries its unit in true case: "W/(m²·K)",
// "Btu/h", "ft²", never "W/M²" (M reads as mega) or "BTU/H". The headings are built from the
// column lists and the unit table; nothing between them and the screen may change their case
// (the grid theme and its stylesheet are read here; the browser test reads the computed style).
import { readFileSync } from "node:fs";
import { describe, expect, test } from "vitest";
import { sheetColumnDefs } from "@/components/grid/column-defs";
import { gridTheme } from "@/components/grid/grid-theme";
import { SHEETS, type TSchedule } from "@/schemas/schedule";
import { RESULT_COLUMNS, resultHeader } from "@/schedule/result-columns";
import { SHEET_COLUMNS, columnHeader } from "@/schedule/sheet-columns";
import { gridColumns, builtInColumns, visibleColumns } from "@/schedule/column-sets";
import { QUANTITIES, UNIT_SYSTEMS, unitLabel } from "@/units/units";

const schedule = { project: { default_method: "boundary_layer" }, zones: [], buildups: [] } as unknown as TSchedule;
// Unit symbols that are only right in their own case.
const SHOUTED = /M²|M³|\bFT|BTU|\bMPH\b|\bCFM\b|W\/M|\(H·|°\s?[cf]\b|\bMM\b|\bIN\b\)/;

describe.each(UNIT_SYSTEMS)("grid headings in %s", (system) => {
  for (const sheet of SHEETS) {
    const defs = sheetColumnDefs(sheet, schedule, system);
    test(`${sheet}: every heading with a unit ends in the unit table's own symbol, in its case`, () => {
      const withUnits = [
        ...SHEET_COLUMNS[sheet].filter((c) => c.kind === "number" && unitLabel(c.spec!.quantity, system) !== "").map((c) => ({ id: c.field, unit: unitLabel(c.spec!.quantity, system) })),
        ...RESULT_COLUMNS[sheet].filter((c) => c.quantity && unitLabel(c.quantity, system) !== "").map((c) => ({ id: `r:${c.key}`, unit: unitLabel(c.quantity!, system) })),
      ];
      expect(withUnits.length).toBeGreaterThan(5);
      for (const { id, unit } of withUnits) {
        const heading = defs.find((d) => d.colId === id)!.headerName!;
        expect(heading.endsWith(`(${unit})`), `${id}: ${heading}`).toBe(true);
      }
    });
    test(`${sheet}: no heading shouts a unit`, () => {
      for (const d of defs) expect(d.headerName, d.colId).not.toMatch(SHOUTED);
      for (const c of SHEET_COLUMNS[sheet]) expect(columnHeader(c, system)).not.toMatch(SHOUTED);
      for (const c of RESULT_COLUMNS[sheet]) expect(resultHeader(c, system)).not.toMatch(SHOUTED);
    });
  }
});

test("the unit table itself is in true case (the check above would miss a shouted symbol there)", () => {
  const units = Object.values(QUANTITIES).flatMap((q) => [q.SI.unit, q.IP.unit]);
  for (const u of units) expect(u, u).not.toMatch(SHOUTED);
  expect(units).toEqual(expect.arrayContaining(["W/m²", "W/(m²·K)", "Btu/h", "Btu/(h·ft²)", "ft²", "m²", "°C", "°F", "mm", "in"]));
  // The pattern does catch the shouted forms the issue saw.
  for (const shouted of ["h_c (W/M²K)", "Q (W/M²)", "Heat loss (BTU/(H·FT²))", "Area (FT²)"]) expect(shouted).toMatch(SHOUTED);
});

test("neither the grid theme nor its stylesheet transforms the case of the headings", () => {
  // AG Grid's own CSS upper-cases its standard buttons: no rule that does so may reach a header.
  const themeCss = JSON.stringify(gridTheme).replaceAll("\\n", "");
  const upper = [...themeCss.matchAll(/([^{}]*)\{[^{}]*text-transform:\s*(uppercase|capitalize)/g)].map((m) => m[1]!);
  for (const selector of upper) expect(selector).not.toMatch(/header/);
  expect(JSON.stringify(gridTheme)).not.toMatch(/headerTextTransform/i);
  const css = readFileSync(new URL("../../src/components/grid/schedule-grid.css", import.meta.url), "utf8");
  expect(css).not.toMatch(/text-transform\s*:\s*(uppercase|capitalize)/);
});

describe("column sets", () => {
  test("every sheet's built-in sets hold only its columns, with the label first", () => {
    for (const sheet of SHEETS) {
      const ids = new Set(gridColumns(sheet).map((c) => c.id));
      for (const set of ["inputs", "results", "everything"] as const) {
        const cols = builtInColumns(sheet, set);
        expect(cols[0]).toBe("label");
        for (const c of cols) expect(ids.has(c), `${sheet}/${set}: ${c}`).toBe(true);
      }
      expect(builtInColumns(sheet, "everything")).toEqual([...ids]);
    }
  });
  test("inputs keep the heat flow beside them and leave the other results out; results keep what identifies the row", () => {
    expect(builtInColumns("surfaces", "inputs")).toEqual(expect.arrayContaining(["area_m2", "tilt_deg", "r:Q_W"]));
    expect(builtInColumns("surfaces", "inputs")).not.toContain("r:h_o_W_m2K");
    expect(builtInColumns("surfaces", "results")).toEqual(expect.arrayContaining(["label", "zone_id", "buildup_id", "area_m2", "r:h_o_W_m2K", "r:Q_W"]));
    expect(builtInColumns("surfaces", "results")).not.toContain("tilt_deg");
  });
  test("a person's own set shows its columns and the label; an unknown set falls back to every column", () => {
    const own = [{ id: "mine", name: "Mine", sheet: "surfaces" as const, columns: ["area_m2", "r:Q_W"] }];
    expect([...visibleColumns("surfaces", "mine", own)].sort()).toEqual(["area_m2", "label", "r:Q_W"]);
    expect(visibleColumns("duct_runs", "mine", own).size).toBe(gridColumns("duct_runs").length);
    expect(visibleColumns("surfaces", "gone", own).size).toBe(gridColumns("surfaces").length);
  });
});

test("a column is wide enough for the longest word of its heading", () => {
  const defs = sheetColumnDefs("surfaces", schedule, "SI");
  const width = (id: string) => defs.find((d) => d.colId === id)!.width!;
  expect(width("absorptance")).toBeGreaterThan(width("tilt_deg"));
  expect(width("r:T_surface_C")).toBeGreaterThanOrEqual(Math.ceil("temperature".length * 6.6 + 42));
  expect(width("area_m2")).toBe(92);
});
