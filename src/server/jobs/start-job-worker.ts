import "server-only";
import { Logger, run, type Runner } from "graphile-worker";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";
import { ZEmailMessage } from "@/server/email/message";
import { sendEmail } from "@/server/email/send-email";
import { BUILD_REPORT_TASK } from "@/server/reports/report-builds";
import { recoverStalledBuilds, stallSeconds } from "@/server/reports/recover-stalled-builds";
import { runReportBuild } from "@/server/reports/run-report-build";
import { ensureJobSchema } from "./job-schema";

type Holder = { __filmsheetWorker?: Promise<Runner>; __filmsheetStopWorker?: () => Promise<void> };
const holder = globalThis as Holder;

// Only problems are worth a log line; a completed job is routine.
const logger = new Logger(() => (level, message) => {
  // First line only: the stack of "mail server down" adds nothing to the retry notice.
  if (level === "error" || level === "warning") console.warn(`[jobs] ${message.split("\n")[0]}`);
});

/**
 * Starts the job worker in this process, once: inside an app instance (instrumentation.ts, unless
 * JOBS_WORKER=off) or as a process of its own (`npm run worker`, scripts/worker.ts). PostgreSQL
 * hands each job to exactly one worker, however many run. Failed jobs are retried with backoff.
 * With `retry` (the default) a worker that cannot reach the database tries again every 10 s.
 */
export function startJobWorker({ retry = true }: { retry?: boolean } = {}): Promise<Runner> {
  holder.__filmsheetWorker ??= (async () => {
    await ensureJobSchema();
    const runner = await run({
      connectionString: env().DATABASE_URL,
      maxPoolSize: 4,
      concurrency: 2,
      noHandleSignals: true,
      pollInterval: 1000,
      logger,
      taskList: {
        send_email: async (payload) => sendEmail(ZEmailMessage.parse(payload)),
        [BUILD_REPORT_TASK]: async (payload) => runReportBuild(String((payload as { buildId?: unknown }).buildId)),
        // Attempts older than a day no longer count toward any limit.
        prune_sign_in_attempts: async () => {
          await db()("sign_in_attempts").where("created_at", "<", db().raw("now() - interval '1 day'")).delete();
        },
        // Draft reports are kept a day (an issued revision's report is kept for good).
        prune_draft_reports: async () => {
          await db()("report_builds").where({ kind: "draft" }).where("created_at", "<", db().raw("now() - interval '1 day'")).delete();
        },
      },
      crontab: "17 * * * * prune_sign_in_attempts\n23 * * * * prune_draft_reports",
    });
    // Report builds whose worker died are restarted by whichever worker notices first.
    const watch = setInterval(() => void recoverStalledBuilds().catch(() => {}), (stallSeconds() * 1000) / 2);
    watch.unref();
    holder.__filmsheetStopWorker = () => {
      clearInterval(watch);
      return runner.stop();
    };
    return runner;
  })().catch((error: unknown) => {
    holder.__filmsheetWorker = undefined;
    if (!retry) throw error;
    // The database may not be up yet: try again shortly rather than run without a worker.
    console.warn(`[jobs] worker did not start (${error instanceof Error ? error.message : String(error)}); retrying in 10 s`);
    setTimeout(() => void startJobWorker().catch(() => {}), 10_000).unref();
    throw error;
  });
  return holder.__filmsheetWorker;
}
