"use server";
// Server actions of the firm admin pages: the same services as /api/firm/…, through action().
import { revalidatePath } from "next/cache";
import { ZApiTokenCreate, ZInvitationParams, ZInvite, ZMemberParams, ZMemberRoles, ZTokenParams } from "@/schemas/firm";
import { ROLE_LABELS } from "@/schemas/roles";
import { action } from "@/server/http/action";
import { changeMemberRoles } from "@/server/services/change-member-roles";
import { createApiToken } from "@/server/services/create-api-token";
import { inviteMember } from "@/server/services/invite-member";
import { removeMember } from "@/server/services/remove-member";
import { resendInvitation } from "@/server/services/resend-invitation";
import { revokeApiToken } from "@/server/services/revoke-api-token";
import { revokeInvitation } from "@/server/services/revoke-invitation";

const admin = ["admin"] as const;
const refresh = () => revalidatePath("/firm", "layout");

export const inviteMemberAction = action({ roles: admin, input: ZInvite }, async ({ actor, input }) => {
  const invitation = await inviteMember(actor, input);
  refresh();
  return { ok: true, message: `Invitation sent to ${invitation.email}` };
});

export const changeRolesAction = action({ roles: admin, input: ZMemberParams.extend(ZMemberRoles.shape) }, async ({ actor, input }) => {
  const { roles } = await changeMemberRoles(actor, input.userId, input.roles);
  refresh();
  return { ok: true, message: `Roles saved: ${roles.map((r) => ROLE_LABELS[r]).join(", ")}` };
});

export const removeMemberAction = action({ roles: admin, input: ZMemberParams }, async ({ actor, input }) => {
  await removeMember(actor, input.userId);
  refresh();
  return { ok: true, message: "Member removed" };
});

export const resendInvitationAction = action({ roles: admin, input: ZInvitationParams }, async ({ actor, input }) => {
  const invitation = await resendInvitation(actor, input.invitationId);
  refresh();
  return { ok: true, message: `Sent again to ${invitation.email} with a new link` };
});

export const revokeInvitationAction = action({ roles: admin, input: ZInvitationParams }, async ({ actor, input }) => {
  await revokeInvitation(actor, input.invitationId);
  refresh();
  return { ok: true, message: "Invitation revoked: its link no longer works" };
});

export const createTokenAction = action({ roles: admin, input: ZApiTokenCreate }, async ({ actor, input }) => {
  const { token, secret } = await createApiToken(actor, input);
  refresh();
  return { ok: true, message: `Token “${token.name}” created`, data: { secret } };
});

export const revokeTokenAction = action({ roles: admin, input: ZTokenParams }, async ({ actor, input }) => {
  await revokeApiToken(actor, input.tokenId);
  refresh();
  return { ok: true, message: "Token revoked" };
});
