// `npm run worker`: the job worker as a process of its own (report builds, e-mail, the hourly
// prunes). Web instances then run with JOBS_WORKER=off and only queue jobs; PostgreSQL hands each
// job to exactly one worker, so any number of these may run. It reads the same environment as the
// app (src/server/env.ts). Run with `--conditions=react-server` so that `import "server-only"` in
// src/server resolves to its empty build, as it does inside Next.js.
import { env } from "@/server/env";
import { startJobWorker } from "@/server/jobs/start-job-worker";

async function main(): Promise<void> {
  env(); // a bad environment stops the worker here with the list of problems
  let runners;
  // The database may still be starting (or restarting): wait for it rather than exit.
  for (let attempt = 1; ; attempt++) {
    try {
      runners = await startJobWorker({ retry: false });
      break;
    } catch (error) {
      console.warn(`[worker] cannot start yet (${error instanceof Error ? error.message : String(error)}); retrying in 3 s`);
      await new Promise((r) => setTimeout(r, 3000));
      if (attempt === 100) throw error;
    }
  }
  console.log(`[worker] running (pid ${process.pid}); jobs from ${env().DATABASE_URL.replace(/:[^:@/]+@/, ":***@")}`);
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[worker] ${signal}: finishing the jobs in hand, then stopping`);
    // A job still running when the grace period ends is left locked; graphile-worker hands it to
    // another worker when the lock expires (see docs/scaling.md).
    const timer = setTimeout(() => process.exit(1), 20_000);
    timer.unref();
    await Promise.all(runners.map((r) => r.stop().catch(() => {})));
    process.exit(0);
  };
  process.on("SIGTERM", () => void stop("SIGTERM"));
  process.on("SIGINT", () => void stop("SIGINT"));
  await Promise.all(runners.map((r) => r.promise));
}

main().catch((error: unknown) => {
  console.error(`[worker] failed: ${error instanceof Error ? error.message : String(error)}`);
  process.exit(1);
});
