// Builds the floor pages (grid-floor-page.ts) with esbuild into one script and serves them to a
// Playwright page on an origin of their own (request routing, no server), for bench:browser.
import type { BrowserContext } from "playwright-core";
import { join } from "node:path";
import { ROOT } from "../../scripts/lib/bootstrap.mjs";

export const FLOOR_ORIGIN = "http://floor.filmsheet.test";

export async function serveFloor(context: BrowserContext): Promise<void> {
  const { build } = await import("esbuild");
  const out = await build({
    entryPoints: [join(ROOT, "bench/lib/grid-floor-page.ts")],
    bundle: true,
    minify: true,
    format: "iife",
    write: false,
    target: "es2022",
    tsconfig: join(ROOT, "tsconfig.json"),
    logLevel: "warning",
  });
  const script = out.outputFiles[0]!.text;
  const html = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Floor</title><style>html,body{margin:0;height:100%}#floor{position:absolute;top:300px;left:72px;right:16px;bottom:105px}</style></head><body><div id="floor"></div><script src="/floor.js"></script></body></html>`;
  await context.route(`${FLOOR_ORIGIN}/**`, (route) => {
    const path = new URL(route.request().url()).pathname;
    if (path === "/floor.js") return route.fulfill({ status: 200, contentType: "text/javascript", body: script });
    return route.fulfill({ status: 200, contentType: "text/html", body: html });
  });
}
