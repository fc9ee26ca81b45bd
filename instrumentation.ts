// Runs once when the server starts: fail fast on a bad environment instead of on the first
// request, then start the e-mail worker (the job queue lives in PostgreSQL).
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { env } = await import("@/server/env");
    if (env().JOBS_WORKER === "on") {
      const { startJobWorker } = await import("@/server/jobs/start-job-worker");
      // Not awaited: the app must serve (and report its health) even while the database is down.
      startJobWorker().catch(() => {});
    }
  }
}
