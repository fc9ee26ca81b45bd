// Benchmark of the command-line calculator end to end (npm run bench:cli): 30,000 surface cases
// (10,000 rows × 3 design cases) piped through `node scripts/run-calc.mjs` — what `npm run calc`
// runs, without npm's own start-up — and the answer read back from its stdout. Start-up is timed
// apart with the empty body {"cases":[]} and left out: evaluations per second are 30,000 over (the
// run's wall time − the empty run's). The CLI's own report (FILMSHEET_CALC_TIMING=1) gives the
// phases: read, parse, engine, serialize, write, in wall and CPU time (CPU time includes V8's GC
// threads; other work on a shared machine does not inflate it much). From 1 MiB the CLI computes
// the second half of the cases on a worker thread; the same runs with FILMSHEET_CALC_THREADS=1 give
// the one-thread figures beside them. Last, the floor (bench/lib/io-floor.mjs): a process that
// only reads, decodes and parses the same body and writes an answer of the same bytes, timed the
// same way, bounds what any JSON-in, JSON-out calculator can reach on this machine. Prints
// figures, asserts nothing.
import { spawn } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { performance } from "node:perf_hooks";
import { ROOT, ensureBundle } from "../scripts/lib/calc-bundle.mjs";
import { surfaceCases } from "./lib/cases";

const ROWS = 10_000;
const REPEATS = 5;
const GOAL = 100_000;
const LAUNCHER = join(ROOT, "scripts", "run-calc.mjs");
const FLOOR = join(ROOT, "bench", "lib", "io-floor.mjs");

interface Timing {
  cases: number;
  threads?: { first_half_cases: number; worker_phases: Record<string, { wall_ms: number }> };
  startup_ms: number;
  after_startup: { wall_ms: number; cpu_ms: number };
  phases: Record<string, { wall_ms: number; cpu_ms: number }>;
}
interface Run {
  wallMs: number;
  outBytes: number;
  out: Buffer | null;
  timing: Timing;
}

/** One run of the CLI on `input`: wall time from spawn to exit, its answer and its timing line. */
function runCli(input: Buffer, keepOutput: boolean, threads: 1 | 2 = 2): Promise<Run> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const env = { ...process.env, FILMSHEET_CALC_TIMING: "1", FILMSHEET_CALC_THREADS: String(threads) };
    const child = spawn(process.execPath, [LAUNCHER], { env });
    const out: Buffer[] = [];
    let outBytes = 0;
    let err = "";
    child.stdout.on("data", (b: Buffer) => {
      outBytes += b.length;
      if (keepOutput) out.push(b);
    });
    child.stderr.on("data", (b: Buffer) => (err += b.toString()));
    child.on("error", reject);
    child.on("close", (code) => {
      const wallMs = performance.now() - t0;
      if (code !== 0) return reject(new Error(`calc exited ${code}: ${err}`));
      const line = err.trim().split("\n").pop() ?? "";
      resolve({ wallMs, outBytes, out: keepOutput ? Buffer.concat(out) : null, timing: JSON.parse(line) as Timing });
    });
    child.stdin.end(input);
  });
}

const fmt = (n: number) => Math.round(n).toLocaleString("en-US");
const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

await ensureBundle();
const cases = surfaceCases(ROWS, true);
const input = Buffer.from(JSON.stringify({ cases }));
const empty = Buffer.from('{"cases":[]}');
console.log(`calc CLI benchmark, node ${process.version}: ${fmt(cases.length)} surface cases, ${(input.length / 1e6).toFixed(1)} MB in`);

// Warm the file cache and check the answer once.
const first = await runCli(input, true);
const answer = JSON.parse(first.out!.toString("utf8")) as { results: { ok: boolean }[] };
const failed = answer.results.filter((r) => !r.ok).length;
console.log(`answer: ${fmt(answer.results.length)} results (${failed} ok: false), ${(first.outBytes / 1e6).toFixed(1)} MB out`);

