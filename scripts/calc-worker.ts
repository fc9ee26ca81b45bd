// The second thread of `npm run calc` on a large body (see scripts/calc.ts): parses the second
// half of the cases from the bytes the main thread read (shared, not copied), says at once
// whether they parsed, then computes them with the shared writer and hands the answer's text back
// as UTF-8 bytes, batch by batch, for the main thread to write after its own half.
import { performance } from "node:perf_hooks";
import { parentPort } from "node:worker_threads";
import { writeCalcResults } from "../src/calc/serialize";
import { decodeText } from "./lib/calc-split";

/** The main thread's request: the byte range of the half to compute and the verdict flag. */
export interface HalfRequest {
  bytes: SharedArrayBuffer;
  start: number;
  end: number;
  /** Int32 flag: 0 until parsed, then 1 (parsed) or 2 (not valid JSON, or no case). */
  verdict: SharedArrayBuffer;
}

/** The worker's last message: the wall milliseconds of its phases. */
export interface HalfDone {
  done: true;
  cases: number;
  phases: Record<string, { wall_ms: number }>;
}

const port = parentPort!;
port.once("message", (m: HalfRequest) => {
  const verdict = new Int32Array(m.verdict);
  const phases: Record<string, { wall_ms: number }> = {};
  let t = performance.now();
  const tick = (phase: string) => {
    const now = performance.now();
    (phases[phase] ??= { wall_ms: 0 }).wall_ms += now - t;
    t = now;
  };
  let cases: unknown[] | null = null;
  try {
    const parsed: unknown = JSON.parse("[" + decodeText(Buffer.from(m.bytes, m.start, m.end - m.start)) + "]");
    if (Array.isArray(parsed) && parsed.length > 0) cases = parsed;
  } catch {
    cases = null;
  }
  Atomics.store(verdict, 0, cases === null ? 2 : 1);
  Atomics.notify(verdict, 0);
  tick("parse");
  if (cases !== null) {
    writeCalcResults(
      cases,
      (chunk) => {
        const b = Buffer.from(chunk, "utf8");
        // Hand the bytes over without a copy when they own their memory (large texts do).
        const own = b.byteOffset === 0 && b.byteLength === b.buffer.byteLength ? b : new Uint8Array(b);
        port.postMessage(own, [own.buffer as ArrayBuffer]);
        tick("encode");
      },
      tick,
      true,
    );
  }
  const r = (v: number) => Math.round(v * 10) / 10;
  for (const p of Object.values(phases)) p.wall_ms = r(p.wall_ms);
  port.postMessage({ done: true, cases: cases?.length ?? 0, phases } satisfies HalfDone);
});
