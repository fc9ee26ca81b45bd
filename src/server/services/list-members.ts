import "server-only";
import type { TRole } from "@/schemas/roles";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { seatUsage, type SeatUsage } from "@/server/repositories/firms";

export interface TMember {
  id: number;
  name: string | null;
  email: string;
  roles: TRole[];
  joined_at: Date;
}

/** The firm's members with their roles, and the seats in use against the seats bought. */
export async function listMembers(actor: Actor): Promise<{ members: TMember[]; seats: SeatUsage }> {
  const members = await db()("memberships as m")
    .join("users as u", "u.id", "m.user_id")
    .where("m.firm_id", actor.firm.id)
    .groupBy("u.id", "u.name", "u.email")
    .orderByRaw("lower(coalesce(u.name, u.email))")
    .select<TMember[]>("u.id", "u.name", "u.email", db().raw("array_agg(m.role::text ORDER BY m.role) AS roles"), db().raw("min(m.created_at) AS joined_at"));
  return { members, seats: await seatUsage(db(), actor.firm.id) };
}
