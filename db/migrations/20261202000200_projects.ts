// A first, minimal projects table so firm isolation has something to guard; the schedule work
// adds the site, design cases, zones and rows.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("projects", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.string("name", 200).notNullable();
    // The firm's own job number, e.g. "TS-2417"; unique within the firm.
    t.string("reference", 40).notNullable();
    t.timestamps(true, true);
    t.integer("version").notNullable().defaultTo(1);
    t.unique(["firm_id", "reference"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("projects");
}
