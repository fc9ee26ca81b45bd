// The computation alone, in Node on the same engine and schedule as the page: a whole
// recalculation of one design case against one edited row and its zone brought up to date.
import { performance } from "node:perf_hooks";
import type { TSchedule } from "../../src/schemas/schedule";
import { resultsFor } from "../../src/schedule/engine-schedule";
import { caseResultsOf, updateCaseResults } from "../../src/schedule/incremental-results";

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)]!;

export async function nodeComputation(schedule: TSchedule): Promise<{ fullMs: number; rowMs: number }> {
  const dc = schedule.design_cases[0]!;
  const full: number[] = [];
  let results = resultsFor(schedule, dc);
  for (let i = 0; i < 3; i++) {
    const t = performance.now();
    results = resultsFor(schedule, dc);
    full.push(performance.now() - t);
  }
  let state = caseResultsOf(schedule, dc, results);
  const row: number[] = [];
  for (let i = 0; i < 25; i++) {
    // As the schedule cache does it: a new list with one new row object.
    const s = state.schedule;
    const at = (i * 97) % s.surfaces.length;
    const next = { ...s, surfaces: s.surfaces.map((r, j) => (j === at ? { ...r, area_m2: r.area_m2 + 1 } : r)) };
    const t = performance.now();
    state = updateCaseResults(state, next, dc)!.state;
    row.push(performance.now() - t);
  }
  return { fullMs: median(full), rowMs: median(row) };
}
