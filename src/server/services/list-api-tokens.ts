import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { API_TOKEN_COLUMNS, type TApiToken } from "@/server/repositories/api-tokens";

/** The firm's API tokens with their last use, newest first; secrets are never listed. */
export async function listApiTokens(actor: Actor): Promise<TApiToken[]> {
  return db()("api_tokens")
    .where({ firm_id: actor.firm.id })
    .orderBy("created_at", "desc")
    .select([
      ...API_TOKEN_COLUMNS,
      db().raw("CASE WHEN revoked_at IS NOT NULL THEN 'revoked' WHEN expires_at <= now() THEN 'expired' ELSE 'active' END AS status"),
    ]);
}
