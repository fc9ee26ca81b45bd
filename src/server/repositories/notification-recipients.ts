import "server-only";
import type { Knex } from "knex";
import type { TRole } from "@/schemas/roles";

export interface Recipient {
  id: number;
  email: string;
  name: string | null;
}

/**
 * Members of a firm who should hear about something in a project: those holding any of `roles`
 * (or exactly `userIds`), minus whoever muted the project and minus `exclude` (the person who
 * acted, who needs no e-mail about their own action).
 */
export async function notificationRecipients(
  q: Knex | Knex.Transaction,
  firmId: string,
  projectId: string,
  who: { roles?: readonly TRole[]; userIds?: readonly number[]; exclude?: number | null },
): Promise<Recipient[]> {
  let query = q("users as u")
    .join("memberships as m", "m.user_id", "u.id")
    .where("m.firm_id", firmId)
    .whereNotExists((s) => s.select(q.raw("1")).from("notification_mutes as n").whereRaw("n.user_id = u.id").andWhere("n.project_id", projectId))
    .distinct("u.id", "u.email", "u.name")
    .orderBy("u.id");
  if (who.roles) query = query.whereIn("m.role", [...who.roles]);
  if (who.userIds) query = query.whereIn("u.id", [...who.userIds]);
  if (who.exclude !== undefined && who.exclude !== null) query = query.whereNot("u.id", who.exclude);
  return query;
}
