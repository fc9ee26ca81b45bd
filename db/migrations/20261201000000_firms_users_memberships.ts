// First schema: firms (the tenants), users and their memberships with a role per firm.
// users keeps the columns @auth/pg-adapter reads (id serial, name, email, "emailVerified", image).
import type { Knex } from "knex";

export const ROLES = ["admin", "consultant", "checker", "viewer"] as const;

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("firms", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.text("name").notNullable();
    t.text("slug").notNullable().unique();
    t.timestamps(true, true);
  });

  await knex.schema.createTable("users", (t) => {
    t.increments("id");
    t.string("name", 255);
    t.string("email", 255).notNullable().unique();
    t.timestamp("emailVerified", { useTz: true });
    t.text("image");
    // bcrypt hash; null for people who only ever sign in by magic link.
    t.text("password_hash");
    t.timestamps(true, true);
  });
  // E-mail addresses are stored lower-case so that uniqueness ignores case.
  await knex.raw("ALTER TABLE users ADD CONSTRAINT users_email_lower CHECK (email = lower(email))");

  // One row per role held: a person can be both consultant and checker in the same firm.
  await knex.schema.createTable("memberships", (t) => {
    t.bigIncrements("id");
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.integer("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.enu("role", ROLES, { useNative: false, enumName: "membership_role" }).notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.unique(["firm_id", "user_id", "role"]);
    t.index(["user_id"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("memberships");
  await knex.schema.dropTable("users");
  await knex.schema.dropTable("firms");
}
