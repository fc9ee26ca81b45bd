import "server-only";
import knexFactory, { type Knex } from "knex";
import { queryDatabaseUrl } from "@/server/env";
import { retryLostReads } from "./read-retry";
import { noteQuery } from "./write-ledger";

// One pool per process (per URL, so tests can point a second app at another database);
// kept on globalThis so module re-evaluation does not open new pools.
const pools: Map<string, Knex> = ((globalThis as { __filmsheetPools?: Map<string, Knex> }).__filmsheetPools ??= new Map());

/**
 * The shared Knex instance for the configured database: DATABASE_POOL_URL (a transaction-mode
 * pooler) when set, else DATABASE_URL. Nothing here relies on session state (no session SET, no
 * LISTEN, no session advisory locks, no named prepared statements), so any pooler mode works.
 */
export function db(): Knex {
  const url = queryDatabaseUrl();
  let pool = pools.get(url);
  if (!pool) {
    pool = createPool(url);
    pools.set(url, pool);
  }
  return pool;
}

/** A Knex pool as the app uses it; `max` is smaller in tests that need one connection. */
export function createPool(url: string, max = 10): Knex {
  const pool = knexFactory({
    client: "pg",
    connection: { connectionString: url, connectionTimeoutMillis: 5000 },
    pool: { min: 0, max },
    acquireConnectionTimeout: 5000,
  });
  // Every statement is noted against the request that sent it (see write-ledger.ts), and reads
  // outside transactions survive a restart of PostgreSQL (read-retry.ts).
  pool.on("query", noteQuery);
  retryLostReads(pool);
  return pool;
}
