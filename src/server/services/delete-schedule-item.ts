import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import type { EntityName } from "@/server/schedule/entities";
import { writeItems } from "@/server/schedule/write-items";

/** Deletes one item at the version the caller read (409 when it has changed since). */
export async function deleteScheduleItem(actor: Actor, projectId: string, name: EntityName, id: string, version: number): Promise<{ deleted: string }> {
  return db().transaction(async (trx) => {
    await writeItems(trx, actor, projectId, [{ op: "delete", entity: name, row: 1, id, version }], { missing: "not_found" });
    return { deleted: id };
  });
}
