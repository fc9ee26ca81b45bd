import "server-only";
import type { Knex } from "knex";
import type { TCheckSheet } from "@/checking/check-machine";
import type { Actor } from "@/server/auth/actor";
import { recordAudit } from "@/server/services/record-audit";

const CHUNK = 1000;

/**
 * Who a reset names as the rows' last editor: the person who edited the rows themselves (null when
 * nobody is known), or "keep" for a change made elsewhere in the project (a design case, the site,
 * a zone, a build-up), which moves the rows' results but is not an edit of them: each row keeps
 * the last editor it had, and its checkers stay free to check it.
 */
export type ResetEditor = number | null | "keep";

/**
 * Sends rows back to unchecked because they (or something they are computed from) changed, and
 * records `editor` as their last editor (unless "keep"), who may then not check them. Rows that
 * were accepted or queried get an audit row saying why their check was reset.
 */
export async function resetChecks(trx: Knex.Transaction, actor: Actor, projectId: string, sheet: TCheckSheet, rowIds: readonly string[], editor: ResetEditor, reason: string): Promise<void> {
  for (let i = 0; i < rowIds.length; i += CHUNK) {
    const ids = rowIds.slice(i, i + CHUNK);
    const open = await trx("row_checks")
      .where({ project_id: projectId, sheet })
      .whereIn("row_id", ids)
      .whereNot("state", "unchecked")
      .select<{ row_id: string; state: string }[]>("row_id", "state");
    const now = new Date().toISOString();
    const edited = editor === "keep" ? {} : { last_edited_by: editor, last_edited_at: now };
    await trx("row_checks")
      .insert(ids.map((row_id) => ({ firm_id: actor.firm.id, project_id: projectId, sheet, row_id, state: "unchecked", ...edited })))
      .onConflict(["project_id", "sheet", "row_id"])
      .merge({
        state: "unchecked",
        checked_by: null,
        checked_at: null,
        checked_row_version: null,
        ...edited,
        version: trx.raw("row_checks.version + 1"),
        updated_at: trx.fn.now(),
      });
    await recordAudit(
      trx,
      actor,
      open.map((c) => ({ projectId, entity: "row_check", entityId: c.row_id, action: "reset", before: { sheet, state: c.state }, after: { sheet, state: "unchecked", reason } })),
    );
  }
}
