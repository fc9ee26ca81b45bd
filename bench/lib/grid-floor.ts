// Builds the floor pages (grid-floor-page.ts, and AG Grid's runtime as a script of its own) with
// esbuild, once per run, and serves them to a Playwright page on an origin of their own (request
// routing, no server), for bench:browser.
import type { BrowserContext } from "playwright-core";
import { join } from "node:path";
import { ROOT } from "../../scripts/lib/bootstrap.mjs";
import { COMPILE_HINT } from "../../scripts/lib/compile-hints.mjs";

export const FLOOR_ORIGIN = "http://floor.filmsheet.test";

const HTML = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>Floor</title><style>html,body{margin:0;height:100%}#floor{position:absolute;top:300px;left:72px;right:16px;bottom:105px}</style></head><body><div id="floor"></div><script src="/floor.js"></script></body></html>`;

let scripts: Promise<{ page: string; grid: string }> | null = null;

export async function serveFloor(context: BrowserContext): Promise<void> {
  scripts ??= buildScripts();
  const { page, grid } = await scripts;
  await context.route(`${FLOOR_ORIGIN}/**`, (route) => {
    const path = new URL(route.request().url()).pathname;
    if (path === "/floor.js") return route.fulfill({ status: 200, contentType: "text/javascript", body: page });
    if (path === "/grid.js") return route.fulfill({ status: 200, contentType: "text/javascript", body: grid });
    return route.fulfill({ status: 200, contentType: "text/html", body: HTML });
  });
}

async function buildScripts(): Promise<{ page: string; grid: string }> {
  const { build } = await import("esbuild");
  const bundle = async (entry: string, globalName?: string) => {
    const out = await build({ entryPoints: [join(ROOT, entry)], bundle: true, minify: true, format: "iife", globalName, write: false, target: "es2022", tsconfig: join(ROOT, "tsconfig.json"), logLevel: "warning" });
    return out.outputFiles[0]!.text;
  };
  // AG Grid's runtime sets window.FloorGrid; the page's script loads it.
  const [page, grid] = await Promise.all([bundle("bench/lib/grid-floor-page.ts"), bundle("src/components/grid/ag-grid-runtime.ts", "FloorGrid")]);
  // Marked for eager compiling as the app's AG Grid chunk is after `next build`.
  return { page, grid: COMPILE_HINT + grid };
}
