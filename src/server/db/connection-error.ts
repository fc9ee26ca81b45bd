import "server-only";
import { db } from "./knex";
import { outcomeOf, type Ledger } from "./write-ledger";

// SQLSTATE classes and codes that mean "the connection went, not the query was wrong":
// 08 connection exception, 57P01–57P03 shutdown / crash / cannot connect now (starting up).
const SQLSTATE = /^(08...|57P0[123])$/;
const NODE_CODES = new Set(["ECONNREFUSED", "ECONNRESET", "EPIPE", "ETIMEDOUT", "ENOTCONN", "EHOSTUNREACH"]);
const MESSAGES = /Connection terminated|connection timeout|Timeout acquiring a connection|Client has encountered a connection error|terminating connection due to administrator command|the database system is (starting up|shutting down|in recovery mode)/i;

/**
 * True when an error means the database connection was lost or could not be made (PostgreSQL
 * restarting, failing over, a pooler recycling connections) rather than that the query failed.
 * Such a request did not reach a decision in the database: a read may be run again, and a write
 * either committed before the loss or was rolled back with its transaction.
 */
export function isConnectionError(error: unknown): boolean {
  // The HTTP client went away ("aborted", ECONNRESET on the request): not the database.
  if ((error as { message?: unknown } | null)?.message === "aborted") return false;
  for (let e: unknown = error, depth = 0; e && typeof e === "object" && depth < 5; e = (e as { cause?: unknown }).cause, depth++) {
    const { code, message, name } = e as { code?: unknown; message?: unknown; name?: unknown };
    if (typeof code === "string" && (SQLSTATE.test(code) || NODE_CODES.has(code))) return true;
    if (name === "KnexTimeoutError") return true;
    if (typeof message === "string" && MESSAGES.test(message)) return true;
  }
  return false;
}

// Failures to open a connection: the request never reached the database, so even a write can be
// run again. (A connection lost in the middle of a transaction is different: its COMMIT may have
// been sent, so a write is then refused, never repeated.)
const NOT_CONNECTED_CODES = new Set(["ECONNREFUSED", "57P03", "EHOSTUNREACH"]);
const NOT_CONNECTED_MESSAGES = /Timeout acquiring a connection|Connection terminated due to connection timeout|the database system is (starting up|shutting down)/i;

/** True when the error says no connection could be made at all (nothing was sent). */
export function isNotConnectedError(error: unknown): boolean {
  for (let e: unknown = error, depth = 0; e && typeof e === "object" && depth < 5; e = (e as { cause?: unknown }).cause, depth++) {
    const { code, message, name } = e as { code?: unknown; message?: unknown; name?: unknown };
    if (typeof code === "string" && NOT_CONNECTED_CODES.has(code)) return true;
    if (name === "KnexTimeoutError") return true;
    if (typeof message === "string" && NOT_CONNECTED_MESSAGES.test(message)) return true;
  }
  return false;
}

/**
 * Waits until the database answers `SELECT 1`, polling, for at most `timeoutMs`; resolves either
 * way. Used before the one retry of a read, so the retry does not fall into the same outage.
 */
export async function waitForDatabase(timeoutMs = 5000): Promise<boolean> {
  const deadline = Date.now() + timeoutMs;
  while (Date.now() < deadline) {
    try {
      await db().raw("SELECT 1");
      return true;
    } catch {
      await new Promise((r) => setTimeout(r, 200));
    }
  }
  return false;
}

/** PostgreSQL's word on a recent transaction: "committed", "aborted", "in progress" or null. */
export async function transactionStatus(xactId: string): Promise<string | null> {
  const { rows } = await db().raw<{ rows: { s: string | null }[] }>("SELECT pg_xact_status(?::xid8) AS s", [xactId]);
  return rows[0]?.s ?? null;
}

/**
 * What to do with a request whose database connection was lost, once it has waited for the
 * database (at most `waitMs`): "repeat" — a read, a write that sent nothing decisive, or one whose
 * one noted transaction PostgreSQL says rolled back; "committed" — that transaction committed;
 * "uncertain" — a write that may have saved and cannot be asked about; "down" — a request that
 * could be repeated, but the database did not answer in time.
 */
export async function afterLostConnection(ledger: Ledger, read: boolean, waitMs: number): Promise<"repeat" | "committed" | "uncertain" | "down"> {
  const askable = ledger.decisive && ledger.xactId !== undefined;
  if (!read && ledger.decisive && !askable) return "uncertain";
  if (!(await waitForDatabase(waitMs))) return read || !ledger.decisive ? "down" : "uncertain";
  if (read || !ledger.decisive) return "repeat";
  const outcome = await outcomeOf(ledger, transactionStatus);
  return outcome === "aborted" ? "repeat" : outcome === "committed" ? "committed" : "uncertain";
}
