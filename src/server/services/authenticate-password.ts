import "server-only";
import { ZSignIn } from "@/schemas/auth";
import { verifyPassword } from "@/server/auth/password";
import { reserveSignInAttempt, settleSignInAttempt } from "@/server/auth/sign-in-limit";
import { db } from "@/server/db/knex";

export type PasswordCheck =
  | { ok: true; user: { id: string; name: string | null; email: string } }
  | { ok: false; reason: "invalid" }
  | { ok: false; reason: "rate_limited"; retryAfterSeconds: number };

/**
 * Checks an e-mail and password for sign-in, within the attempt limits. The password is only
 * compared with its bcrypt hash; it is never stored or logged, and the hash never leaves here.
 */
export async function authenticatePassword(credentials: unknown, address: string): Promise<PasswordCheck> {
  const parsed = ZSignIn.safeParse(credentials);
  if (!parsed.success) return { ok: false, reason: "invalid" };
  const { email, password } = parsed.data;

  // Counted before bcrypt runs: parallel guesses cannot all slip in under the limit.
  const reserved = await reserveSignInAttempt(email, address);
  if (reserved.blocked) return { ok: false, reason: "rate_limited", retryAfterSeconds: reserved.retryAfterSeconds };
  const user = await db()("users").where({ email }).first<{ id: number; name: string | null; email: string; password_hash: string | null } | undefined>("id", "name", "email", "password_hash");
  const ok = await verifyPassword(password, user?.password_hash);
  await settleSignInAttempt(reserved.attemptId, ok ? "ok" : "failed");
  if (!ok || !user) return { ok: false, reason: "invalid" };
  return { ok: true, user: { id: String(user.id), name: user.name, email: user.email } };
}
