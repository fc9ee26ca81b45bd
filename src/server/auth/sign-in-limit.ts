import "server-only";
import type { Knex } from "knex";
import { db } from "@/server/db/knex";

/**
 * Password sign-in limits. Failures are counted over a sliding window in PostgreSQL, so the limit
 * holds across app instances: per account (since its last success) and per address (guessing
 * many accounts from one place). While blocked, attempts are refused before the password is
 * checked and do not extend the block.
 *
 * An attempt is counted before its password is compared: it is reserved as "pending" (which
 * counts as a failure until settled) under advisory locks on its account and address, so a burst
 * of parallel guesses queues there and only as many as the limit allows ever reach bcrypt.
 */
export const SIGN_IN_LIMITS = { windowMinutes: 15, perAccount: 5, perAddress: 20 } as const;

export type SignInOutcome = "ok" | "failed" | "blocked";
export type SignInLimit = { blocked: false } | { blocked: true; scope: "account" | "address"; retryAfterSeconds: number };
export type SignInReservation = { blocked: false; attemptId: string } | { blocked: true; scope: "account" | "address"; retryAfterSeconds: number };

/** Seconds until the count of recent failures drops below the limit, or 0 if it already is. */
async function secondsUntilBelow(q: Knex | Knex.Transaction, column: "email" | "address", value: string, limit: number, sinceSuccess: boolean): Promise<number> {
  const window = `${SIGN_IN_LIMITS.windowMinutes} minutes`;
  const lastOk = sinceSuccess
    ? "AND created_at > coalesce((SELECT max(created_at) FROM sign_in_attempts WHERE email = :value AND outcome = 'ok'), '-infinity')"
    : "";
  // The limit-th most recent failure: when it leaves the window, one more attempt is allowed.
  const { rows } = await q.raw<{ rows: { wait: string | null }[] }>(
    `SELECT extract(epoch FROM (created_at + interval '${window}' - now())) AS wait
       FROM sign_in_attempts
      WHERE ${column} = :value AND outcome IN ('failed', 'pending') AND created_at > now() - interval '${window}' ${lastOk}
      ORDER BY created_at DESC OFFSET :offset LIMIT 1`,
    { value, offset: limit - 1 },
  );
  const wait = rows[0]?.wait;
  return wait === undefined || wait === null ? 0 : Math.max(1, Math.ceil(Number(wait)));
}

export async function checkSignInLimit(email: string, address: string, q: Knex | Knex.Transaction = db()): Promise<SignInLimit> {
  const account = await secondsUntilBelow(q, "email", email, SIGN_IN_LIMITS.perAccount, true);
  if (account > 0) return { blocked: true, scope: "account", retryAfterSeconds: account };
  const place = await secondsUntilBelow(q, "address", address, SIGN_IN_LIMITS.perAddress, false);
  if (place > 0) return { blocked: true, scope: "address", retryAfterSeconds: place };
  return { blocked: false };
}

/**
 * Counts one attempt before any password is compared: "blocked" when over a limit, else a
 * pending row to settle with settleSignInAttempt. Locks are taken account first, then address,
 * always in that order, so two attempts never wait on each other in a cycle.
 */
export async function reserveSignInAttempt(email: string, address: string): Promise<SignInReservation> {
  const row = { email: email.slice(0, 255), address: address.slice(0, 64) };
  return db().transaction(async (trx) => {
    await trx.raw("SELECT pg_advisory_xact_lock(hashtextextended(?, 0))", [`sign-in:account:${row.email}`]);
    await trx.raw("SELECT pg_advisory_xact_lock(hashtextextended(?, 0))", [`sign-in:address:${row.address}`]);
    const limit = await checkSignInLimit(row.email, row.address, trx);
    if (limit.blocked) {
      await trx("sign_in_attempts").insert({ ...row, outcome: "blocked" });
      return limit;
    }
    const [attempt] = await trx("sign_in_attempts").insert({ ...row, outcome: "pending" }).returning<{ id: string }[]>("id");
    return { blocked: false, attemptId: String(attempt!.id) };
  });
}

/** Records what a reserved attempt turned out to be. */
export async function settleSignInAttempt(attemptId: string, outcome: "ok" | "failed"): Promise<void> {
  await db()("sign_in_attempts").where({ id: attemptId }).update({ outcome });
}
