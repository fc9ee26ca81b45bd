// Benchmark of the calculation engine (npm run bench:calc): evaluations per second of
// `calculate`, single-threaded, for a schedule of 10,000 surface rows × 3 design cases
// (boundary-layer method) and 10,000 duct runs × 3 cases (each result includes the
// minimum-insulation search). It prints figures against the goals; it asserts nothing.
import { performance } from "node:perf_hooks";
import { calculate } from "../src/calc/index";

const ROWS = 10_000;
const REPEATS = 5;
const GOALS = { surface: 200_000, duct_run: 20_000 };

/** Small deterministic generator (mulberry32), so every run times the same schedule. */
function rng(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
const pick = <T>(r: () => number, xs: readonly T[]): T => xs[Math.floor(r() * xs.length)]!;
const between = (r: () => number, lo: number, hi: number) => lo + (hi - lo) * r();

const surfaceDesignCases = [
  { T_outside_C: -5, T_inside_C: 20, V_met_m_s: 6, wind_from_deg: 240, solar_W_m2: 0 },
  { T_outside_C: 32, T_inside_C: 24, V_met_m_s: 3, wind_from_deg: 200, solar_W_m2: 700 },
  { T_outside_C: 12, T_inside_C: 21, V_met_m_s: 1.5, wind_from_deg: 90, solar_W_m2: 250 },
];

const ductDesignCases = [
  { T_entering_C: 13, T_ambient_C: 32, RH_ambient_pct: 55, T_surround_C: 45, V_wind_m_s: 2 },
  { T_entering_C: 35, T_ambient_C: -5, RH_ambient_pct: 80, T_surround_C: -12, V_wind_m_s: 5 },
  { T_entering_C: 16, T_ambient_C: 22, RH_ambient_pct: 70, T_surround_C: 22, V_wind_m_s: 0 },
];

function surfaceCases(): Record<string, unknown>[] {
  const r = rng(6946);
  const rows = Array.from({ length: ROWS }, () => ({
    kind: "surface", area_m2: between(r, 2, 200), tilt_deg: pick(r, [0, 15, 35, 90, 90, 90, 180]),
    azimuth_deg: between(r, 0, 360), height_m: between(r, 1, 60), length_m: between(r, 1, 30),
    panel_height_m: between(r, 1, 12), R_construction_m2K_W: between(r, 0.2, 6), T_inside_C: 20,
    T_outside_C: 0, V_met_m_s: 0, wind_from_deg: 0, terrain: pick(r, ["city", "suburban", "open", "water"]),
    law: pick(r, ["power", "log"]), emissivity: between(r, 0.1, 0.95), absorptance: between(r, 0.2, 0.9),
    method: "boundary_layer",
  }));
  return surfaceDesignCases.flatMap((dc) => rows.map((row) => ({ ...row, ...dc })));
}

function ductCases(): Record<string, unknown>[] {
  const r = rng(1977);
  const rows = Array.from({ length: ROWS }, () => {
    const round = r() < 0.5;
    const dims = round
      ? { shape: "round", diameter_m: between(r, 0.1, 1.2) }
      : { shape: "rect", width_m: between(r, 0.2, 1.6), height_m: between(r, 0.15, 0.8) };
    return {
      kind: "duct_run", ...dims, length_m: between(r, 2, 60), flow_m3_s: between(r, 0.05, 4),
      insulation_thickness_m: pick(r, [0, 0.013, 0.025, 0.05]), insulation_k_W_mK: between(r, 0.03, 0.045),
      jacket_emissivity: pick(r, [0.05, 0.3, 0.9]), location: pick(r, ["indoor", "outdoor"]),
      margin_K: pick(r, [0, 0.5, 1]), T_entering_C: 0, T_ambient_C: 0, RH_ambient_pct: 50,
    };
  });
  return ductDesignCases.flatMap((dc) => rows.map((row) => ({ ...row, ...dc })));
}

function time(label: keyof typeof GOALS, cases: Record<string, unknown>[]): void {
  // Warm-up: let the JIT see every branch before timing.
  for (let i = 0; i < 2; i++) calculate({ cases: cases.slice(0, 3000) });
  let best = Infinity;
  let bestCpu = Infinity;
  let failed = 0;
  for (let i = 0; i < REPEATS; i++) {
    const t0 = performance.now();
    const c0 = process.cpuUsage();
    const { results } = calculate({ cases });
    const cpu = process.cpuUsage(c0);
    best = Math.min(best, performance.now() - t0);
    // CPU time of this thread's process: steadier than wall time when other work shares the cores.
    bestCpu = Math.min(bestCpu, (cpu.user + cpu.system) / 1000);
    failed = results.filter((res) => !res.ok).length;
  }
  const perSecond = cases.length / (best / 1000);
  const perCpuSecond = cases.length / (bestCpu / 1000);
  const goal = GOALS[label];
  const verdict = perSecond >= goal ? "meets" : `misses by ${((1 - perSecond / goal) * 100).toFixed(0)} %`;
  console.log(
    `${label.padEnd(8)} ${cases.length} evaluations in ${best.toFixed(0)} ms (best of ${REPEATS}): ` +
      `${Math.round(perSecond).toLocaleString("en-US")} evals/s; goal ${goal.toLocaleString("en-US")} — ${verdict}; ` +
      `${Math.round(perCpuSecond).toLocaleString("en-US")} evals per CPU-second (GC threads included)` +
      (failed > 0 ? `; ${failed} cases answered ok: false` : ""),
  );
}

console.log(`calc benchmark, node ${process.version}, single thread, ${ROWS} rows × 3 design cases`);
// Requests reach the engine through JSON.parse (POST /api/calc, npm run calc), so the cases do
// too; objects built here by spreading would time V8's object migrations, not the engine.
const asReceived = (cases: Record<string, unknown>[]) => JSON.parse(JSON.stringify(cases)) as Record<string, unknown>[];
time("surface", asReceived(surfaceCases()));
time("duct_run", asReceived(ductCases()));
