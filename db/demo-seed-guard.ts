// When the demo seed may run. It writes accounts with a well-known password, so it refuses
// whenever the database is, or will be, served in production: not only when NODE_ENV says so at
// seed time (npm start seeds without NODE_ENV and then serves in production mode on localhost,
// which is fine), but also when the app's address or the database is off this machine, or the
// app has already served this database on a public address (the mark it leaves in
// deployment_marks). Kept outside db/seeds so that Knex does not run it as a seed.
import type { Knex } from "knex";

const LOOPBACK = new Set(["localhost", "127.0.0.1", "[::1]", "::1"]);

function hostOf(url: string): string | null {
  try {
    return new URL(url).hostname;
  } catch {
    return null;
  }
}

/** Why the environment forbids the demo seed, or null when it allows it. */
export function demoSeedEnvRefusal(e: Record<string, string | undefined>): string | null {
  if (e.NODE_ENV === "production") return "NODE_ENV=production";
  if (e.APP_URL !== undefined && e.APP_URL !== "") {
    const host = hostOf(e.APP_URL);
    if (host === null || !LOOPBACK.has(host)) return `APP_URL (${e.APP_URL}) is not on this machine, so the app would serve these accounts to others`;
  }
  if (e.DATABASE_URL) {
    const host = hostOf(e.DATABASE_URL);
    if (host === null || !LOOPBACK.has(host)) return `DATABASE_URL points at ${host ?? "an unreadable address"}, not a database on this machine`;
  }
  return null;
}

/** Throws, naming the reason, unless the demo seed may run against this database. */
export async function assertDemoSeedAllowed(knex: Knex, e: Record<string, string | undefined> = process.env): Promise<void> {
  let reason = demoSeedEnvRefusal(e);
  if (reason === null && (await knex.schema.hasTable("deployment_marks"))) {
    const mark = await knex("deployment_marks").where({ mode: "production" }).first("app_url", "first_at");
    if (mark) reason = `the app has served this database in production at ${mark.app_url} (since ${new Date(mark.first_at).toISOString()})`;
  }
  if (reason !== null) throw new Error(`Refusing to load demo data: ${reason}. The demo accounts have a well-known password.`);
}
