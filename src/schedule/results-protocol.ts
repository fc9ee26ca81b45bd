/**
 * Messages between the page and the results worker (results.worker.ts). The page sends the
 * schedule once per change and then the cases it wants, most wanted first; the worker answers a
 * case in slices of rows, so that no single message takes the page long to receive.
 */
import type { RowResult, ScheduleResults } from "@/calc/index";
import type { TDesignCase, TSchedule } from "@/schemas/schedule";

export type ToWorker =
  | { type: "schedule"; job: number; schedule: Pick<TSchedule, "project" | "zones" | "buildups" | "surfaces" | "duct_runs"> }
  /** The schedule as the page's packed JSON text (packed-schedule.ts), when the page has it. */
  | { type: "schedule-text"; job: number; text: string }
  | { type: "case"; job: number; dc: TDesignCase; urgent: boolean };

export type FromWorker =
  | { type: "rows"; job: number; caseId: string; sheet: "surfaces" | "duct_runs"; from: number; rows: RowResult[] }
  | { type: "done"; job: number; caseId: string; zones: ScheduleResults["zones"]; surfaces: number; ducts: number; ms: number };

/** Rows per message: small enough that receiving one stays far below a long task. */
export const SLICE = 400;
