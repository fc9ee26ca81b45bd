import "server-only";
import type { Knex } from "knex";
import { rowPath } from "@/checking/paths";
import { SHEET_LABELS, nextCheckState, type TCheckSheet, type TCheckState } from "@/checking/check-machine";
import { checkRefusal } from "@/server/checking/check-rules";
import type { TCheckMoveInput } from "@/schemas/checking";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { rowQueriedEmail } from "@/server/email/row-queried-email";
import { AppError } from "@/server/http/app-error";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";
import { notificationRecipients } from "@/server/repositories/notification-recipients";
import { currentInputs, rowInputColumns } from "@/server/repositories/accepted-inputs";
import { findCheck, findRowOrThrow, saveCheck, type RowCheck } from "@/server/repositories/row-checks";
import { getProjectOrThrow } from "./get-project";
import { actorName, recordAudit } from "./record-audit";

export interface CheckOutcome {
  sheet: TCheckSheet;
  row_id: string;
  state: TCheckState;
  checked_by: number | null;
  checked_at: string | null;
  row_version: number;
}

/**
 * A checker accepts or queries one row, at the version of the row they read. Refused: by an API
 * token (a check is signed by a person), on a row changed since it was read (409), by whoever last
 * edited the row (403), and any move the check states do not allow (409). A query carries its
 * comment into the row's thread and e-mails the row's last editor (or the consultants).
 */
export async function checkRow(actor: Actor, projectId: string, sheet: TCheckSheet, rowId: string, input: TCheckMoveInput): Promise<CheckOutcome> {
  if (actor.userId === null) throw new AppError("forbidden", "Rows are checked by a person: sign in to accept or query them (API tokens cannot)");
  const project = await getProjectOrThrow(actor, projectId);
  return db().transaction(async (trx) => {
    // Locking the row first serialises a check with any edit of the same row.
    const row = await findRowOrThrow(trx, actor.firm.id, projectId, sheet, rowId, true);
    const check = await findCheck(trx, projectId, sheet, rowId, true);
    const state = check?.state ?? "unchecked";
    const refusal = checkRefusal(sheet, row, check, actor.userId!, input.move, input.row_version);
    if (refusal) throw new AppError(refusal.status, refusal.message, [{ field: refusal.field, message: refusal.message }]);
    const next = nextCheckState(input.move, state)!;
    const at = new Date().toISOString();
    // An acceptance keeps what the row was computed from, for "what changed since" once it is reset.
    let accepted: Partial<RowCheck> = {};
    if (next === "accepted") {
      const stored = await trx(sheet).where({ id: rowId, firm_id: actor.firm.id }).first(rowInputColumns(sheet));
      const inputs = (await currentInputs(trx, actor.firm.id, projectId, [{ sheet, row: stored }])).get(`${sheet}:${rowId}`)!;
      accepted = { accepted_at: at, accepted_by: actor.userId, accepted_row_version: row.version, accepted_in_bulk: false, accepted_inputs: inputs };
    }

    const saved = await saveCheck(
      trx,
      { firmId: actor.firm.id, projectId, sheet, rowId },
      { state: next, checked_by: actor.userId, checked_at: at, checked_row_version: row.version, ...accepted },
    );
    if (input.comment) {
      await trx("row_comments").insert({
        firm_id: actor.firm.id, project_id: projectId, sheet, row_id: rowId, author_id: actor.userId,
        author_name: actorName(actor), kind: input.move, body: input.comment, row_version: row.version,
      });
    }
    await recordAudit(trx, actor, [
      { projectId, entity: "row_check", entityId: rowId, action: input.move, before: { sheet, label: row.label, state }, after: { sheet, label: row.label, state: next, row_version: row.version, ...(input.comment ? { comment: input.comment } : {}) } },
    ]);

    if (input.move === "query") {
      const editor = check?.last_edited_by ?? null;
      let to = editor === null ? [] : await notificationRecipients(trx, actor.firm.id, projectId, { userIds: [editor], exclude: actor.userId });
      // Nobody known edited the row (or they have left, or muted it): tell the project's consultants.
      if (to.length === 0 && (editor === null || !(await isMember(trx, actor.firm.id, editor)))) {
        to = await notificationRecipients(trx, actor.firm.id, projectId, { roles: ["consultant"], exclude: actor.userId });
      }
      for (const r of to) {
        await enqueueEmail(
          rowQueriedEmail({ to: r.email, firmName: actor.firm.name, project, checker: actorName(actor), rowLabel: `${SHEET_LABELS[sheet]} ${row.label}`, query: input.comment!, url: appUrl(rowPath(projectId, sheet, rowId)) }),
          trx,
        );
      }
    }
    return { sheet, row_id: rowId, state: saved.state, checked_by: saved.checked_by, checked_at: saved.checked_at, row_version: row.version };
  });
}

async function isMember(trx: Knex.Transaction, firmId: string, userId: number): Promise<boolean> {
  return (await trx("memberships").where({ firm_id: firmId, user_id: userId }).first("id")) !== undefined;
}
