/** What a calculation report is made from. */
import type { DesignCase, Schedule } from "@/calc/index";
import type { UnitFormatter } from "./format";

export type CheckState = "unchecked" | "accepted" | "queried";

export interface ReportMeta {
  projectName: string;
  projectReference: string;
  siteDescription: string;
  firmName: string;
  author: string;
  checker: string | null;
  /** A draft built after every row was accepted says so on its cover. */
  allAccepted?: boolean;
  /** ISO date of the report (or of the revision's issue). */
  date: string;
  status: "draft" | "issued";
  /** "A", "B", … for an issued revision; null for a draft. */
  revision: string | null;
  unitSystem: "SI" | "IP";
  /** "Not for issue" on every page: drafts, and every report of a firm on the free plan. */
  watermark: boolean;
}

export interface ReportInput {
  meta: ReportMeta;
  schedule: Schedule;
  designCases: DesignCase[];
  /** Check state by row id; rows not listed are unchecked. */
  checks?: Record<string, CheckState>;
  /** Converts SI values for display (IP projects); identity when absent. */
  convert?: UnitFormatter;
}
