import "server-only";
import type { Knex } from "knex";
import { withInputDefaults, type RevisionSnapshot } from "@/checking/snapshot";
import { buildReportAsync, type BuiltReport, type ReportProgress } from "@/report/build-report";
import { getPlan } from "@/server/services/get-plan";
import { revisionReportSource, type RevisionRecord } from "./report-inputs";

/** A revision's report as stored: the PDF served, byte for byte, every time it is asked for. */
export interface StoredReport {
  pdf: Uint8Array;
  pages: number;
  filename: string;
  watermark: boolean;
}

type Revision = { id: string; firm_id: string; project_id: string };

/** The columns of `revisions` a revision's report is built from. */
export const REVISION_REPORT_COLUMNS = ["id", "firm_id", "project_id", "letter", "issued_by_name", "issued_at", "snapshot"];

export async function storedRevisionReport(q: Knex | Knex.Transaction, revisionId: string): Promise<StoredReport | null> {
  const row = await q("revision_reports").where({ revision_id: revisionId }).first("pdf", "pages", "filename", "watermark");
  return row ? { pdf: new Uint8Array(row.pdf as Buffer), pages: row.pages, filename: row.filename, watermark: row.watermark } : null;
}

/**
 * Keeps a revision's report. The first one stored wins: when two builds finish together (the
 * job and a download that could not wait), both answer with the same stored PDF.
 */
export async function storeRevisionReport(q: Knex | Knex.Transaction, r: Revision, built: BuiltReport, filename: string, watermark: boolean): Promise<StoredReport> {
  await q("revision_reports")
    .insert({ revision_id: r.id, firm_id: r.firm_id, project_id: r.project_id, filename, pages: built.pages, byte_size: built.pdf.length, watermark, pdf: Buffer.from(built.pdf) })
    .onConflict("revision_id")
    .ignore();
  return (await storedRevisionReport(q, r.id))!;
}

/**
 * Whether a revision's report carries the "not for issue" mark: as decided when the revision was
 * issued (its build records it), or, for a revision issued before reports were kept, by the
 * firm's plan now. Either way it is decided once: the stored PDF never changes afterwards.
 */
export async function revisionWatermark(q: Knex | Knex.Transaction, r: Revision): Promise<boolean> {
  const build = await q("report_builds").where({ revision_id: r.id }).orderBy("created_at").first("watermark");
  if (build) return build.watermark as boolean;
  return !(await getPlan(r.firm_id, q)).limits.cleanReport;
}

/**
 * Builds a revision's report from its frozen snapshot and stores it (the report job, and a
 * download that comes before the job has finished); answers with what is stored.
 */
export async function buildRevisionReport(
  q: Knex | Knex.Transaction,
  firm: { id: string; name: string },
  r: Revision & Omit<RevisionRecord, "snapshot"> & { snapshot: unknown },
  watermark: boolean,
  onProgress?: (p: ReportProgress) => void | Promise<void>,
): Promise<StoredReport> {
  const source = revisionReportSource(firm, { ...r, snapshot: withInputDefaults(r.snapshot as RevisionSnapshot) }, watermark);
  const built = await buildReportAsync(source.input, onProgress);
  return storeRevisionReport(q, r, built, source.filename, watermark);
}
