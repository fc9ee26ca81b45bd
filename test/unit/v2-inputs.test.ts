// The inputs of calculation contract v2 in the shared rules, without a database: the field specs
// and zod schemas, the sheets' columns (headings, blanks, a yes/no kind), reading cells (paste and
// import alike), typing into the grid, the design case the engine gets, and revisions issued
// before the fields existed. Expected messages follow from the specs in schedule-fields.ts.
import { beforeAll, describe, expect, test } from "vitest";
import { editCell, loadRowSchemas, storedValue } from "@/components/grid/cell-edits";
import { sheetColumnDefs } from "@/components/grid/column-defs";
import { planPaste } from "@/components/grid/paste-block";
import type { Row } from "@/components/schedule/schedule-cache";
import { compareRevisions } from "@/checking/compare-revisions";
import { withInputDefaults, type RevisionSnapshot } from "@/checking/snapshot";
import { CREATE_DEFAULTS, withBlanks, ZDesignCaseValues, ZDuctRunValues, ZSurfaceValues, type TDesignCase, type TSchedule } from "@/schemas/schedule";
import { DESIGN_CASE_NUMBERS, DUCT_RUN_NUMBERS, numberProblem } from "@/schemas/schedule-fields";
import { engineDesignCase } from "@/schedule/engine-schedule";
import { parseCell, parseSheet } from "@/schedule/parse-cells";
import { DUCT_RUN_COLUMNS, SURFACE_COLUMNS, columnHeader, matchHeaders } from "@/schedule/sheet-columns";

// Edits are checked with the row schemas, which the browser loads after the sheet is drawn.
beforeAll(() => loadRowSchemas());

const Z1 = "11111111-1111-4111-8111-111111111111";
const B1 = "33333333-3333-4333-8333-333333333333";
const lookups = { zones: [{ id: Z1, name: "Hall" }], buildups: [{ id: B1, name: "Wall" }] };
const col = (sheet: "surfaces" | "duct_runs", field: string) => (sheet === "surfaces" ? SURFACE_COLUMNS : DUCT_RUN_COLUMNS).find((c) => c.field === field)!;
const issues = (r: { success: boolean; error?: { issues: { path: PropertyKey[]; message: string }[] } }) => (r.success ? [] : r.error!.issues.map((i) => ({ path: i.path.join("."), message: i.message })));

const designCase = { name: "Winter", kind: "heating", T_outdoor_C: -3, RH_outdoor_pct: 85, V_met_m_s: 8, wind_from_deg: 225, solar_W_m2: {}, cloud_cover: 0.5 } as const;
const surface = { label: "Slab", zone_id: Z1, buildup_id: B1, area_m2: 10, tilt_deg: 180, azimuth_deg: 0, height_m: 0, length_m: 4, panel_height_m: 3, method: null, absorptance: null, emissivity: null, exposed_to: "ground" } as const;
const duct = {
  label: "D", zone_id: Z1, shape: "round", diameter_m: 0.4, width_m: null, height_m: null, length_m: 10, flow_m3_s: 0.5, T_entering_heating_C: 30, T_entering_cooling_C: 14, location: "indoor",
  T_surround_C: null, T_surround_cooling_C: null, RH_surround_pct: null, elevation_m: null, insulation_thickness_m: 0, insulation_k_W_mK: 0.035, jacket_emissivity: 0.3, jacket_absorptance: null, margin_K: 0, in_served_zone: true,
} as const;

