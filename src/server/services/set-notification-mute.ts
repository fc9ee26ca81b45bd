import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { getProjectOrThrow } from "./get-project";

/** Turns a person's e-mail about one project off (muted) or back on. Idempotent. */
export async function setNotificationMute(actor: Actor, projectId: string, muted: boolean): Promise<{ muted: boolean }> {
  if (actor.userId === null) throw new AppError("forbidden", "E-mail settings belong to a person: sign in to change them");
  await getProjectOrThrow(actor, projectId);
  const key = { user_id: actor.userId, project_id: projectId };
  if (muted) await db()("notification_mutes").insert({ ...key, firm_id: actor.firm.id }).onConflict(["user_id", "project_id"]).ignore();
  else await db()("notification_mutes").where(key).delete();
  return { muted };
}
