import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import next from "next";
import { ROOT } from "./paths";

/**
 * Serves the production build (.next, made by `npm test` before the suites) in this process.
 * The HTTP server listens first so Next learns its real port; until prepare() has finished it
 * answers 503, as a real instance does while it boots.
 */
export async function startBuiltApp(): Promise<{ server: Server; close: () => Promise<void> }> {
  const server = createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const { port } = server.address() as AddressInfo;
  const app = next({ dev: false, dir: ROOT, hostname: "127.0.0.1", port, quiet: true });
  const handle = app.getRequestHandler();
  let ready = false;
  server.on("request", (req, res) => {
    if (ready) return void handle(req, res);
    res.writeHead(503, { "content-type": "text/plain" }).end("starting");
  });
  await app.prepare();
  ready = true;
  return {
    server,
    close: async () => {
      // The app started its job worker in this process (instrumentation.ts): stop it first.
      await (globalThis as { __filmsheetStopWorker?: () => Promise<void> }).__filmsheetStopWorker?.();
      await app.close();
      await new Promise((resolve) => server.close(resolve));
    },
  };
}
