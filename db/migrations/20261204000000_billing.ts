// Billing: each firm's link to Stripe (customer, subscription, its status and seat quantity) and
// the webhook events already processed, so a redelivered event is recognised and skipped.
import type { Knex } from "knex";

export async function up(knex: Knex): Promise<void> {
  await knex.schema.createTable("firm_billing", (t) => {
    t.uuid("firm_id").primary().references("firms.id").onDelete("CASCADE");
    t.text("stripe_customer_id").unique();
    t.text("stripe_subscription_id");
    // Stripe's own status words (active, trialing, past_due, canceled …); the plan is paid only
    // while it is active or trialing.
    t.text("subscription_status");
    t.integer("subscription_seats");
    t.timestamp("current_period_end", { useTz: true });
    t.boolean("cancel_at_period_end").notNullable().defaultTo(false);
    // Creation time of the newest event applied: an older event arriving late is not applied.
    t.timestamp("synced_event_at", { useTz: true });
    t.timestamps(true, true);
    t.integer("version").notNullable().defaultTo(1);
  });
  await knex.raw("ALTER TABLE firm_billing ADD CONSTRAINT firm_billing_seats_positive CHECK (subscription_seats IS NULL OR subscription_seats >= 1)");

  await knex.schema.createTable("webhook_events", (t) => {
    // Stripe's event id (evt_…): the primary key makes a second delivery a no-op.
    t.text("id").primary();
    t.text("type").notNullable();
    t.timestamp("stripe_created_at", { useTz: true }).notNullable();
    t.uuid("firm_id").references("firms.id").onDelete("SET NULL");
    // applied: changed the firm's billing; stale: older than what was applied; ignored: not ours.
    t.enu("outcome", ["applied", "stale", "ignored"], { useNative: false, enumName: "webhook_outcome" }).notNullable();
    t.timestamp("received_at", { useTz: true }).notNullable().defaultTo(knex.fn.now());
    t.index(["firm_id", "received_at"]);
  });
}

export async function down(knex: Knex): Promise<void> {
  await knex.schema.dropTable("webhook_events");
  await knex.schema.dropTable("firm_billing");
}
