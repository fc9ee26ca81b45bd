import "server-only";
import { run, type Runner } from "graphile-worker";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";
import { sendEmail } from "@/server/email/send-email";
import { BUILD_REPORT_TASK } from "@/server/reports/report-builds";
import { recoverStalledBuilds, stallSeconds } from "@/server/reports/recover-stalled-builds";
import { runReportBuild } from "@/server/reports/run-report-build";
import { sendEmailJob } from "./enqueue-email";
import { ensureJobSchema } from "./job-schema";
import { pruneAuthRecords } from "./prune-auth-records";
import { jobRunnerOptions } from "./runner-options";

type Holder = { __filmsheetWorker?: Promise<Runner[]>; __filmsheetStopWorker?: () => Promise<void> };
const holder = globalThis as Holder;

/**
 * Starts the job workers in this process, once: inside an app instance (instrumentation.ts, unless
 * JOBS_WORKER=off) or as a process of its own (`npm run worker`, scripts/worker.ts): one runner for
 * e-mail and the housekeeping crons, one for report builds (see runner-options.ts). PostgreSQL
 * hands each job to exactly one worker, however many run. Failed jobs are retried with backoff.
 * With `retry` (the default) a worker that cannot reach the database tries again every 10 s.
 */
export function startJobWorker({ retry = true }: { retry?: boolean } = {}): Promise<Runner[]> {
  holder.__filmsheetWorker ??= (async () => {
    await ensureJobSchema();
    const options = jobRunnerOptions(
      env().DATABASE_URL,
      {
        send_email: async (payload) => void (await sendEmailJob(payload, sendEmail)),
        [BUILD_REPORT_TASK]: async (payload) => runReportBuild(String((payload as { buildId?: unknown }).buildId)),
        // Attempts older than a day no longer count toward any limit.
        prune_sign_in_attempts: async () => {
          await db()("sign_in_attempts").where("created_at", "<", db().raw("now() - interval '1 day'")).delete();
        },
        prune_auth_records: async () => void (await pruneAuthRecords()),
        // Draft reports are kept a day (an issued revision's report is kept for good).
        prune_draft_reports: async () => {
          await db()("report_builds").where({ kind: "draft" }).where("created_at", "<", db().raw("now() - interval '1 day'")).delete();
        },
      },
      "17 * * * * prune_sign_in_attempts\n23 * * * * prune_draft_reports\n41 * * * * prune_auth_records",
    );
    const runners = await Promise.all(options.map((o) => run(o)));
    // Report builds whose worker died are restarted by whichever worker notices first.
    const watch = setInterval(() => void recoverStalledBuilds().catch(() => {}), (stallSeconds() * 1000) / 2);
    watch.unref();
    holder.__filmsheetStopWorker = async () => {
      clearInterval(watch);
      await Promise.all(runners.map((r) => r.stop()));
    };
    return runners;
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
