import "server-only";
import { buildReportAsync, type BuiltReport } from "@/report/build-report";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { REPORT_LIMITS } from "@/schemas/reports";
import { AppError } from "@/server/http/app-error";
import { draftReportSource } from "@/server/reports/report-inputs";
import { assertReportSize, draftReportSize } from "@/server/reports/report-size";

/**
 * The draft calculation report of a project, built in this request (scripts and small
 * projects; the page asks the report job instead and follows its progress): the schedule as it
 * stands, watermarked "not for issue" on every page as every draft is. Small projects only
 * (REPORT_LIMITS.inRequestRowCases): a larger one is refused (413) before anything is built and
 * pointed at the report job, which builds it without holding a request open.
 */
export async function buildProjectReport(actor: Actor, projectId: string): Promise<BuiltReport & { filename: string }> {
  const project = await db()("projects").where({ id: projectId, firm_id: actor.firm.id }).first("id");
  if (!project) throw new AppError("not_found", "No project with that id in this firm");
  assertReportSize(
    await draftReportSize(db(), projectId),
    REPORT_LIMITS.inRequestRowCases,
    `Larger reports are built by the report job: POST /api/projects/${projectId}/reports {"kind":"draft"}, then follow GET …/reports/:buildId until it is done.`,
  );
  const source = await draftReportSource(db(), actor.firm, projectId, actor.name ?? actor.email ?? "API token");
  return { ...(await buildReportAsync(source.input)), filename: source.filename };
}
