import "server-only";
import type { TRole } from "@/schemas/roles";
import { db } from "@/server/db/knex";
import { idempotent } from "@/server/db/write-ledger";
import { AppError } from "@/server/http/app-error";
import type { Actor } from "./actor";
import { hashSecret } from "./secrets";

export const TOKEN_PREFIX = "fst_";

/**
 * The actor behind `Authorization: Bearer fst_…`. Only the token's hash is looked up; an unknown,
 * revoked or expired token is 401, with a message that says which so scripts can be fixed.
 */
export async function resolveTokenActor(secret: string): Promise<Actor> {
  if (!secret.startsWith(TOKEN_PREFIX)) throw new AppError("unauthenticated", "API token not recognised");
  const row = await db()("api_tokens as t")
    .join("firms as f", "f.id", "t.firm_id")
    .where("t.token_hash", hashSecret(secret))
    .first<{ id: string; role: TRole; firm_id: string; firm_name: string; revoked: boolean; expired: boolean } | undefined>(
      "t.id",
      "t.role",
      "t.firm_id",
      "f.name as firm_name",
      db().raw("t.revoked_at IS NOT NULL AS revoked"),
      db().raw("t.expires_at <= now() AS expired"),
    );
  if (!row) throw new AppError("unauthenticated", "API token not recognised");
  if (row.revoked) throw new AppError("unauthenticated", "API token has been revoked");
  if (row.expired) throw new AppError("unauthenticated", "API token has expired");
  // Last use to the minute is enough for the token list, and spares a write per request.
  // Idempotent: a request repeated after a lost connection may set it again.
  await idempotent(() =>
    db()("api_tokens")
      .where({ id: row.id })
      .andWhere((q) => q.whereNull("last_used_at").orWhere("last_used_at", "<", db().raw("now() - interval '1 minute'")))
      .update({ last_used_at: db().fn.now() }),
  );
  const firm = { id: row.firm_id, name: row.firm_name };
  return { via: "token", userId: null, name: null, email: null, firm, roles: [row.role], firms: [firm], tokenId: row.id };
}
