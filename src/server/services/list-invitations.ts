import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { INVITATION_COLUMNS, type TInvitationRow } from "@/server/repositories/invitations";

/** The firm's open invitations, newest first; expired ones are listed (flagged) so they can be resent. */
export async function listInvitations(actor: Actor): Promise<TInvitationRow[]> {
  return db()("invitations")
    .where({ firm_id: actor.firm.id })
    .whereNull("accepted_at")
    .whereNull("revoked_at")
    .orderBy("created_at", "desc")
    .select([...INVITATION_COLUMNS, db().raw("expires_at <= now() AS expired")]);
}
