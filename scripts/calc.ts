// `npm run --silent calc`: the calculation contract on the command line — JSON body on stdin, JSON
// answer on stdout, byte for byte what POST /api/calc answers (plus a newline), without its size
// limits. `npm run calc` runs this file bundled (.build/calc/calc.mjs, see scripts/run-calc.mjs):
// no TypeScript loader at start-up. The answer is written batch by batch while the engine computes.
// A body of 1 MiB or more is cut in two between cases (scripts/lib/calc-split.ts) and its second
// half parsed and computed on a worker thread (scripts/calc-worker.ts) while this thread does the
// first; the halves' texts joined by a comma are the whole answer's text, so the bytes are those of
// one thread. Anything that does not cut cleanly goes the one-thread way. The worker is used when
// a core is free (load average) or FILMSHEET_CALC_THREADS=2; FILMSHEET_CALC_THREADS=1 keeps every
// body on one thread.
// FILMSHEET_CALC_TIMING=1 prints the wall and CPU time of each phase as one JSON line on stderr
// (CPU time is the process's: while the worker runs, it counts both threads).
import { existsSync, readSync } from "node:fs";
import { availableParallelism, loadavg } from "node:os";
import { fileURLToPath } from "node:url";
import { performance } from "node:perf_hooks";
import { Worker } from "node:worker_threads";
import { writeCalcAnswer, writeCalcResults } from "../src/calc/serialize";
import { decodeText, splitCases, type CaseSplit } from "./lib/calc-split";
import type { HalfDone, HalfRequest } from "./calc-worker";

// performance.now() counts from the start of the process: this is the start-up time.
const startupMs = performance.now();

type Phase = "read" | "parse" | "engine" | "serialize" | "write";

/** Wall and CPU milliseconds per phase, each tick closing the phase that just ran. */
function phaseClock() {
  const totals = {} as Record<Phase, { wall_ms: number; cpu_ms: number }>;
  let wall = performance.now();
  let cpu = process.cpuUsage();
  return {
    totals,
    tick(phase: Phase): void {
      const w = performance.now();
      const c = process.cpuUsage();
      const t = (totals[phase] ??= { wall_ms: 0, cpu_ms: 0 });
      t.wall_ms += w - wall;
      t.cpu_ms += (c.user - cpu.user + c.system - cpu.system) / 1000;
      wall = w;
      cpu = c;
    },
  };
}
const timing = process.env.FILMSHEET_CALC_TIMING ? phaseClock() : null;
const cpuAtStart = process.cpuUsage();

function fail(payload: unknown): never {
  process.stdout.write(JSON.stringify(payload) + "\n");
  process.exit(2);
}

/** Bodies from this size up are computed on two threads. */
const SPLIT_MIN_BYTES = 1 << 20;
// Only the bundle has its worker beside it; run from scripts/ through tsx, the CLI stays on one thread.
const WORKER_FILE = fileURLToPath(new URL("./calc-worker.mjs", import.meta.url));
const hasWorker = import.meta.url.endsWith(".mjs") && existsSync(WORKER_FILE);
// A second thread shortens the run only when a core is free for it; on a busy machine it costs
// more CPU than it saves (its own start and warm-up), so by default it is used only when the load
// average leaves a core idle. FILMSHEET_CALC_THREADS=1 or 2 decides instead (tests, benchmarks).
const wanted = process.env.FILMSHEET_CALC_THREADS;
const threads = !hasWorker || wanted === "1" ? 1 : wanted === "2" || loadavg()[0] <= availableParallelism() - 1 ? 2 : 1;

/**
 * All of stdin. One synchronous read loop into 1 MiB blocks, joined once at the end (readFileSync
 * on a pipe allocates 64 KiB per read, and a pipe answers a few KiB at a time); `shared` puts the
 * joined bytes in memory a worker can read. `onBytes` hears the running total, so the worker can
 * start while the rest arrives.
 */
async function readStdin(onBytes: (n: number) => void, shared: () => boolean): Promise<Buffer> {
  const BLOCK = 1 << 20;
  const blocks: Buffer[] = [];
  let block = Buffer.allocUnsafe(BLOCK);
  let used = 0;
  let n = 0;
  const take = (bytes: Buffer) => {
    blocks.push(bytes);
    n += bytes.length;
    onBytes(n);
  };
  for (;;) {
    let got: number;
    try {
      got = readSync(0, block, used, block.length - used, null);
    } catch (e) {
      const code = (e as NodeJS.ErrnoException).code;
      if (code === "EOF") break;
      // A non-blocking stdin (some parents hand one over) answers EAGAIN: read the rest as a stream.
      if (code !== "EAGAIN") throw e;
      if (used > 0) take(block.subarray(0, used));
      used = 0;
      for await (const chunk of process.stdin) take(chunk as Buffer);
      break;
    }
    if (got === 0) break;
    used += got;
    if (used === block.length) {
      take(block);
      block = Buffer.allocUnsafe(BLOCK);
      used = 0;
    }
  }
  if (used > 0) take(block.subarray(0, used));
  if (!shared()) return Buffer.concat(blocks, n);
  const all = Buffer.from(new SharedArrayBuffer(n));
  let at = 0;
  for (const b of blocks) {
    b.copy(all, at);
    at += b.length;
  }
  return all;
}

let worker: Worker | null = null;
const bytes = await readStdin(
  (n) => {
    if (worker === null && threads === 2 && n >= SPLIT_MIN_BYTES) worker = new Worker(WORKER_FILE);
  },
  () => worker !== null,
);
timing?.tick("read");

