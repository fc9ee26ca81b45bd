import "server-only";
import { runMigrations } from "graphile-worker";
import { env } from "@/server/env";

let ready: Promise<void> | undefined;

/** Creates or updates graphile-worker's own tables (schema graphile_worker) once per process. */
export function ensureJobSchema(): Promise<void> {
  ready ??= runMigrations({ connectionString: env().DATABASE_URL, maxPoolSize: 1 }).catch((error: unknown) => {
    ready = undefined;
    throw error;
  });
  return ready;
}
