import "server-only";
import type { Knex } from "knex";
import type { TRole } from "@/schemas/roles";
import { AppError } from "@/server/http/app-error";

/** A member's roles in a firm; not_found when the person is not a member of that firm. */
export async function memberRolesOrThrow(q: Knex | Knex.Transaction, firmId: string, userId: number): Promise<TRole[]> {
  const rows = await q("memberships").where({ firm_id: firmId, user_id: userId }).select<{ role: TRole }[]>("role");
  if (rows.length === 0) throw new AppError("not_found", "No member with that id in this firm");
  return rows.map((r) => r.role);
}

export async function adminCount(q: Knex | Knex.Transaction, firmId: string): Promise<number> {
  const [row] = await q("memberships").where({ firm_id: firmId, role: "admin" }).countDistinct({ n: "user_id" });
  return Number(row!.n);
}

export async function insertMemberships(trx: Knex.Transaction, firmId: string, userId: number, roles: readonly TRole[]): Promise<void> {
  await trx("memberships")
    .insert(roles.map((role) => ({ firm_id: firmId, user_id: userId, role })))
    .onConflict(["firm_id", "user_id", "role"])
    .ignore();
}
