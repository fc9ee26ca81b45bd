import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import type { EntityName } from "@/server/schedule/entities";
import { writeItems } from "@/server/schedule/write-items";
import { getProjectOrThrow } from "./get-project";

/** Adds one item to a project; `values.id` may carry an id the client made. */
export async function createScheduleItem(actor: Actor, projectId: string, name: EntityName, input: Record<string, unknown>): Promise<Record<string, unknown>> {
  await getProjectOrThrow(actor, projectId);
  const { id, ...values } = input;
  return db().transaction(async (trx) => {
    const result = await writeItems(trx, actor, projectId, [{ op: "create", entity: name, row: 1, values, ...(id === undefined ? {} : { id: String(id) }) }]);
    return result.created[0]!.row;
  });
}
