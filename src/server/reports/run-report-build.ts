import "server-only";
import { buildReportAsync } from "@/report/build-report";
import { db } from "@/server/db/knex";
import type { RevisionSnapshot } from "@/checking/snapshot";
import { draftReportSource, revisionReportSource, type ReportSource } from "./report-inputs";
import { storeRevisionReport } from "./revision-reports";

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
    .update({ status: "running", stage: "Reading the schedule", started_at: q.fn.now(), updated_at: q.fn.now() })
    .returning(["id", "firm_id", "project_id", "revision_id", "kind", "watermark", "requested_by_name"]);
  if (!build) return;
  try {
    const firm = await q("firms").where({ id: build.firm_id }).first("id", "name");
    let source: ReportSource;
    let revision: { id: string; firm_id: string; project_id: string } | null = null;
    if (build.kind === "revision") {
      const r = await q("revisions").where({ id: build.revision_id }).first("id", "firm_id", "project_id", "letter", "issued_by_name", "issued_at", "snapshot");
      revision = r;
      source = revisionReportSource(firm, { ...r, snapshot: r.snapshot as RevisionSnapshot }, build.watermark);
    } else {
      source = await draftReportSource(q, firm, build.project_id, build.requested_by_name);
    }
    let last = 0;
    const built = await buildReportAsync(source.input, async (p) => {
      const now = Date.now();
      if (now - last < PROGRESS_EVERY_MS || p.fraction >= 1) return;
      last = now;
      await q("report_builds").where({ id: buildId }).update({ progress: Math.min(0.99, p.fraction), stage: p.stage, updated_at: q.fn.now() });
    });
    await q.transaction(async (trx) => {
      const done = { status: "done", progress: 1, stage: "Done", pages: built.pages, byte_size: built.pdf.length, filename: source.filename, updated_at: trx.fn.now(), finished_at: trx.fn.now() };
      if (revision) {
        const stored = await storeRevisionReport(trx, revision, built, source.filename, build.watermark);
        await trx("report_builds").where({ id: buildId }).update({ ...done, pages: stored.pages, byte_size: stored.pdf.length });
      } else {
        await trx("report_builds").where({ id: buildId }).update({ ...done, pdf: Buffer.from(built.pdf) });
      }
    });
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    console.warn(`[jobs] report build ${buildId} failed: ${message.split("\n")[0]}`);
    await q("report_builds").where({ id: buildId }).update({ status: "failed", stage: "Failed", error: message.slice(0, 2000), updated_at: q.fn.now(), finished_at: q.fn.now() });
  }
}
