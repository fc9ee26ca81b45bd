// Duct runs get a second surround temperature for cooling design cases: a ceiling void or plant
// room is not at the same temperature in winter and in summer. Null (every existing row) means
// "as in heating", so the results of stored schedules do not change.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("duct_runs", (t) => {
    t.double("T_surround_cooling_C");
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("duct_runs", (t) => {
    t.dropColumn("T_surround_cooling_C");
  });
}
