// Benchmark of the calculation engine (npm run bench:calc): evaluations per second of
// `calculate`, in process on one core, for a schedule of 10,000 surface rows × 3 design cases
// (boundary-layer method) and 10,000 duct runs × 3 cases (each result includes the
// minimum-insulation search), in wall-clock time and per CPU-second. It prints figures against the
// goals; it asserts nothing. The command line end to end is bench/cli.bench.ts.
//
// The engine is timed as it ships: bundled by esbuild (.build/engine/engine.mjs, the same builder
// as `npm run calc`), not through the TypeScript loader, whose module getters sit on every call
// between files (≈ 25 % slower). Each series runs in a fresh process (bench/lib/engine-timer.mjs)
// that parses the cases from JSON text and holds nothing else: run in this process, after the
// generator's objects, the same engine took up to twice as long, with the old generation filling
// and being collected every few runs. Two ways of calling it are timed:
// - in batches of 1,000 cases, each batch's results dropped before the next — how POST /api/calc
//   and `npm run calc` call it (src/calc/serialize.ts); this is the figure set against the goals;
// - one call of all 30,000, every result held to the end. The results (≈ 600 bytes each) outlive
//   the young generation, and copying them is the collector's work: this figure varies with where
//   collections fall and is printed beside the first.
import { spawnSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { ROOT, ensureBundle } from "../scripts/lib/calc-bundle.mjs";
import { ductCases, surfaceCases } from "./lib/cases";

const ROWS = 10_000;
const BATCH = 1000;
// Ten runs: on a shared machine the collector's work varies from run to run (the median, the best
// and the sustained rate over all runs are printed).
const REPEATS = 10;
const GOALS = { surface: 300_000, duct_run: 25_000 };

const bundle = await ensureBundle(join(ROOT, "src", "calc", "index.ts"), join(ROOT, ".build", "engine", "engine.mjs"));
const TIMER = join(ROOT, "bench", "lib", "engine-timer.mjs");
const dir = mkdtempSync(join(tmpdir(), "bench-calc-"));

const fmt = (n: number) => Math.round(n).toLocaleString("en-US");

interface Runs {
  wallMs: number[];
  cpuMs: number[];
  failed: number;
}

/** One series in its own process: `batch` cases per call, REPEATS passes over all of them. */
function run(file: string, batch: number): Runs {
  const child = spawnSync(process.execPath, [TIMER, bundle, file, String(batch), String(REPEATS)], { encoding: "utf8" });
  if (child.status !== 0) throw new Error(`engine timer failed: ${child.stderr}`);
  const runs = JSON.parse(child.stdout.trim().split("\n").pop()!) as Runs;
  if (process.env.BENCH_VERBOSE) console.log(runs.wallMs.map((t) => t.toFixed(0)).join(" "));
  return runs;
}

function report(label: keyof typeof GOALS, how: string, n: number, r: Runs, goal: number | null): void {
  const sorted = [...r.wallMs].sort((a, b) => a - b);
  const cpuSorted = [...r.cpuMs].sort((a, b) => a - b);
  const mid = Math.floor(REPEATS / 2);
  const rate = (ms: number) => n / (ms / 1000);
  const median = rate(sorted[mid]!);
  const sustained = (n * REPEATS) / (r.wallMs.reduce((a, b) => a + b, 0) / 1000);
  const verdict = goal === null ? "" : `; goal ${fmt(goal)} on the median — ${median >= goal ? "meets" : `misses by ${((1 - median / goal) * 100).toFixed(0)} %`}`;
  console.log(
    `${label.padEnd(8)} ${how}: median ${fmt(median)} evals/s (best ${fmt(rate(sorted[0]!))}, sustained over ${REPEATS} runs ${fmt(sustained)})${verdict}; ` +
      `per CPU-second median ${fmt(rate(cpuSorted[mid]!))}, best ${fmt(rate(cpuSorted[0]!))}` +
      (r.failed > 0 ? `; ${r.failed} cases answered ok: false` : ""),
  );
}

function time(label: keyof typeof GOALS, cases: Record<string, unknown>[]): void {
  const file = join(dir, `${label}.json`);
  writeFileSync(file, JSON.stringify(cases));
  report(label, `batches of ${fmt(BATCH)}`, cases.length, run(file, BATCH), GOALS[label]);
  report(label, `one call of ${fmt(cases.length)}, all results held`, cases.length, run(file, cases.length), null);
}

console.log(`calc benchmark, node ${process.version}, bundled engine, single thread, ${fmt(ROWS)} rows × 3 design cases`);
try {
  time("surface", surfaceCases(ROWS));
  time("duct_run", ductCases(ROWS));
} finally {
  rmSync(dir, { recursive: true, force: true });
}
