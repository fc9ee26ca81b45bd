import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { getProjectOrThrow } from "./get-project";

/** Whether this person muted e-mail about the project (an API token has no e-mail: never muted). */
export async function getNotificationMute(actor: Actor, projectId: string): Promise<{ muted: boolean }> {
  await getProjectOrThrow(actor, projectId);
  if (actor.userId === null) return { muted: false };
  const row = await db()("notification_mutes").where({ user_id: actor.userId, project_id: projectId }).first("user_id");
  return { muted: row !== undefined };
}
