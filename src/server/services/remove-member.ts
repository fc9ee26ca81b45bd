import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { lockFirmOrThrow } from "@/server/repositories/firms";
import { adminCount, memberRolesOrThrow } from "@/server/repositories/memberships";

/**
 * Removes a person from the firm (their account stays: it may belong to other firms). They lose
 * access at once, since every request reads memberships afresh. The last admin cannot go.
 */
export async function removeMember(actor: Actor, userId: number): Promise<{ id: number; removed: true }> {
  return db().transaction(async (trx) => {
    await lockFirmOrThrow(trx, actor.firm.id);
    const roles = await memberRolesOrThrow(trx, actor.firm.id, userId);
    if (roles.includes("admin") && (await adminCount(trx, actor.firm.id)) <= 1) {
      throw new AppError("conflict", "This is the firm's last admin and cannot be removed: make someone else admin first");
    }
    await trx("memberships").where({ firm_id: actor.firm.id, user_id: userId }).delete();
    return { id: userId, removed: true };
  });
}
