// GET /api/firm/invitations: pending invitations. POST: invite by e-mail with roles (firm admin).
import { ZInvite } from "@/schemas/firm";
import { route } from "@/server/http/route";
import { inviteMember } from "@/server/services/invite-member";
import { listInvitations } from "@/server/services/list-invitations";

export const GET = route({ roles: ["admin"] }, async ({ actor }) => ({ invitations: await listInvitations(actor) }));
export const POST = route({ roles: ["admin"], body: ZInvite }, async ({ actor, body }) => Response.json(await inviteMember(actor, body), { status: 201 }));
