import "server-only";
import { SHEET_LABELS, type TCheckSheet } from "@/checking/check-machine";
import { rowPath } from "@/checking/paths";
import type { TRowCommentInput } from "@/schemas/checking";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { queryAnsweredEmail } from "@/server/email/query-answered-email";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";
import { notificationRecipients } from "@/server/repositories/notification-recipients";
import { findCheck, findRowOrThrow } from "@/server/repositories/row-checks";
import { getProjectOrThrow } from "./get-project";
import { actorName, recordAudit } from "./record-audit";

export interface RowComment {
  id: string;
  sheet: TCheckSheet;
  row_id: string;
  author_id: number | null;
  author_name: string;
  kind: "query" | "answer" | "note" | "accept";
  body: string;
  row_version: number | null;
  created_at: string;
}

/**
 * Adds to a row's thread. A consultant writing on a queried row answers the query: the checker
 * who queried it is e-mailed. The state does not move: the checker accepts, or the consultant
 * changes the row (which sends it back to unchecked).
 */
export async function commentOnRow(actor: Actor, projectId: string, sheet: TCheckSheet, rowId: string, input: TRowCommentInput): Promise<RowComment> {
  const project = await getProjectOrThrow(actor, projectId);
  return db().transaction(async (trx) => {
    const row = await findRowOrThrow(trx, actor.firm.id, projectId, sheet, rowId);
    const check = await findCheck(trx, projectId, sheet, rowId);
    const answering = check?.state === "queried" && actor.roles.includes("consultant");
    const kind = answering ? "answer" : "note";
    const [comment] = await trx("row_comments")
      .insert({ firm_id: actor.firm.id, project_id: projectId, sheet, row_id: rowId, author_id: actor.userId, author_name: actorName(actor), kind, body: input.body, row_version: row.version })
      .returning<RowComment[]>(["id", "sheet", "row_id", "author_id", "author_name", "kind", "body", "row_version", "created_at"]);
    await recordAudit(trx, actor, [{ projectId, entity: "row_comment", entityId: rowId, action: kind, after: { sheet, label: row.label, body: input.body, row_version: row.version } }]);
    if (answering && check.checked_by !== null) {
      const to = await notificationRecipients(trx, actor.firm.id, projectId, { userIds: [check.checked_by], exclude: actor.userId });
      for (const r of to) {
        await enqueueEmail(
          queryAnsweredEmail({ to: r.email, firmName: actor.firm.name, project, author: actorName(actor), rowLabel: `${SHEET_LABELS[sheet]} ${row.label}`, answer: input.body, url: appUrl(rowPath(projectId, sheet, rowId)) }),
          trx,
        );
      }
    }
    return comment!;
  });
}
