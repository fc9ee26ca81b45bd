// GET /api/firm/tokens: API tokens with last use. POST: create one; the secret is in this answer only (firm admin).
import { ZApiTokenCreate } from "@/schemas/firm";
import { route } from "@/server/http/route";
import { createApiToken } from "@/server/services/create-api-token";
import { listApiTokens } from "@/server/services/list-api-tokens";

export const GET = route({ roles: ["admin"] }, async ({ actor }) => ({ tokens: await listApiTokens(actor) }));
export const POST = route({ roles: ["admin"], body: ZApiTokenCreate }, async ({ actor, body }) =>
  Response.json(await createApiToken(actor, body), { status: 201, headers: { "cache-control": "no-store" } }),
);
