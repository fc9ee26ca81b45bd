// PATCH /api/firm/members/:userId: replace a member's roles. DELETE: remove the member (firm admin).
import { ZMemberParams, ZMemberRoles } from "@/schemas/firm";
import { route } from "@/server/http/route";
import { changeMemberRoles } from "@/server/services/change-member-roles";
import { removeMember } from "@/server/services/remove-member";

export const PATCH = route({ roles: ["admin"], params: ZMemberParams, body: ZMemberRoles }, ({ actor, params, body }) =>
  changeMemberRoles(actor, params.userId, body.roles),
);
export const DELETE = route({ roles: ["admin"], params: ZMemberParams }, ({ actor, params }) => removeMember(actor, params.userId));
