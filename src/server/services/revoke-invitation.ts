import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";

/** Withdraws a pending invitation: its link stops working and its seat is free again. */
export async function revokeInvitation(actor: Actor, invitationId: string): Promise<{ id: string; revoked: true }> {
  const count = await db()("invitations")
    .where({ id: invitationId, firm_id: actor.firm.id })
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .update({ revoked_at: db().fn.now(), updated_at: db().fn.now(), version: db().raw("version + 1") });
  if (count === 0) throw new AppError("not_found", "No pending invitation with that id in this firm");
  return { id: invitationId, revoked: true };
}
