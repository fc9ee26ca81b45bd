import "server-only";
import type { Knex } from "knex";
import type { TReportBuild } from "@/schemas/reports";
import { REPORT_PRIORITY } from "@/server/jobs/job-priorities";

/** Graphile-worker's task that builds one report. */
export const BUILD_REPORT_TASK = "build_report";

/** A build that has said nothing for this long was interrupted (its server stopped mid-build). */
export const STALE_AFTER_S = 600;

/** Queues the build of `buildId` in the caller's transaction: it starts once that commits. */
export async function enqueueReportBuild(trx: Knex | Knex.Transaction, buildId: string): Promise<void> {
  // One attempt: a build that fails says why, and the person asks again (a retry would fail alike).
  // Built by a runner of their own (one at a time per instance), never in the e-mail runner's slots.
  await trx.raw("SELECT graphile_worker.add_job(?, ?::json, max_attempts => 1, priority => ?)", [BUILD_REPORT_TASK, JSON.stringify({ buildId }), REPORT_PRIORITY]);
}

/** The columns of report_builds the API shows (`presentBuild`), and the same joined to the revision's letter. */
export const BUILD_FIELDS = ["id", "kind", "status", "progress", "stage", "watermark", "requested_by_name", "pages", "byte_size", "error", "created_at", "updated_at", "finished_at", "project_id"];
export const BUILD_COLUMNS = [...BUILD_FIELDS.map((c) => `b.${c}`), "r.letter"];

type BuildRow = {
  id: string; kind: "draft" | "revision"; status: TReportBuild["status"]; progress: number; stage: string; watermark: boolean; requested_by_name: string;
  pages: number | null; byte_size: number | null; error: string | null; created_at: Date; updated_at: Date; finished_at: Date | null; project_id: string; letter: string | null;
};

/** The API's view of a build row; one that has gone quiet mid-build is reported as failed. */
export function presentBuild(row: BuildRow, now = new Date()): TReportBuild {
  const quiet = (now.getTime() - new Date(row.updated_at).getTime()) / 1000 > STALE_AFTER_S;
  const interrupted = (row.status === "queued" || row.status === "running") && quiet;
  const download =
    row.status !== "done" ? null : row.kind === "draft" ? `/api/projects/${row.project_id}/reports/${row.id}/pdf` : `/api/projects/${row.project_id}/revisions/${row.letter}/report`;
  return {
    id: row.id,
    kind: row.kind,
    revision: row.letter,
    status: interrupted ? "failed" : row.status,
    progress: row.progress,
    stage: interrupted ? "Interrupted" : row.stage,
    watermark: row.watermark,
    requested_by_name: row.requested_by_name,
    pages: row.pages,
    byte_size: row.byte_size,
    error: interrupted ? "The build stopped before it finished (the server restarted); ask for the report again" : row.error,
    created_at: new Date(row.created_at).toISOString(),
    finished_at: row.finished_at ? new Date(row.finished_at).toISOString() : null,
    download,
  };
}

/** Builds of one project, newest first, joined to their revision's letter. */
export function buildsOf(q: Knex | Knex.Transaction, firmId: string, projectId: string) {
  return q("report_builds as b").leftJoin("revisions as r", "r.id", "b.revision_id").where({ "b.firm_id": firmId, "b.project_id": projectId }).orderBy("b.created_at", "desc");
}
