import "server-only";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";

const LOOPBACK = new Set(["localhost", "127.0.0.1", "[::1]"]);

/**
 * Leaves the mark that this database is served in production on a public address (once per
 * start; `last_at` follows). The demo seed refuses to run against a database so marked, whoever
 * runs it and with whatever environment (db/demo-seed-guard.ts). The local production build on
 * localhost (`npm start`, `npm test`) leaves no mark.
 *
 * @returns whether a mark was written.
 */
export async function markDeployment(): Promise<boolean> {
  const e = env();
  if (e.NODE_ENV !== "production" || LOOPBACK.has(new URL(e.APP_URL).hostname)) return false;
  await db()("deployment_marks").insert({ mode: "production", app_url: e.APP_URL }).onConflict("mode").merge({ app_url: e.APP_URL, last_at: db().fn.now() });
  return true;
}
