import "server-only";
import { db } from "@/server/db/knex";
import { env } from "@/server/env";

/** Answers "ok" when PostgreSQL runs `select 1` within the health timeout, else "down". */
export async function checkDatabase(timeoutMs = env().HEALTH_DB_TIMEOUT_MS): Promise<"ok" | "down"> {
  let timer: NodeJS.Timeout | undefined;
  const timeout = new Promise<"down">((resolve) => {
    timer = setTimeout(() => resolve("down"), timeoutMs);
  });
  const ping = db()
    .raw("select 1")
    .then(() => "ok" as const)
    .catch(() => "down" as const);
  try {
    return await Promise.race([ping, timeout]);
  } finally {
    clearTimeout(timer);
  }
}
