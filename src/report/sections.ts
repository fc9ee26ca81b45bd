/** The body of the report: cover, design cases, methods, conventions, totals, row tables, warnings. */
import { autoTable } from "jspdf-autotable";
import { CONVENTIONS } from "@/calc/conventions";
import { exclusionsSentence, type DesignCase, type MethodUsed, type ScheduleResults } from "@/calc/index";
import { cell, head, num, withUnit } from "./format";
import { plainText, plainWord } from "./plain-words";
import { ACCENT, CAUTION, INK, MUTED, PAGE, Writer } from "./layout";
import { pdfText } from "./pdf-text";
import { FONT } from "./report-font";
import type { ReportInput } from "./types";

const TABLE = {
  styles: { font: FONT, fontSize: 7.5, cellPadding: 1.2, textColor: INK, lineColor: 220, lineWidth: 0.1 },
  headStyles: { fillColor: ACCENT, textColor: 255, fontStyle: "bold" as const },
  margin: { left: PAGE.margin, right: PAGE.margin, bottom: PAGE.margin + PAGE.footer },
  theme: "grid" as const,
};

const clean = (rows: (string | number)[][]) => rows.map((r) => r.map((c) => (typeof c === "string" ? pdfText(c) : c)));

export function cover(w: Writer, input: ReportInput): void {
  const m = input.meta;
  const doc = w.doc;
  doc.setFillColor(...ACCENT).rect(0, 0, PAGE.w, 8, "F");
  w.y = 40;
  doc.setFont(FONT, "normal").setFontSize(11).setTextColor(MUTED).text("CALCULATION REPORT", PAGE.margin, w.y);
  w.y += 12;
  doc.setFont(FONT, "bold").setFontSize(24).setTextColor(INK);
  for (const line of doc.splitTextToSize(pdfText(m.projectName), PAGE.w - 2 * PAGE.margin) as string[]) {
    doc.text(line, PAGE.margin, w.y);
    w.y += 10;
  }
  doc.setFont(FONT, "normal").setFontSize(11).text(pdfText("External surfaces and duct runs: film coefficients, surface temperatures, heat flows and condensation"), PAGE.margin, w.y);
  w.y += 14;
  autoTable(doc, {
    ...TABLE,
    startY: w.y,
    theme: "plain",
    styles: { ...TABLE.styles, fontSize: 10, cellPadding: 1.6 },
    columnStyles: { 0: { cellWidth: 45, textColor: MUTED } },
    body: clean([
      ["Project reference", m.projectReference],
      ["Site", m.siteDescription],
      ["Firm", m.firmName],
      ["Revision", m.revision === null ? "Draft (not a revision)" : m.revision],
      ["Status", m.status === "issued" ? "Issued" : "Draft"],
      ["Prepared by", m.author],
      ["Checked by", m.checker ?? "Not checked"],
      ...(m.allAccepted === true && m.status === "draft" ? [["Check", "Every row accepted; not yet issued as a revision"]] : []),
      ["Date", m.date],
      ["Units", m.unitSystem === "IP" ? "IP (inch-pound)" : "SI"],
      ["Rows", `${input.schedule.surfaces.length} surfaces, ${input.schedule.ductRuns.length} duct runs, ${input.designCases.length} design cases`],
    ]),
  });
  w.afterTable(10);
  doc.setDrawColor(...ACCENT).setLineWidth(0.4).rect(PAGE.margin, w.y, PAGE.w - 2 * PAGE.margin, 16);
  w.y += 4;
  w.paragraph(`Engineering caution. ${CAUTION}`, 9, INK, 4);
}

export function designCases(w: Writer, input: ReportInput): void {
  const c = input.convert;
  w.heading("1  Design cases");
  autoTable(w.doc, {
    ...TABLE,
    startY: w.y,
    head: [["Case", "Kind", head("Outdoor", "°C", c), "RH (%)", head("Wind at mast", "m/s", c), "From (°)", head("Solar (horizontal)", "W/m²", c)]],
    body: clean(
      input.designCases.map((d) => [
        d.name, plainWord(d.kind), cell(d.T_outdoor_C, "°C", c), num(d.RH_outdoor_pct, "%"), cell(d.V_met_m_s, "m/s", c),
        num(d.wind_from_deg, "°"), cell(d.solar_W_m2.horizontal ?? 0, "W/m²", c),
      ]),
    ),
    columnStyles: { 2: { halign: "right" }, 3: { halign: "right" }, 4: { halign: "right" }, 5: { halign: "right" }, 6: { halign: "right" } },
  });
  w.afterTable();
}

/** Short references M1, M2 … of the methods, in the order the method statement lists them. */
export function methodRefs(methods: MethodUsed[]): Map<string, string> {
  return new Map(methods.map((m, i) => [m.id, `M${i + 1}`]));
}

export function methodStatement(w: Writer, methods: MethodUsed[]): void {
  w.heading("2  Method statement");
  w.paragraph("Every method used for the results of this report, with its equation, published source and the range in which it was published; the workings in Appendix A cite each by its reference (M1 …), and Appendix B gives the identifier the software records for each. Uses outside a range are listed in section 8.", 8.5, MUTED);
  const refs = methodRefs(methods);
  autoTable(w.doc, {
    ...TABLE,
    startY: w.y,
    head: [["Ref.", "Method", "Equation", "Validity", "Source"]],
    columnStyles: { 0: { cellWidth: 9 }, 1: { cellWidth: 36 }, 2: { cellWidth: 50 }, 3: { cellWidth: 30 } },
    body: clean(methods.map((m) => [refs.get(m.id) ?? "", m.title, m.equation, plainText(m.validity), m.source])),
  });
  w.afterTable();
}

