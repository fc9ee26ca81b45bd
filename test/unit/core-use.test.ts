// bench:browser's account of who had the cores while the page loaded (bench/lib/core-use.ts): each
// thread's CPU time from Linux's /proc, grouped by the process it belongs to.
import { existsSync } from "node:fs";
import { expect, test } from "vitest";
import { coreUseBetween, groupOf, readCoreUse } from "../../bench/lib/core-use";

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

test.runIf(existsSync("/proc/self/stat"))("a busy loop in this process shows as CPU time of the rest, and only grows", () => {
  const before = readCoreUse()!;
  // 300 ms of this process's own CPU time (not wall time: a busy machine may take the core away).
  const start = process.cpuUsage();
  while ((process.cpuUsage(start).user + process.cpuUsage(start).system) / 1000 < 300);
  const used = coreUseBetween(before, readCoreUse()!);
  // /proc counts in 10 ms ticks.
  expect(used["the rest"]).toBeGreaterThanOrEqual(270);
  for (const v of Object.values(used)) expect(v).toBeGreaterThanOrEqual(0);
});
