// Local Stripe stand-in: a small HTTP server of our own that the official stripe SDK is pointed
// at (host/port/protocol) in development and tests. Here it only answers GET /health; the
// billing work adds the API calls the app makes and signed webhooks.
import { createServer, type IncomingMessage, type Server, type ServerResponse } from "node:http";
import { pathToFileURL } from "node:url";

function sendJson(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { "content-type": "application/json" });
  res.end(JSON.stringify(body));
}

function handle(req: IncomingMessage, res: ServerResponse): void {
  const url = new URL(req.url ?? "/", "http://stand-in");
  if (req.method === "GET" && url.pathname === "/health") {
    sendJson(res, 200, { status: "ok", service: "stripe-stand-in" });
    return;
  }
  // Same error shape as Stripe, so the SDK raises a StripeInvalidRequestError.
  sendJson(res, 404, {
    error: { type: "invalid_request_error", message: `Unrecognized request URL (${req.method}: ${url.pathname}).` },
  });
}

/** Starts the stand-in (loopback unless told otherwise); port 0 picks a free port (tests). */
export function startStripeStandIn(port: number, host = "127.0.0.1"): Promise<Server> {
  const server = createServer(handle);
  return new Promise((resolve, reject) => {
    server.once("error", reject);
    server.listen(port, host, () => resolve(server));
  });
}

if (import.meta.url === pathToFileURL(process.argv[1] ?? "").href) {
  const port = Number(process.env.STRIPE_STAND_IN_PORT ?? 12111);
  // Inside a container (docker-compose.dev.yml) it must listen on 0.0.0.0 to be reachable.
  const host = process.env.STRIPE_STAND_IN_HOST ?? "127.0.0.1";
  const server = await startStripeStandIn(port, host);
  console.log(`Stripe stand-in listening on http://${host}:${port}`);
  const close = () => server.close(() => process.exit(0));
  process.on("SIGTERM", close);
  process.on("SIGINT", close);
}
