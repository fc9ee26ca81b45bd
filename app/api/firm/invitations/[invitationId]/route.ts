// DELETE /api/firm/invitations/:invitationId: revoke a pending invitation (firm admin).
import { ZInvitationParams } from "@/schemas/firm";
import { route } from "@/server/http/route";
import { revokeInvitation } from "@/server/services/revoke-invitation";

export const DELETE = route({ roles: ["admin"], params: ZInvitationParams }, ({ actor, params }) => revokeInvitation(actor, params.invitationId));