const startups: Run[] = [];
const runs: Record<1 | 2, Run[]> = { 1: [], 2: [] };
for (let i = 0; i < REPEATS; i++) {
  startups.push(await runCli(empty, false));
  runs[2].push(await runCli(input, false, 2));
  runs[1].push(await runCli(input, false, 1));
}
const startupWall = median(startups.map((r) => r.wallMs));
console.log(
  `start-up (empty body, median of ${REPEATS}): ${startupWall.toFixed(0)} ms wall, of which ${median(startups.map((r) => r.timing.startup_ms)).toFixed(0)} ms before the CLI's first line`,
);
for (const threads of [2, 1] as const) {
  const rs = runs[threads];
  const best = rs.reduce((a, b) => (b.wallMs < a.wallMs ? b : a));
  const net = best.wallMs - startupWall;
  const perSecond = cases.length / (net / 1000);
  const cpus = rs.map((r) => r.timing.after_startup.cpu_ms);
  const bestCpu = Math.min(...cpus);
  const selfWall = Math.min(...rs.map((r) => r.timing.after_startup.wall_ms));
  const verdict = perSecond >= GOAL ? "meets" : `misses by ${((1 - perSecond / GOAL) * 100).toFixed(0)} %`;
  console.log(`${threads === 2 ? "two threads (npm run calc)" : "one thread (FILMSHEET_CALC_THREADS=1)"}:`);
  console.log(`  end to end, start-up excluded (best of ${REPEATS}): ${net.toFixed(0)} ms → ${fmt(perSecond)} evals/s; goal ${fmt(GOAL)} — ${verdict}`);
  console.log(
    `  the CLI's own clock after start-up: ${selfWall.toFixed(0)} ms wall → ${fmt(cases.length / (selfWall / 1000))} evals/s; ` +
      `CPU best ${bestCpu.toFixed(0)} ms / median ${median(cpus).toFixed(0)} ms → ${fmt(cases.length / (bestCpu / 1000))} / ${fmt(cases.length / (median(cpus) / 1000))} evals per CPU-second (both threads)`,
  );
  console.log("  phases of the fastest run, main thread (wall / CPU ms, CPU of the whole process):");
  for (const [phase, t] of Object.entries(best.timing.phases)) {
    console.log(`    ${phase.padEnd(10)} ${t.wall_ms.toFixed(0).padStart(6)} / ${t.cpu_ms.toFixed(0).padStart(6)}`);
  }
  if (best.timing.threads) {
    const w = best.timing.threads;
    const ph = Object.entries(w.worker_phases).map(([k, v]) => `${k} ${v.wall_ms.toFixed(0)}`).join(", ");
    console.log(`  worker: ${fmt(cases.length - w.first_half_cases)} of the cases; wall ms ${ph}`);
  }
}

// The floor: the same body in and the same answer's bytes out, no engine and no serializing.
interface FloorTiming {
  answer_load_ms: number;
  read_ms: number;
  parse_ms: number;
  write_ms: number;
  cpu_ms: number;
}
function runFloor(body: Buffer, answerFile: string): Promise<{ wallMs: number; timing: FloorTiming }> {
  return new Promise((resolve, reject) => {
    const t0 = performance.now();
    const child = spawn(process.execPath, [FLOOR, answerFile]);
    let err = "";
    child.stdout.on("data", () => undefined);
    child.stderr.on("data", (b: Buffer) => (err += b.toString()));
    child.on("error", reject);
    child.on("close", (code) => {
      const wallMs = performance.now() - t0;
      if (code !== 0) return reject(new Error(`io floor exited ${code}: ${err}`));
      resolve({ wallMs, timing: JSON.parse(err.trim().split("\n").pop()!) as FloorTiming });
    });
    child.stdin.end(body);
  });
}
const dir = mkdtempSync(join(tmpdir(), "bench-cli-"));
try {
  const answerFile = join(dir, "answer.json");
  const emptyAnswer = join(dir, "empty.json");
  writeFileSync(answerFile, first.out!);
  writeFileSync(emptyAnswer, '{"results":[]}\n');
  const floorStarts: number[] = [];
  const floors: { net: number; timing: FloorTiming }[] = [];
  for (let i = 0; i < REPEATS; i++) {
    floorStarts.push((await runFloor(empty, emptyAnswer)).wallMs);
    const f = await runFloor(input, answerFile);
    floors.push({ net: f.wallMs - f.timing.answer_load_ms, timing: f.timing });
  }
  const start = median(floorStarts);
  const best = floors.reduce((a, b) => (b.net < a.net ? b : a));
  const net = best.net - start;
  console.log(
    `floor on this machine (read, decode and parse the body, write the answer's ${(first.outBytes / 1e6).toFixed(1)} MB; no engine, no serializing; best of ${REPEATS}):`,
  );
  console.log(
    `  ${net.toFixed(0)} ms after start-up → at most ${fmt(cases.length / (net / 1000))} evals/s for any calculator of this JSON here ` +
      `(read ${best.timing.read_ms.toFixed(0)}, decode and parse ${best.timing.parse_ms.toFixed(0)}, write ${best.timing.write_ms.toFixed(0)} ms on its own clock; ${best.timing.cpu_ms.toFixed(0)} ms CPU)`,
  );
} finally {
  rmSync(dir, { recursive: true, force: true });
}
