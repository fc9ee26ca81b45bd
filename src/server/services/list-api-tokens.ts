import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { API_TOKEN_COLUMNS, TOKEN_MAKER_SQL, type TApiToken } from "@/server/repositories/api-tokens";

/** The firm's API tokens with their maker and last use, newest first; secrets are never listed. */
export async function listApiTokens(actor: Actor): Promise<TApiToken[]> {
  return db()("api_tokens as t")
    .leftJoin("users as u", "u.id", "t.created_by")
    .where({ "t.firm_id": actor.firm.id })
    .orderBy("t.created_at", "desc")
    .select([
      ...API_TOKEN_COLUMNS.map((c) => `t.${c}`),
      db().raw(TOKEN_MAKER_SQL),
      db().raw("CASE WHEN t.revoked_at IS NOT NULL THEN 'revoked' WHEN t.expires_at <= now() THEN 'expired' ELSE 'active' END AS status"),
    ]);
}
