// Everything that decides who may act for a firm: seats bought, invitations, API tokens,
// password-reset links and the sign-in attempts the rate limit counts. Secrets (invitation and
// reset links, API tokens) are stored only as SHA-256 hashes.
import type { Knex } from "knex";

const ROLES = ["admin", "consultant", "checker", "viewer"];

export async function up(knex: Knex): Promise<void> {
  await knex.schema.alterTable("firms", (t) => {
    // Seats bought; the billing work keeps it in step with the subscription.
    t.integer("seats").notNullable().defaultTo(5);
    t.integer("version").notNullable().defaultTo(1);
  });
  await knex.raw("ALTER TABLE firms ADD CONSTRAINT firms_seats_positive CHECK (seats >= 1)");

  await knex.schema.alterTable("users", (t) => {
    // A session issued before this moment is no longer accepted (set by a password reset).
    t.timestamp("sessions_valid_after", { useTz: true });
  });

  await knex.schema.createTable("invitations", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.string("email", 255).notNullable();
    t.specificType("roles", "text[]").notNullable();
    t.text("token_hash").notNullable().unique();
    t.integer("invited_by").references("users.id").onDelete("SET NULL");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("accepted_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.integer("send_count").notNullable().defaultTo(1);
    t.timestamps(true, true);
    t.integer("version").notNullable().defaultTo(1);
    t.index(["firm_id"]);
  });
  await knex.raw("ALTER TABLE invitations ADD CONSTRAINT invitations_email_lower CHECK (email = lower(email))");
  await knex.raw(`ALTER TABLE invitations ADD CONSTRAINT invitations_roles_known CHECK (cardinality(roles) > 0 AND roles <@ ARRAY[${ROLES.map((r) => `'${r}'`).join(",")}]::text[])`);
  // At most one open invitation per address and firm; accepted and revoked ones stay as history.
  await knex.raw("CREATE UNIQUE INDEX invitations_open_per_email ON invitations (firm_id, email) WHERE accepted_at IS NULL AND revoked_at IS NULL");

  await knex.schema.createTable("api_tokens", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.uuid("firm_id").notNullable().references("firms.id").onDelete("CASCADE");
    t.string("name", 120).notNullable();
    t.enu("role", ROLES, { useNative: false, enumName: "api_token_role" }).notNullable();
    t.text("token_hash").notNullable().unique();
    // The first characters of the secret, so people can tell their tokens apart.
    t.string("prefix", 16).notNullable();
    t.integer("created_by").references("users.id").onDelete("SET NULL");
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("last_used_at", { useTz: true });
    t.timestamp("revoked_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["firm_id"]);
  });

  await knex.schema.createTable("password_resets", (t) => {
    t.uuid("id").primary().defaultTo(knex.raw("gen_random_uuid()"));
    t.integer("user_id").notNullable().references("users.id").onDelete("CASCADE");
    t.text("token_hash").notNullable().unique();
    t.timestamp("expires_at", { useTz: true }).notNullable();
    t.timestamp("used_at", { useTz: true });
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["user_id"]);
  });

  // One row per password sign-in attempt; the limit counts recent failures per account and per
  // address, here rather than in memory so it holds across app instances.
  await knex.schema.createTable("sign_in_attempts", (t) => {
    t.bigIncrements("id");
    t.string("email", 255).notNullable();
    t.string("address", 64).notNullable();
    t.enu("outcome", ["ok", "failed", "blocked"], { useNative: false, enumName: "sign_in_outcome" }).notNullable();
    t.timestamp("created_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["email", "created_at"]);
    t.index(["address", "created_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("sign_in_attempts");
  await knex.schema.dropTable("password_resets");
  await knex.schema.dropTable("api_tokens");
  await knex.schema.dropTable("invitations");
  await knex.schema.alterTable("users", (t) => t.dropColumn("sessions_valid_after"));
  await knex.raw("ALTER TABLE firms DROP CONSTRAINT firms_seats_positive");
  await knex.schema.alterTable("firms", (t) => {
    t.dropColumn("seats");
    t.dropColumn("version");
  });
}
