import "server-only";
import type { Knex } from "knex";
import { isConnectionError } from "./connection-error";
import { isPureRead } from "./write-ledger";

type Runner = { run(): Promise<unknown> };
type Compilable = { toSQL(): { sql: string } | { sql: string }[] };
type RunnerClient = { runner(builder: Compilable): Runner };

/** Every statement the builder compiles to only reads (the ledger's rule, write-ledger.ts). */
function readsOnly(builder: Compilable): boolean {
  try {
    const compiled = builder.toSQL();
    const statements = Array.isArray(compiled) ? compiled : [compiled];
    return statements.length > 0 && statements.every((s) => isPureRead(s.sql));
  } catch {
    return false;
  }
}

/**
 * Makes every read that runs outside a transaction on `pool` survive a lost connection: when
 * PostgreSQL restarts or fails over, the statement waits (up to `waitMs`) until the database
 * answers and runs once more on a fresh connection. Reading twice changes nothing, so this is safe
 * for any caller — server-rendered pages included, which have no request wrapper of their own.
 * Statements inside a transaction are never repeated here: the transaction client is made from
 * the class, not from this instance, so it does not see this runner; writes are left to route()
 * and action(), which know whether a COMMIT went out. A pool that is merely busy (Knex's acquire
 * timeout) is not a lost connection and is not retried, so an overloaded server is not loaded more.
 */
export function retryLostReads(pool: Knex, waitMs = 8000): void {
  const client = pool.client as unknown as RunnerClient;
  const runner = client.runner.bind(client);
  client.runner = (builder) => {
    const first = runner(builder);
    const run = first.run.bind(first);
    first.run = async () => {
      try {
        return await run();
      } catch (error) {
        if ((error as { name?: unknown } | null)?.name === "KnexTimeoutError" || !isConnectionError(error) || !readsOnly(builder)) throw error;
        if (!(await answers(runner, pool, waitMs))) throw error;
        return runner(builder).run();
      }
    };
    return first;
  };
}

/** Polls `SELECT 1` (through the plain runner, so it is not retried itself) until it answers. */
async function answers(runner: RunnerClient["runner"], pool: Knex, waitMs: number): Promise<boolean> {
  const deadline = Date.now() + waitMs;
  while (Date.now() < deadline) {
    try {
      await runner(pool.raw("SELECT 1") as unknown as Compilable).run();
      return true;
    } catch {
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  return false;
}
