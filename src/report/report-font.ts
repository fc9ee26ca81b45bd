/**
 * The report's typeface: DejaVu Sans Condensed (a subset shipped in src/report/fonts), embedded in
 * every PDF so that ε, σ, π, √, α, Δ, ², ³, ⁴, ×, −, ≤, ≥, °, · and subscripts print as themselves.
 * jsPDF's standard fonts print Latin-1 only. jsPDF writes only the glyphs a document uses.
 */
import type { jsPDF } from "jspdf";
import { REPORT_SANS_BOLD, REPORT_SANS_REGULAR } from "./fonts/report-font-data";

/** The family name every part of the report sets (autoTable styles included). */
export const FONT = "ReportSans";

/** Adds both weights to a new document and makes the regular one current. */
export function useReportFont(doc: jsPDF): void {
  doc.addFileToVFS("report-sans.ttf", REPORT_SANS_REGULAR);
  doc.addFont("report-sans.ttf", FONT, "normal", undefined, "Identity-H");
  doc.addFileToVFS("report-sans-bold.ttf", REPORT_SANS_BOLD);
  doc.addFont("report-sans-bold.ttf", FONT, "bold", undefined, "Identity-H");
  doc.setFont(FONT, "normal");
}
