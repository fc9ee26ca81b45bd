import "server-only";
import { checkPath } from "@/checking/paths";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { checkRequestedEmail } from "@/server/email/check-requested-email";
import { AppError } from "@/server/http/app-error";
import { appUrl } from "@/server/http/app-url";
import { enqueueEmail } from "@/server/jobs/enqueue-email";
import { notificationRecipients } from "@/server/repositories/notification-recipients";
import { checkCounts, type CheckCounts } from "@/server/repositories/row-checks";
import { getProjectOrThrow } from "./get-project";
import { actorName, recordAudit } from "./record-audit";

/** A consultant asks the firm's checkers to check a project: one e-mail each (unless muted). */
export async function requestCheck(actor: Actor, projectId: string, input: { message?: string }): Promise<{ counts: CheckCounts; notified: number }> {
  const project = await getProjectOrThrow(actor, projectId);
  return db().transaction(async (trx) => {
    const counts = await checkCounts(trx, actor.firm.id, projectId);
    if (counts.rows === 0) throw new AppError("conflict", "There is nothing to check yet: the schedule has no surfaces or duct runs");
    const message = input.message ?? "";
    await recordAudit(trx, actor, [{ projectId, entity: "project", entityId: projectId, action: "request_check", after: { message, ...counts } }]);
    const to = await notificationRecipients(trx, actor.firm.id, projectId, { roles: ["checker"], exclude: actor.userId });
    for (const r of to) {
      await enqueueEmail(checkRequestedEmail({ to: r.email, firmName: actor.firm.name, project, requester: actorName(actor), message, counts, url: appUrl(checkPath(projectId)) }), trx);
    }
    return { counts, notified: to.length };
  });
}
