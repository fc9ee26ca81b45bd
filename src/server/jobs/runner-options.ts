import "server-only";
import { Logger, type RunnerOptions, type TaskList } from "graphile-worker";

// Only problems are worth a log line; a completed job is routine.
const logger = new Logger(() => (level, message) => {
  // First line only: the stack of "mail server down" adds nothing to the retry notice.
  if (level === "error" || level === "warning") console.warn(`[jobs] ${message.split("\n")[0]}`);
});

/** Tasks that build reports: slow and heavy, so they get a runner of their own. */
export const REPORT_TASKS = ["build_report"] as const;

/**
 * The options of the two runners every app instance starts. A runner only takes jobs of the
 * tasks it knows, so report builds (one at a time per instance) can never fill the slots that
 * send e-mail: a sign-in link or a password reset goes out while a report is being built.
 * Within the e-mail runner, e-mail jobs also carry the highest priority (job-priorities.ts).
 */
export function jobRunnerOptions(connectionString: string, taskList: TaskList, crontab = ""): [RunnerOptions, RunnerOptions] {
  const reports = (name: string) => (REPORT_TASKS as readonly string[]).includes(name);
  const pick = (keep: boolean) => Object.fromEntries(Object.entries(taskList).filter(([name]) => reports(name) === keep)) as TaskList;
  const common = { connectionString, noHandleSignals: true, pollInterval: 1000, logger };
  return [
    { ...common, maxPoolSize: 3, concurrency: 2, taskList: pick(false), crontab },
    { ...common, maxPoolSize: 2, concurrency: 1, taskList: pick(true) },
  ];
}
