// Account security (issue 12): a server-side record of every browser session, so signing out
// (or "sign out everywhere") ends a session even though the cookie is a self-contained JWT; a
// "pending" sign-in outcome, so an attempt is counted before its password is compared; and a log
// of sign-in-link requests for their per-address and per-address-asked-for limits.
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
  // Pruning deletes by expiry; the adapter's primary key (identifier, token) does not help it.
  await knex.schema.alterTable("verification_token", (t) => t.index(["expires"]));
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.alterTable("verification_token", (t) => t.dropIndex(["expires"]));
  await knex.schema.dropTable("magic_link_requests");
  // An attempt still pending when the schema goes back counts as what it most likely was.
  await knex("sign_in_attempts").where({ outcome: "pending" }).update({ outcome: "failed" });
  await knex.raw("ALTER TABLE sign_in_attempts DROP CONSTRAINT sign_in_attempts_outcome_check");
  await knex.raw("ALTER TABLE sign_in_attempts ADD CONSTRAINT sign_in_attempts_outcome_check CHECK (outcome = ANY (ARRAY['ok'::text, 'failed'::text, 'blocked'::text]))");
  await knex.schema.dropTable("user_sessions");
}
