import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";

/**
 * What one request has sent to PostgreSQL that may have changed data, so that a request whose
 * connection was lost can be told apart: one that sent nothing decisive left the database as it
 * was and may be run again; one that sent a COMMIT (or a write outside a transaction) may have
 * changed it and is refused instead. Knex reports every statement, those inside transactions
 * included (with their transaction id), through its "query" event, in the caller's async context.
 */
interface Ledger {
  /** A COMMIT, or a statement outside a transaction that may write, has been sent. */
  decisive: boolean;
  /** Statements run through `idempotent()`: repeating them changes nothing that matters. */
  ignore?: boolean;
}

const store = new AsyncLocalStorage<Ledger>();

// Outside a transaction a SELECT reads, unless it calls a function that writes (the job queue's
// add_job, sequences, advisory locks) or locks rows; everything else (INSERT, UPDATE, DELETE, CTEs
// that may hold them) is taken to write.
const READ_ONLY = /^\s*(select\b|show\b)/i;
const WRITING_CALL = /graphile_worker\.|nextval\s*\(|setval\s*\(|pg_advisory|\bfor\s+(update|share|no key update|key share)\b/i;
const COMMIT = /^\s*commit\b/i;

/** True for a statement that only reads: running it twice changes nothing. */
export function isPureRead(sql: string): boolean {
  return READ_ONLY.test(sql) && !WRITING_CALL.test(sql);
}

/** Knex "query" listener: notes decisive statements of the request in whose context it runs. */
export function noteQuery(query: { sql?: unknown; __knexTxId?: unknown }): void {
  const ledger = store.getStore();
  if (!ledger || ledger.ignore || ledger.decisive || typeof query.sql !== "string") return;
  const sql = query.sql;
  if (query.__knexTxId) {
    if (COMMIT.test(sql)) ledger.decisive = true;
  } else if (!isPureRead(sql)) {
    ledger.decisive = true;
  }
}

/** Runs `work` with a ledger of its own and returns it beside the outcome. */
export async function withWriteLedger<T>(work: () => Promise<T>): Promise<{ ledger: Ledger; outcome: PromiseSettledResult<T> }> {
  const ledger: Ledger = { decisive: false };
  const outcome = await store.run(ledger, () => work().then(
    (value) => ({ status: "fulfilled" as const, value }),
    (reason: unknown) => ({ status: "rejected" as const, reason }),
  ));
  return { ledger, outcome };
}

/**
 * Runs a write that is the same however often it runs (a token's "last used" time) without
 * marking the request decisive, so a request that lost its connection later can still be repeated.
 */
export function idempotent<T>(work: () => PromiseLike<T>): Promise<T> {
  return store.run({ decisive: false, ignore: true }, async () => await work());
}
