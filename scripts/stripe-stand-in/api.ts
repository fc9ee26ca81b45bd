// The Stripe API calls the app makes, answered from the store. Unknown paths answer Stripe's
// 404 error shape, so the SDK raises the same errors as against Stripe itself.
import * as ops from "./objects";
import { StandInError, getOrThrow } from "./objects";
import type { Store, StripeObject } from "./store";

export interface ApiResult {
  status: number;
  body: unknown;
  /** Events the call caused, delivered after the answer is written. */
  events?: StripeObject[];
}

const list = (data: StripeObject[], url: string, limit: unknown) => {
  const n = Math.min(100, Math.max(1, Number(limit ?? 10) || 10));
  const newestFirst = [...data].sort((a, b) => Number(b.created) - Number(a.created));
  return { object: "list", url, has_more: newestFirst.length > n, data: newestFirst.slice(0, n) };
};

/** An invoice as Stripe answers it once finalised: with the address of its PDF (served by server.ts). */
const invoiceWithPdf = (invoice: StripeObject, base: string): StripeObject => ({ ...invoice, invoice_pdf: `${base}/invoices/${String(invoice.id)}/pdf` });
const withPdf = (page: ReturnType<typeof list>, base: string) => ({ ...page, data: page.data.map((i) => invoiceWithPdf(i, base)) });

type Handler = (store: Store, params: Record<string, unknown>, match: string[], baseUrl: string) => ApiResult;
const ok = (body: unknown, events?: StripeObject[]): ApiResult => ({ status: 200, body, ...(events ? { events } : {}) });
const s = (store: Store) => store.state;

const ROUTES: [string, RegExp, Handler][] = [
  ["POST", /^\/v1\/customers$/, (store, p) => ok(ops.createCustomer(store, p))],
  ["GET", /^\/v1\/customers\/([^/]+)$/, (store, _p, m) => ok(getOrThrow(s(store).customers, "customer", m[1]!))],
  ["GET", /^\/v1\/prices\/([^/]+)$/, (store, _p, m) => ok(getOrThrow(s(store).prices, "price", m[1]!))],
  ["POST", /^\/v1\/checkout\/sessions$/, (store, p, _m, base) => ok(ops.createCheckoutSession(store, p, base))],
  ["GET", /^\/v1\/checkout\/sessions\/([^/]+)$/, (store, _p, m) => ok(getOrThrow(s(store).checkoutSessions, "checkout session", m[1]!))],
  [
    "GET",
    /^\/v1\/subscriptions$/,
    (store, p) =>
      ok(list(Object.values(s(store).subscriptions).filter((x) => (!p.customer || x.customer === p.customer) && (p.status === "all" || x.status !== "canceled")), "/v1/subscriptions", p.limit)),
  ],
  ["GET", /^\/v1\/subscriptions\/([^/]+)$/, (store, _p, m) => ok(getOrThrow(s(store).subscriptions, "subscription", m[1]!))],
  ["POST", /^\/v1\/subscriptions\/([^/]+)$/, (store, p, m) => ok(s(store).subscriptions[m[1]!], ops.updateSubscription(store, m[1]!, p))],
  ["DELETE", /^\/v1\/subscriptions\/([^/]+)$/, (store, _p, m) => ok(s(store).subscriptions[m[1]!], ops.cancelSubscription(store, m[1]!))],
  ["POST", /^\/v1\/billing_portal\/sessions$/, (store, p, _m, base) => ok(ops.createPortalSession(store, p, base))],
  ["POST", /^\/v1\/invoices\/create_preview$/, (store, p) => ok(ops.previewInvoice(store, p))],
  [
    "GET",
    /^\/v1\/invoices$/,
    (store, p, _m, base) => ok(withPdf(list(Object.values(s(store).invoices).filter((x) => !p.customer || x.customer === p.customer), "/v1/invoices", p.limit), base)),
  ],
  ["GET", /^\/v1\/invoices\/([^/]+)$/, (store, _p, m, base) => ok(invoiceWithPdf(getOrThrow(s(store).invoices, "invoice", m[1]!), base))],
  ["GET", /^\/v1\/events$/, (store, p) => ok(list(s(store).events.filter((e) => !p.type || e.type === p.type), "/v1/events", p.limit))],
  ["GET", /^\/v1\/events\/([^/]+)$/, (store, _p, m) => ok(store.state.events.find((e) => e.id === m[1]) ?? getOrThrow({}, "event", m[1]!))],
];

/** Answers one /v1 call; the caller has checked the secret key. */
export function handleApi(store: Store, method: string, path: string, params: Record<string, unknown>, baseUrl: string): ApiResult {
  for (const [m, pattern, handler] of ROUTES) {
    const match = method === m ? pattern.exec(path) : null;
    if (!match) continue;
    try {
      // A handler that changes something must not leave half a change behind: work on a copy.
      const before = JSON.stringify(store.state);
      try {
        const result = handler(store, params, [...match], baseUrl);
        if (m !== "GET") store.save();
        return result;
      } catch (error) {
        store.state = JSON.parse(before);
        throw error;
      }
    } catch (error) {
      if (error instanceof StandInError) return stripeError(error.status, error.message, error.param, error.code);
      throw error;
    }
  }
  return stripeError(404, `Unrecognized request URL (${method}: ${path}).`);
}

export function stripeError(status: number, message: string, param?: string, code?: string): ApiResult {
  return { status, body: { error: { type: "invalid_request_error", message, ...(param ? { param } : {}), ...(code ? { code } : {}) } } };
}
