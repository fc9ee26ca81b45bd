import "server-only";
import type { TInvite } from "@/schemas/firm";
import type { Actor } from "@/server/auth/actor";
import { hashSecret, newSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";
import { isUniqueViolation } from "@/server/db/unique-violation";
import { AppError } from "@/server/http/app-error";
import { lockFirmOrThrow, seatUsage, seatsFullError } from "@/server/repositories/firms";
import { INVITATION_COLUMNS, INVITATION_DAYS, queueInvitationEmail, type TInvitationRow } from "@/server/repositories/invitations";

/**
 * Invites someone to the actor's firm by e-mail with one or more roles. The invitation takes a
 * seat while it is open; beyond the seats bought it is refused. The row and its e-mail job are
 * saved in one transaction, so there is never an invitation without its e-mail or the reverse.
 */
export async function inviteMember(actor: Actor, input: TInvite): Promise<TInvitationRow> {
  // An admin token inviting admins could hand the firm to whoever holds the token, for good.
  if (actor.via === "token" && input.roles.includes("admin")) {
    throw new AppError("forbidden", "An API token cannot invite admins: sign in as a firm admin", [{ field: "roles", message: "Not with an API token" }]);
  }
  const already = (message: string) => new AppError("conflict", message, [{ field: "email", message }]);
  return db()
    .transaction(async (trx) => {
      await lockFirmOrThrow(trx, actor.firm.id);
      const member = await trx("memberships as m").join("users as u", "u.id", "m.user_id").where({ "m.firm_id": actor.firm.id, "u.email": input.email }).first("u.id");
      if (member) throw already(`${input.email} is already a member of this firm`);
      const open = await trx("invitations").where({ firm_id: actor.firm.id, email: input.email }).whereNull("accepted_at").whereNull("revoked_at").first("id", "expires_at");
      if (open && new Date(open.expires_at) > new Date()) throw already(`${input.email} already has a pending invitation: resend it instead`);
      // An expired invitation to the same address is closed and replaced by the new one.
      if (open) await trx("invitations").where({ id: open.id }).update({ revoked_at: trx.fn.now(), updated_at: trx.fn.now() });

      const usage = await seatUsage(trx, actor.firm.id);
      if (usage.used >= usage.bought) throw seatsFullError(usage);

      const secret = newSecret();
      const expiresAt = new Date(Date.now() + INVITATION_DAYS * 86_400_000);
      const [row] = await trx("invitations")
        .insert({ firm_id: actor.firm.id, email: input.email, roles: input.roles, token_hash: hashSecret(secret), invited_by: actor.userId, expires_at: expiresAt })
        .returning([...INVITATION_COLUMNS]);
      await queueInvitationEmail(trx, { firmId: actor.firm.id, invitedBy: actor.userId, email: input.email, roles: input.roles, secret, expiresAt });
      return { ...row, expired: false } as TInvitationRow;
    })
    .catch((error: unknown) => {
      throw isUniqueViolation(error, "invitations_open_per_email") ? already(`${input.email} already has a pending invitation: resend it instead`) : error;
    });
}
