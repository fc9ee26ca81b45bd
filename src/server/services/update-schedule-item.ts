import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import type { EntityName } from "@/server/schedule/entities";
import { writeItems } from "@/server/schedule/write-items";
import { getProjectOrThrow } from "./get-project";
import { getScheduleItemOrThrow } from "./get-schedule-item";

/**
 * Changes some fields of one item, given the version the caller read: a stale version answers
 * 409 with the row as it stands, so nobody's edit is silently overwritten.
 */
export async function updateScheduleItem(actor: Actor, projectId: string, name: EntityName, id: string, version: number, values: Record<string, unknown>): Promise<Record<string, unknown>> {
  await getProjectOrThrow(actor, projectId);
  return db().transaction(async (trx) => {
    await getScheduleItemOrThrow(actor, projectId, name, id, trx);
    const result = await writeItems(trx, actor, projectId, [{ op: "update", entity: name, row: 1, id, version, values }]);
    return result.updated[0]!.row;
  });
}
