import "server-only";
import type { Actor } from "@/server/auth/actor";
import { hashSecret, newSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { lockFirmOrThrow, seatUsage, seatsFullError } from "@/server/repositories/firms";
import { INVITATION_COLUMNS, INVITATION_DAYS, queueInvitationEmail, type TInvitationRow } from "@/server/repositories/invitations";

/**
 * Sends a pending invitation again with a new link (the old one stops working) and a new expiry.
 * An invitation that had expired no longer held a seat, so it needs a free one again.
 */
export async function resendInvitation(actor: Actor, invitationId: string): Promise<TInvitationRow> {
  return db().transaction(async (trx) => {
    await lockFirmOrThrow(trx, actor.firm.id);
    const inv = await trx("invitations")
      .where({ id: invitationId, firm_id: actor.firm.id })
      .whereNull("accepted_at")
      .whereNull("revoked_at")
      .first("id", "email", "roles", "expires_at");
    if (!inv) throw new AppError("not_found", "No pending invitation with that id in this firm");
    if (new Date(inv.expires_at) <= new Date()) {
      const usage = await seatUsage(trx, actor.firm.id);
      if (usage.used >= usage.bought) throw seatsFullError(usage);
    }
    const secret = newSecret();
    const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86_400_000);
    const [row] = await trx("invitations")
      .where({ id: inv.id })
      .update({ token_hash: hashSecret(secret), expires_at: expiresAt, send_count: trx.raw("send_count + 1"), version: trx.raw("version + 1"), updated_at: trx.fn.now() })
      .returning([...INVITATION_COLUMNS]);
    await queueInvitationEmail(trx, { firmId: actor.firm.id, invitedBy: actor.userId, email: inv.email, roles: inv.roles, secret, expiresAt });
    return { ...row, expired: false } as TInvitationRow;
  });
}
