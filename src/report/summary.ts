/**
 * The schedule summary: one line per row on landscape pages of at most 40 rows, before the
 * appendix of workings: what a checker reads first, every case of a row side by side.
 */
import { autoTable } from "jspdf-autotable";
import type { ScheduleResults } from "@/calc/index";
import { cell, head, num } from "./format";
import { ACCENT, INK, MUTED, PAGE, Writer } from "./layout";
import { pdfText } from "./pdf-text";
import { FONT } from "./report-font";
import type { ReportInput } from "./types";

export const SUMMARY_ROWS_PER_PAGE = 40;
const LANDSCAPE = { w: PAGE.h, h: PAGE.w };

const STYLE = {
  styles: { font: FONT, fontSize: 6, cellPadding: 0.6, textColor: INK, lineColor: 220, lineWidth: 0.1, overflow: "ellipsize" as const },
  headStyles: { fillColor: ACCENT, textColor: 255, fontStyle: "bold" as const, overflow: "linebreak" as const },
  margin: { left: PAGE.margin, right: PAGE.margin, bottom: PAGE.margin + PAGE.footer },
  theme: "grid" as const,
};

const val = (r: { ok: boolean } & Record<string, unknown>, k: string) => (r.ok ? (r[k] as number) : null);

function chunks<T>(xs: T[], n: number): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < xs.length; i += n) out.push(xs.slice(i, i + n));
  return out;
}

/** A landscape page with the summary's title; `part` counts pages of one sheet. */
function page(w: Writer, title: string, lead: string): void {
  w.doc.addPage("a4", "landscape");
  w.y = PAGE.margin;
  w.doc.setFont(FONT, "bold").setFontSize(12).setTextColor(...ACCENT).text(pdfText(title), PAGE.margin, w.y + 4);
  w.doc.setFont(FONT, "normal").setFontSize(7.5).setTextColor(MUTED).text(pdfText(lead), PAGE.margin, w.y + 9);
  w.doc.setTextColor(INK);
  w.y += 12;
}

const right = (from: number, to: number) => Object.fromEntries(Array.from({ length: to - from }, (_, i) => [from + i, { halign: "right" as const }]));

/** The first heading row: each design case's name over its three columns. */
function caseHeads(before: number, cases: string[], after: number) {
  return [
    { content: "", colSpan: before },
    ...cases.map((n) => ({ content: pdfText(n), colSpan: 3, styles: { halign: "center" as const } })),
    { content: "", colSpan: after },
  ];
}

/** Section 9: surfaces, then duct runs, each in pages of 40 rows; returns to portrait after. */
export function scheduleSummary(w: Writer, input: ReportInput, results: ScheduleResults[]): void {
  const c = input.convert;
  const s = input.schedule;
  const zones = new Map(s.zones.map((z) => [z.id, z.name]));
  const buildups = new Map(s.buildups.map((b) => [b.id, b.name]));
  const cases = results.map((r) => input.designCases.find((d) => d.id === r.design_case_id)?.name ?? r.design_case_id);
  const surfaceIdx = s.surfaces.map((_, i) => i);
  chunks(surfaceIdx, SUMMARY_ROWS_PER_PAGE).forEach((part, p, all) => {
    page(w, `9  Schedule summary: external surfaces${all.length > 1 ? ` (${p + 1} of ${all.length})` : ""}`, "One line per row. Heat loss is positive out of the zone. U and the surface temperature T_s per design case; workings in Appendix A.");
    autoTable(w.doc, {
      ...STYLE,
      startY: w.y,
      tableWidth: LANDSCAPE.w - 2 * PAGE.margin,
      head: [
        caseHeads(5, cases, 2),
        ["Row", "Zone", "Build-up", head("Area", "m²", c), "Tilt/az. (°)", ...cases.flatMap(() => [head("U", "W/m²K", c), head("T_s", "°C", c), head("Heat loss", "W", c)]), "Warnings", "Check"],
      ],
      body: part.map((i) => {
        const row = s.surfaces[i]!;
        const per = results.map((r) => r.surfaces[i]!.result as { ok: boolean } & Record<string, unknown>);
        const warnings = per.reduce((n, r) => n + (r.ok ? (r.warnings as unknown[]).length : 0), 0);
        return [
          row.label, zones.get(row.zone_id) ?? "", buildups.get(row.buildup_id) ?? "", cell(row.area_m2, "m²", c), `${num(row.tilt_deg, "°")}/${num(row.azimuth_deg, "°")}`,
          ...per.flatMap((r) => (r.ok ? [cell(val(r, "U_W_m2K"), "W/m²K", c), cell(val(r, "T_surface_C"), "°C", c), cell(val(r, "Q_W"), "W", c)] : ["error", "", ""])),
          warnings === 0 ? "" : String(warnings), input.checks?.[row.id] ?? "unchecked",
        ].map((x) => pdfText(String(x)));
      }),
      columnStyles: { ...right(3, 5 + 3 * cases.length), 0: { cellWidth: 24 }, 1: { cellWidth: 24 }, 2: { cellWidth: 26 }, 4: { cellWidth: 14, halign: "right" } },
    });
  });
  chunks(s.ductRuns.map((_, i) => i), SUMMARY_ROWS_PER_PAGE).forEach((part, p, all) => {
    page(w, `9  Schedule summary: duct runs${all.length > 1 ? ` (${p + 1} of ${all.length})` : ""}`, "One line per row. Heat to the air is positive when the air warms along the run, negative when it cools.");
    autoTable(w.doc, {
      ...STYLE,
      startY: w.y,
      tableWidth: LANDSCAPE.w - 2 * PAGE.margin,
      head: [
        caseHeads(4, cases, 1),
        ["Row", "Zone served", head("Length", "m", c), head("Flow", "m³/s", c), ...cases.flatMap(() => [head("Leaving air", "°C", c), head("Heat to the air", "W", c), "Condensation"]), "Check"],
      ],
      body: part.map((i) => {
        const row = s.ductRuns[i]!;
        const per = results.map((r) => r.duct_runs[i]!.result as { ok: boolean } & Record<string, unknown>);
        return [
          row.label, zones.get(row.zone_id) ?? "", cell(row.length_m, "m", c), cell(row.flow_m3_s, "m³/s", c),
          ...per.flatMap((r) => (r.ok ? [cell(val(r, "T_leaving_C"), "°C", c), cell(val(r, "Q_W"), "W", c), r.condensation ? "YES" : "no"] : ["error", "", ""])),
          input.checks?.[row.id] ?? "unchecked",
        ].map((x) => pdfText(String(x)));
      }),
      columnStyles: { ...right(2, 4 + 3 * cases.length), 0: { cellWidth: 30 }, 1: { cellWidth: 30 } },
    });
  });
  w.y = w.bottom; // the appendix starts on a new portrait page
}
