// The row schemas (zod) that check an edit before it is sent load after the sheet is drawn
// (src/components/grid/cell-edits.ts): an edit made before waits for them and is then checked as
// any other; nothing is checked without them. Each test file has its own module instance, so the
// schemas start unloaded here.
import { expect, test } from "vitest";
import { editCell, rowProblems, withRowSchemas } from "@/components/grid/cell-edits";
import type { Row } from "@/components/schedule/schedule-cache";
import { SURFACE_COLUMNS } from "@/schedule/sheet-columns";

const row = { id: "s1", version: 1, position: 0, label: "Wall N", zone_id: "z1", buildup_id: "b1", area_m2: 12, tilt_deg: 90, azimuth_deg: 0, height_m: 1.5, length_m: 4, panel_height_m: 3, method: null, absorptance: null, emissivity: null, exposed_to: "outside_air" } as Row;
const area = SURFACE_COLUMNS.find((c) => c.field === "area_m2")!;

test("an edit made before the row schemas have loaded waits for them, then is checked; a row is never passed unchecked", async () => {
  expect(() => rowProblems("surfaces", row, "SI")).toThrow(/not loaded/);
  const outcomes: ReturnType<typeof editCell>[] = [];
  const failed: string[] = [];
  withRowSchemas(() => outcomes.push(editCell("surfaces", row, area, -5, "SI")), () => failed.push("failed"));
  // Not checked in the same turn: the schemas' chunk is still on its way.
  expect(outcomes).toEqual([]);
  await expect.poll(() => outcomes.length).toBe(1);
  expect(outcomes[0]).toEqual({ ok: false, message: expect.stringMatching(/^Area must be greater than 0 m²/) });
  expect(failed).toEqual([]);
  // Loaded now: the next edit is checked at once.
  withRowSchemas(() => outcomes.push(editCell("surfaces", row, area, 20, "SI")), () => failed.push("failed"));
  expect(outcomes[1]).toEqual({ ok: true, values: { area_m2: 20 } });
});
