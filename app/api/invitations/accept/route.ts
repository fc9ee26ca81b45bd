// POST /api/invitations/accept: accept an e-mailed invitation with its token (public; a new
// person sets name and password, an existing account gives its password or its session).
import { ZInvitationAccept } from "@/schemas/auth";
import { clientAddress } from "@/server/auth/client-address";
import { resolveSessionActor } from "@/server/auth/resolve-session-actor";
import { route } from "@/server/http/route";
import { acceptInvitation } from "@/server/services/accept-invitation";

export const POST = route({ auth: "public", body: ZInvitationAccept }, async ({ req, body }) => {
  const session = await resolveSessionActor();
  return acceptInvitation(body, { signedIn: session?.user ?? null, address: clientAddress(req.headers) });
});
