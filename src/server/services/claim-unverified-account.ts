import "server-only";
import { db } from "@/server/db/knex";

/**
 * The first sign-in by e-mailed link to an account whose address was never proven: whoever
 * signed it up may not own the mailbox (anyone can sign up with anyone's address), so the
 * password they chose is cleared and every session they opened ends. The owner, who has just
 * proven the address, keeps the account and can choose a password with "Forgot your password?".
 */
export async function claimUnverifiedAccount(email: string): Promise<boolean> {
  return db().transaction(async (trx) => {
    const user = await trx("users").where({ email: email.toLowerCase() }).whereNull("emailVerified").forUpdate().first<{ id: number } | undefined>("id");
    if (!user) return false;
    await trx("users").where({ id: user.id }).update({ password_hash: null, emailVerified: trx.fn.now(), sessions_valid_after: trx.fn.now(), updated_at: trx.fn.now() });
    await trx("user_sessions").where({ user_id: user.id }).whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
    return true;
  });
}
