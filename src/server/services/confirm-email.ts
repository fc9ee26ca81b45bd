import "server-only";
import type { Knex } from "knex";
import { hashSecret, newSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";
import { emailConfirmationEmail } from "@/server/email/email-confirmation-email";
import { AppError } from "@/server/http/app-error";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";

export const CONFIRMATION_DAYS = 7;

/** Queues the link that confirms a new account's address, inside the sign-up's transaction. */
export async function queueEmailConfirmation(trx: Knex.Transaction, user: { id: number; email: string }, firmName: string): Promise<void> {
  const secret = newSecret();
  const expiresAt = new Date(Date.now() + CONFIRMATION_DAYS * 86_400_000);
  await trx("email_confirmations").insert({ user_id: user.id, token_hash: hashSecret(secret), expires_at: expiresAt });
  await enqueueEmail(emailConfirmationEmail({ to: user.email, firmName, url: appUrl(`/confirm-email/${secret}`), expiresAt }), trx);
}

/**
 * Confirms the signed-in person's address with the link from their e-mail. Both halves are
 * needed: the link (the mailbox) and a session of this very account (its password), so the owner
 * of a mailbox that a stranger signed up cannot, by following the link, hand that stranger a
 * confirmed account.
 */
export async function confirmEmail(userId: number, token: string): Promise<{ email: string; confirmed: true }> {
  return db().transaction(async (trx) => {
    const row = await trx("email_confirmations").where({ token_hash: hashSecret(token) }).forUpdate().first("id", "user_id", "used_at", "expires_at");
    if (!row) throw new AppError("not_found", "This confirmation link is not valid: copy the whole link from the e-mail");
    if (row.user_id !== userId) throw new AppError("forbidden", "This link confirms another account's address: sign in to that account first");
    if (row.used_at) throw new AppError("gone", "This address is already confirmed");
    if (new Date(row.expires_at) <= new Date()) throw new AppError("gone", "This confirmation link has expired: sign in by e-mailed link to confirm the address instead");
    await trx("email_confirmations").where({ id: row.id }).update({ used_at: trx.fn.now() });
    const [user] = await trx("users").where({ id: userId }).update({ emailVerified: trx.raw('coalesce("emailVerified", now())'), updated_at: trx.fn.now() }).returning(["email"]);
    return { email: user.email, confirmed: true };
  });
}
