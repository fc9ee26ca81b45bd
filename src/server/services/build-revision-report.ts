import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { buildRevisionReport, REVISION_REPORT_COLUMNS, revisionWatermark, storedRevisionReport, type StoredReport } from "@/server/reports/revision-reports";

/**
 * The calculation report of an issued revision: the PDF stored with it, byte for byte as first
 * built (the job builds it as the revision is issued). A download that arrives before the job
 * has finished builds it from the frozen snapshot here, and whichever build is stored first is
 * the one served from then on. Everyone in the firm reads it, viewers included.
 */
export async function getRevisionReport(actor: Actor, projectId: string, letter: string): Promise<StoredReport> {
  const r = await db()("revisions").where({ firm_id: actor.firm.id, project_id: projectId, letter }).first(REVISION_REPORT_COLUMNS);
  if (!r) throw new AppError("not_found", `No revision ${letter} of this project`);
  return (await storedRevisionReport(db(), r.id)) ?? buildRevisionReport(db(), actor.firm, r, await revisionWatermark(db(), r));
}
