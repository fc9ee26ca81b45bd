import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { lockFirmOrThrow } from "@/server/repositories/firms";
import { adminCount, memberRolesOrThrow } from "@/server/repositories/memberships";

/**
 * Removes a person from the firm (their account stays: it may belong to other firms). They lose
 * access at once, since every request reads memberships afresh; in the same transaction the API
 * tokens they made for this firm are revoked and the invitations they sent are withdrawn, so
 * nothing they set up keeps acting for them. The last admin cannot go.
 */
export async function removeMember(actor: Actor, userId: number): Promise<{ id: number; removed: true; tokensRevoked: number; invitationsRevoked: number }> {
  return db().transaction(async (trx) => {
    await lockFirmOrThrow(trx, actor.firm.id);
    const roles = await memberRolesOrThrow(trx, actor.firm.id, userId);
    if (roles.includes("admin") && (await adminCount(trx, actor.firm.id)) <= 1) {
      throw new AppError("conflict", "This is the firm's last admin and cannot be removed: make someone else admin first");
    }
    await trx("memberships").where({ firm_id: actor.firm.id, user_id: userId }).delete();
    const tokensRevoked = await trx("api_tokens").where({ firm_id: actor.firm.id, created_by: userId }).whereNull("revoked_at").update({ revoked_at: trx.fn.now() });
    const invitationsRevoked = await trx("invitations")
      .where({ firm_id: actor.firm.id, invited_by: userId })
      .whereNull("accepted_at")
      .whereNull("revoked_at")
      .update({ revoked_at: trx.fn.now(), updated_at: trx.fn.now(), version: trx.raw("version + 1") });
    return { id: userId, removed: true, tokensRevoked, invitationsRevoked };
  });
}
