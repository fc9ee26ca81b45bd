import "server-only";
import { hasAnyRole, type Actor } from "@/server/auth/actor";
import type { TReportBuild } from "@/schemas/reports";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { BUILD_COLUMNS, buildsOf, presentBuild } from "@/server/reports/report-builds";
import { storedRevisionReport } from "@/server/reports/revision-reports";

/** Drafts are for the people working on the project; viewers read issued revisions only. */
const DRAFT_READERS = ["admin", "consultant", "checker"] as const;

async function findBuild(actor: Actor, projectId: string, buildId: string) {
  const row = await buildsOf(db(), actor.firm.id, projectId).where("b.id", buildId).first([...BUILD_COLUMNS, "b.revision_id"]);
  if (!row) throw new AppError("not_found", "No report with that id in this project");
  if (row.kind === "draft" && !hasAnyRole(actor, DRAFT_READERS)) throw new AppError("forbidden", "Draft reports are for admins, consultants and checkers; viewers read issued revisions");
  return row;
}

/** How far a report's build has got (the page polls this), and where to download it once done. */
export async function getReportBuild(actor: Actor, projectId: string, buildId: string): Promise<TReportBuild> {
  return presentBuild(await findBuild(actor, projectId, buildId));
}

/** The PDF of a finished build: a draft's own, or the stored report of the revision it built. */
export async function getReportBuildPdf(actor: Actor, projectId: string, buildId: string): Promise<{ pdf: Uint8Array; pages: number; filename: string }> {
  const row = await findBuild(actor, projectId, buildId);
  const build = presentBuild(row);
  if (build.status === "failed") throw new AppError("conflict", `This report could not be built: ${build.error}`);
  if (build.status !== "done") throw new AppError("conflict", `This report is not ready yet (${Math.round(build.progress * 100)} %); follow GET /api/projects/${projectId}/reports/${buildId}`);
  if (row.kind === "revision") return (await storedRevisionReport(db(), row.revision_id))!;
  const pdf = await db()("report_builds").where({ id: buildId }).first("pdf", "pages", "filename");
  return { pdf: new Uint8Array(pdf.pdf as Buffer), pages: pdf.pages, filename: pdf.filename };
}
