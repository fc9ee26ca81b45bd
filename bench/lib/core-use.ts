// Where a machine's cores go while the page loads, read from Linux's /proc (each thread's user and
// system time, in clock ticks of 10 ms): the page's main thread, the browser's other threads
// (compositing, rasterising, compiling, the network), the app's server, the database, and the rest
// (the kernel, the benchmark itself). A long task's wall time on shared cores includes waiting for
// one; this says who had them. Elsewhere than Linux it reads nothing and the bench says so.
import { existsSync, readdirSync, readFileSync } from "node:fs";

export const CORE_GROUPS = ["the page's main thread", "the browser's other threads", "the app's server", "the database", "the rest"] as const;
export type CoreUse = Record<(typeof CORE_GROUPS)[number], number>;

const TICK_MS = 10;

// A process's command line as one string: Chromium's and PostgreSQL's processes rewrite theirs into
// one space-separated title, others keep NUL-separated arguments.
export function groupOf(cmdline: string, pid: string, tid: string): (typeof CORE_GROUPS)[number] {
  const exe = cmdline.split(" ")[0] ?? "";
  // A renderer's main thread is its first (thread id = process id).
  if (/chrom/.test(exe)) return /--type=renderer/.test(cmdline) && pid === tid ? "the page's main thread" : "the browser's other threads";
  if (/next-server|\.bin\/next /.test(cmdline)) return "the app's server";
  if (/postgres/.test(exe)) return "the database";
  return "the rest";
}

/** A thread's CPU time so far (ms) from the text of its /proc stat file: user and system time. */
export function cpuMsOfStat(stat: string): number {
  // Fields after the command name (which may hold spaces); utime and stime are the 14th and 15th.
  const fields = stat.slice(stat.lastIndexOf(")") + 2).split(" ");
  return (Number(fields[11]) + Number(fields[12])) * TICK_MS;
}

/** Each thread's CPU time (ms) so far and its group, by "pid/tid". */
export type ThreadTimes = Map<string, { group: (typeof CORE_GROUPS)[number]; ms: number }>;

/** CPU time (ms) of every thread on the machine so far; null where /proc is not there. */
export function readCoreUse(): ThreadTimes | null {
  if (!existsSync("/proc/self/stat")) return null;
  const threads: ThreadTimes = new Map();
  for (const pid of readdirSync("/proc").filter((d) => /^\d+$/.test(d))) {
    try {
      const cmdline = readFileSync(`/proc/${pid}/cmdline`, "utf8").replaceAll("\0", " ");
      for (const tid of readdirSync(`/proc/${pid}/task`)) {
        threads.set(`${pid}/${tid}`, { group: groupOf(cmdline, pid, tid), ms: cpuMsOfStat(readFileSync(`/proc/${pid}/task/${tid}/stat`, "utf8")) });
      }
    } catch {
      // The process or thread ended while it was read.
    }
  }
  return threads;
}

/**
 * What each group used between two readings, thread by thread: a thread that started in between
 * counts whole, one that ended in between counts nothing (its time went with it), and no thread's
 * end takes time away from the others of its group.
 */
export function coreUseBetween(before: ThreadTimes, after: ThreadTimes): CoreUse {
  const use = Object.fromEntries(CORE_GROUPS.map((g) => [g, 0])) as CoreUse;
  for (const [id, t] of after) use[t.group] += Math.max(0, t.ms - (before.get(id)?.ms ?? 0));
  return use;
}
