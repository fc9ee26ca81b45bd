import "server-only";
import type { TCheckSheet } from "@/checking/check-machine";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { findRowOrThrow } from "@/server/repositories/row-checks";
import type { RowComment } from "./comment-on-row";

/** A row's thread, oldest first. */
export async function listRowComments(actor: Actor, projectId: string, sheet: TCheckSheet, rowId: string): Promise<RowComment[]> {
  await findRowOrThrow(db(), actor.firm.id, projectId, sheet, rowId);
  return db()("row_comments")
    .where({ firm_id: actor.firm.id, project_id: projectId, sheet, row_id: rowId })
    .orderBy("id")
    .select("id", "sheet", "row_id", "author_id", "author_name", "kind", "body", "row_version", "created_at");
}
