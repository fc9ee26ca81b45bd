// DELETE /api/firm/tokens/:tokenId: revoke an API token (firm admin).
import { ZTokenParams } from "@/schemas/firm";
import { route } from "@/server/http/route";
import { revokeApiToken } from "@/server/services/revoke-api-token";

export const DELETE = route({ roles: ["admin"], params: ZTokenParams }, ({ actor, params }) => revokeApiToken(actor, params.tokenId));
