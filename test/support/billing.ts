// Billing helpers for integration tests: a Stripe stand-in in this process for the in-process
// app, and plan fixtures for tests that are not about billing but need a paid firm.
import { startStripeStandIn, type StandIn } from "../../scripts/stripe-stand-in";
import { testDb } from "./db";

export const TEST_WEBHOOK_SECRET = "whsec_integration_tests";

/**
 * Starts a stand-in on a free port and points this process's app at it (call before
 * startBuiltApp); then `connectWebhooks(standIn, origin)` once the app's address is known.
 */
export async function startTestStandIn(): Promise<StandIn> {
  const standIn = await startStripeStandIn({ port: 0, webhookSecret: TEST_WEBHOOK_SECRET });
  process.env.STRIPE_API_URL = standIn.url;
  process.env.STRIPE_WEBHOOK_SECRET = TEST_WEBHOOK_SECRET;
  return standIn;
}

export function connectWebhooks(standIn: StandIn, origin: string): void {
  standIn.setWebhookUrl(`${origin}/api/webhooks/stripe`);
}

/**
 * Puts a firm on the paid plan directly in the database, as if its subscription were active —
 * for tests of other features that need more than the free limits. Tests of billing itself go
 * through Checkout and webhooks instead.
 */
export async function grantPaidPlan(firmId: string, seats = 50): Promise<void> {
  await testDb()("firm_billing")
    .insert({ firm_id: firmId, subscription_status: "active", subscription_seats: seats })
    .onConflict("firm_id")
    .merge({ subscription_status: "active", subscription_seats: seats });
}

/** Back to the free plan (the billing row and its Stripe links removed). */
export async function clearPlan(firmId: string): Promise<void> {
  await testDb()("firm_billing").where({ firm_id: firmId }).delete();
}

let serial = 0;

/** A new firm through the public sign-up, its founder (admin and consultant) signed in. */
export async function newFirmAdmin(server: import("node:http").Server, origin: string): Promise<{ firmId: string; headers: Record<string, string>; email: string }> {
  const { default: request } = await import("supertest");
  const { sessionCookie } = await import("./sessions");
  const email = `founder-${process.pid}-${Date.now()}-${++serial}@billing.filmsheet.test`;
  const password = "billing-founder-password";
  const res = await request(server).post("/api/sign-up").send({ firmName: `Billing Test Partners ${serial}`, name: "Bea Illing", email, password });
  if (res.status !== 201) throw new Error(`sign-up failed: ${res.status} ${res.text}`);
  const row = await testDb()("memberships as m").join("users as u", "u.id", "m.user_id").where("u.email", email).first("m.firm_id");
  return { firmId: row.firm_id, headers: { cookie: await sessionCookie(server, email, password), origin }, email };
}
