// The inputs of calculation contract v2: cloud cover per design case, what lies outside a surface
// (outside air, or the ground, which Filmsheet does not compute), and for duct runs whether the run
// lies inside the zone it serves and the solar absorptance of its jacket. Every default keeps the
// rows already stored as they were meant (clear sky, outside air, a run outside its zone, the
// engine's 0.6 jacket). Doubles, like every other number of the schedule: a `real` would store 0.8
// as 0.800000011920929 and break the round trip through the API and the export.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("design_cases", (t) => {
    t.double("cloud_cover").notNullable().defaultTo(0);
  });
  await knex.schema.alterTable("surfaces", (t) => {
    t.text("exposed_to").notNullable().defaultTo("outside_air");
  });
  await knex.schema.alterTable("duct_runs", (t) => {
    t.boolean("in_served_zone").notNullable().defaultTo(false);
    t.double("jacket_absorptance");
  });
  // The database keeps its own guard, as it does for the other choices (a check per rule, named).
  await knex.raw(`alter table design_cases add constraint design_cases_cloud_cover_fraction check ("cloud_cover" between 0 and 1)`);
  await knex.raw(`alter table surfaces add constraint surfaces_exposed_to_known check ("exposed_to" in ('outside_air', 'ground'))`);
  await knex.raw(`alter table duct_runs add constraint duct_runs_jacket_absorptance_fraction check ("jacket_absorptance" between 0 and 1)`);
}

export async function down(knex: Knex): Promise<void> {
  // Dropping a column drops its check with it.
  await knex.schema.alterTable("duct_runs", (t) => {
    t.dropColumn("jacket_absorptance");
    t.dropColumn("in_served_zone");
  });
  await knex.schema.alterTable("surfaces", (t) => {
    t.dropColumn("exposed_to");
  });
  await knex.schema.alterTable("design_cases", (t) => {
    t.dropColumn("cloud_cover");
  });
}
