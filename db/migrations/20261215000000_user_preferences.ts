// Each person's own view of the schedule, per firm: the units they read in, whether the zone
// totals are folded away, which column set each sheet shows and the sets they made. A view
// setting changes nothing in any project, so it has no history and never touches row checks.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("user_preferences", (t) => {
    t.integer("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    // null: follow each project's own units (the project's setting is the default view).
    t.string("unit_system", 2).nullable();
    t.boolean("zone_totals_collapsed").notNullable().defaultTo(false);
    // { surfaces: "inputs" | "results" | "everything" | <own set id>, duct_runs: … }
    t.jsonb("active_column_sets").notNullable().defaultTo("{}");
    // [{ id, name, sheet, columns: [column id, …] }]
    t.jsonb("column_sets").notNullable().defaultTo("[]");
    t.integer("version").notNullable().defaultTo(1);
    t.timestamp("updated_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.primary(["user_id", "firm_id"]);
  });
  await knex.raw("ALTER TABLE user_preferences ADD CONSTRAINT user_preferences_unit_system CHECK (unit_system IN ('SI', 'IP'))");
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("user_preferences");
}
