/**
 * The one place where the zone-totals panel reads rows' results for the breakdowns: whatever shape
 * the schedule view hands the panel (today the engine's ScheduleResults of one case), the
 * breakdowns take a CaseRows that looks a row's result up by its id.
 */
import { caseRowsOf, type CaseRows, type ScheduleResults } from "@/calc/index";

export type PanelCaseResults = Pick<ScheduleResults, "design_case_id" | "surfaces" | "duct_runs">;

export function panelCaseRows(results: PanelCaseResults): CaseRows {
  return caseRowsOf(results);
}
