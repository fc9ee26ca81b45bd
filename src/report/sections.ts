/** The body of the report: cover, design cases, methods, conventions, totals, row tables, warnings. */
import { autoTable } from "jspdf-autotable";
import { CONVENTIONS } from "@/calc/conventions";
import { exclusionsSentence, type DesignCase, type MethodUsed, type ScheduleResults } from "@/calc/index";
import { withUnit, num } from "./format";
import { ACCENT, CAUTION, INK, MUTED, PAGE, Writer } from "./layout";
import { pdfText } from "./pdf-text";
import type { ReportInput } from "./types";

const TABLE = {
  styles: { font: "helvetica", fontSize: 7.5, cellPadding: 1.2, textColor: INK, lineColor: 220, lineWidth: 0.1 },
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
  doc.setFont("helvetica", "normal").setFontSize(11).setTextColor(MUTED).text("CALCULATION REPORT", PAGE.margin, w.y);
  w.y += 12;
  doc.setFont("helvetica", "bold").setFontSize(24).setTextColor(INK);
  for (const line of doc.splitTextToSize(pdfText(m.projectName), PAGE.w - 2 * PAGE.margin) as string[]) {
    doc.text(line, PAGE.margin, w.y);
    w.y += 10;
  }
  doc.setFont("helvetica", "normal").setFontSize(11).text(pdfText("External surfaces and duct runs: film coefficients, surface temperatures, heat flows and condensation"), PAGE.margin, w.y);
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
    head: [["Case", "Kind", "Outdoor", "RH", "Wind at mast", "From", "Solar (horizontal)"]],
    body: clean(
      input.designCases.map((d) => [
        d.name, d.kind, withUnit(d.T_outdoor_C, "°C", c, 3), `${num(d.RH_outdoor_pct, 3)} %`, withUnit(d.V_met_m_s, "m/s", c, 3),
        `${num(d.wind_from_deg, 3)}°`, withUnit(d.solar_W_m2.horizontal ?? 0, "W/m²", c, 3),
      ]),
    ),
  });
  w.afterTable();
}

export function methodStatement(w: Writer, methods: MethodUsed[]): void {
  w.heading("2  Method statement");
  w.paragraph("Every method used for the results of this report, with its equation, published source and the range in which it was published. Uses outside that range are listed in section 8.", 8.5, MUTED);
  autoTable(w.doc, {
    ...TABLE,
    startY: w.y,
    head: [["Method", "Equation", "Validity", "Source"]],
    columnStyles: { 0: { cellWidth: 38 }, 1: { cellWidth: 52 }, 2: { cellWidth: 30 } },
    body: clean(methods.map((m) => [m.title, m.equation, m.validity, m.source])),
  });
  w.afterTable();
}

export function conventions(w: Writer): void {
  w.heading("3  Assumptions and conventions");
  autoTable(w.doc, {
    ...TABLE,
    startY: w.y,
    columnStyles: { 0: { cellWidth: 38, fontStyle: "bold" } },
    body: clean(CONVENTIONS.map((c) => [c.topic, c.text])),
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
    w.doc.setFont("helvetica", "bold").setFontSize(9.5).text(pdfText(dc?.name ?? r.design_case_id), PAGE.margin, w.y + 3);
    w.y += 5;
    autoTable(w.doc, {
      ...TABLE,
      startY: w.y,
      styles: { ...TABLE.styles, fontSize: 7 },
      head: [["Zone", "Floor area", "Fabric loss", "Distribution loss", "Heat loss", "Fabric gain", "Distribution gain", "Heat gain", "Loss / gain per floor area", ""]],
      columnStyles: { 9: { cellWidth: 30 } },
      body: clean(
        r.zones.map((z) => [
          z.name, withUnit(z.floor_area_m2, "m²", c), withUnit(z.surfaces_loss_W, "W", c), withUnit(z.ducts_loss_W, "W", c), withUnit(z.loss_W, "W", c),
          withUnit(z.surfaces_gain_W, "W", c), withUnit(z.ducts_gain_W, "W", c), withUnit(z.gain_W, "W", c),
          `${withUnit(z.loss_W_m2, "W/m²", c)} / ${withUnit(z.gain_W_m2, "W/m²", c)}`, "",
        ]),
      ),
      didParseCell: (data) => {
        if (data.section === "body" && (data.column.index === 4 || data.column.index === 7)) data.cell.styles.fontStyle = "bold";
      },
      didDrawCell: (data) => {
        if (data.section !== "body" || data.column.index !== 9) return;
        const z = r.zones[data.row.index];
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
  w.paragraph("Bars: heat loss (upper, blue) and heat gain (lower, orange), to one scale across all cases.", 7.5, MUTED);
  w.paragraph(
    "Fabric: surfaces to outside air. Distribution: duct runs crossing unconditioned or outdoor space, on their own line; a duct run inside the zone it serves gives its heat to that zone and is left out of its totals. Surfaces over ground are not computed (ISO 13370) and are not in the totals.",
    7.5,
    MUTED,
  );
  w.paragraph(exclusionsSentence(), 8, INK);
}
