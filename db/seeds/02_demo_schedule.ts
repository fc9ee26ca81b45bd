// The demo schedule of Tarnbrook & Sill's (invented) Larchfield Community Library extension: four
// zones, nine build-ups, 44 surfaces on every side and at several heights (one over the ground),
// nine duct runs (on the roof in the sun, in ceiling voids, one bare in the room it serves) and
// four design cases (clear and overcast). Fixed ids derived from names make it
// idempotent: rows already there (perhaps edited during a demo) are left as they are.
import { createHash } from "node:crypto";
import type { Knex } from "knex";
import { assertDemoSeedAllowed } from "../demo-seed-guard";

/** A stable UUID (version-5 layout) from a name, so every run seeds the same ids. */
export function demoId(name: string): string {
  const h = createHash("sha1").update(`filmsheet-demo:${name}`).digest("hex");
  return `${h.slice(0, 8)}-${h.slice(8, 12)}-5${h.slice(13, 16)}-${((parseInt(h[16]!, 16) & 3) | 8).toString(16)}${h.slice(17, 20)}-${h.slice(20, 32)}`;
}

const SITE = { altitude_m: 212, terrain: "open", wind_law: "power", unit_system: "SI", default_method: "boundary_layer" } as const;

const SOLAR_SUNNY = { N: 115, NE: 290, E: 470, SE: 445, S: 350, SW: 445, W: 470, NW: 290, horizontal: 850 };
const SOLAR_STILL = { N: 100, NE: 105, E: 110, SE: 230, S: 370, SW: 520, W: 590, NW: 370, horizontal: 720 };
// Clear skies (cloud cover 0) for the design days, the cautious choice; a hazy still afternoon; and
// a mild, overcast winter day, when the cloud keeps the roofs and the ducts outdoors warmer.
export const DEMO_CASES = [
  { name: "Winter design day, windy", kind: "heating", T_outdoor_C: -5, RH_outdoor_pct: 90, V_met_m_s: 11, wind_from_deg: 240, cloud_cover: 0, solar_W_m2: {} },
  { name: "Summer design day, sunny", kind: "cooling", T_outdoor_C: 28, RH_outdoor_pct: 45, V_met_m_s: 4, wind_from_deg: 200, cloud_cover: 0, solar_W_m2: SOLAR_SUNNY },
  { name: "Still summer afternoon", kind: "cooling", T_outdoor_C: 29, RH_outdoor_pct: 50, V_met_m_s: 0.5, wind_from_deg: 90, cloud_cover: 0.2, solar_W_m2: SOLAR_STILL },
  // Named to sort after the winter design day, which the grid opens on (the first heating case).
  { name: "Winter overcast day, mild", kind: "heating", T_outdoor_C: 7, RH_outdoor_pct: 92, V_met_m_s: 6, wind_from_deg: 220, cloud_cover: 0.8, solar_W_m2: {} },
];

