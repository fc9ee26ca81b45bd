import "server-only";
import { buildReportAsync, type ReportProgress } from "@/report/build-report";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { internalMessage, logInternalError } from "@/server/http/internal-error";
import { draftReportSource } from "./report-inputs";
import { assertReportSize, draftReportSize } from "./report-size";
import { buildRevisionReport, REVISION_REPORT_COLUMNS } from "./revision-reports";

const RESTARTED = "Restarted after its worker stopped · ";

// Progress is written at most this often: enough for a smooth bar, few enough writes.
const PROGRESS_EVERY_MS = 250;

/**
 * The report job: builds one queued report, writing its progress as it goes, and stores the PDF
 * (a draft's with its build; a revision's in revision_reports, where it never changes). A build
 * that another worker has already taken, or that is finished, is left alone.
 */
export async function runReportBuild(buildId: string): Promise<void> {
  const q = db();
  const [build] = await q("report_builds")
    .where({ id: buildId, status: "queued" })
    // A build put back in the queue because its worker stopped (recover-stalled-builds.ts) says so
    // on every stage until it is done, so the person following it sees why it started over.
    .update({
      status: "running",
      stage: q.raw("CASE WHEN stage LIKE 'Restarting%' THEN ? ELSE 'Reading the schedule' END", [`${RESTARTED}Reading the schedule`]),
      started_at: q.fn.now(),
      updated_at: q.fn.now(),
    })
    .returning(["id", "firm_id", "project_id", "revision_id", "kind", "watermark", "requested_by_name", "stage"]);
  if (!build) return;
  const prefix = String(build.stage).startsWith(RESTARTED) ? RESTARTED : "";
  try {
    const firm = await q("firms").where({ id: build.firm_id }).first("id", "name");
    let last = 0;
    const progress = async (p: ReportProgress) => {
      const now = Date.now();
      if (now - last < PROGRESS_EVERY_MS || p.fraction >= 1) return;
      last = now;
      await q("report_builds").where({ id: buildId }).update({ progress: Math.min(0.99, p.fraction), stage: `${prefix}${p.stage}`, updated_at: q.fn.now() });
    };
    let done: { pages: number; pdf: Uint8Array; filename: string };
    if (build.kind === "revision") {
      // Stored in revision_reports, where it never changes; the build keeps no copy.
      const r = await q("revisions").where({ id: build.revision_id }).first(REVISION_REPORT_COLUMNS);
      done = await buildRevisionReport(q, firm, r, build.watermark, progress);
    } else {
      // The schedule may have grown since the draft was asked for: the size limit holds at build time too.
      assertReportSize(await draftReportSize(q, build.project_id));
      const source = await draftReportSource(q, firm, build.project_id, build.requested_by_name);
      done = { ...(await buildReportAsync(source.input, progress)), filename: source.filename };
    }
    await q("report_builds")
      .where({ id: buildId })
      .update({
        status: "done", progress: 1, stage: "Done", pages: done.pages, byte_size: done.pdf.length, filename: done.filename,
        pdf: build.kind === "draft" ? Buffer.from(done.pdf) : null, updated_at: q.fn.now(), finished_at: q.fn.now(),
      });
  } catch (error) {
    // A refusal meant for the person (AppError) is shown as it is; anything else is logged in full
    // and shown only as a reference, since its message may name tables, paths or connections.
    const message = error instanceof AppError ? error.message : internalMessage(logInternalError(`[jobs] report build ${buildId}`, error), " while building this report");
    await q("report_builds").where({ id: buildId }).update({ status: "failed", stage: "Failed", error: message.slice(0, 2000), updated_at: q.fn.now(), finished_at: q.fn.now() });
  }
}
