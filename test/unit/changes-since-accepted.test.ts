// What changed in a row's inputs since it was accepted: the diff of the inputs kept at acceptance
// against those of now (row, zone, build-up, design cases, site), and the same in words with units
// for the checker — field headings, never column names.
import { describe, expect, test } from "vitest";
import { inputChanges, rowInputs, type InputSources } from "../../src/checking/accepted-inputs";
import { describeInputChanges, describeItemChange } from "../../src/checking/describe-input-changes";

const zone = { id: "z1", name: "Reading room", floor_area_m2: 120, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 50, version: 3 };
const zone2 = { id: "z2", name: "Stair core", floor_area_m2: 30, T_heating_C: 16, T_cooling_C: 26, RH_inside_pct: 50, version: 1 };
const buildup = { id: "b1", name: "Rainscreen wall", layers: [{ material: "Mineral wool", thickness_m: 0.15, k_W_mK: 0.035 }], R_direct_m2K_W: null, absorptance: 0.6, emissivity: 0.9, version: 2 };
const winter = { id: "d1", name: "Winter design day", kind: "heating", T_outdoor_C: -4, RH_outdoor_pct: 90, V_met_m_s: 5, wind_from_deg: 225, solar_W_m2: { S: 0 }, cloud_cover: 0 };
const surface = {
  id: "s1", label: "North wall 1", zone_id: "z1", buildup_id: "b1", exposed_to: "outside_air", area_m2: 12.5, tilt_deg: 90, azimuth_deg: 0, height_m: 4, length_m: 10,
  panel_height_m: 3, method: null, absorptance: null, emissivity: null, version: 1, position: 1,
};
const sources = (over: Partial<{ zones: object[]; buildups: object[]; design_cases: object[]; project: object }> = {}): InputSources =>
  ({ project: { altitude_m: 85, terrain: "suburban", wind_law: "power", default_method: "boundary_layer", name: "Library", unit_system: "SI" }, zones: [zone, zone2], buildups: [buildup], design_cases: [winter], ...over }) as InputSources;

const accepted = rowInputs("surfaces", surface, sources());

describe("the inputs kept at acceptance", () => {
  test("hold the row, its zone and build-up, every design case and the site, without bookkeeping", () => {
    expect(accepted.row).not.toHaveProperty("version");
    expect(accepted.row).not.toHaveProperty("position");
    expect(accepted.zone).toEqual({ id: "z1", name: "Reading room", floor_area_m2: 120, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 50 });
    expect(accepted.buildup?.layers).toEqual(buildup.layers);
    expect(accepted.design_cases).toHaveLength(1);
    // The project's name and units do not move results: not kept.
    expect(accepted.site).toEqual({ altitude_m: 85, terrain: "suburban", wind_law: "power", default_method: "boundary_layer" });
  });
  test("a duct run has no build-up", () => {
    expect(rowInputs("duct_runs", { id: "r1", label: "Supply 1", zone_id: "z2" }, sources()).buildup).toBeNull();
  });
});

describe("the diff of inputs, before → after", () => {
  test("nothing changed: no change, even after a new version or another position", () => {
    expect(inputChanges(accepted, rowInputs("surfaces", { ...surface, version: 5, position: 9 }, sources()))).toEqual([]);
  });

  test("the row's own input", () => {
    const now = rowInputs("surfaces", { ...surface, area_m2: 14, method: "mcadams" }, sources());
    expect(inputChanges(accepted, now)).toEqual([
      { scope: "row", name: "North wall 1", change: "changed", fields: [{ field: "area_m2", before: 12.5, after: 14 }, { field: "method", before: null, after: "mcadams" }] },
    ]);
  });

  test("its zone and build-up, by name", () => {
    const now = rowInputs("surfaces", surface, sources({ zones: [{ ...zone, T_heating_C: 21 }], buildups: [{ ...buildup, layers: [{ material: "Mineral wool", thickness_m: 0.2, k_W_mK: 0.035 }] }] }));
    const c = inputChanges(accepted, now);
    expect(c.map((x) => [x.scope, x.name, x.fields.map((f) => f.field)])).toEqual([
      ["zone", "Reading room", ["T_heating_C"]],
      ["buildup", "Rainscreen wall", ["layers"]],
    ]);
  });

  test("moved to another zone: the row's zone changes, the two zones are not compared", () => {
    const c = inputChanges(accepted, rowInputs("surfaces", { ...surface, zone_id: "z2" }, sources()));
    expect(c).toEqual([{ scope: "row", name: "North wall 1", change: "changed", fields: [{ field: "zone_id", before: "z1", after: "z2" }] }]);
  });

  test("design cases added, removed and changed, and the site", () => {
    const summer = { ...winter, id: "d2", name: "Summer peak", kind: "cooling" };
    const before = rowInputs("surfaces", surface, sources({ design_cases: [winter, summer] }));
    const evening = { ...winter, id: "d3", name: "Winter evening" };
    const now = rowInputs("surfaces", surface, sources({ design_cases: [{ ...winter, T_outdoor_C: -6, solar_W_m2: { S: 120 } }, evening], project: { altitude_m: 85, terrain: "open", wind_law: "power", default_method: "boundary_layer" } }));
    expect(inputChanges(before, now).map((x) => [x.scope, x.name, x.change, x.fields.map((f) => f.field)])).toEqual([
      ["design_case", "Winter design day", "changed", ["T_outdoor_C", "solar_W_m2"]],
      ["design_case", "Winter evening", "added", []],
      ["design_case", "Summer peak", "removed", []],
      ["site", "", "changed", ["terrain"]],
    ]);
  });

  test("an input added to Filmsheet after the acceptance is not reported as changed", () => {
    const old = { ...accepted, row: Object.fromEntries(Object.entries(accepted.row).filter(([k]) => k !== "exposed_to")) };
    expect(inputChanges(old, rowInputs("surfaces", surface, sources()))).toEqual([]);
  });
});

