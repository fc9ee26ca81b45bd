import { spawnSync } from "node:child_process";
import { join } from "node:path";
import pg from "pg";
import { ROOT } from "./paths";

function withDatabase(url: string, database: string): string {
  const u = new URL(url);
  u.pathname = `/${database}`;
  return u.toString();
}

async function admin<T>(fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: withDatabase(process.env.TEST_DATABASE_URL!, "postgres") });
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/** Creates an empty database beside the test database and returns its URL. */
export async function createScratchDatabase(name: string): Promise<string> {
  await admin(async (c) => {
    await c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
    await c.query(`CREATE DATABASE "${name}"`);
  });
  return withDatabase(process.env.TEST_DATABASE_URL!, name);
}

export async function dropScratchDatabase(name: string): Promise<void> {
  await admin((c) => c.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
}

/** Runs the Knex CLI exactly as the start and test scripts do. */
export function knexCli(args: string[], env: Record<string, string>) {
  const result = spawnSync(process.execPath, ["--import", "tsx", join(ROOT, "node_modules/knex/bin/cli.js"), "--knexfile", join(ROOT, "knexfile.ts"), ...args], {
    cwd: ROOT,
    env: { ...process.env, ...env },
    encoding: "utf8",
  });
  return { status: result.status, output: `${result.stdout}\n${result.stderr}` };
}
