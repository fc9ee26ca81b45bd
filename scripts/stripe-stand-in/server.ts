// The stand-in's HTTP server: the /v1 API for the SDK, the Checkout and portal pages for people,
// and /_stand-in/… controls for tests (complete a checkout, decline a renewal, redeliver an event).
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import type { AddressInfo } from "node:net";
import { handleApi, stripeError } from "./api";
import { parseForm } from "./form-body";
import * as ops from "./objects";
import { StandInError, getOrThrow } from "./objects";
import { checkoutPage, portalPage } from "./pages";
import { invoicePdf } from "./invoice-pdf";
import { Store, type StripeObject } from "./store";
import { deliverAll, deliverEvent, type WebhookTarget } from "./webhooks";

export interface StandInOptions {
  port: number;
  host?: string;
  /** Where events are posted (the app's /api/webhooks/stripe); none: events are only recorded. */
  webhookUrl?: string;
  webhookSecret?: string;
  /** JSON file that keeps the state across restarts; none: memory only. */
  stateFile?: string;
}

export interface StandIn {
  server: Server;
  url: string;
  store: Store;
  setWebhookUrl(url: string): void;
  /** Resolves once every event raised so far has been delivered (or given up on). */
  flush(): Promise<void>;
  close(): Promise<void>;
}

const readBody = async (req: IncomingMessage) => {
  const chunks: Buffer[] = [];
  for await (const chunk of req) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks).toString("utf8");
};
const sendJson = (res: ServerResponse, status: number, body: unknown): void => void res.writeHead(status, { "content-type": "application/json" }).end(JSON.stringify(body));
const sendHtml = (res: ServerResponse, html: string): void => void res.writeHead(200, { "content-type": "text/html; charset=utf-8" }).end(html);
const redirect = (res: ServerResponse, location: string): void => void res.writeHead(303, { location }).end();

