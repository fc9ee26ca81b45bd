/**
 * Section 4's second half: the totals by orientation, element type and build-up with every design
 * case side by side, and the peak case of each zone (src/calc/schedule/breakdowns.ts, the same
 * function the zone-totals panel and the XLSX export read).
 */
import { autoTable, type RowInput } from "jspdf-autotable";
import { BREAKDOWN_RULES, caseRowsOf, leftOutSentence, scheduleBreakdowns, type BreakdownLine, type Breakdowns, type CaseBreakdowns, type ScheduleResults } from "@/calc/index";
import { cell, head } from "./format";
import { ACCENT, INK, MUTED, PAGE, Writer } from "./layout";
import { pdfText } from "./pdf-text";
import { FONT } from "./report-font";
import type { ReportInput } from "./types";

const STYLE = {
  styles: { font: FONT, fontSize: 7, cellPadding: 1, textColor: INK, lineColor: 220, lineWidth: 0.1 },
  headStyles: { fillColor: ACCENT, textColor: 255, fontStyle: "bold" as const, halign: "center" as const },
  margin: { left: PAGE.margin, right: PAGE.margin, bottom: PAGE.margin + PAGE.footer },
  theme: "grid" as const,
};

export function reportBreakdowns(input: ReportInput, results: ScheduleResults[]): Breakdowns {
  return scheduleBreakdowns(input.schedule, input.designCases, results.map(caseRowsOf));
}

function linesTable(w: Writer, input: ReportInput, b: Breakdowns, title: string, column: string, note: string, pick: (c: CaseBreakdowns) => BreakdownLine[]): void {
  const c = input.convert;
  const first = b.cases[0]!;
  // Title, two heading rows and the lines kept together when they fit on a page (≈ 5 mm a line).
  w.need(Math.min(120, 20 + 5 * (pick(first).length + 1)));
  w.doc.setFont(FONT, "bold").setFontSize(9).setTextColor(INK).text(pdfText(title), PAGE.margin, w.y + 3);
  w.doc.setFont(FONT, "normal").setFontSize(7).setTextColor(MUTED).text(pdfText(note), PAGE.margin, w.y + 6.5);
  w.doc.setTextColor(INK);
  w.y += 8;
  // The rows and area of a line are those in its totals: the same in every case unless a row fails in some only.
  const area = (i: number) => {
    const a = pick(first)[i]!.area_m2;
    return b.cases.every((k) => pick(k)[i]!.area_m2 === a) ? cell(a, "m²", c) : "varies";
  };
  const sum = (k: CaseBreakdowns, key: "loss_W" | "gain_W") => pick(k).reduce((s, l) => s + l[key], 0);
  const n = b.cases.length;
  const head1: RowInput = [
    { content: "", colSpan: 2 },
    ...b.cases.map((k) => ({ content: pdfText(`${k.name} (${k.kind})`), colSpan: 2 })),
  ];
  const head2: RowInput = [column, head("Area", "m²", c), ...b.cases.flatMap(() => [head("Loss", "W", c), head("Gain", "W", c)])];
  autoTable(w.doc, {
    ...STYLE,
    startY: w.y,
    head: [head1, head2],
    body: [
      ...pick(first).map((l, i) => [pdfText(l.label), area(i), ...b.cases.flatMap((k) => [cell(pick(k)[i]!.loss_W, "W", c), cell(pick(k)[i]!.gain_W, "W", c)])]),
      [{ content: "Total", styles: { fontStyle: "bold" as const } }, "", ...b.cases.flatMap((k) => [cell(sum(k, "loss_W"), "W", c), cell(sum(k, "gain_W"), "W", c)])],
    ],
    columnStyles: { 0: { cellWidth: 40 }, ...Object.fromEntries(Array.from({ length: 1 + 2 * n }, (_, i) => [i + 1, { halign: "right" as const }])) },
    rowPageBreak: "avoid",
  });
  w.afterTable(4);
}

/** The breakdowns of every case and each zone's peak case, after the zone totals. */
export function breakdownSection(w: Writer, input: ReportInput, results: ScheduleResults[]): void {
  const b = reportBreakdowns(input, results);
  if (b.cases.length === 0) return;
  const c = input.convert;
  w.heading("4.1  Totals by orientation, element type and build-up", 11);
  w.paragraph("Every design case side by side. Loss is heat leaving the building through its surfaces (heat loss, positive out) and heat lost by the air of duct runs crossing unconditioned or outdoor space; gain is the reverse. Ducts inside the zone they serve are left out, as in the zone totals.", 7.5, MUTED);
  linesTable(w, input, b, "By orientation", "Orientation", "Surfaces to outside air; adds up to the fabric loss and gain.", (k) => k.orientation);
  linesTable(w, input, b, "By element type", "Element", "Surfaces and distribution ducts; adds up to the zones' heat loss and gain.", (k) => k.element);
  linesTable(w, input, b, "By build-up", "Build-up", "Surfaces to outside air; adds up to the fabric loss and gain.", (k) => k.buildup);
  // What no line holds, once for the cases that leave out the same rows.
  const said = new Map<string, string[]>();
  for (const k of b.cases) {
    if (k.left_out.length === 0) continue;
    const text = `${leftOutSentence(k.left_out)} ${k.left_out.map((l) => l.label).join(", ")}.`;
    said.set(text, [...(said.get(text) ?? []), k.name]);
  }
  for (const [text, names] of said) w.paragraph(`${names.length === b.cases.length ? "Every case" : names.join("; ")}: ${text}`, 7.5, INK);
  w.paragraph(BREAKDOWN_RULES.join(" "), 7.5, MUTED);

  w.heading("4.2  Peak case of each zone", 11);
  autoTable(w.doc, {
    ...STYLE,
    startY: w.y,
    head: [["Zone", "Peak heating case (largest heat loss)", head("Heat loss", "W", c), "Peak cooling case (largest heat gain)", head("Heat gain", "W", c)]],
    body: b.peaks.map((z) => [
      pdfText(z.name), pdfText(z.heating?.name ?? "no loss in any heating case"), z.heating ? cell(z.heating.W, "W", c) : "–",
      pdfText(z.cooling?.name ?? "no gain in any cooling case"), z.cooling ? cell(z.cooling.W, "W", c) : "–",
    ]),
    columnStyles: { 2: { halign: "right" }, 4: { halign: "right" } },
  });
  w.afterTable(6);
}
