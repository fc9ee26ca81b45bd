// bench:browser's account of a scrolled frame's main-thread time (bench/lib/frame-cost.ts), on a
// hand-made trace whose sums are worked out below.
import { expect, test } from "vitest";
import { describeFrameCost, frameCost, type FrameTraceEvent } from "../../bench/lib/frame-cost";

const main = { pid: 1, tid: 1 };
const other = { pid: 1, tid: 7 };
// Times in microseconds, as Chromium writes them.
const events: FrameTraceEvent[] = [
  { name: "thread_name", ph: "M", ts: 0, ...main },
  // Frame 1: a 20 ms task (25 ms of wall time) with a 5 ms layout that recalculated style inside it
  // (counted once, in the layout), then 3 ms of painting and 1 of pre-painting.
  { name: "RunTask", ph: "X", ts: 0, dur: 25_000, tdur: 20_000, ...main },
  { name: "Layout", ph: "X", ts: 1_000, dur: 6_000, tdur: 5_000, ...main },
  { name: "UpdateLayoutTree", ph: "X", ts: 2_000, dur: 2_000, tdur: 2_000, ...main },
  { name: "Paint", ph: "X", ts: 10_000, dur: 3_000, tdur: 3_000, ...main },
  { name: "PrePaint", ph: "X", ts: 14_000, dur: 1_000, tdur: 1_000, ...main },
  // Frame 2: a 10 ms task with 2 ms of style.
  { name: "RunTask", ph: "X", ts: 30_000, dur: 10_000, tdur: 10_000, ...main },
  { name: "UpdateLayoutTree", ph: "X", ts: 31_000, dur: 2_000, tdur: 2_000, ...main },
  // Another thread's work is not the page's main thread's.
  { name: "RunTask", ph: "X", ts: 0, dur: 90_000, tdur: 90_000, ...other },
  { name: "Layout", ph: "X", ts: 100, dur: 50_000, tdur: 50_000, ...other },
];
const onMain = (e: FrameTraceEvent) => e.pid === main.pid && e.tid === main.tid;

test("a frame's main-thread CPU is split into style and layout, painting and the rest, per frame", () => {
  // Total 30 ms; style and layout 5 + 2 = 7; painting 3 + 1 = 4; the rest 30 − 7 − 4 = 19; over 2 frames.
  const c = frameCost(events, onMain, 2);
  expect(c.total).toBeCloseTo(15, 6);
  expect(c.styleLayout).toBeCloseTo(3.5, 6);
  expect(c.paint).toBeCloseTo(2, 6);
  expect(c.rest).toBeCloseTo(9.5, 6);
  expect(describeFrameCost(c)).toBe("15.0 ms: style and layout 3.5, painting 2.0, scripts and the rest 9.5");
});

test("CPU time is read, not wall time; without it (an older trace) the wall time stands in", () => {
  const wallOnly = events.filter(onMain).map(({ tdur: _tdur, ...e }) => e);
  // Wall: tasks 25 + 10 = 35; style and layout 6 + 2 = 8; painting 4.
  expect(frameCost(wallOnly, onMain, 1)).toEqual({ total: 35, styleLayout: 8, paint: 4, rest: 23 });
  expect(describeFrameCost(null)).toBe("n/a");
});
