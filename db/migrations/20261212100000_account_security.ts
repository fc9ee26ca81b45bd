// Account security (issue 12): a server-side record of every browser session, so signing out
// (or "sign out everywhere") ends a session even though the cookie is a self-contained JWT; a
// "pending" sign-in outcome, so an attempt is counted before its password is compared; and a log
// of sign-in-link requests for their per-address and per-address-asked-for limits; and the
// links that confirm a new account's e-mail address.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("user_sessions", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.integer("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("revoked_at", { useTz: true });
    t.index(["user_id"]);
  });

  await knex.raw("ALTER TABLE sign_in_attempts DROP CONSTRAINT sign_in_attempts_outcome_check");
  await knex.raw("ALTER TABLE sign_in_attempts ADD CONSTRAINT sign_in_attempts_outcome_check CHECK (outcome = ANY (ARRAY['ok'::text, 'failed'::text, 'blocked'::text, 'pending'::text]))");

  await knex.schema.createTable("magic_link_requests", (t) => {
    t.bigIncrements("id");
    t.string("email", 255).notNullable();
    t.string("address", 64).notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "created_at"]);
    t.index(["address", "created_at"]);
  });
  // A confirmation link proves the mailbox; it is accepted only from a session of the account
  // itself, so whoever follows it must also know the account's password.
  await knex.schema.createTable("email_confirmations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.integer("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("token_hash").notNullable().unique();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["user_id"]);
  });
  // Pruning deletes by expiry; the adapter's primary key (identifier, token) does not help it.
  await knex.schema.alterTable("verification_token", (t) => t.index(["expires"]));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("verification_token", (t) => t.dropIndex(["expires"]));
  await knex.schema.dropTable("email_confirmations");
  await knex.schema.dropTable("magic_link_requests");
  // An attempt still pending when the schema goes back counts as what it most likely was.
  await knex("sign_in_attempts").where({ outcome: "pending" }).update({ outcome: "failed" });
  await knex.raw("ALTER TABLE sign_in_attempts DROP CONSTRAINT sign_in_attempts_outcome_check");
  await knex.raw("ALTER TABLE sign_in_attempts ADD CONSTRAINT sign_in_attempts_outcome_check CHECK (outcome = ANY (ARRAY['ok'::text, 'failed'::text, 'blocked'::text]))");
  await knex.schema.dropTable("user_sessions");
}
