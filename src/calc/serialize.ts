/**
 * The contract's answer as JSON text, shared by POST /api/calc and `npm run calc` so that both
 * answer byte for byte the same. The text is made batch by batch — compute a batch, stringify it,
 * hand it on — so a large request never holds one giant string or every result at once, and the
 * command line can write while it computes.
 *
 * The text is exactly JSON.stringify(calculate(body)): V8's JSON.stringify writes every number in
 * its shortest round-trip form (exact: parsing the text gives back the engine's double), and the
 * engine turns a case whose answer would hold NaN or Infinity into an `ok: false` result, so neither
 * ever appears (JSON.stringify would write null, never NaN). Measured on 30,000 surface results:
 * stringifying in batches of 1,000 takes ≈ 70 ms CPU against ≈ 90–120 ms for one whole-body call;
 * number formatting is about half of it, and rounding to 12 digits would save under 10 %, so the
 * numbers keep full precision.
 */
import { calculate } from "./calculate";

/** Cases per batch: ≈ 600 kB of text for surfaces, small enough to stay in cache. */
export const ANSWER_BATCH = 1000;

/** Called at the end of each batch's computing and of its stringifying (the CLI's timing report). */
export type PhaseTick = (phase: "engine" | "serialize") => void;

/**
 * Computes the cases in order and passes the answer `{"results":[…]}` to `write` in pieces whose
 * concatenation is the whole text (no trailing newline).
 */
export function writeCalcAnswer(cases: readonly unknown[], write: (chunk: string) => void, tick?: PhaseTick): void {
  write('{"results":[');
  writeCalcResults(cases, write, tick);
  write("]}");
}

/**
 * The results of `cases` as the text between the answer's brackets, batch by batch; with
 * `following`, each piece starts with the comma that joins it to results written before (the
 * command line computes the two halves of a large body on two threads, and the halves' texts
 * joined by that comma are the text of the whole).
 */
export function writeCalcResults(cases: readonly unknown[], write: (chunk: string) => void, tick?: PhaseTick, following = false): void {
  for (let i = 0; i < cases.length; i += ANSWER_BATCH) {
    const { results } = calculate({ cases: cases.slice(i, i + ANSWER_BATCH) });
    tick?.("engine");
    // JSON.stringify of an array is "[" + its items' texts joined by "," + "]": drop the brackets
    // and join the batches with the same comma.
    const text = JSON.stringify(results);
    tick?.("serialize");
    write(i === 0 && !following ? text.slice(1, -1) : "," + text.slice(1, -1));
  }
}

/** The whole answer as one string (the HTTP endpoint's bodies are at most 10,000 cases). */
export function calcAnswerText(cases: readonly unknown[]): string {
  const parts: string[] = [];
  writeCalcAnswer(cases, (chunk) => parts.push(chunk));
  return parts.join("");
}
