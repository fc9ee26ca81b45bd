import "server-only";
import type { RevisionSnapshot } from "@/checking/snapshot";
import { buildReportAsync } from "@/report/build-report";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { revisionReportSource } from "@/server/reports/report-inputs";
import { revisionWatermark, storeRevisionReport, storedRevisionReport, type StoredReport } from "@/server/reports/revision-reports";

/**
 * The calculation report of an issued revision: the PDF stored with it, byte for byte as first
 * built (the job builds it as the revision is issued). A download that arrives before the job
 * has finished builds it from the frozen snapshot here, and whichever build is stored first is
 * the one served from then on. Everyone in the firm reads it, viewers included.
 */
export async function getRevisionReport(actor: Actor, projectId: string, letter: string): Promise<StoredReport> {
  const r = await db()("revisions").where({ firm_id: actor.firm.id, project_id: projectId, letter }).first("id", "firm_id", "project_id", "letter", "issued_by_name", "issued_at", "snapshot");
  if (!r) throw new AppError("not_found", `No revision ${letter} of this project`);
  const stored = await storedRevisionReport(db(), r.id);
  if (stored) return stored;
  const watermark = await revisionWatermark(db(), r);
  const source = revisionReportSource(actor.firm, { ...r, snapshot: r.snapshot as RevisionSnapshot }, watermark);
  const built = await buildReportAsync(source.input);
  return storeRevisionReport(db(), r, built, source.filename, watermark);
}