export function conventions(w: Writer): void {
  w.heading("3  Assumptions and conventions");
  autoTable(w.doc, {
    ...TABLE,
    startY: w.y,
    columnStyles: { 0: { cellWidth: 38, fontStyle: "bold" } },
    body: clean(CONVENTIONS.map((c) => [c.topic, plainText(c.text)])),
  });
  w.afterTable();
}

/** Zone totals per case, with a bar of loss and gain per zone drawn to one scale. */
export function zoneTotals(w: Writer, input: ReportInput, results: ScheduleResults[]): void {
  const c = input.convert;
  w.heading("4  Zone totals");
  const max = Math.max(1, ...results.flatMap((r) => r.zones.flatMap((z) => [z.loss_W, z.gain_W])));
  for (const r of results) {
    const dc = input.designCases.find((d) => d.id === r.design_case_id);
    w.need(20);
    w.doc.setFont(FONT, "bold").setFontSize(9.5).text(pdfText(dc?.name ?? r.design_case_id), PAGE.margin, w.y + 3);
    w.y += 5;
    autoTable(w.doc, {
      ...TABLE,
      startY: w.y,
      styles: { ...TABLE.styles, fontSize: 7 },
      head: [["Zone", head("Floor area", "m²", c), head("Fabric loss", "W", c), head("Distribution loss", "W", c), head("Heat loss", "W", c), head("Fabric gain", "W", c), head("Distribution gain", "W", c), head("Heat gain", "W", c), `${head("Loss / gain per floor area", "W/m²", c)}`, ""]],
      columnStyles: { ...Object.fromEntries([1, 2, 3, 4, 5, 6, 7, 8].map((i) => [i, { halign: "right" as const }])), 9: { cellWidth: 30 } },
      // A zone's line is never split over two pages: its bar belongs beside its numbers.
      rowPageBreak: "avoid",
      body: clean(
        r.zones.map((z) => [
          z.name, cell(z.floor_area_m2, "m²", c), cell(z.surfaces_loss_W, "W", c), cell(z.ducts_loss_W, "W", c), cell(z.loss_W, "W", c),
          cell(z.surfaces_gain_W, "W", c), cell(z.ducts_gain_W, "W", c), cell(z.gain_W, "W", c),
          `${cell(z.loss_W_m2, "W/m²", c)} / ${cell(z.gain_W_m2, "W/m²", c)}`, "",
        ]),
      ),
      didParseCell: (data) => {
        if (data.section === "body" && (data.column.index === 4 || data.column.index === 7)) data.cell.styles.fontStyle = "bold";
      },
      didDrawCell: (data) => {
        if (data.section !== "body" || data.column.index !== 9) return;
        const z = r.zones[data.row.index];
        if (z === undefined) return; // the rest of a row split over a page (index -1): its bar is drawn once
        const x = data.cell.x + 1;
        const full = data.cell.width - 2;
        const h = (data.cell.height - 1.5) / 2;
        w.doc.setFillColor(40, 90, 170).rect(x, data.cell.y + 0.5, (full * z.loss_W) / max, h, "F");
        w.doc.setFillColor(200, 110, 30).rect(x, data.cell.y + 0.8 + h, (full * z.gain_W) / max, h, "F");
      },
    });
    w.afterTable(2);
    const inZone = r.zones.filter((z) => z.ducts_in_zone_W !== 0);
    if (inZone.length > 0) {
      const list = inZone.map((z) => `${z.name} ${withUnit(Math.abs(z.ducts_in_zone_W), "W", c)} ${z.ducts_in_zone_W >= 0 ? "to" : "from"} the zone`).join("; ");
      w.paragraph(`Ducts inside the zone they serve, for reference, not in the totals: ${list}.`, 7.5, MUTED);
    }
    w.y += 2;
  }
  w.paragraph("Heat loss adds up the surfaces' heat flows out of the zone (positive out) and heat gain those into it; a duct run's heat to its air counts as the zone's gain when it warms the air and as its loss when it cools it. Bars: heat loss (upper, blue) and heat gain (lower, orange), to one scale across all cases.", 7.5, MUTED);
  w.paragraph(
    "Fabric: surfaces to outside air. Distribution: duct runs crossing unconditioned or outdoor space, on their own line; a duct run inside the zone it serves gives its heat to that zone and is left out of its totals. Surfaces over ground are not computed (ISO 13370) and are not in the totals.",
    7.5,
    MUTED,
  );
  w.paragraph(exclusionsSentence(), 8, INK);
}

/** Appendix B: the identifier the software records for each method (API, exports, audit trail). */
export function methodIdentifiers(w: Writer, methods: MethodUsed[]): void {
  const refs = methodRefs(methods);
  w.newPage();
  w.heading("Appendix B  Method identifiers");
  w.paragraph("The identifier under which each method of section 2 is recorded in the software, its exports and its interface.", 8, MUTED);
  autoTable(w.doc, {
    ...TABLE,
    startY: w.y,
    head: [["Ref.", "Method", "Identifier"]],
    columnStyles: { 0: { cellWidth: 12 }, 2: { cellWidth: 55 } },
    body: clean(methods.map((m) => [refs.get(m.id) ?? "", m.title, m.id])),
  });
  w.afterTable();
}
