import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import type { EntityName } from "@/server/schedule/entities";
import { writeItems } from "@/server/schedule/write-items";

/**
 * Changes some fields of one item, given the version the caller read: a stale version answers
 * 409 with the row as it stands, so nobody's edit is silently overwritten.
 */
export async function updateScheduleItem(actor: Actor, projectId: string, name: EntityName, id: string, version: number, values: Record<string, unknown>): Promise<Record<string, unknown>> {
  const change = [{ op: "update" as const, entity: name, row: 1, id, version, values }];
  // One guarded UPDATE needs no transaction; a build-up's layers are a second table, so they do.
  if (name !== "buildups") return (await writeItems(db(), actor, projectId, change, { missing: "not_found" })).updated[0]!.row;
  return db().transaction(async (trx) => (await writeItems(trx, actor, projectId, change, { missing: "not_found" })).updated[0]!.row);
}
