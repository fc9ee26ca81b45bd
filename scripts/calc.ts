// `npm run --silent calc`: the calculation contract on the command line — JSON body on stdin, JSON
// answer on stdout, byte for byte what POST /api/calc answers (plus a newline), without its size
// limits. `npm run calc` runs this file bundled (.build/calc/calc.mjs, see scripts/run-calc.mjs):
// no TypeScript loader at start-up. The answer is written batch by batch while the engine computes.
// FILMSHEET_CALC_TIMING=1 prints the wall and CPU time of each phase as one JSON line on stderr.
import { isAscii } from "node:buffer";
import { readFileSync } from "node:fs";
import { performance } from "node:perf_hooks";
import { writeCalcAnswer } from "../src/calc/serialize";

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

/** UTF-8 text of the bytes; pure ASCII (the usual body) decodes faster as Latin-1, to the same string. */
const decode = (bytes: Buffer): string => (isAscii(bytes) ? bytes.toString("latin1") : bytes.toString("utf8"));

/** All of stdin. One synchronous read loop is quicker than the stream's event-loop turns. */
async function readStdin(): Promise<string> {
  try {
    return decode(readFileSync(0));
  } catch (e) {
    // A non-blocking stdin (some parents hand one over) answers EAGAIN: read it as a stream.
    if ((e as NodeJS.ErrnoException).code !== "EAGAIN") throw e;
    const chunks: Buffer[] = [];
    for await (const chunk of process.stdin) chunks.push(chunk as Buffer);
    return decode(Buffer.concat(chunks));
  }
}

const text = await readStdin();
timing?.tick("read");
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

if (timing) {
  timing.tick("write");
  const cpu = process.cpuUsage(cpuAtStart);
  const r = (v: number) => Math.round(v * 10) / 10;
  const phases = Object.fromEntries(Object.entries(timing.totals).map(([k, v]) => [k, { wall_ms: r(v.wall_ms), cpu_ms: r(v.cpu_ms) }]));
  process.stderr.write(
    JSON.stringify({
      cases: cases.length,
      startup_ms: r(startupMs),
      after_startup: { wall_ms: r(performance.now() - startupMs), cpu_ms: r((cpu.user + cpu.system) / 1000) },
      phases,
    }) + "\n",
  );
}
