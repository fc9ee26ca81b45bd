// The grid's total row: a total of a thousand or more is shown whole, so it fits its column (a
// 92 px area column showed "124,799..." for 124,799.45 m²); smaller totals and every row keep the
// column's decimals.
import { expect, test } from "vitest";
import type { ValueFormatterParams } from "ag-grid-community";
import { sheetColumnDefs } from "@/components/grid/column-defs";
import { TOTALS_ID } from "@/components/grid/grid-context";
import type { TSchedule } from "@/schemas/schedule";

const schedule = { project: { default_method: "boundary_layer" }, zones: [], buildups: [] } as unknown as TSchedule;
const area = sheetColumnDefs("surfaces", schedule, "SI").find((d) => d.colId === "area_m2")!;
const shown = (value: number, id: string) =>
  (area.valueFormatter as (p: Partial<ValueFormatterParams>) => string)({ value, data: { id } as never, context: { results: new Map(), totals: {} } });

test("a total of a thousand or more is shown whole; a smaller one with the column's decimals", () => {
  expect(shown(124_799.45, TOTALS_ID)).toBe("124,799");
  expect(shown(999.5, TOTALS_ID)).toBe("999.50");
  expect(shown(512.3, TOTALS_ID)).toBe("512.30");
});

test("a row's value keeps the column's decimals, however big", () => {
  expect(shown(1_234.5, "row-1")).toBe("1,234.50");
});
