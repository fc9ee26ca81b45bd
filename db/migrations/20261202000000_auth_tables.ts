// The tables @auth/pg-adapter reads and writes besides users: linked accounts, database sessions
// and magic-link verification tokens. Columns keep the adapter's camelCase names (quoted in SQL).
// Sessions are JWTs (Credentials sign-in needs them), so "sessions" stays empty for now; it is
// created so the adapter's schema is complete.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("verification_token", (t) => {
    t.text("identifier").notNullable();
    t.timestamp("expires", { useTz: true }).notNullable();
    // The adapter stores a SHA-256 of token + secret, never the token from the e-mail.
    t.text("token").notNullable();
    t.primary(["identifier", "token"]);
  });

  await knex.schema.createTable("accounts", (t) => {
    t.increments("id");
    t.integer("userId").notNullable().references("users.id").onDelete("CASCADE");
    t.string("type", 255).notNullable();
    t.string("provider", 255).notNullable();
    t.string("providerAccountId", 255).notNullable();
    t.text("refresh_token");
    t.text("access_token");
    t.bigInteger("expires_at");
    t.text("id_token");
    t.text("scope");
    t.text("session_state");
    t.text("token_type");
    t.unique(["provider", "providerAccountId"]);
  });

  await knex.schema.createTable("sessions", (t) => {
    t.increments("id");
    t.integer("userId").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("expires", { useTz: true }).notNullable();
    t.string("sessionToken", 255).notNullable().unique();
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("sessions");
  await knex.schema.dropTable("accounts");
  await knex.schema.dropTable("verification_token");
}
