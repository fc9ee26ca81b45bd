import "server-only";
import type { TReportBuild } from "@/schemas/reports";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { BUILD_COLUMNS, buildsOf, presentBuild } from "@/server/reports/report-builds";

/** Whether an issued revision's report is stored yet, and its latest build (for the progress bar). */
export async function getRevisionReportState(actor: Actor, projectId: string, revisionId: string): Promise<{ stored: boolean; build: TReportBuild | null }> {
  const [stored, build] = await Promise.all([
    db()("revision_reports").where({ revision_id: revisionId, firm_id: actor.firm.id }).first("revision_id"),
    buildsOf(db(), actor.firm.id, projectId).where("b.revision_id", revisionId).first(BUILD_COLUMNS),
  ]);
  return { stored: stored !== undefined, build: build ? presentBuild(build) : null };
}
