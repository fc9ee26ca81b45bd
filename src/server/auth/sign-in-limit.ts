import "server-only";
import { db } from "@/server/db/knex";

/**
 * Password sign-in limits. Failures are counted over a sliding window in PostgreSQL, so the limit
 * holds across app instances: per account (since its last success) and per address (guessing
 * many accounts from one place). While blocked, attempts are refused before the password is
 * checked and do not extend the block.
 */
export const SIGN_IN_LIMITS = { windowMinutes: 15, perAccount: 5, perAddress: 20 } as const;

export type SignInOutcome = "ok" | "failed" | "blocked";
export type SignInLimit = { blocked: false } | { blocked: true; scope: "account" | "address"; retryAfterSeconds: number };

/** Seconds until the count of recent failures drops below the limit, or 0 if it already is. */
async function secondsUntilBelow(column: "email" | "address", value: string, limit: number, sinceSuccess: boolean): Promise<number> {
  const window = `${SIGN_IN_LIMITS.windowMinutes} minutes`;
  const lastOk = sinceSuccess
    ? "AND created_at > coalesce((SELECT max(created_at) FROM sign_in_attempts WHERE email = :value AND outcome = 'ok'), '-infinity')"
    : "";
  // The limit-th most recent failure: when it leaves the window, one more attempt is allowed.
  const { rows } = await db().raw<{ rows: { wait: string | null }[] }>(
    `SELECT extract(epoch FROM (created_at + interval '${window}' - now())) AS wait
       FROM sign_in_attempts
      WHERE ${column} = :value AND outcome = 'failed' AND created_at > now() - interval '${window}' ${lastOk}
      ORDER BY created_at DESC OFFSET :offset LIMIT 1`,
    { value, offset: limit - 1 },
  );
  const wait = rows[0]?.wait;
  return wait === undefined || wait === null ? 0 : Math.max(1, Math.ceil(Number(wait)));
}

export async function checkSignInLimit(email: string, address: string): Promise<SignInLimit> {
  const account = await secondsUntilBelow("email", email, SIGN_IN_LIMITS.perAccount, true);
  if (account > 0) return { blocked: true, scope: "account", retryAfterSeconds: account };
  const place = await secondsUntilBelow("address", address, SIGN_IN_LIMITS.perAddress, false);
  if (place > 0) return { blocked: true, scope: "address", retryAfterSeconds: place };
  return { blocked: false };
}

export async function recordSignInAttempt(email: string, address: string, outcome: SignInOutcome): Promise<void> {
  await db()("sign_in_attempts").insert({ email: email.slice(0, 255), address, outcome });
}
