// bench:browser's account of who had the cores while the page loaded (bench/lib/core-use.ts): each
// thread's CPU time from Linux's /proc, grouped by the process it belongs to.
import { existsSync, readFileSync } from "node:fs";
import { expect, test } from "vitest";
import { coreUseBetween, cpuMsOfStat, groupOf, readCoreUse } from "../../bench/lib/core-use";

test("threads are grouped by their process: a renderer's first thread is the page's main thread", () => {
  const renderer = "/usr/lib/chromium/chromium --type=renderer --crashpad-handler-pid=0 --lang=en-US";
  expect(groupOf(renderer, "4087", "4087")).toBe("the page's main thread");
  expect(groupOf(renderer, "4087", "4090")).toBe("the browser's other threads");
  expect(groupOf("/usr/lib/chromium/chromium --type=gpu-process --no-sandbox", "4047", "4047")).toBe("the browser's other threads");
  expect(groupOf("/usr/lib/chromium/chromium --headless --remote-debugging-pipe", "4005", "4005")).toBe("the browser's other threads");
  expect(groupOf("next-server (v16.4.6) ", "5000", "5001")).toBe("the app's server");
  expect(groupOf("node /work/main/node_modules/.bin/next start -H 127.0.0.1 -p 3999 ", "5000", "5000")).toBe("the app's server");
  expect(groupOf("postgres: filmsheet filmsheet_browser 127.0.0.1(40112) idle", "6000", "6000")).toBe("the database");
  expect(groupOf("node --import tsx bench/browser.bench.ts ", "7000", "7000")).toBe("the rest");
});

test("a thread that ended between two readings takes nothing away; one that started counts whole", () => {
  const before = new Map([
    ["10/10", { group: "the page's main thread" as const, ms: 500 }],
    ["20/21", { group: "the rest" as const, ms: 4_000 }],
    ["30/30", { group: "the app's server" as const, ms: 100 }],
  ]);
  const after = new Map([
    ["10/10", { group: "the page's main thread" as const, ms: 620 }],
    // 20/21 (4 s of CPU in "the rest") ended in between; 40/41 started and ran 70 ms.
    ["40/41", { group: "the rest" as const, ms: 70 }],
    ["30/30", { group: "the app's server" as const, ms: 100 }],
  ]);
  expect(coreUseBetween(before, after)).toEqual({ "the page's main thread": 120, "the browser's other threads": 0, "the app's server": 0, "the database": 0, "the rest": 70 });
});

// This thread's own CPU time as /proc counts it (10 ms ticks).
const ownTicksMs = () => cpuMsOfStat(readFileSync("/proc/thread-self/stat", "utf8"));

test.runIf(existsSync("/proc/thread-self/stat"))("a busy loop in this thread shows as CPU time of the rest, and no group shrinks", () => {
  const before = readCoreUse()!;
  // 300 ms of this thread's own CPU time as /proc counts it (not wall time, and not the process's:
  // other threads of the test runner may be busy too).
  const start = ownTicksMs();
  while (ownTicksMs() - start < 300);
  const used = coreUseBetween(before, readCoreUse()!);
  expect(used["the rest"]).toBeGreaterThanOrEqual(300);
  for (const v of Object.values(used)) expect(v).toBeGreaterThanOrEqual(0);
});
