import type { TCheckSheet } from "./check-machine";

// Addresses of the checking pages: used by the pages' links and by e-mailed links alike.
export const sheetSegment = (sheet: TCheckSheet) => (sheet === "duct_runs" ? "duct-runs" : "surfaces");
export const rowPath = (projectId: string, sheet: TCheckSheet, rowId: string) => `/projects/${projectId}/${sheetSegment(sheet)}/${rowId}`;
/** A row's working opened on a design case (the one chosen in the grid). */
export const workingPath = (projectId: string, sheet: TCheckSheet, rowId: string, caseId?: string | null) =>
  `${rowPath(projectId, sheet, rowId)}${caseId ? `?case=${encodeURIComponent(caseId)}` : ""}`;
/** The schedule opened on a sheet and a design case: where a working's Back link returns. */
export const schedulePath = (projectId: string, sheet: TCheckSheet, caseId?: string | null) =>
  `/projects/${projectId}?sheet=${sheet}${caseId ? `&case=${encodeURIComponent(caseId)}` : ""}`;
export const checkPath = (projectId: string) => `/projects/${projectId}/check`;
export const revisionsPath = (projectId: string) => `/projects/${projectId}/revisions`;
export const revisionPath = (projectId: string, letter: string) => `/projects/${projectId}/revisions/${letter}`;
export const historyPath = (projectId: string) => `/projects/${projectId}/history`;
