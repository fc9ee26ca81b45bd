/**
 * The page's side of the results worker: sends a schedule once per job and the cases wanted,
 * gathers each case's slices of rows, and hands back whole results with the schedule they were
 * computed from.
 */
import type { RowResult, ScheduleResults } from "@/calc/index";
import type { TDesignCase, TSchedule } from "@/schemas/schedule";
import type { FromWorker, ToWorker } from "@/schedule/results-protocol";
import { packedTextOf } from "@/schedule/packed-schedule";
import { startResultsWorker } from "@/schedule/results-worker";

export type OnCase = (schedule: TSchedule, dc: TDesignCase, results: ScheduleResults, ms: number) => void;

export class ResultsWorkerClient {
  private worker: Worker;
  private job = 0;
  private sent: TSchedule | null = null;
  /** job → the schedule sent with it. */
  private snapshots = new Map<number, TSchedule>();
  /** case id → the job it was last asked for in. */
  private asked = new Map<string, number>();
  /** `${job}:${caseId}` → the case as sent (the results belong to that version of it). */
  private cases = new Map<string, TDesignCase>();
  private parts = new Map<string, { surfaces: RowResult[]; ducts: RowResult[] }>();

  /** `onFail`: the worker could not start or broke; the page then computes in place. */
  constructor(private onCase: OnCase, onFail: () => void) {
    this.worker = startResultsWorker();
    this.worker.onmessage = (e: MessageEvent<FromWorker>) => this.receive(e.data);
    this.worker.onerror = () => onFail();
  }

  /** Whether a case is being computed (for any schedule). */
  pending(caseId: string): boolean {
    return this.asked.has(caseId);
  }

  /** Asks for `cases` of `schedule`; urgent ones go to the front of the worker's queue. */
  request(schedule: TSchedule, cases: TDesignCase[], urgent: boolean) {
    if (schedule !== this.sent) {
      this.job++;
      this.sent = schedule;
      this.snapshots.set(this.job, schedule);
      // The page's own packed text when this is the schedule it came with (a copy of one string);
      // an edited schedule goes as objects.
      const text = packedTextOf(schedule);
      const { project, zones, buildups, surfaces, duct_runs } = schedule;
      this.post(text !== undefined ? { type: "schedule-text", job: this.job, text } : { type: "schedule", job: this.job, schedule: { project, zones, buildups, surfaces, duct_runs } });
    }
    for (const dc of cases) {
      this.asked.set(dc.id, this.job);
      this.cases.set(`${this.job}:${dc.id}`, dc);
      this.post({ type: "case", job: this.job, dc, urgent });
    }
  }

  close() {
    this.worker.terminate();
  }

  private post(m: ToWorker) {
    this.worker.postMessage(m);
  }

  private receive(m: FromWorker) {
    const key = `${m.job}:${m.caseId}`;
    const part = this.parts.get(key) ?? { surfaces: [], ducts: [] };
    this.parts.set(key, part);
    if (m.type === "rows") {
      const into = m.sheet === "surfaces" ? part.surfaces : part.ducts;
      for (let i = 0; i < m.rows.length; i++) into[m.from + i] = m.rows[i]!;
      return;
    }
    this.parts.delete(key);
    const schedule = this.snapshots.get(m.job);
    const dc = this.cases.get(key);
    this.cases.delete(key);
    if (this.asked.get(m.caseId) === m.job) this.asked.delete(m.caseId);
    // Snapshots no job is waiting for any more are let go.
    const waiting = new Set(this.asked.values());
    for (const job of this.snapshots.keys()) if (job < m.job && !waiting.has(job)) this.snapshots.delete(job);
    if (!schedule || !dc) return;
    this.onCase(schedule, dc, { design_case_id: m.caseId, surfaces: part.surfaces, duct_runs: part.ducts, zones: m.zones }, m.ms);
  }
}
