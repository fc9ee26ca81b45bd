// Where a scrolled frame's main-thread time goes, from a Chromium trace taken while the grid
// scrolls (categories devtools.timeline and disabled-by-default-devtools.timeline): the main
// thread's CPU time per frame, split into style and layout (UpdateLayoutTree, Layout), painting
// (Paint, PrePaint, Layerize, Commit) and the rest (the page's scripts and the browser's own work
// around them). CPU time (a trace event's tdur), not wall time, so a frame that waited for a core
// shared with other threads does not count the wait. Used by bench:browser for the schedule and
// for its floor pages.

/** The fields of a trace event this reads. */
export type FrameTraceEvent = { name: string; ph: string; ts: number; dur?: number; tdur?: number; pid: number; tid: number };

export type FrameCost = { total: number; styleLayout: number; paint: number; rest: number };

const STYLE_LAYOUT = new Set(["UpdateLayoutTree", "Layout"]);
const PAINT = new Set(["Paint", "PrePaint", "Layerize", "Commit"]);

/**
 * Milliseconds of main-thread CPU per frame over `frames` frames. `onMain` picks the page's main
 * thread. An event of a kind inside another of the same kind (style recalculated within a layout)
 * is counted once, in the outer one.
 */
export function frameCost(events: FrameTraceEvent[], onMain: (e: FrameTraceEvent) => boolean, frames: number): FrameCost {
  const complete = events.filter((e) => e.ph === "X" && onMain(e)).sort((a, b) => a.ts - b.ts || (b.dur ?? 0) - (a.dur ?? 0));
  const cpu = (e: FrameTraceEvent) => (e.tdur ?? e.dur ?? 0) / 1000;
  let total = 0;
  for (const e of complete) if (e.name === "RunTask") total += cpu(e);
  const outer = (kinds: Set<string>) => {
    let sum = 0;
    let openUntil = -Infinity;
    for (const e of complete) {
      if (!kinds.has(e.name)) continue;
      if (e.ts < openUntil) continue;
      sum += cpu(e);
      openUntil = e.ts + (e.dur ?? 0);
    }
    return sum;
  };
  const styleLayout = outer(STYLE_LAYOUT);
  const paint = outer(PAINT);
  const per = (ms: number) => ms / Math.max(1, frames);
  return { total: per(total), styleLayout: per(styleLayout), paint: per(paint), rest: per(Math.max(0, total - styleLayout - paint)) };
}

/** "26.1 ms: style and layout 8.4, painting 5.2, scripts and the rest 12.5". */
export function describeFrameCost(c: FrameCost | null): string {
  if (!c) return "n/a";
  return `${c.total.toFixed(1)} ms: style and layout ${c.styleLayout.toFixed(1)}, painting ${c.paint.toFixed(1)}, scripts and the rest ${c.rest.toFixed(1)}`;
}
