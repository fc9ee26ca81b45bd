// Runs once when the server starts: fail fast on a bad environment instead of on the first
// request, stamp each request with its caller's address, then start the job worker (the job
// queue lives in PostgreSQL).
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME === "nodejs") {
    const { env } = await import("@/server/env");
    const jobsWorker = env().JOBS_WORKER;
    // A production site marks its database, so the demo seed never runs against it.
    const { markDeployment } = await import("@/server/services/mark-deployment");
    const mark = (tries: number): void =>
      void markDeployment().catch(() => {
        if (tries > 1) setTimeout(() => mark(tries - 1), 30_000).unref();
      });
    mark(20);
    const { installClientAddress } = await import("@/server/auth/client-address");
    installClientAddress(env().TRUSTED_PROXIES);
    if (jobsWorker === "on") {
      const { startJobWorker } = await import("@/server/jobs/start-job-worker");
      // Not awaited: the app must serve (and report its health) even while the database is down.
      startJobWorker().catch(() => {});
    }
  }
}
