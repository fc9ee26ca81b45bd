import type { TCheckSheet } from "./check-machine";

// Addresses of the checking pages: used by the pages' links and by e-mailed links alike.
export const sheetSegment = (sheet: TCheckSheet) => (sheet === "duct_runs" ? "duct-runs" : "surfaces");
export const rowPath = (projectId: string, sheet: TCheckSheet, rowId: string) => `/projects/${projectId}/${sheetSegment(sheet)}/${rowId}`;
export const checkPath = (projectId: string) => `/projects/${projectId}/check`;
export const revisionsPath = (projectId: string) => `/projects/${projectId}/revisions`;
export const revisionPath = (projectId: string, letter: string) => `/projects/${projectId}/revisions/${letter}`;
export const historyPath = (projectId: string) => `/projects/${projectId}/history`;
