// No call to Stripe is made while one of our transactions is open: the services are run against
// the real stand-in behind a pass-through that, at every Stripe call, asks PostgreSQL what this
// process's connections are doing. None may be "idle in transaction" (holding a row lock and a
// pooled connection while Stripe thinks).
import { createServer, request as httpRequest, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, test } from "vitest";
import { changeSeats } from "@/server/billing/change-seats";
import { ensureStripeCustomer } from "@/server/billing/ensure-stripe-customer";
import { startCheckout } from "@/server/billing/start-checkout";
import { db } from "@/server/db/knex";
import type { StandIn } from "../../scripts/stripe-stand-in";
import { startTestStandIn } from "../support/billing";
import { actorFor, makeMember } from "../support/checking";
import { closeTestDb, testDb } from "../support/db";

const APP_NAME = `billing-no-lock-${process.pid}`;
let standIn: StandIn;
let proxy: Server;
/** What this process's connections were doing at each Stripe call. */
const seen: { call: string; states: string[] }[] = [];

beforeAll(async () => {
  // This process's pool names itself, so its connections can be told apart from other files'.
  const url = new URL(process.env.DATABASE_URL!);
  url.searchParams.set("application_name", APP_NAME);
  process.env.DATABASE_URL = url.toString();
  standIn = await startTestStandIn();
  const target = new URL(standIn.url);
  proxy = createServer(async (req, res) => {
    const { rows } = await testDb().raw("SELECT state FROM pg_stat_activity WHERE application_name = ? AND datname = current_database()", [APP_NAME]);
    seen.push({ call: `${req.method} ${req.url}`, states: rows.map((r: { state: string }) => r.state) });
    const upstream = httpRequest({ host: target.hostname, port: target.port, path: req.url, method: req.method, headers: req.headers }, (up) => {
      res.writeHead(up.statusCode ?? 502, up.headers);
      up.pipe(res);
    });
    req.pipe(upstream);
  });
  await new Promise<void>((r) => proxy.listen(0, "127.0.0.1", r));
  process.env.STRIPE_API_URL = `http://127.0.0.1:${(proxy.address() as AddressInfo).port}`;
});
afterAll(async () => {
  proxy?.close();
  await standIn?.close();
  await db().destroy();
  await closeTestDb();
});

async function newFirmActor() {
  const slug = `no-lock-${process.pid}-${Date.now()}`;
  await testDb()("firms").insert({ name: "Lockless Services", slug });
  const admin = await makeMember(slug, ["admin", "consultant"], "Lena Lockless");
  return actorFor(admin.email, slug);
}

describe("Stripe calls hold no transaction open", () => {
  test("creating the customer, opening Checkout and changing seats: no connection of ours is idle in a transaction during any call", async () => {
    const actor = await newFirmActor();
    const customer = await ensureStripeCustomer(actor);
    expect(await ensureStripeCustomer(actor)).toBe(customer);
    const checkout = await startCheckout(actor, { seats: 2 });
    const done = await (await fetch(`${standIn.url}/_stand-in/checkout/sessions/${checkout.sessionId}/complete`, { method: "POST" })).json();
    // As the webhook would have recorded it (webhooks are not delivered in this test).
    await testDb()("firm_billing").where({ firm_id: actor.firm.id }).update({ stripe_subscription_id: done.session.subscription, subscription_status: "active", subscription_seats: 2 });

    expect(await changeSeats(actor, { seats: 4 })).toEqual({ seats: 4 });
    expect(await testDb()("firm_billing").where({ firm_id: actor.firm.id }).first("subscription_seats", "stripe_customer_id")).toEqual({ subscription_seats: 4, stripe_customer_id: customer });
    expect(standIn.store.state.subscriptions[done.session.subscription]!.items).toMatchObject({ data: [{ quantity: 4 }] });

    const calls = seen.map((s) => s.call.split("?")[0]);
    expect(calls).toEqual(expect.arrayContaining(["POST /v1/customers", "POST /v1/checkout/sessions", `GET /v1/subscriptions/${done.session.subscription}`, `POST /v1/subscriptions/${done.session.subscription}`]));
    for (const s of seen) expect(s.states.filter((state) => state.startsWith("idle in transaction")), s.call).toEqual([]);
  });
});
