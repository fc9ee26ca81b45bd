import { z } from "zod";

export const ZReportBuildParams = z.object({
  projectId: z.uuid({ error: "Project id must be a UUID" }),
  buildId: z.uuid({ error: "Report id must be a UUID" }),
});

/** Asking for a report: only drafts are asked for (an issued revision's is built when it is issued). */
export const ZReportRequest = z.object({
  kind: z.literal("draft", { error: "kind must be draft (a revision's report is built when it is issued)" }).default("draft"),
});

export const REPORT_BUILD_STATUSES = ["queued", "running", "done", "failed"] as const;
export type TReportBuildStatus = (typeof REPORT_BUILD_STATUSES)[number];

/** A report build as the API and the page see it. */
export interface TReportBuild {
  id: string;
  kind: "draft" | "revision";
  /** The revision's letter for a revision's report. */
  revision: string | null;
  status: TReportBuildStatus;
  /** 0 … 1. */
  progress: number;
  stage: string;
  watermark: boolean;
  requested_by_name: string;
  pages: number | null;
  byte_size: number | null;
  error: string | null;
  created_at: string;
  finished_at: string | null;
  /** Where the PDF is downloaded from once it is done; null until then. */
  download: string | null;
}

/**
 * How large a report may be, in row-cases (surfaces and duct runs × design cases): every row is
 * worked out, tabled and explained in the appendix once per case, so time and memory grow with
 * the product (a 10,000-row × 3-case report took 49 s and 2.4 GB). 10,000 row-cases is about
 * 15 s and under 1 GB in the job. The in-request build (GET …/report) takes up to 5,000 (about
 * the bench report's 3,000 row-cases in 5 s, with the event loop handed back between steps);
 * anything larger goes to the job.
 */
export const REPORT_LIMITS = {
  rowCases: 10_000,
  inRequestRowCases: 5_000,
} as const;
