// The schedule: a project's site and unit system, its design cases, zones, build-ups (with
// layers), surfaces and duct runs. Columns carry the engine's names (src/calc/schedule/types.ts),
// SI throughout. Every row keeps its firm_id (tenant scope) and a version (a stale write gets 409).
// Rows point at zones and build-ups of their own project through composite keys, so the database
// itself refuses a surface of one project that names another project's zone.
import type { Knex } from "knex";

const TERRAINS = ["city", "suburban", "open", "water"];
const METHODS = ["boundary_layer", "iso6946", "mcadams"];

function owned(knex: Knex, t: Knex.CreateTableBuilder): void {
  t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
  t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
  t.uuid("project_id").notNullable().references("projects.id").onDelete("CASCADE");
}

function stamped(knex: Knex, t: Knex.CreateTableBuilder): void {
  t.integer("version").notNullable().defaultTo(1);
  t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
}

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("projects", (t) => {
    t.double("altitude_m").notNullable().defaultTo(0);
    t.enu("terrain", TERRAINS, { useNative: false, enumName: "project_terrain" }).notNullable().defaultTo("suburban");
    t.enu("wind_law", ["power", "log"], { useNative: false, enumName: "project_wind_law" }).notNullable().defaultTo("power");
    t.enu("unit_system", ["SI", "IP"], { useNative: false, enumName: "project_unit_system" }).notNullable().defaultTo("SI");
    t.enu("default_method", METHODS, { useNative: false, enumName: "project_default_method" }).notNullable().defaultTo("boundary_layer");
    // Lets child tables reference (project_id, firm_id) so a row cannot sit in another firm's project.
    t.unique(["id", "firm_id"]);
  });

  await knex.schema.createTable("design_cases", (t) => {
    owned(knex, t);
    t.string("name", 80).notNullable();
    t.enu("kind", ["heating", "cooling"], { useNative: false, enumName: "design_case_kind" }).notNullable();
    t.double("T_outdoor_C").notNullable();
    t.double("RH_outdoor_pct").notNullable();
    t.double("V_met_m_s").notNullable();
    t.double("wind_from_deg").notNullable();
    // W/m² by orientation (N … NW) and "horizontal"; a missing key means 0.
    t.jsonb("solar_W_m2").notNullable().defaultTo("{}");
    stamped(knex, t);
    t.unique(["project_id", "name"]);
  });

  await knex.schema.createTable("zones", (t) => {
    owned(knex, t);
    t.string("name", 80).notNullable();
    t.double("floor_area_m2").notNullable();
    t.double("T_heating_C").notNullable();
    t.double("T_cooling_C").notNullable();
    t.double("RH_inside_pct").notNullable();
    stamped(knex, t);
    t.unique(["project_id", "name"]);
    t.unique(["project_id", "id"]);
  });

  await knex.schema.createTable("buildups", (t) => {
    owned(knex, t);
    t.string("name", 80).notNullable();
    t.double("R_direct_m2K_W");
    t.double("absorptance").notNullable();
    t.double("emissivity").notNullable();
    stamped(knex, t);
    t.unique(["project_id", "name"]);
    t.unique(["project_id", "id"]);
  });

  // Layers are part of their build-up: written with it, under its version.
  await knex.schema.createTable("buildup_layers", (t) => {
    t.bigIncrements("id");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.uuid("buildup_id").notNullable().references("buildups.id").onDelete("CASCADE");
    t.integer("position").notNullable();
    t.string("material", 80).notNullable();
    t.double("thickness_m").notNullable();
    t.double("k_W_mK").notNullable();
    t.unique(["buildup_id", "position"]);
  });

  await knex.schema.createTable("surfaces", (t) => {
    owned(knex, t);
    t.integer("position").notNullable();
    t.uuid("zone_id").notNullable();
    t.uuid("buildup_id").notNullable();
    t.string("label", 120).notNullable();
    t.double("area_m2").notNullable();
    t.double("tilt_deg").notNullable();
    t.double("azimuth_deg").notNullable();
    t.double("height_m").notNullable();
    t.double("length_m").notNullable();
    t.double("panel_height_m").notNullable();
    t.enu("method", METHODS, { useNative: false, enumName: "surface_method" });
    t.double("absorptance");
    t.double("emissivity");
    stamped(knex, t);
    t.foreign(["project_id", "zone_id"]).references(["project_id", "id"]).inTable("zones");
    t.foreign(["project_id", "buildup_id"]).references(["project_id", "id"]).inTable("buildups");
    t.index(["project_id", "position"]);
    t.index(["zone_id"]);
    t.index(["buildup_id"]);
  });

  await knex.schema.createTable("duct_runs", (t) => {
    owned(knex, t);
    t.integer("position").notNullable();
    t.uuid("zone_id").notNullable();
    t.string("label", 120).notNullable();
    t.enu("shape", ["round", "rect"], { useNative: false, enumName: "duct_shape" }).notNullable();
    t.double("diameter_m");
    t.double("width_m");
    t.double("height_m");
    t.double("length_m").notNullable();
    t.double("flow_m3_s").notNullable();
    t.double("T_entering_heating_C").notNullable();
    t.double("T_entering_cooling_C").notNullable();
    t.enu("location", ["indoor", "outdoor"], { useNative: false, enumName: "duct_location" }).notNullable();
    t.double("T_surround_C");
    t.double("RH_surround_pct");
    t.double("elevation_m");
    t.double("insulation_thickness_m").notNullable();
    t.double("insulation_k_W_mK").notNullable();
    t.double("jacket_emissivity").notNullable();
    t.double("margin_K").notNullable().defaultTo(0);
    stamped(knex, t);
    t.foreign(["project_id", "zone_id"]).references(["project_id", "id"]).inTable("zones");
    t.index(["project_id", "position"]);
    t.index(["zone_id"]);
  });

  // Every child row sits in a project of its own firm.
  for (const table of ["design_cases", "zones", "buildups", "surfaces", "duct_runs"]) {
    await knex.schema.alterTable(table, (t) => {
      t.foreign(["project_id", "firm_id"], `${table}_project_firm_fk`).references(["id", "firm_id"]).inTable("projects").onDelete("CASCADE");
    });
  }
}

export async function down(knex: Knex): Promise<void> {
  for (const table of ["duct_runs", "surfaces", "buildup_layers", "buildups", "zones", "design_cases"]) await knex.schema.dropTable(table);
  await knex.schema.alterTable("projects", (t) => {
    t.dropUnique(["id", "firm_id"]);
    for (const c of ["altitude_m", "terrain", "wind_law", "unit_system", "default_method"]) t.dropColumn(c);
  });
}
