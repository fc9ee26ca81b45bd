/** Page furniture of the report: headings, running footer, page numbers and the watermark. */
import { jsPDF } from "jspdf";
import { pdfText } from "./pdf-text";
import { FONT } from "./report-font";
import type { ReportMeta } from "./types";

export const PAGE = { w: 210, h: 297, margin: 16, footer: 12 } as const;
export const INK = 30;
export const MUTED = 110;
export const ACCENT: [number, number, number] = [24, 94, 88];

export const CAUTION =
  "Results are engineering estimates. Every design must be verified by a competent, licensed engineer under the codes and standards that apply where it is built.";

/** A writer that keeps the vertical position and starts new pages when needed. */
export class Writer {
  y: number = PAGE.margin;
  constructor(readonly doc: jsPDF) {}

  get bottom(): number {
    return PAGE.h - PAGE.margin - PAGE.footer;
  }

  need(height: number): void {
    if (this.y + height > this.bottom) this.newPage();
  }

  newPage(): void {
    this.doc.addPage("a4", "portrait");
    this.y = PAGE.margin;
  }

  heading(text: string, size = 14): void {
    this.need(size * 0.9 + 4);
    this.doc.setFont(FONT, "bold").setFontSize(size).setTextColor(...ACCENT);
    this.doc.text(pdfText(text), PAGE.margin, this.y + size * 0.35);
    this.y += size * 0.55 + 3;
    this.doc.setTextColor(INK).setFont(FONT, "normal");
  }

  paragraph(text: string, size = 9, color = INK, indent = 0): void {
    this.doc.setFontSize(size).setTextColor(color);
    const lines = this.doc.splitTextToSize(pdfText(text), PAGE.w - 2 * PAGE.margin - 2 * indent) as string[];
    for (const line of lines) {
      this.need(size * 0.45);
      this.doc.text(line, PAGE.margin + indent, this.y + size * 0.35);
      this.y += size * 0.45;
    }
    this.y += 1.5;
    this.doc.setTextColor(INK);
  }

  /** After an autoTable: continue below it. */
  afterTable(gap = 6): void {
    const last = (this.doc as unknown as { lastAutoTable?: { finalY?: number } }).lastAutoTable;
    this.y = (last?.finalY ?? this.y) + gap;
  }
}

/** Running footer, page numbers and (for drafts and free plans) the watermark on every page. */
export function finishPages(doc: jsPDF, meta: ReportMeta): number {
  const n = doc.getNumberOfPages();
  const rev = meta.revision === null ? "Draft" : `Revision ${meta.revision}`;
  for (let i = 1; i <= n; i++) {
    doc.setPage(i);
    // Pages of the schedule summary are landscape: place the furniture by each page's own size.
    const pw = doc.internal.pageSize.getWidth();
    const ph = doc.internal.pageSize.getHeight();
    if (meta.watermark) {
      doc.saveGraphicsState();
      doc.setGState(new (doc as unknown as { GState: new (o: { opacity: number }) => unknown }).GState({ opacity: 0.12 }) as never);
      doc.setFont(FONT, "bold").setFontSize(54).setTextColor(150, 20, 20);
      doc.text("NOT FOR ISSUE", pw / 2, ph / 2, { align: "center", angle: 45, baseline: "middle" });
      doc.restoreGraphicsState();
    }
    const y = ph - PAGE.margin + 2;
    doc.setDrawColor(200).setLineWidth(0.2).line(PAGE.margin, y - 5, pw - PAGE.margin, y - 5);
    doc.setFont(FONT, "normal").setFontSize(7).setTextColor(MUTED);
    doc.text(pdfText(`Filmsheet · ${meta.projectName} (${meta.projectReference}) · ${rev} · ${meta.date}`), PAGE.margin, y - 1.5);
    doc.text(`page ${i} of ${n}`, pw - PAGE.margin, y - 1.5, { align: "right" });
    doc.setFontSize(6.5);
    doc.text(pdfText(CAUTION), PAGE.margin, y + 1.8);
  }
  return n;
}
