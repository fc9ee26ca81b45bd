// POST /api/firm/invitations/:invitationId/resend: a new link and expiry, e-mailed again (firm admin).
import { ZInvitationParams } from "@/schemas/firm";
import { route } from "@/server/http/route";
import { resendInvitation } from "@/server/services/resend-invitation";

export const POST = route({ roles: ["admin"], params: ZInvitationParams }, ({ actor, params }) => resendInvitation(actor, params.invitationId));