export async function startStandIn(options: StandInOptions): Promise<StandIn> {
  const store = new Store(options.stateFile);
  const target: WebhookTarget = { url: options.webhookUrl, secret: options.webhookSecret ?? "whsec_filmsheet_local" };
  const idempotent = new Map<string, { status: number; body: unknown }>();
  let queue: Promise<unknown> = Promise.resolve();
  let baseUrl = "";
  // One queue, so events reach the app in the order they happened.
  const deliver = (events: StripeObject[]) => {
    const done = queue.then(() => deliverAll(store, target, events));
    queue = done.catch(() => undefined);
    return done;
  };
  // Changes made from a page or a control: saved, then delivered before answering, so the app
  // already knows when the browser (or the test) goes back to it.
  const change = async (work: () => StripeObject[]) => {
    const events = work();
    store.save();
    return { events, statuses: await deliver(events) };
  };

  async function handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? "/", "http://stand-in");
    const path = url.pathname;
    const method = req.method ?? "GET";
    if (method === "GET" && path === "/health") return sendJson(res, 200, { status: "ok", service: "stripe-stand-in" });

    if (path.startsWith("/v1/")) {
      if (!/^Bearer sk_(test|live)_\S+$/.test(req.headers.authorization ?? "")) {
        return sendJson(res, 401, { error: { type: "invalid_request_error", message: "You did not provide a valid API key (Authorization: Bearer sk_test_…)." } });
      }
      const body = await readBody(req);
      const params = method === "POST" ? parseForm(body) : parseForm(url.search.slice(1));
      const key = method === "POST" ? req.headers["idempotency-key"] : undefined;
      const seen = typeof key === "string" ? idempotent.get(key) : undefined;
      if (seen) return sendJson(res, seen.status, seen.body);
      const result = handleApi(store, method, path, params, baseUrl);
      if (typeof key === "string") idempotent.set(key, { status: result.status, body: result.body });
      sendJson(res, result.status, result.body);
      if (result.events?.length) void deliver(result.events);
      return;
    }

    let m: RegExpExecArray | null;
    if (method === "GET" && (m = /^\/checkout\/([^/]+)$/.exec(path))) return sendHtml(res, checkoutPage(store, getOrThrow(store.state.checkoutSessions, "checkout session", m[1]!)));
    if (method === "POST" && (m = /^\/checkout\/([^/]+)\/pay$/.exec(path))) {
      await change(() => ops.completeCheckout(store, m![1]!));
      const session = store.state.checkoutSessions[m[1]!]!;
      return redirect(res, String(session.success_url).replace("{CHECKOUT_SESSION_ID}", session.id));
    }
    if (method === "GET" && (m = /^\/invoices\/([^/]+)\/pdf$/.exec(path))) {
      const invoice = getOrThrow(store.state.invoices, "invoice", m[1]!);
      const pdf = invoicePdf(invoice);
      return void res.writeHead(200, { "content-type": "application/pdf", "content-length": pdf.length, "content-disposition": `inline; filename="${String(invoice.number ?? invoice.id)}.pdf"` }).end(pdf);
    }
    if (method === "GET" && (m = /^\/portal\/([^/]+)$/.exec(path))) return sendHtml(res, portalPage(store, getOrThrow(store.state.portalSessions, "portal session", m[1]!)));
    if (method === "POST" && (m = /^\/portal\/([^/]+)\/(fail-renewal|pay-overdue|cancel)\/([^/]+)$/.exec(path))) {
      const portal = getOrThrow(store.state.portalSessions, "portal session", m[1]!);
      const sub = getOrThrow(store.state.subscriptions, "subscription", m[3]!);
      if (sub.customer !== portal.customer) throw new StandInError(404, `No such subscription: '${sub.id}'`);
      const act = { "fail-renewal": ops.failPayment, "pay-overdue": ops.recoverPayment, cancel: ops.cancelSubscription }[m[2] as "cancel"];
      await change(() => act(store, sub.id));
      return redirect(res, `/portal/${portal.id}`);
    }

    // Controls for tests and scripts (not part of Stripe's API).
    if (method === "POST" && (m = /^\/_stand-in\/checkout\/sessions\/([^/]+)\/complete$/.exec(path))) {
      const { events, statuses } = await change(() => ops.completeCheckout(store, m![1]!));
      return sendJson(res, 200, { session: store.state.checkoutSessions[m[1]!], events: events.map((e) => e.id), statuses });
    }
    if (method === "POST" && (m = /^\/_stand-in\/subscriptions\/([^/]+)\/(fail-payment|recover-payment|cancel)$/.exec(path))) {
      const act = { "fail-payment": ops.failPayment, "recover-payment": ops.recoverPayment, cancel: ops.cancelSubscription }[m[2] as "cancel"];
      const { events, statuses } = await change(() => act(store, m![1]!));
      return sendJson(res, 200, { subscription: store.state.subscriptions[m[1]!], events: events.map((e) => e.id), statuses });
    }
    if (method === "POST" && (m = /^\/_stand-in\/events\/([^/]+)\/redeliver$/.exec(path))) {
      const event = store.state.events.find((e) => e.id === m![1]) ?? getOrThrow({}, "event", m[1]!);
      return sendJson(res, 200, { status: await deliverEvent(store, target, event) });
    }
    if (method === "POST" && path === "/_stand-in/flush") {
      await queue;
      return sendJson(res, 200, { deliveries: store.deliveries });
    }
    if (method === "GET" && path === "/_stand-in/deliveries") return sendJson(res, 200, { deliveries: store.deliveries });
    const miss = stripeError(404, `Unrecognized request URL (${method}: ${path}).`);
    return sendJson(res, miss.status, miss.body);
  }

  const server = createServer((req, res) => {
    handle(req, res).catch((error: unknown) => {
      const known = error instanceof StandInError;
      if (!known) console.error("stripe stand-in:", error);
      const failure = stripeError(known ? error.status : 500, error instanceof Error ? error.message : String(error), known ? error.param : undefined, known ? error.code : undefined);
      if (!res.headersSent) sendJson(res, failure.status, failure.body);
    });
  });
  await new Promise<void>((resolve, reject) => {
    server.once("error", reject);
    server.listen(options.port, options.host ?? "127.0.0.1", () => resolve());
  });
  const { port } = server.address() as AddressInfo;
  baseUrl = `http://${options.host && options.host !== "0.0.0.0" ? options.host : "127.0.0.1"}:${port}`;
  return {
    server,
    url: baseUrl,
    store,
    setWebhookUrl: (url) => void (target.url = url),
    flush: () => queue.then(() => undefined),
    close: () => new Promise((resolve) => server.close(() => resolve())),
  };
}