describe("schemas", () => {
  test.each([
    ["cloud cover 0 and 1 (the ends) are fine", ZDesignCaseValues, { ...designCase, cloud_cover: 1 }, []],
    ["cloud cover above 1", ZDesignCaseValues, { ...designCase, cloud_cover: 1.01 }, [{ path: "cloud_cover", message: "Cloud cover must be between 0 and 1" }]],
    ["cloud cover left out", ZDesignCaseValues, { ...designCase, cloud_cover: undefined }, [{ path: "cloud_cover", message: "Cloud cover is required" }]],
    ["a surface over ground", ZSurfaceValues, surface, []],
    ["a surface over water", ZSurfaceValues, { ...surface, exposed_to: "water" }, [{ path: "exposed_to", message: "Outside of surface must be one of: outside_air, ground" }]],
    ["a duct run in its zone with a blank jacket absorptance", ZDuctRunValues, duct, []],
    ["in_served_zone as text", ZDuctRunValues, { ...duct, in_served_zone: "true" }, [{ path: "in_served_zone", message: "Inside the zone it serves must be true or false" }]],
    ["a jacket absorptance below 0", ZDuctRunValues, { ...duct, jacket_absorptance: -0.01 }, [{ path: "jacket_absorptance", message: "Jacket solar absorptance must be between 0 and 1" }]],
  ] as const)("%s", (_label, schema, value, expected) => {
    expect(issues((schema as typeof ZSurfaceValues).safeParse(value))).toEqual(expected);
  });

  test("a create that leaves the v2 inputs out gets the columns' defaults; one that gives them keeps them", () => {
    const { cloud_cover: _c, ...oldCase } = designCase;
    expect(withBlanks(DESIGN_CASE_NUMBERS, oldCase, [], CREATE_DEFAULTS.design_cases)).toMatchObject({ cloud_cover: 0 });
    const { in_served_zone: _z, jacket_absorptance: _a, ...oldDuct } = duct;
    expect(withBlanks(DUCT_RUN_NUMBERS, oldDuct, [], CREATE_DEFAULTS.duct_runs)).toMatchObject({ in_served_zone: false, jacket_absorptance: null });
    expect(withBlanks(DUCT_RUN_NUMBERS, duct, [], CREATE_DEFAULTS.duct_runs)).toMatchObject({ in_served_zone: true });
    expect(CREATE_DEFAULTS.surfaces).toEqual({ exposed_to: "outside_air" });
  });

  test("the design-case form's hint and the blank of the jacket absorptance come from the specs", () => {
    expect(DESIGN_CASE_NUMBERS.cloud_cover.hint).toMatch(/^0 clear sky … 1 overcast/);
    // The engine's DEFAULT_JACKET_ABSORPTANCE (0.6) is what a blank means.
    expect(DUCT_RUN_NUMBERS.jacket_absorptance.blank).toBe("0.6");
    expect(numberProblem(DESIGN_CASE_NUMBERS.cloud_cover, 2, "IP")).toBe("Cloud cover must be between 0 and 1");
  });

  test("the engine's design case carries the cloud cover", () => {
    const dc = { ...designCase, id: "c", version: 1, cloud_cover: 0.8 } as unknown as TDesignCase;
    expect(engineDesignCase(dc).cloud_cover).toBe(0.8);
  });
});