export const DEMO_ZONES = [
  { name: "Reading room", floor_area_m2: 210, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
  { name: "Study gallery", floor_area_m2: 120, T_heating_C: 21, T_cooling_C: 24, RH_inside_pct: 50 },
  { name: "Community room", floor_area_m2: 85, T_heating_C: 20, T_cooling_C: 24, RH_inside_pct: 55 },
  { name: "Entrance lobby", floor_area_m2: 30, T_heating_C: 18, T_cooling_C: 25, RH_inside_pct: 50 },
];

type L = [string, number, number];
const BUILDUPS: { name: string; layers: L[]; R?: number; absorptance: number; emissivity: number }[] = [
  { name: "Rainscreen timber-frame wall", absorptance: 0.55, emissivity: 0.9, layers: [["Sheathing board", 0.012, 0.13], ["Mineral wool between studs", 0.2, 0.038], ["OSB racking board", 0.015, 0.13], ["Service-void mineral wool", 0.05, 0.038], ["Plasterboard", 0.0125, 0.21]] },
  { name: "Brick plinth wall", absorptance: 0.7, emissivity: 0.9, layers: [["Facing brick", 0.1025, 0.77], ["PIR cavity board", 0.1, 0.022], ["Dense concrete block", 0.1, 1.13], ["Gypsum plaster", 0.013, 0.57]] },
  { name: "Warm-deck flat roof", absorptance: 0.85, emissivity: 0.9, layers: [["Single-ply membrane", 0.0015, 0.16], ["PIR insulation", 0.16, 0.022], ["Plywood deck", 0.018, 0.13]] },
  { name: "Copper-clad gallery wall", absorptance: 0.64, emissivity: 0.7, layers: [["Plywood substrate", 0.018, 0.13], ["Wood-fibre insulation", 0.22, 0.04], ["OSB racking board", 0.015, 0.13]] },
  { name: "Curtain-wall spandrel panel", absorptance: 0.8, emissivity: 0.84, layers: [], R: 2.2 },
  { name: "Entrance door panel", absorptance: 0.45, emissivity: 0.85, layers: [], R: 0.9 },
  { name: "Ventilated soffit", absorptance: 0.3, emissivity: 0.9, layers: [["Cement particle board", 0.012, 0.35], ["Mineral wool", 0.15, 0.035], ["Plywood", 0.018, 0.13]] },
  { name: "Ground-bearing floor slab", absorptance: 0.5, emissivity: 0.9, layers: [["Sand-cement screed", 0.065, 1.15], ["PIR floor board", 0.1, 0.022], ["Reinforced concrete slab", 0.15, 2.3]] },
  // Where the extension meets the old lodge: a back-painted single pane kept as an opaque panel,
  // with nothing behind it. Its inside face runs cold in winter (mould and condensation risk).
  { name: "Retained single-glazed spandrel", absorptance: 0.7, emissivity: 0.84, layers: [["Back-painted float glass", 0.006, 1.0]] },
];

// [label, zone, build-up, count, area m², tilt °, azimuth °, centroid height m, length along wind m, panel height m, outside of it]
type S = [string, string, string, number, number, number, number, number, number, number, ("outside_air" | "ground")?];
const SURFACE_GROUPS: S[] = [
  ["RR south wall", "Reading room", "Rainscreen timber-frame wall", 4, 14.4, 90, 180, 2, 6, 4],
  ["RR south spandrel", "Reading room", "Curtain-wall spandrel panel", 2, 4.8, 90, 180, 3.6, 4, 1.2],
  ["RR west wall", "Reading room", "Rainscreen timber-frame wall", 3, 12, 90, 270, 2, 5, 4],
  ["RR plinth", "Reading room", "Brick plinth wall", 2, 6, 90, 225, 0.4, 7.5, 0.8],
  ["RR roof bay", "Reading room", "Warm-deck flat roof", 4, 52.5, 0, 0, 4.5, 10.5, 1.7],
  ["SG east wall", "Study gallery", "Copper-clad gallery wall", 3, 10.8, 90, 90, 6, 4.5, 3.6],
  ["SG north wall", "Study gallery", "Copper-clad gallery wall", 3, 10.8, 90, 0, 6, 4.5, 3.6],
  ["SG west wall", "Study gallery", "Copper-clad gallery wall", 2, 9, 90, 270, 6, 4, 3.6],
  ["SG south spandrel", "Study gallery", "Curtain-wall spandrel panel", 3, 3.6, 90, 180, 7.2, 3, 1.2],
  ["SG roof bay", "Study gallery", "Warm-deck flat roof", 3, 40, 0, 0, 8.2, 10, 1.5],
  ["SG north clerestory", "Study gallery", "Rainscreen timber-frame wall", 2, 6, 70, 0, 8.8, 6, 1],
  ["CR west wall", "Community room", "Rainscreen timber-frame wall", 2, 13.5, 90, 270, 1.8, 5, 3.6],
  ["CR north wall", "Community room", "Brick plinth wall", 2, 12.6, 90, 0, 1.8, 5, 3.6],
  ["CR roof", "Community room", "Warm-deck flat roof", 2, 42.5, 0, 0, 4.2, 8.5, 1.6],
  ["CR north-east corner", "Community room", "Rainscreen timber-frame wall", 1, 8.4, 90, 45, 1.8, 3.5, 3.6],
  ["EL door panel", "Entrance lobby", "Entrance door panel", 1, 4.4, 90, 225, 1.2, 2, 2.4],
  ["EL south-east side panel", "Entrance lobby", "Rainscreen timber-frame wall", 1, 7.5, 90, 135, 1.6, 3, 3.2],
  ["EL soffit", "Entrance lobby", "Ventilated soffit", 1, 9, 180, 0, 3.2, 3, 1],
  ["EL roof", "Entrance lobby", "Warm-deck flat roof", 1, 30, 0, 0, 3.6, 6, 1.3],
  ["EL retained spandrel", "Entrance lobby", "Retained single-glazed spandrel", 1, 2.4, 90, 45, 2.8, 2, 0.8],
  // Over the ground: recorded with the fabric but not computed (ISO 13370), so out of the totals.
  ["RR ground-floor slab", "Reading room", "Ground-bearing floor slab", 1, 210, 180, 0, 0, 15, 14, "ground"],
];

// Roof runs in the sun, clad in bright aluminium (absorptance 0.25), but for the painted one below.
const ROOF = { location: "outdoor", in_served_zone: false, T_surround_C: null, T_surround_cooling_C: null, RH_surround_pct: null, insulation_k_W_mK: 0.035, jacket_emissivity: 0.1, jacket_absorptance: 0.25, margin_K: 1 } as const;
// Ceiling voids sit near the rooms in winter and warm up under the roof in summer (27–29 °C).
const VOID = { location: "indoor", in_served_zone: false, elevation_m: null, insulation_k_W_mK: 0.037, jacket_absorptance: null, margin_K: 1 } as const;
const round = (d: number) => ({ shape: "round", diameter_m: d, width_m: null, height_m: null }) as const;
const rect = (w: number, h: number) => ({ shape: "rect", diameter_m: null, width_m: w, height_m: h }) as const;
export const DEMO_DUCT_RUNS = [
  { label: "AHU-1 supply, roof run to gallery drop", zone: "Study gallery", ...round(0.5), ...ROOF, length_m: 14, flow_m3_s: 1.1, T_entering_heating_C: 32, T_entering_cooling_C: 13, elevation_m: 8.6, insulation_thickness_m: 0.05 },
  { label: "AHU-1 supply, roof run to reading room", zone: "Reading room", ...rect(0.8, 0.4), ...ROOF, length_m: 22, flow_m3_s: 1.6, T_entering_heating_C: 32, T_entering_cooling_C: 13, elevation_m: 8.6, insulation_thickness_m: 0.05 },
  { label: "AHU-1 extract, roof run", zone: "Reading room", ...rect(0.7, 0.4), ...ROOF, length_m: 18, flow_m3_s: 1.4, T_entering_heating_C: 21, T_entering_cooling_C: 24, elevation_m: 8.6, insulation_thickness_m: 0.025 },
  { label: "Community room supply, low-roof run", zone: "Community room", ...round(0.315), ...ROOF, length_m: 9, flow_m3_s: 0.45, T_entering_heating_C: 30, T_entering_cooling_C: 14, elevation_m: 4.6, insulation_thickness_m: 0.05, jacket_emissivity: 0.9, jacket_absorptance: null },
  { label: "Reading room supply, ceiling void", zone: "Reading room", ...rect(0.6, 0.3), ...VOID, length_m: 26, flow_m3_s: 1.2, T_entering_heating_C: 32, T_entering_cooling_C: 13, T_surround_C: 19, T_surround_cooling_C: 28, RH_surround_pct: null, insulation_thickness_m: 0.025, jacket_emissivity: 0.1 },
  { label: "Gallery supply, ceiling void", zone: "Study gallery", ...round(0.4), ...VOID, length_m: 16, flow_m3_s: 0.8, T_entering_heating_C: 32, T_entering_cooling_C: 13, T_surround_C: 20, T_surround_cooling_C: 28, RH_surround_pct: null, insulation_thickness_m: 0.025, jacket_emissivity: 0.1 },
  { label: "Lobby supply, void over entrance (bare)", zone: "Entrance lobby", ...round(0.25), ...VOID, length_m: 8, flow_m3_s: 0.2, T_entering_heating_C: 30, T_entering_cooling_C: 13, T_surround_C: 22, T_surround_cooling_C: 29, RH_surround_pct: 70, insulation_thickness_m: 0, jacket_emissivity: 0.3 },
  { label: "Community room supply, ceiling void", zone: "Community room", ...rect(0.4, 0.25), ...VOID, length_m: 12, flow_m3_s: 0.45, T_entering_heating_C: 30, T_entering_cooling_C: 14, T_surround_C: 20, T_surround_cooling_C: 27, RH_surround_pct: null, insulation_thickness_m: 0.025, jacket_emissivity: 0.9, margin_K: 0.5 },
  // Spiral duct left bare in the reading room it supplies: its heat stays in the room, so the
  // zone's totals leave it out and show it for reference.
  { label: "Reading room supply, exposed spiral duct", zone: "Reading room", ...round(0.45), ...VOID, in_served_zone: true, length_m: 18, flow_m3_s: 0.6, T_entering_heating_C: 32, T_entering_cooling_C: 14, T_surround_C: null, T_surround_cooling_C: null, RH_surround_pct: null, insulation_thickness_m: 0, jacket_emissivity: 0.3 },
];

export const DEMO_SURFACE_COUNT = SURFACE_GROUPS.reduce((n, g) => n + g[3], 0);

export async function seed(knex: Knex): Promise<void> {
  await assertDemoSeedAllowed(knex);
  const project = await knex("projects as p").join("firms as f", "f.id", "p.firm_id").where({ "f.slug": "tarnbrook-sill", "p.reference": "TS-2417" }).first("p.id", "p.firm_id");
  if (!project) throw new Error("The demo project TS-2417 is missing: run 01_demo_firms first.");
  const own = { firm_id: project.firm_id, project_id: project.id };
  const id = (kind: string, name: string) => demoId(`${kind}:${name}`);

  await knex.transaction(async (trx) => {
    // The site is set once, when the demo schedule is first written; later runs keep any edits.
    const fresh = !(await trx("zones").where({ id: id("zone", DEMO_ZONES[0]!.name) }).first("id"));
    if (fresh) await trx("projects").where({ id: project.id }).update(SITE);
    const ignore = (table: string, rows: object[], key: string[] = ["id"]) => trx(table).insert(rows).onConflict(key).ignore();

    await ignore("design_cases", DEMO_CASES.map((c) => ({ ...own, id: id("case", c.name), ...c, solar_W_m2: JSON.stringify(c.solar_W_m2) })));
    await ignore("zones", DEMO_ZONES.map((z) => ({ ...own, id: id("zone", z.name), ...z })));
    await ignore("buildups", BUILDUPS.map((b) => ({ ...own, id: id("buildup", b.name), name: b.name, R_direct_m2K_W: b.R ?? null, absorptance: b.absorptance, emissivity: b.emissivity })));
    const layers = BUILDUPS.flatMap((b) => b.layers.map(([material, thickness_m, k_W_mK], position) => ({ firm_id: project.firm_id, buildup_id: id("buildup", b.name), position, material, thickness_m, k_W_mK })));
    await ignore("buildup_layers", layers, ["buildup_id", "position"]);

    let position = 0;
    const surfaces = SURFACE_GROUPS.flatMap(([label, zone, buildup, count, area_m2, tilt_deg, azimuth_deg, height_m, length_m, panel_height_m, exposed_to = "outside_air"]) =>
      Array.from({ length: count }, (_, i) => {
        const name = count > 1 ? `${label} ${i + 1}` : label;
        return { ...own, id: id("surface", name), position: position++, label: name, zone_id: id("zone", zone), buildup_id: id("buildup", buildup), area_m2, tilt_deg, azimuth_deg, height_m, length_m, panel_height_m, method: null, absorptance: null, emissivity: null, exposed_to };
      }),
    );
    await ignore("surfaces", surfaces);
    await ignore("duct_runs", DEMO_DUCT_RUNS.map(({ zone, ...d }, i) => ({ ...own, id: id("duct", d.label), position: i, zone_id: id("zone", zone), ...d })));
  });
}
