import "server-only";
import type { TReportBuild } from "@/schemas/reports";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { isUniqueViolation } from "@/server/db/unique-violation";
import { AppError } from "@/server/http/app-error";
import { BUILD_FIELDS, enqueueReportBuild, presentBuild, STALE_AFTER_S } from "@/server/reports/report-builds";
import { assertReportSize, draftReportSize } from "@/server/reports/report-size";
import { actorName } from "./record-audit";

const ACTIVE = ["queued", "running"];

/**
 * Queues a draft report of the schedule as it stands; the job builds it and the page follows its
 * progress (GET …/reports/:id). Drafts are always marked "not for issue". One draft at a time
 * per project: while one is queued or running, asking again returns it (`existing: true`)
 * rather than queueing another. A report over the size limit is refused (413) before anything
 * is queued. A project's drafts older than a day are cleared as a new one is asked for.
 */
export async function requestDraftReport(actor: Actor, projectId: string): Promise<{ build: TReportBuild; existing: boolean }> {
  const attempt = () =>
    db().transaction(async (trx) => {
      const project = await trx("projects").where({ id: projectId, firm_id: actor.firm.id }).first("id");
      if (!project) throw new AppError("not_found", "No project with that id in this firm");
      // A build that went quiet (its server stopped) no longer holds the project's place.
      await trx("report_builds")
        .where({ project_id: projectId, kind: "draft" })
        .whereIn("status", ACTIVE)
        .where("updated_at", "<", trx.raw(`now() - interval '${STALE_AFTER_S} seconds'`))
        .update({ status: "failed", stage: "Interrupted", error: "The build stopped before it finished", finished_at: trx.fn.now() });
      const running = await trx("report_builds").where({ project_id: projectId, kind: "draft" }).whereIn("status", ACTIVE).first(BUILD_FIELDS);
      if (running) return { build: presentBuild({ ...running, letter: null }), existing: true };
      assertReportSize(await draftReportSize(trx, projectId));
      await trx("report_builds").where({ project_id: projectId, kind: "draft" }).where("created_at", "<", trx.raw("now() - interval '1 day'")).delete();
      const [row] = await trx("report_builds")
        .insert({ firm_id: actor.firm.id, project_id: projectId, kind: "draft", watermark: true, requested_by: actor.userId, requested_by_name: actorName(actor) })
        .returning(BUILD_FIELDS);
      await enqueueReportBuild(trx, row.id);
      return { build: presentBuild({ ...row, letter: null }), existing: false };
    });
  try {
    return await attempt();
  } catch (error) {
    // Two requests at once: the one that lost the race returns the winner's build.
    if (isUniqueViolation(error, "report_builds_one_active_draft")) return attempt();
    throw error;
  }
}
