"use client";

import { useCallback, useEffect, useMemo, useRef, useState } from "react";
import type { RowResult, ScheduleResults } from "@/calc/index";
import type { TDesignCase, TSchedule } from "@/schemas/schedule";
import { resultsFor } from "@/schedule/engine-schedule";
import { caseResultsOf, planUpdate, updateCaseResults, type CaseResults } from "@/schedule/incremental-results";
import { ResultsWorkerClient } from "./results-worker-client";

/**
 * Below this many rows a whole recalculation takes a few milliseconds: it runs in the page, which
 * is quicker than a round trip to the worker (and the results are there on the first paint).
 */
export const INLINE_ROWS = 600;

export interface ShownResults {
  /** The chosen case's results; while a whole recalculation runs, the last ones (or null at first). */
  results: ScheduleResults | null;
  byRow: Map<string, RowResult>;
  /** A whole recalculation of the chosen case is under way in the worker. */
  pending: boolean;
  /** Results of another case, computed or brought up to date when asked (undefined when not ready). */
  resultsOf: (dc: TDesignCase) => ScheduleResults | undefined;
}

const EMPTY = new Map<string, RowResult>();

function measure(name: string, start: number) {
  try {
    performance.measure(name, { start, end: performance.now() });
  } catch {
    // user timing is for the benchmark only
  }
}

/**
 * The results shown for the chosen design case, kept current edit by edit: a row edit recalculates
 * that row and its zone's totals here (a few ms); anything that touches every row goes to a Web
 * Worker, and the other cases are computed there in the background, so switching finds them ready.
 */
export function useScheduleResults(schedule: TSchedule, dc: TDesignCase | undefined): ShownResults {
  const cache = useRef(new Map<string, CaseResults>()).current;
  const worker = useRef<Pick<ResultsWorkerClient, "pending" | "request" | "close"> | null>(null);
  const [arrived, setArrived] = useState(0);
  // The order in which this page saw its schedules: an answer made from an older schedule than
  // the results held for its case is not wanted.
  const seen = useRef({ order: new WeakMap<TSchedule, number>(), n: 0 }).current;
  if (!seen.order.has(schedule)) seen.order.set(schedule, ++seen.n);
  const rows = schedule.surfaces.length + schedule.duct_runs.length;
  // A browser that cannot start the worker sets `broken` when first asked (startClient). Not a
  // test of `typeof Worker` here: the server has no Worker, and would compute a big sheet in its
  // render and draw results the page's first render does not have (a hydration mismatch, which
  // makes React throw the server's HTML away and draw the whole page again).
  const [broken, setBroken] = useState(false);
  const inline = rows <= INLINE_ROWS || broken;

  const client = () => (worker.current ??= startClient());
  const startClient = () => {
    try {
      return makeClient();
    } catch {
      // A browser or policy that refuses the worker: compute in the page instead.
      setBroken(true);
      return new InlineClient();
    }
  };
  const makeClient = () =>
    new ResultsWorkerClient((s, c, results, _ms) => {
      const t = performance.now();
      const prev = cache.get(c.id);
      // Keep whichever is newer: results made from an older schedule than those held are dropped.
      if (!prev || (seen.order.get(s) ?? 0) >= (seen.order.get(prev.schedule) ?? 0)) cache.set(c.id, caseResultsOf(s, c, results));
      measure("filmsheet:results:receive", t);
      setArrived((n) => n + 1);
    }, () => setBroken(true));
  useEffect(() => () => worker.current?.close(), []);

  // Every edit recalculates here only what it touched; arrived counts the worker's answers.
  const shown = useMemo(() => {
    if (!dc) return { state: undefined, pending: false };
    const t = performance.now();
    const prev = cache.get(dc.id);
    const up = updateCaseResults(prev, schedule, dc);
    if (up) {
      if (up.state !== prev) cache.set(dc.id, up.state);
      if (up.changed.size) measure("filmsheet:results:rows", t);
      return { state: up.state, pending: false };
    }
    if (inline) {
      const state = caseResultsOf(schedule, dc, resultsFor(schedule, dc));
      cache.set(dc.id, state);
      measure("filmsheet:results:full", t);
      return { state, pending: false };
    }
    return { state: prev, pending: true };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [schedule, dc, arrived, inline]);

  // A whole recalculation of the chosen case: to the front of the worker's queue.
  useEffect(() => {
    if (dc && shown.pending && !client().pending(dc.id)) client().request(schedule, [dc], true);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [shown, dc, schedule]);

  // The other cases, once the chosen one is shown and the page has had a moment.
  useEffect(() => {
    if (inline || shown.pending || !dc) return;
    const timer = setTimeout(() => {
      const others = schedule.design_cases.filter((c) => c.id !== dc.id && !client().pending(c.id) && planUpdate(cache.get(c.id), schedule, c).kind === "full");
      if (others.length) client().request(schedule, others, false);
    }, 400);
    return () => clearTimeout(timer);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [schedule, dc, shown.pending, inline]);

  const resultsOf = useCallback((c: TDesignCase) => {
    if (c.id === dc?.id) return shown.state?.results;
    const up = updateCaseResults(cache.get(c.id), schedule, c);
    if (up) {
      cache.set(c.id, up.state);
      return up.state.results;
    }
    if (inline) {
      const state = caseResultsOf(schedule, c, resultsFor(schedule, c));
      cache.set(c.id, state);
      return state.results;
    }
    return undefined;
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [schedule, dc, shown, inline]);

  return { results: shown.state?.results ?? null, byRow: shown.state?.byRow ?? EMPTY, pending: shown.pending, resultsOf };
}

/** Stands in for the worker when none could be started: asks for nothing (the page computes in place). */
class InlineClient {
  pending() {
    return false;
  }
  request() {}
  close() {}
}
