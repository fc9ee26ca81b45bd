import { z } from "zod";
import { ZEmail } from "./auth";
import { ZRole, ZRoles } from "./roles";

export const ZInvite = z.object({ email: ZEmail, roles: ZRoles });
export type TInvite = z.infer<typeof ZInvite>;

export const ZMemberRoles = z.object({ roles: ZRoles });

export const ZMemberParams = z.object({ userId: z.coerce.number({ error: "Member id must be a number" }).int().positive("Member id must be a positive number") });
export const ZInvitationParams = z.object({ invitationId: z.uuid({ error: "Invitation id must be a UUID" }) });
export const ZTokenParams = z.object({ tokenId: z.uuid({ error: "Token id must be a UUID" }) });

/** Token lifetimes offered when creating one; there is no token that never expires. */
export const TOKEN_LIFETIME_DAYS = [7, 30, 90, 365] as const;

export const ZApiTokenCreate = z.object({
  name: z.string({ error: "Name is required" }).trim().min(1, "Name is required").max(120, "Name is at most 120 characters"),
  role: ZRole,
  expiresInDays: z.coerce
    .number({ error: "Expiry is required" })
    .int()
    .refine((d) => (TOKEN_LIFETIME_DAYS as readonly number[]).includes(d), `Expiry must be one of ${TOKEN_LIFETIME_DAYS.join(", ")} days`),
});
export type TApiTokenCreate = z.infer<typeof ZApiTokenCreate>;
