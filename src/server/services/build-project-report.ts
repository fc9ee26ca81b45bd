import "server-only";
import { buildReportAsync, type BuiltReport } from "@/report/build-report";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { draftReportSource } from "@/server/reports/report-inputs";

/**
 * The draft calculation report of a project, built in this request (scripts and small
 * projects; the page asks the report job instead and follows its progress): the schedule as it
 * stands, watermarked "not for issue" on every page as every draft is.
 */
export async function buildProjectReport(actor: Actor, projectId: string): Promise<BuiltReport & { filename: string }> {
  const source = await draftReportSource(db(), actor.firm, projectId, actor.name ?? actor.email ?? "API token");
  return { ...(await buildReportAsync(source.input)), filename: source.filename };
}
