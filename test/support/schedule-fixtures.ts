// Projects with a small schedule, written straight into the test database, for the schedule
// tests and the access matrix. Values are ordinary ones (a heating and a cooling case, a wall
// and a roof, a round and a rectangular duct), chosen by hand, not taken from the engine.
import { randomUUID } from "node:crypto";
import { testDb } from "./db";

export interface FixtureProject {
  projectId: string;
  firmId: string;
  caseIds: { heating: string; cooling: string };
  zoneIds: [string, string];
  buildupIds: { layered: string; direct: string };
  surfaceIds: string[];
  ductRunIds: string[];
}

let serial = 0;
export const uniqueRef = (prefix: string) => `${prefix}-${process.pid}-${Date.now() % 1e8}-${++serial}`;

export const SURFACE_VALUES = { label: "South wall", area_m2: 12.5, tilt_deg: 90, azimuth_deg: 180, height_m: 3, length_m: 5, panel_height_m: 3, method: null, absorptance: null, emissivity: null };
export const DUCT_VALUES = {
  label: "Roof supply",
  shape: "round",
  diameter_m: 0.4,
  width_m: null,
  height_m: null,
  length_m: 12,
  flow_m3_s: 0.8,
  T_entering_heating_C: 32,
  T_entering_cooling_C: 13,
  location: "outdoor",
  T_surround_C: null,
  T_surround_cooling_C: null,
  RH_surround_pct: null,
  elevation_m: 8,
  insulation_thickness_m: 0.05,
  insulation_k_W_mK: 0.035,
  jacket_emissivity: 0.1,
  margin_K: 1,
};

/** A project of the firm with two design cases, two zones, two build-ups, three surfaces and two duct runs. */
export async function makeProject(firmSlug: string): Promise<FixtureProject> {
  const db = testDb();
  const firm = await db("firms").where({ slug: firmSlug }).first("id");
  const own = { firm_id: firm.id };
  const [project] = await db("projects").insert({ ...own, name: "Fixture pavilion", reference: uniqueRef("FX"), altitude_m: 120, terrain: "suburban" }).returning("id");
  const p = { ...own, project_id: project.id };
  const [heating, cooling] = [randomUUID(), randomUUID()];
  await db("design_cases").insert([
    { ...p, id: heating, name: "Winter", kind: "heating", T_outdoor_C: -3, RH_outdoor_pct: 85, V_met_m_s: 8, wind_from_deg: 225, solar_W_m2: "{}" },
    { ...p, id: cooling, name: "Summer", kind: "cooling", T_outdoor_C: 30, RH_outdoor_pct: 40, V_met_m_s: 3, wind_from_deg: 180, solar_W_m2: JSON.stringify({ S: 400, W: 450, horizontal: 800 }) },
  ]);
  const zoneIds: [string, string] = [randomUUID(), randomUUID()];
  await db("zones").insert([
    { ...p, id: zoneIds[0], name: "Hall", floor_area_m2: 150, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 50 },
    { ...p, id: zoneIds[1], name: "Office", floor_area_m2: 40, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
  ]);
  const buildupIds = { layered: randomUUID(), direct: randomUUID() };
  await db("buildups").insert([
    { ...p, id: buildupIds.layered, name: "Insulated wall", R_direct_m2K_W: null, absorptance: 0.6, emissivity: 0.9 },
    { ...p, id: buildupIds.direct, name: "Roof panel", R_direct_m2K_W: 4.5, absorptance: 0.85, emissivity: 0.9 },
  ]);
  await db("buildup_layers").insert([
    { ...own, buildup_id: buildupIds.layered, position: 0, material: "Brick", thickness_m: 0.1, k_W_mK: 0.77 },
    { ...own, buildup_id: buildupIds.layered, position: 1, material: "Mineral wool", thickness_m: 0.15, k_W_mK: 0.035 },
  ]);
  const surfaceIds = [randomUUID(), randomUUID(), randomUUID()];
  await db("surfaces").insert([
    { ...p, ...SURFACE_VALUES, id: surfaceIds[0], position: 0, zone_id: zoneIds[0], buildup_id: buildupIds.layered },
    { ...p, ...SURFACE_VALUES, id: surfaceIds[1], position: 1, label: "West wall", azimuth_deg: 270, zone_id: zoneIds[0], buildup_id: buildupIds.layered },
    { ...p, ...SURFACE_VALUES, id: surfaceIds[2], position: 2, label: "Roof", area_m2: 150, tilt_deg: 0, azimuth_deg: 0, height_m: 6, length_m: 15, panel_height_m: 2.5, zone_id: zoneIds[1], buildup_id: buildupIds.direct, method: "iso6946" },
  ]);
  const ductRunIds = [randomUUID(), randomUUID()];
  await db("duct_runs").insert([
    { ...p, ...DUCT_VALUES, id: ductRunIds[0], position: 0, zone_id: zoneIds[0] },
    { ...p, ...DUCT_VALUES, id: ductRunIds[1], position: 1, label: "Void extract", shape: "rect", diameter_m: null, width_m: 0.6, height_m: 0.3, location: "indoor", T_surround_C: 18, elevation_m: null, insulation_thickness_m: 0.025, zone_id: zoneIds[1] },
  ]);
  return { projectId: project.id, firmId: firm.id, caseIds: { heating, cooling }, zoneIds, buildupIds, surfaceIds, ductRunIds };
}

/** Every stored row of a project's tables, for "nothing changed" comparisons. */
export async function snapshot(projectId: string): Promise<Record<string, unknown[]>> {
  const out: Record<string, unknown[]> = {};
  for (const table of ["design_cases", "zones", "buildups", "surfaces", "duct_runs"]) out[table] = await testDb()(table).where({ project_id: projectId }).orderBy("id");
  out.buildup_layers = await testDb()("buildup_layers").whereIn("buildup_id", testDb()("buildups").where({ project_id: projectId }).select("id")).orderBy("id");
  return out;
}