describe("in words for the checker", () => {
  const ctx = { sheet: "surfaces" as const, system: "SI" as const, zones: new Map([["z1", "Reading room"], ["z2", "Stair core"]]), buildups: new Map([["b1", "Rainscreen wall"]]) };

  test("headings, units and choice labels; no column names", () => {
    const now = rowInputs("surfaces", { ...surface, area_m2: 14, method: "mcadams", zone_id: "z2", absorptance: 0.7 }, sources({ zones: [zone, zone2], design_cases: [{ ...winter, T_outdoor_C: -6, solar_W_m2: { S: 120 } }] }));
    const shown = describeInputChanges(inputChanges(accepted, now), ctx);
    expect(shown).toEqual([
      {
        heading: "This surface",
        fields: [
          { label: "Zone", before: "Reading room", after: "Stair core" },
          { label: "Area", before: "12.50 m²", after: "14.00 m²" },
          { label: "Method", before: "Project default", after: "McAdams wind formula" },
          { label: "Absorptance", before: "blank (the build-up's)", after: "0.70" },
        ],
      },
      {
        heading: "Design case Winter design day",
        fields: [
          { label: "Outdoor dry-bulb", before: "-4.0 °C", after: "-6.0 °C" },
          { label: "Solar irradiance, south", before: "0 W/m²", after: "120 W/m²" },
        ],
      },
    ]);
    expect(JSON.stringify(shown)).not.toMatch(/_m2|_id|_C\b|mcadams/);
  });

  test("in IP units for an IP project", () => {
    const now = rowInputs("surfaces", { ...surface, area_m2: 14 }, sources());
    const [c] = describeInputChanges(inputChanges(accepted, now), { ...ctx, system: "IP" });
    expect(c!.fields).toEqual([{ label: "Area", before: "134.5 ft²", after: "150.7 ft²" }]);
  });

  test("a build-up's layers, layer by layer; a whole design case added", () => {
    const now = rowInputs("surfaces", surface, sources({ buildups: [{ ...buildup, layers: [{ material: "Mineral wool", thickness_m: 0.2, k_W_mK: 0.035 }, { material: "Plasterboard", thickness_m: 0.0125, k_W_mK: 0.21 }] }], design_cases: [winter, { ...winter, id: "d9", name: "Cold snap" }] }));
    expect(describeInputChanges(inputChanges(accepted, now), ctx)).toEqual([
      {
        heading: "Build-up Rainscreen wall",
        fields: [
          { label: "Layer 1", before: "Mineral wool, 150.0 mm, k 0.035 W/(m·K)", after: "Mineral wool, 200.0 mm, k 0.035 W/(m·K)" },
          { label: "Layer 2", before: "none", after: "Plasterboard, 12.5 mm, k 0.210 W/(m·K)" },
        ],
      },
      { heading: "Design case Cold snap", note: "added since the row was accepted", fields: [] },
    ]);
  });

  test("a history entry's change of a duct run, in words", () => {
    expect(describeItemChange("duct_runs", { label: "Supply 1", insulation_thickness_m: 0.025, shape: "round", in_served_zone: false }, { label: "Supply 1", insulation_thickness_m: 0.05, shape: "rect", in_served_zone: true })).toEqual([
      "Insulation: 25 mm → 50 mm",
      "Shape: Round → Rectangular",
      "Inside the zone it serves: No → Yes",
    ]);
    expect(describeItemChange("row_comment", {}, {})).toBeNull();
  });
});
