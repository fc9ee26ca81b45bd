import "server-only";
import { AsyncLocalStorage } from "node:async_hooks";

/**
 * What one request has sent to PostgreSQL that may have changed data, so that a request whose
 * connection was lost can be told apart: one that sent nothing decisive left the database as it
 * was and may be run again; one that sent a COMMIT (or a write outside a transaction) may have
 * changed it and is refused instead. Knex reports every statement, those inside transactions
 * included (with their transaction id), through its "query" event, in the caller's async context.
 */
export interface Ledger {
  /** A COMMIT, or a statement outside a transaction that may write, has been sent. */
  decisive: boolean;
  /** Statements run through `idempotent()`: repeating them changes nothing that matters. */
  ignore?: boolean;
  /** Knex ids of the transactions whose COMMIT was sent, and whether anything wrote outside one. */
  commits: string[];
  wroteOutside: boolean;
  /** The PostgreSQL transaction id a transaction noted through `XACT_ID_COLUMN`, and its knex id. */
  xactId?: string;
  xactOf?: string;
}

const store = new AsyncLocalStorage<Ledger>();

// Outside a transaction a SELECT reads, unless it calls a function that writes (the job queue's
// add_job, sequences, advisory locks) or locks rows; everything else (INSERT, UPDATE, DELETE, CTEs
// that may hold them) is taken to write.
const READ_ONLY = /^\s*(select\b|show\b)/i;
const WRITING_CALL = /graphile_worker\.|nextval\s*\(|setval\s*\(|pg_advisory|\bfor\s+(update|share|no key update|key share)\b/i;
const COMMIT = /^\s*commit\b/i;

/**
 * A RETURNING column that names the writing transaction's PostgreSQL id (`pg_current_xact_id`),
 * for statements that every writer of project data runs inside its transaction (the audit rows).
 * With it, a request whose connection went while its COMMIT was in flight can ask PostgreSQL
 * afterwards whether that transaction committed (`pg_xact_status`) instead of guessing.
 */
export const XACT_ID_COLUMN = "pg_current_xact_id()::text as __xact_id";
const XACT_ID_MARK = /pg_current_xact_id\(\)::text as __xact_id/;

/** True for a statement that only reads: running it twice changes nothing. */
export function isPureRead(sql: string): boolean {
  return READ_ONLY.test(sql) && !WRITING_CALL.test(sql);
}

/** Knex "query" listener: notes decisive statements of the request in whose context it runs. */
export function noteQuery(query: { sql?: unknown; __knexTxId?: unknown }): void {
  const ledger = store.getStore();
  if (!ledger || ledger.ignore || typeof query.sql !== "string") return;
  const sql = query.sql;
  if (typeof query.__knexTxId === "string") {
    if (COMMIT.test(sql)) {
      ledger.decisive = true;
      ledger.commits.push(query.__knexTxId);
    } else if (XACT_ID_MARK.test(sql)) {
      ledger.xactOf = query.__knexTxId;
    }
  } else if (!isPureRead(sql)) {
    ledger.decisive = true;
    ledger.wroteOutside = true;
  }
}

/** Notes the PostgreSQL transaction id read through `XACT_ID_COLUMN` (first row's value). */
export function noteTransactionId(rows: readonly { __xact_id?: unknown }[]): void {
  const ledger = store.getStore();
  const id = rows[0]?.__xact_id;
  if (ledger && !ledger.ignore && typeof id === "string" && /^\d+$/.test(id)) ledger.xactId = id;
}

/**
 * What became of a decisive request whose connection was lost, asked of PostgreSQL once it
 * answers again: "committed" or "aborted" when its one COMMIT belongs to a transaction that noted
 * its id, else "unknown" (nothing noted, more than one commit, or a write outside a transaction).
 * A transaction still "in progress" (its backend finishing the COMMIT) is asked again briefly.
 */
export async function outcomeOf(ledger: Ledger, ask: (xactId: string) => Promise<string | null>): Promise<"committed" | "aborted" | "unknown"> {
  if (ledger.wroteOutside || ledger.commits.length !== 1 || !ledger.xactId || ledger.xactOf !== ledger.commits[0]) return "unknown";
  for (let tries = 0; tries < 10; tries++) {
    const status = await ask(ledger.xactId).catch(() => null);
    if (status === "committed" || status === "aborted") return status;
    if (status !== "in progress") return "unknown";
    await new Promise((r) => setTimeout(r, 200));
  }
  return "unknown";
}

/** Runs `work` with a ledger of its own and returns it beside the outcome. */
export async function withWriteLedger<T>(work: () => Promise<T>): Promise<{ ledger: Ledger; outcome: PromiseSettledResult<T> }> {
  const ledger: Ledger = { decisive: false, commits: [], wroteOutside: false };
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
  return store.run({ decisive: false, ignore: true, commits: [], wroteOutside: false }, async () => await work());
}