describe("sheet columns", () => {
  test("where the new columns sit, their headings, and that files without them still import", () => {
    const fields = (c: readonly { field: string }[]) => c.map((x) => x.field);
    expect(fields(SURFACE_COLUMNS).indexOf("exposed_to")).toBe(fields(SURFACE_COLUMNS).indexOf("buildup_id") + 1);
    expect(fields(DUCT_RUN_COLUMNS).indexOf("in_served_zone")).toBe(fields(DUCT_RUN_COLUMNS).indexOf("location") + 1);
    expect(fields(DUCT_RUN_COLUMNS).indexOf("jacket_absorptance")).toBe(fields(DUCT_RUN_COLUMNS).indexOf("jacket_emissivity") + 1);
    expect([columnHeader(col("surfaces", "exposed_to"), "IP"), columnHeader(col("duct_runs", "in_served_zone"), "SI"), columnHeader(col("duct_runs", "jacket_absorptance"), "IP")]).toEqual([
      "Outside of surface",
      "Inside the zone it serves",
      "Jacket solar absorptance",
    ]);
    const old = ["Label", "Zone", "Shape", "Length (m)", "Airflow (m³/s)", "Entering air, heating (°C)", "Entering air, cooling (°C)", "Location", "Insulation (mm)", "Insulation conductivity (W/(m·K))", "Jacket emissivity", "Condensation margin (K)"];
    expect(matchHeaders(old, "duct_runs").missing).toEqual([]);
    const m = matchHeaders(["in_served_zone", "Jacket solar absorptance", "exposed_to"], "duct_runs");
    expect(m.columns.map((c) => c?.col.field ?? null)).toEqual(["in_served_zone", "jacket_absorptance", null]);
    expect(matchHeaders(["Outside of surface", "exposed_to"], "surfaces").columns.map((c) => c?.col.field)).toEqual(["exposed_to", "exposed_to"]);
  });

  test.each([
    ["Yes", true], ["no", false], ["TRUE", true], ["false", false], ["1", true], ["0", false], ["y", true], [true, true], [false, false], ["", false], [null, false],
  ] as const)("a yes/no cell %j reads as %j", (raw, value) => {
    expect(parseCell(col("duct_runs", "in_served_zone"), raw, "SI", lookups)).toEqual({ ok: true, value });
  });

  test.each([
    ["Ground", "ground"], ["ground", "ground"], ["Outside air", "outside_air"], ["outside_air", "outside_air"], ["  ", "outside_air"],
  ] as const)("an outside-of-surface cell %j reads as %j", (raw, value) => {
    expect(parseCell(col("surfaces", "exposed_to"), raw, "IP", lookups)).toEqual({ ok: true, value });
  });

  test("cells that cannot be read say why, naming the column", () => {
    expect(parseCell(col("duct_runs", "in_served_zone"), "maybe", "SI", lookups)).toEqual({ ok: false, message: "Inside the zone it serves must be Yes or No" });
    expect(parseCell(col("surfaces", "exposed_to"), "Water", "SI", lookups)).toEqual({ ok: false, message: "Outside of surface must be one of: Outside air, Ground" });
    expect(parseCell(col("duct_runs", "jacket_absorptance"), "", "SI", lookups)).toEqual({ ok: true, value: null });
  });

  test("a whole sheet: values and problems by row and column", () => {
    const table = [
      ["Label", "Zone", "Shape", "Inside the zone it serves", "Jacket solar absorptance"],
      ["A", "Hall", "Round", "Yes", 0.3],
      ["B", "Hall", "Round", "perhaps", ""],
    ];
    const parsed = parseSheet(table, "duct_runs", lookups);
    expect(parsed.rows[0]!.values).toMatchObject({ in_served_zone: true, jacket_absorptance: 0.3 });
    // (Row 1 lists the required columns this short table lacks.)
    expect(parsed.problems.filter((p) => p.row > 1)).toEqual([{ sheet: "duct_runs", row: 3, column: "Inside the zone it serves", field: "in_served_zone", message: "Inside the zone it serves must be Yes or No" }]);
  });
});

describe("the grid", () => {
  const row = (over: Record<string, unknown> = {}): Row => ({ id: "d", version: 1, position: 0, ...duct, ...over }) as unknown as Row;
  const s = { project: { default_method: "boundary_layer" }, zones: [], buildups: [] } as unknown as TSchedule;

  test("the yes/no column shows Yes/No and offers both; a picked value is stored as a boolean", () => {
    const def = sheetColumnDefs("duct_runs", s, "SI").find((d) => d.colId === "in_served_zone")!;
    expect(def.refData).toEqual({ yes: "Yes", no: "No" });
    expect(def.cellEditorParams).toEqual({ values: ["yes", "no"] });
    const get = def.valueGetter as (p: unknown) => unknown;
    expect([true, false].map((v) => get({ data: row({ in_served_zone: v }) }))).toEqual(["yes", "no"]);
    expect([storedValue(col("duct_runs", "in_served_zone"), "yes", "SI"), storedValue(col("duct_runs", "in_served_zone"), "no", "SI")]).toEqual([true, false]);
  });

  test("choosing Ground in the surfaces grid saves exposed_to; the choice offers both exposures", () => {
    const def = sheetColumnDefs("surfaces", s, "SI").find((d) => d.colId === "exposed_to")!;
    expect(def.refData).toEqual({ outside_air: "Outside air", ground: "Ground" });
    const r = { id: "s", version: 1, position: 0, ...surface, exposed_to: "outside_air" } as unknown as Row;
    expect(editCell("surfaces", r, col("surfaces", "exposed_to"), "ground", "SI")).toEqual({ ok: true, values: { exposed_to: "ground" } });
    expect(editCell("duct_runs", row(), col("duct_runs", "jacket_absorptance"), 1.2, "SI")).toEqual({ ok: false, message: "Jacket solar absorptance must be between 0 and 1" });
    expect(editCell("duct_runs", row(), col("duct_runs", "jacket_absorptance"), 0.85, "IP")).toEqual({ ok: true, values: { jacket_absorptance: 0.85 } });
  });

  test("a pasted block reads Yes/No and labels like an import", () => {
    const plan = planPaste({
      sheet: "duct_runs", text: "Indoors\tYes\n", rows: [row({ in_served_zone: false })], startRow: 0, columnIds: DUCT_RUN_COLUMNS.map((c) => c.field), startColumn: "location", system: "SI", lookups, newId: () => "n",
    });
    expect(plan).toEqual({ ops: [{ op: "update", sheet: "duct_runs", id: "d", values: { location: "indoor", in_served_zone: true } }], problems: [] });
  });
});

