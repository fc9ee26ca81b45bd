import "server-only";
import { hashPassword } from "@/server/auth/password";
import { hashSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";

/**
 * Sets a new password from a reset link. The link works once; every other open link of the
 * account is closed too, and sessions signed in before now stop working.
 */
export async function resetPassword(input: { token: string; password: string }): Promise<{ email: string }> {
  // A made-up, used or expired link is refused before bcrypt runs (checked again under the lock).
  assertUsable(await db()("password_resets").where({ token_hash: hashSecret(input.token) }).first("used_at", "expires_at"));
  const passwordHash = await hashPassword(input.password);
  return db().transaction(async (trx) => {
    const reset = await trx("password_resets").where({ token_hash: hashSecret(input.token) }).forUpdate().first("id", "user_id", "used_at", "expires_at");
    assertUsable(reset);
    const [user] = await trx("users")
      .where({ id: reset.user_id })
      // The link proves the address, so the account counts as verified from now on.
      .update({ password_hash: passwordHash, sessions_valid_after: trx.fn.now(), emailVerified: trx.raw('coalesce("emailVerified", now())'), updated_at: trx.fn.now() })
      .returning(["email"]);
    await trx("password_resets").where({ user_id: reset.user_id }).whereNull("used_at").update({ used_at: trx.fn.now() });
    await trx("user_sessions").where({ user_id: reset.user_id }).whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
    return { email: user.email };
  });
}

function assertUsable(reset: { used_at: Date | null; expires_at: Date } | undefined): asserts reset is { id: string; user_id: number; used_at: Date | null; expires_at: Date } {
  if (!reset) throw new AppError("not_found", "This reset link is not valid: copy the whole link from the e-mail");
  if (reset.used_at) throw new AppError("gone", "This reset link has already been used: ask for a new one");
  if (new Date(reset.expires_at) <= new Date()) throw new AppError("gone", "This reset link has expired: ask for a new one");
}
