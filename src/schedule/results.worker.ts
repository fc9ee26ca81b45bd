/**
 * Whole recalculations off the page's main thread: the engine over every row of a design case,
 * for the first load, a change of the site or a design case, a zone or build-up edit, and the
 * other cases in the background so that switching case finds them ready.
 */
import { scheduleResults } from "@/calc/index";
import { engineDesignCase, engineSchedule } from "./engine-schedule";
import { scheduleFromText } from "./packed-schedule";
import { SLICE, type FromWorker, type ToWorker } from "./results-protocol";

type Schedule = Extract<ToWorker, { type: "schedule" }>["schedule"];
// The schedule of every job with work queued: a case computed from a slightly older schedule is
// still worth having, since the page brings it up to date with the few rows changed since.
const schedules = new Map<number, Schedule>();
let queue: Extract<ToWorker, { type: "case" }>[] = [];
let busy = false;
const post = (m: FromWorker) => (self as unknown as { postMessage: (m: FromWorker) => void }).postMessage(m);

self.onmessage = (e: MessageEvent<ToWorker>) => {
  const m = e.data;
  if (m.type === "schedule") {
    schedules.set(m.job, m.schedule);
  } else if (m.type === "schedule-text") {
    schedules.set(m.job, scheduleFromText(m.text));
  } else {
    // A newer request for the same case replaces one still waiting.
    queue = queue.filter((q) => q.dc.id !== m.dc.id);
    if (m.urgent) queue.unshift(m);
    else queue.push(m);
  }
  if (!busy) {
    busy = true;
    setTimeout(next, 0);
  }
};

/** One case at a time, handing back between cases so a newer schedule or an urgent case is read first. */
function next() {
  const m = queue.shift();
  const latest = Math.max(...schedules.keys());
  for (const job of schedules.keys()) if (job !== latest && job !== m?.job && !queue.some((q) => q.job === job)) schedules.delete(job);
  const schedule = m && schedules.get(m.job);
  if (!m || !schedule) {
    busy = queue.length > 0;
    if (busy) setTimeout(next, 0);
    return;
  }
  const t = performance.now();
  const r = scheduleResults(engineSchedule(schedule), engineDesignCase(m.dc));
  const ms = performance.now() - t;
  for (const [sheet, rows] of [["surfaces", r.surfaces], ["duct_runs", r.duct_runs]] as const) {
    for (let from = 0; from < rows.length; from += SLICE) post({ type: "rows", job: m.job, caseId: m.dc.id, sheet, from, rows: rows.slice(from, from + SLICE) });
  }
  post({ type: "done", job: m.job, caseId: m.dc.id, zones: r.zones, surfaces: r.surfaces.length, ducts: r.duct_runs.length, ms });
  setTimeout(next, 0);
}
