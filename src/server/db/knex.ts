import "server-only";
import knexFactory, { type Knex } from "knex";
import { env } from "@/server/env";

// One pool per process (per URL, so tests can point a second app at another database);
// kept on globalThis so module re-evaluation does not open new pools.
const pools: Map<string, Knex> = ((globalThis as { __filmsheetPools?: Map<string, Knex> }).__filmsheetPools ??= new Map());

/** The shared Knex instance for the configured DATABASE_URL. */
export function db(): Knex {
  const url = env().DATABASE_URL;
  let pool = pools.get(url);
  if (!pool) {
    pool = knexFactory({
      client: "pg",
      connection: { connectionString: url, connectionTimeoutMillis: 5000 },
      pool: { min: 0, max: 10 },
      acquireConnectionTimeout: 5000,
    });
    pools.set(url, pool);
  }
  return pool;
}