describe("revisions issued before the v2 inputs", () => {
  const snap = (over: Partial<RevisionSnapshot> = {}): RevisionSnapshot =>
    ({
      format: 1,
      project: { id: "p", name: "P", reference: "R", altitude_m: 0, terrain: "open", wind_law: "power", unit_system: "SI", default_method: "boundary_layer" },
      design_cases: [{ id: "c", version: 1, name: "Winter", kind: "heating", T_outdoor_C: -3, RH_outdoor_pct: 85, V_met_m_s: 8, wind_from_deg: 225, solar_W_m2: {} }],
      zones: [],
      buildups: [],
      surfaces: [{ id: "s", version: 1, position: 0, label: "Wall", zone_id: Z1, buildup_id: B1, area_m2: 10, tilt_deg: 90, azimuth_deg: 0, height_m: 2, length_m: 4, panel_height_m: 3, method: null, absorptance: null, emissivity: null }],
      duct_runs: [{ id: "d", version: 1, position: 0, ...duct, in_served_zone: undefined, jacket_absorptance: undefined, T_surround_cooling_C: undefined }].map(({ in_served_zone: _z, jacket_absorptance: _a, T_surround_cooling_C: _t, ...r }) => r),
      results: [],
      checks: [],
      comments: [],
      ...over,
    }) as unknown as RevisionSnapshot;

  test("read with the defaults their absence means; values present are kept", () => {
    const s = withInputDefaults(snap());
    expect(s.design_cases[0]!.cloud_cover).toBe(0);
    expect(s.surfaces[0]!.exposed_to).toBe("outside_air");
    expect(s.duct_runs[0]).toMatchObject({ in_served_zone: false, jacket_absorptance: null, T_surround_cooling_C: null });
    const later = withInputDefaults(snap({ surfaces: [{ ...snap().surfaces[0]!, exposed_to: "ground" }] }));
    expect(later.surfaces[0]!.exposed_to).toBe("ground");
  });

  test("compared with a later revision, the defaults are no change; a real change is listed", () => {
    const old = withInputDefaults(snap());
    const same = snap({ design_cases: [{ ...snap().design_cases[0]!, cloud_cover: 0 }], duct_runs: [{ ...snap().duct_runs[0]!, in_served_zone: false, jacket_absorptance: null, T_surround_cooling_C: null }] });
    expect(compareRevisions(old, withInputDefaults(same))).toMatchObject({ rows: { changed: [] }, settings: [] });
    const moved = snap({ design_cases: [{ ...snap().design_cases[0]!, cloud_cover: 0.8 }] });
    expect(compareRevisions(old, withInputDefaults(moved)).settings).toEqual([{ entity: "design_cases", id: "c", name: "Winter", change: "changed", fields: [{ field: "cloud_cover", before: 0, after: 0.8 }] }]);
  });
});
