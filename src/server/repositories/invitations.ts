import "server-only";
import type { Knex } from "knex";
import type { TRole } from "@/schemas/roles";
import { invitationEmail } from "@/server/email/invitation-email";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";

/** Invitation links stay valid this long; resending starts the period again. */
export const INVITATION_DAYS = 7;

export interface TInvitationRow {
  id: string;
  email: string;
  roles: TRole[];
  expires_at: Date;
  created_at: Date;
  send_count: number;
  expired: boolean;
}

export const INVITATION_COLUMNS = ["id", "email", "roles", "expires_at", "created_at", "send_count"] as const;

/** The page a link opens; the secret is in the path and stored only as its hash. */
export function invitationUrl(secret: string): string {
  return appUrl(`/invitations/${secret}`);
}

/** Queues the invitation e-mail inside the caller's transaction. */
export async function queueInvitationEmail(
  trx: Knex.Transaction,
  input: { firmId: string; invitedBy: number | null; email: string; roles: TRole[]; secret: string; expiresAt: Date },
): Promise<void> {
  const firm = await trx("firms").where({ id: input.firmId }).first("name");
  const inviter = input.invitedBy === null ? undefined : await trx("users").where({ id: input.invitedBy }).first("name");
  await enqueueEmail(
    invitationEmail({ to: input.email, firmName: firm.name, inviterName: inviter?.name ?? null, roles: input.roles, url: invitationUrl(input.secret), expiresAt: input.expiresAt }),
    trx,
  );
}
