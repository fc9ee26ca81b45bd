import "server-only";
import { hashSecret, newSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";
import { passwordResetEmail } from "@/server/email/password-reset-email";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";

export const RESET_LINK_MINUTES = 60;
/** More reset e-mails than this per address and hour are not sent (a mailbox is no target). */
const MAX_PER_HOUR = 5;

/**
 * E-mails a one-time link to choose a new password. The answer is the same whether or not the
 * address has an account, so the form cannot be used to find out who has one.
 */
export async function requestPasswordReset(email: string): Promise<{ sent: true }> {
  await db().transaction(async (trx) => {
    const user = await trx("users").where({ email }).forUpdate().first("id", "email");
    if (!user) return;
    const [recent] = await trx("password_resets").where({ user_id: user.id }).andWhere("created_at", ">", trx.raw("now() - interval '1 hour'")).count({ n: "*" });
    if (Number(recent!.n) >= MAX_PER_HOUR) return;
    const secret = newSecret();
    const expiresAt = new Date(Date.now() + RESET_LINK_MINUTES * 60_000);
    await trx("password_resets").insert({ user_id: user.id, token_hash: hashSecret(secret), expires_at: expiresAt });
    await enqueueEmail(passwordResetEmail({ to: user.email, url: appUrl(`/reset-password/${secret}`), expiresAt }), trx);
  });
  return { sent: true };
}
