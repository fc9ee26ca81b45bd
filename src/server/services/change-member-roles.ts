import "server-only";
import type { TRole } from "@/schemas/roles";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { lockFirmOrThrow } from "@/server/repositories/firms";
import { adminCount, insertMemberships, memberRolesOrThrow } from "@/server/repositories/memberships";

/** Replaces a member's roles. The firm always keeps at least one admin. */
export async function changeMemberRoles(actor: Actor, userId: number, roles: TRole[]): Promise<{ id: number; roles: TRole[] }> {
  return db().transaction(async (trx) => {
    await lockFirmOrThrow(trx, actor.firm.id);
    const current = await memberRolesOrThrow(trx, actor.firm.id, userId);
    // As with invitations: making someone admin takes a person, not an API token.
    if (actor.via === "token" && roles.includes("admin") && !current.includes("admin")) {
      throw new AppError("forbidden", "An API token cannot make anyone admin: sign in as a firm admin", [{ field: "roles", message: "Not with an API token" }]);
    }
    if (current.includes("admin") && !roles.includes("admin") && (await adminCount(trx, actor.firm.id)) <= 1) {
      throw new AppError("conflict", "This is the firm's last admin: make someone else admin first", [{ field: "roles", message: "The firm needs an admin" }]);
    }
    await trx("memberships").where({ firm_id: actor.firm.id, user_id: userId }).whereNotIn("role", roles).delete();
    await insertMemberships(trx, actor.firm.id, userId, roles);
    return { id: userId, roles };
  });
}
