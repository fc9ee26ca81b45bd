import "server-only";
import { Logger, run, type Runner } from "graphile-worker";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";
import { sendEmail } from "@/server/email/send-email";
import { BUILD_REPORT_TASK } from "@/server/reports/report-builds";
import { runReportBuild } from "@/server/reports/run-report-build";
import { openEmailJob } from "./enqueue-email";
import { ensureJobSchema } from "./job-schema";

type Holder = { __filmsheetWorker?: Promise<Runner>; __filmsheetStopWorker?: () => Promise<void> };
const holder = globalThis as Holder;

// Only problems are worth a log line; a completed job is routine.
const logger = new Logger(() => (level, message) => {
  // First line only: the stack of "mail server down" adds nothing to the retry notice.
  if (level === "error" || level === "warning") console.warn(`[jobs] ${message.split("\n")[0]}`);
});

/**
 * Starts the job worker inside this app instance (once per process). Every instance runs one;
 * PostgreSQL hands each job to exactly one of them. Failed jobs are retried with backoff.
 */
export function startJobWorker(): Promise<Runner> {
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
        send_email: async (payload) => sendEmail(openEmailJob(payload)),
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
    holder.__filmsheetStopWorker = () => runner.stop();
    return runner;
  })().catch((error: unknown) => {
    // The database may not be up yet: try again shortly rather than run without a worker.
    console.warn(`[jobs] worker did not start (${error instanceof Error ? error.message : String(error)}); retrying in 10 s`);
    holder.__filmsheetWorker = undefined;
    setTimeout(() => void startJobWorker().catch(() => {}), 10_000).unref();
    throw error;
  });
  return holder.__filmsheetWorker;
}
