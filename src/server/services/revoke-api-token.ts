import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";

/** Revokes a token: the next request that carries it is refused with 401. */
export async function revokeApiToken(actor: Actor, tokenId: string): Promise<{ id: string; revoked: true }> {
  const count = await db()("api_tokens").where({ id: tokenId, firm_id: actor.firm.id }).whereNull("revoked_at").update({ revoked_at: db().fn.now() });
  if (count === 0) throw new AppError("not_found", "No active API token with that id in this firm");
  return { id: tokenId, revoked: true };
}
