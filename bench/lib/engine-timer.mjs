// One timed series of the calculation engine, in a process of its own (bench/calc.bench.ts):
// node engine-timer.mjs <bundle> <cases.json> <batch> <repeats>. The cases are parsed from JSON
// text, as requests reach the engine (POST /api/calc, npm run calc), in a process that holds
// nothing else; it prints {wallMs, cpuMs, failed} as one JSON line.
import { readFileSync } from "node:fs";
import { performance } from "node:perf_hooks";
import { pathToFileURL } from "node:url";

const [bundle, file, batchArg, repeatsArg] = process.argv.slice(2);
const { calculate } = await import(pathToFileURL(bundle).href);
const cases = JSON.parse(readFileSync(file, "utf8"));
const batch = Number(batchArg);
const repeats = Number(repeatsArg);

/** All the cases once, `batch` per call; returns how many answered ok: false. */
function pass() {
  let failed = 0;
  for (let at = 0; at < cases.length; at += batch) {
    const { results } = calculate({ cases: batch >= cases.length ? cases : cases.slice(at, at + batch) });
    for (const res of results) if (!res.ok) failed++;
  }
  return failed;
}

// Warm-up: let the JIT see every branch before timing, called the way the series is.
pass();
const wallMs = [];
const cpuMs = [];
let failed = 0;
for (let i = 0; i < repeats; i++) {
  const t0 = performance.now();
  const c0 = process.cpuUsage();
  failed = pass();
  const cpu = process.cpuUsage(c0);
  wallMs.push(performance.now() - t0);
  // CPU time of the process (GC threads included): steadier than wall time when other work
  // shares the cores.
  cpuMs.push((cpu.user + cpu.system) / 1000);
}
console.log(JSON.stringify({ wallMs, cpuMs, failed }));
