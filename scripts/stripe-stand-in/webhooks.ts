// Events and their delivery: every change the stand-in makes is recorded as a Stripe event and
// posted to the app's webhook endpoint, signed exactly as Stripe signs (the SDK's own helper
// computes the Stripe-Signature header from the payload and the endpoint's secret).
import Stripe from "stripe";
import { newId, nowSeconds, type Store, type StripeObject } from "./store";

const signer = new Stripe("sk_test_stand_in_signer", { telemetry: false });
export const API_VERSION = Stripe.API_VERSION;

export interface WebhookTarget {
  url?: string;
  secret: string;
}

/** Records an event with a snapshot of the object as it is now. */
export function recordEvent(store: Store, type: string, object: StripeObject, previous?: Record<string, unknown>): StripeObject {
  const event: StripeObject = {
    id: newId("evt"),
    object: "event",
    api_version: API_VERSION,
    created: nowSeconds(),
    livemode: false,
    pending_webhooks: 1,
    request: { id: null, idempotency_key: null },
    type,
    data: { object: structuredClone(object), ...(previous ? { previous_attributes: previous } : {}) },
  };
  store.state.events.push(event);
  return event;
}

const pause = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Posts one event to the app, retrying a refused or failed delivery twice (after 0.3 s and 1 s),
 * as Stripe retries too. Resolves with the last HTTP status (null when nothing answered).
 */
export async function deliverEvent(store: Store, target: WebhookTarget, event: StripeObject): Promise<number | null> {
  if (!target.url) return null;
  const payload = JSON.stringify(event);
  let status: number | null = null;
  for (const [attempt, wait] of [0, 300, 1000].entries()) {
    if (wait) await pause(wait);
    const header = signer.webhooks.generateTestHeaderString({ payload, secret: target.secret });
    let error: string | undefined;
    try {
      const res = await fetch(target.url, { method: "POST", headers: { "content-type": "application/json", "stripe-signature": header }, body: payload });
      status = res.status;
      await res.arrayBuffer();
    } catch (e) {
      status = null;
      error = e instanceof Error ? e.message : String(e);
    }
    store.deliveries.push({ eventId: event.id, type: String(event.type), attempt: attempt + 1, status, ...(error ? { error } : {}), at: new Date().toISOString() });
    // 4xx other than 429 means the app refused this payload for good: retrying will not help.
    if (status !== null && (status < 300 || (status >= 400 && status < 500 && status !== 429))) break;
  }
  return status;
}

/** Delivers events one after another, in the order they happened. */
export async function deliverAll(store: Store, target: WebhookTarget, events: StripeObject[]): Promise<(number | null)[]> {
  const statuses: (number | null)[] = [];
  for (const event of events) statuses.push(await deliverEvent(store, target, event));
  return statuses;
}