/** The first half's cases when the body was cut and that half parsed, the worker given the second. */
function startHalves(w: Worker, split: CaseSplit, verdict: SharedArrayBuffer): unknown[] | null {
  const request: HalfRequest = { bytes: bytes.buffer as SharedArrayBuffer, start: bytes.byteOffset + split.tailStart, end: bytes.byteOffset + split.tailEnd, verdict };
  w.postMessage(request);
  try {
    const head: unknown = JSON.parse("[" + decodeText(bytes.subarray(split.headStart, split.headEnd)) + "]");
    if (Array.isArray(head) && head.length > 0) return head;
  } catch {
    // Not valid JSON there: the whole body's parse below gives the verdict.
  }
  return null;
}

const verdictBuffer = new SharedArrayBuffer(4);
const verdict = new Int32Array(verdictBuffer);
const split = worker !== null ? splitCases(bytes) : null;
const head = worker !== null && split !== null ? startHalves(worker, split, verdictBuffer) : null;

const answered = head !== null && (await answerInHalves(worker!, head));
if (!answered) {
  if (worker !== null) await (worker as Worker).terminate();
  await answerOnOneThread();
}

/**
 * Writes the answer from the two halves: this thread's first, held back until the worker says its
 * half parsed (so an invalid body never starts an answer), then the worker's bytes as they come.
 * False, with nothing written, when the second half did not parse.
 */
async function answerInHalves(w: Worker, first: unknown[]): Promise<boolean> {
  timing?.tick("parse");
  const held: string[] = [];
  let confirmed = false;
  let refused = false;
  const out = (chunk: string) => {
    if (!confirmed && !refused) {
      const v = Atomics.load(verdict, 0);
      if (v === 0) {
        held.push(chunk);
        return;
      }
      if (v === 2) refused = true;
      else {
        confirmed = true;
        for (const h of held) process.stdout.write(h);
        held.length = 0;
      }
    }
    if (confirmed) process.stdout.write(chunk);
    timing?.tick("write");
  };
  const tick = timing ? (phase: "engine" | "serialize") => timing.tick(phase) : undefined;
  // The worker's messages, queued while this thread computes, are read once it waits.
  const fromWorker = new Promise<HalfDone>((resolve, reject) => {
    w.on("message", (m: Uint8Array | HalfDone) => {
      if (m instanceof Uint8Array) {
        process.stdout.write(m);
        timing?.tick("write");
      } else resolve(m);
    });
    w.once("error", reject);
    w.once("exit", (code) => reject(new Error(`the calculation worker stopped (exit code ${code})`)));
  });
  // When the second half is refused this promise is never awaited, and the worker is then
  // terminated (its "exit" rejects it): that must not end the process as an unhandled rejection
  // before the one-thread answer is written. Awaited below, it still throws.
  fromWorker.catch(() => undefined);
  out('{"results":[');
  writeCalcResults(first, out, tick);
  if (!confirmed && !refused) {
    Atomics.wait(verdict, 0, 0);
    out(""); // the verdict is in: write what was held back, or refuse
  }
  if (refused) return false;
  const done = await fromWorker;
  process.stdout.write("]}\n");
  report(first.length + done.cases, { share: first.length, worker: done.phases });
  return true;
}

/** The answer from one thread: parse the whole body (giving the endpoint's errors), compute, write. */
async function answerOnOneThread(): Promise<void> {
  const text = decodeText(bytes);
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch {
    fail({ error: { code: "bad_request", message: "Body is not valid JSON" } });
  }
  const cases = (raw as { cases?: unknown } | null)?.cases;
  if (raw === null || typeof raw !== "object" || Array.isArray(raw) || !Array.isArray(cases)) {
    // Not of the contract's shape: zod's verdict and error body, as the endpoint gives. Loaded only
    // here, since zod is most of the bundle and a well-formed body does not need it.
    const { ZCalcBody, calcBodyError } = await import("../src/schemas/calc");
    const parsed = ZCalcBody.safeParse(raw);
    fail(parsed.success ? { error: { code: "bad_request", message: "Invalid body" } } : calcBodyError(parsed.error));
  }
  timing?.tick("parse");

  const tick = timing ? (phase: "engine" | "serialize") => timing.tick(phase) : undefined;
  writeCalcAnswer(
    cases,
    (chunk) => {
      process.stdout.write(chunk);
      timing?.tick("write");
    },
    tick,
  );
  process.stdout.write("\n");

  report(cases.length);
}

/** The timing line on stderr (FILMSHEET_CALC_TIMING=1); `extra` describes the worker's half. */
function report(count: number, extra?: { share: number; worker: HalfDone["phases"] }): void {
  if (!timing) return;
  timing.tick("write");
  const cpu = process.cpuUsage(cpuAtStart);
  const r = (v: number) => Math.round(v * 10) / 10;
  const phases = Object.fromEntries(Object.entries(timing.totals).map(([k, v]) => [k, { wall_ms: r(v.wall_ms), cpu_ms: r(v.cpu_ms) }]));
  process.stderr.write(
    JSON.stringify({
      cases: count,
      startup_ms: r(startupMs),
      after_startup: { wall_ms: r(performance.now() - startupMs), cpu_ms: r((cpu.user + cpu.system) / 1000) },
      phases,
      ...(extra ? { threads: { first_half_cases: extra.share, worker_phases: extra.worker } } : {}),
    }) + "\n",
  );
}
