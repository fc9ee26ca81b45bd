import "server-only";
import { db } from "@/server/db/knex";

/**
 * Hourly (cron `prune_auth_records`): sign-in links, reset links, link requests and session rows
 * that can no longer do anything. Unused sign-in links pile up otherwise (every request makes
 * one, whether or not its e-mail is sent). A day's grace keeps recent ones for questions.
 */
export async function pruneAuthRecords(): Promise<Record<string, number>> {
  const dayAgo = db().raw("now() - interval '1 day'");
  return {
    verificationTokens: await db()("verification_token").where("expires", "<", dayAgo).delete(),
    passwordResets: await db()("password_resets").where("expires_at", "<", dayAgo).delete(),
    emailConfirmations: await db()("email_confirmations").where("expires_at", "<", dayAgo).delete(),
    magicLinkRequests: await db()("magic_link_requests").where("created_at", "<", dayAgo).delete(),
    userSessions: await db()("user_sessions")
      .where((q) => q.where("expires_at", "<", dayAgo).orWhere("revoked_at", "<", dayAgo))
      .delete(),
  };
}
