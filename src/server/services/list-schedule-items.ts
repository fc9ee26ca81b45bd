import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { loadItems } from "@/server/repositories/schedule";
import type { EntityName } from "@/server/schedule/entities";
import { getProjectOrThrow } from "./get-project";

/** Every design case, zone, build-up, surface or duct run of one project of this firm. */
export async function listScheduleItems(actor: Actor, projectId: string, name: EntityName): Promise<Record<string, unknown>[]> {
  await getProjectOrThrow(actor, projectId);
  return loadItems(db(), name, actor.firm.id, projectId);
}
