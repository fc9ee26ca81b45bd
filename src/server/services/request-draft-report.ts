import "server-only";
import type { TReportBuild } from "@/schemas/reports";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { BUILD_FIELDS, enqueueReportBuild, presentBuild } from "@/server/reports/report-builds";
import { actorName } from "./record-audit";

/**
 * Queues a draft report of the schedule as it stands; the job builds it and the page follows its
 * progress (GET …/reports/:id). Drafts are always marked "not for issue". A project's drafts
 * older than a day are cleared as a new one is asked for.
 */
export async function requestDraftReport(actor: Actor, projectId: string): Promise<TReportBuild> {
  return db().transaction(async (trx) => {
    const project = await trx("projects").where({ id: projectId, firm_id: actor.firm.id }).first("id");
    if (!project) throw new AppError("not_found", "No project with that id in this firm");
    await trx("report_builds").where({ project_id: projectId, kind: "draft" }).where("created_at", "<", trx.raw("now() - interval '1 day'")).delete();
    const [row] = await trx("report_builds")
      .insert({ firm_id: actor.firm.id, project_id: projectId, kind: "draft", watermark: true, requested_by: actor.userId, requested_by_name: actorName(actor) })
      .returning(BUILD_FIELDS);
    await enqueueReportBuild(trx, row.id);
    return presentBuild({ ...row, letter: null });
  });
}
