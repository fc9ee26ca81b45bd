// Benchmark of the calculation engine (npm run bench:calc): evaluations per second of
// `calculate`, in process on one core, for a schedule of 10,000 surface rows × 3 design cases
// (boundary-layer method) and 10,000 duct runs × 3 cases (each result includes the
// minimum-insulation search), in wall-clock time and per CPU-second. It prints figures against the
// goals; it asserts nothing. The command line end to end is bench/cli.bench.ts.
import { performance } from "node:perf_hooks";
import { calculate } from "../src/calc/index";
import { ductCases, surfaceCases } from "./lib/cases";

const ROWS = 10_000;
// Ten runs: on a shared machine the collector's work varies from run to run (the best and the
// median are both printed).
const REPEATS = 10;
const GOALS = { surface: 300_000, duct_run: 25_000 };

function time(label: keyof typeof GOALS, cases: Record<string, unknown>[]): void {
  // Warm-up: let the JIT see every branch before timing.
  for (let i = 0; i < 2; i++) calculate({ cases: cases.slice(0, 3000) });
  let best = Infinity;
  const cpuMs: number[] = [];
  let failed = 0;
  for (let i = 0; i < REPEATS; i++) {
    const t0 = performance.now();
    const c0 = process.cpuUsage();
    const { results } = calculate({ cases });
    const cpu = process.cpuUsage(c0);
    best = Math.min(best, performance.now() - t0);
    // CPU time of this thread's process: steadier than wall time when other work shares the cores.
    cpuMs.push((cpu.user + cpu.system) / 1000);
    failed = results.filter((res) => !res.ok).length;
  }
  cpuMs.sort((a, b) => a - b);
  const bestCpu = cpuMs[0]!;
  const medianCpu = cpuMs[Math.floor(cpuMs.length / 2)]!;
  const perSecond = cases.length / (best / 1000);
  const perCpuSecond = cases.length / (bestCpu / 1000);
  const perCpuSecondMedian = cases.length / (medianCpu / 1000);
  const goal = GOALS[label];
  const verdict = perSecond >= goal ? "meets" : `misses by ${((1 - perSecond / goal) * 100).toFixed(0)} %`;
  console.log(
    `${label.padEnd(8)} ${cases.length} evaluations in ${best.toFixed(0)} ms (best of ${REPEATS}): ` +
      `${Math.round(perSecond).toLocaleString("en-US")} evals/s; goal ${goal.toLocaleString("en-US")} — ${verdict}; ` +
      `${Math.round(perCpuSecond).toLocaleString("en-US")} evals per CPU-second best, ${Math.round(perCpuSecondMedian).toLocaleString("en-US")} median (GC threads included)` +
      (failed > 0 ? `; ${failed} cases answered ok: false` : ""),
  );
}

console.log(`calc benchmark, node ${process.version}, single thread, ${ROWS} rows × 3 design cases`);
// Requests reach the engine through JSON.parse (POST /api/calc, npm run calc), so the cases do
// too; objects built here by spreading would time V8's object migrations, not the engine.
const asReceived = (cases: Record<string, unknown>[]) => JSON.parse(JSON.stringify(cases)) as Record<string, unknown>[];
time("surface", asReceived(surfaceCases(ROWS)));
time("duct_run", asReceived(ductCases(ROWS)));
