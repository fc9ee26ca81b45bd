import "server-only";
import type { TBulkBody } from "@/schemas/bulk";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { writeItems, type WriteResult } from "@/server/schedule/write-items";
import { getProjectOrThrow } from "./get-project";

/**
 * Many row changes of the schedule's sheets (a paste, a multi-row delete, duplicates) in one
 * transaction: all are saved or none. Errors name the change by its 1-based number.
 */
export async function applyScheduleChanges(actor: Actor, projectId: string, body: TBulkBody): Promise<WriteResult> {
  await getProjectOrThrow(actor, projectId);
  const changes = body.changes.map((c, i) => ({
    op: c.op,
    entity: c.sheet,
    row: i + 1,
    ...(c.id === undefined ? {} : { id: c.id }),
    ...("version" in c ? { version: c.version } : {}),
    ...("values" in c ? { values: c.values } : {}),
  }));
  return db().transaction((trx) => writeItems(trx, actor, projectId, changes));
}
