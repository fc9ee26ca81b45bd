import "server-only";
import type { TApiTokenCreate } from "@/schemas/firm";
import type { Actor } from "@/server/auth/actor";
import { TOKEN_PREFIX } from "@/server/auth/resolve-token-actor";
import { hashSecret, newSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { API_TOKEN_COLUMNS, type TApiToken } from "@/server/repositories/api-tokens";

/**
 * Creates a named API token with one role and an expiry. The secret is returned this once and
 * stored only as its SHA-256 hash: nobody, Filmsheet included, can show it again. Only a person
 * makes tokens: a leaked token must not be able to mint others that outlive its revocation.
 */
export async function createApiToken(actor: Actor, input: TApiTokenCreate): Promise<{ token: TApiToken; secret: string }> {
  if (actor.via !== "session" || actor.userId === null) throw new AppError("forbidden", "An API token cannot make API tokens: sign in as a firm admin");
  const secret = `${TOKEN_PREFIX}${newSecret()}`;
  const [token] = await db()("api_tokens")
    .insert({
      firm_id: actor.firm.id,
      name: input.name,
      role: input.role,
      token_hash: hashSecret(secret),
      prefix: secret.slice(0, 10),
      created_by: actor.userId,
      expires_at: new Date(Date.now() + input.expiresInDays * 86_400_000),
    })
    .returning([...API_TOKEN_COLUMNS]);
  return { token: { ...token, status: "active", created_by: { id: actor.userId, name: actor.name, email: actor.email ?? "" } }, secret };
}
