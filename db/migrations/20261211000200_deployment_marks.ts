// A mark the app leaves in its database when it serves in production on a public address, so
// that the demo seed (which resets well-known passwords) refuses to run against that database
// ever after, whatever the environment of whoever runs it.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("deployment_marks", (t) => {
    // "production": the app has served this database in production mode on a public address.
    t.string("mode", 40).primary();
    t.text("app_url").notNullable();
    t.timestamp("first_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("last_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("deployment_marks");
}
