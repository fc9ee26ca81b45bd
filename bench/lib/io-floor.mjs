// The floor under `npm run calc` on this machine (bench/cli.bench.ts): a process that does only
// what any JSON-in, JSON-out calculator must — read the body from stdin, decode and parse it, and
// write an answer of the real answer's size to stdout — and no engine or serializing at all.
// node io-floor.mjs <answer-file>: the answer's bytes are loaded before stdin is read, and that
// load is timed apart; one JSON line on stderr gives {answer_load_ms, read_ms, parse_ms, write_ms,
// cpu_ms (after the load), cases}.
import { readFileSync, readSync } from "node:fs";
import { performance } from "node:perf_hooks";

const t0 = performance.now();
const c0 = process.cpuUsage();
const answer = readFileSync(process.argv[2]);
const t1 = performance.now();
const c1 = process.cpuUsage(c0);
// stdin as the CLI reads it: synchronous reads into 1 MiB blocks.
const blocks = [];
let n = 0;
for (;;) {
  const block = Buffer.allocUnsafe(1 << 20);
  let got;
  try {
    got = readSync(0, block, 0, block.length, null);
  } catch (e) {
    if (e.code === "EOF") break;
    throw e;
  }
  if (got === 0) break;
  blocks.push(block.subarray(0, got));
  n += got;
}
const t2 = performance.now();
const body = JSON.parse(Buffer.concat(blocks, n).toString("utf8"));
const t3 = performance.now();
// Written as the CLI writes (process.stdout is synchronous on a pipe or file on Linux).
for (let at = 0; at < answer.length; at += 1 << 20) process.stdout.write(answer.subarray(at, at + (1 << 20)));
const t4 = performance.now();
const c4 = process.cpuUsage(c0);
process.stderr.write(
  JSON.stringify({ answer_load_ms: t1 - t0, read_ms: t2 - t1, parse_ms: t3 - t2, write_ms: t4 - t3, cpu_ms: (c4.user + c4.system - c1.user - c1.system) / 1000, cases: body.cases.length }) + "\n",
);
