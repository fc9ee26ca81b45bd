/** Row tables per design case, the warnings list and the appendix of workings. */
import { autoTable } from "jspdf-autotable";
import { MAX_INSULATION_M } from "@/calc/duct-run";
import type { CalcWarning, DesignCase, ScheduleResults, Working } from "@/calc/index";
import { bandCell, bare, factorCell, insideCell, insideRiskRows, spreadCell } from "./checks";
import { cell, head, num, withUnit } from "./format";
import { plainText, plainWord } from "./plain-words";
import { ACCENT, INK, MUTED, PAGE, Writer } from "./layout";
import { pdfText } from "./pdf-text";
import { FONT } from "./report-font";
import type { ReportInput } from "./types";

const TABLE = {
  styles: { font: FONT, fontSize: 6.5, cellPadding: 0.9, textColor: INK, lineColor: 220, lineWidth: 0.1 },
  headStyles: { fillColor: ACCENT, textColor: 255, fontStyle: "bold" as const },
  margin: { left: PAGE.margin, right: PAGE.margin, bottom: PAGE.margin + PAGE.footer },
  theme: "grid" as const,
};

/** Numbers right-aligned, so that digits line up down a column. */
const NUMERIC = (columns: number[]) => Object.fromEntries(columns.map((i) => [i, { halign: "right" as const }]));

const val = (r: { ok: boolean } & Record<string, unknown>, k: string) => (r.ok ? (r[k] as number) : null);

/** The design case's name above its table. */
function caseTitle(w: Writer, input: ReportInput, r: ScheduleResults): void {
  const dc = input.designCases.find((d) => d.id === r.design_case_id);
  w.need(14);
  w.doc.setFont(FONT, "bold").setFontSize(9.5).text(pdfText(dc?.name ?? ""), PAGE.margin, w.y + 3);
  w.y += 5;
}

/** Section 5, one table per design case; yields after each (a large table takes a while). */
export function* surfaceTables(w: Writer, input: ReportInput, results: ScheduleResults[]): Generator<void, void> {
  const c = input.convert;
  const zones = new Map(input.schedule.zones.map((z) => [z.id, z.name]));
  w.heading("5  External surfaces");
  for (const r of results) {
    caseTitle(w, input, r);
    autoTable(w.doc, {
      ...TABLE,
      startY: w.y,
      head: [[
        "Row", "Zone", head("Area", "m²", c), "Tilt/azimuth (°)", head("Wind at surface", "m/s", c), `${head("h_o", "W/m²K", c)}, band`, head("U", "W/m²K", c), head("T_s", "°C", c),
        `${head("Heat loss, + out", "W", c)}, band`, "Method-sensitive", head("T_si", "°C", c), "f_Rsi / min", "Inside", "Check",
      ].map(pdfText)],
      columnStyles: { 0: { cellWidth: 22 }, 1: { cellWidth: 16 }, 4: { cellWidth: 11 }, 5: { cellWidth: 15 }, 8: { cellWidth: 17 }, 9: { cellWidth: 15 }, 11: { cellWidth: 15 }, 12: { cellWidth: 22 }, ...NUMERIC([2, 3, 4, 5, 6, 7, 8, 10, 11]) },
      body: r.surfaces.map((s, i) => {
        const row = input.schedule.surfaces[i];
        const res = s.result as { ok: boolean } & Record<string, unknown>;
        const check = input.checks?.[row.id] ?? "unchecked";
        const lead = [row.label, zones.get(row.zone_id) ?? "", bare(row.area_m2, "m²", c), `${num(row.tilt_deg, "°")}/${num(row.azimuth_deg, "°")}`].map(pdfText);
        if (!res.ok) {
          const e = (s.result as { error?: { code: string; field: string; message: string } }).error;
          const why = e?.code === "not_computed" && e.field === "exposed_to" ? "Not computed: over ground (ISO 13370); not in the totals" : e?.code === "not_computed" ? `Not computed: ${e.message}` : `error: ${e?.message ?? ""}`;
          return [...lead, { content: pdfText(why), colSpan: 9 }, check];
        }
        const sp = s.spread;
        const ins = s.inside;
        return [
          ...lead,
          ...[
            bare(val(res, "V_surface_m_s"), "m/s", c),
            `${bare(val(res, "h_o_W_m2K"), "W/m²K", c)}${sp ? `\n${bandCell(sp.h_o_min_W_m2K, sp.h_o_max_W_m2K, "W/m²K", c)}` : ""}`,
            bare(val(res, "U_W_m2K"), "W/m²K", c), bare(val(res, "T_surface_C"), "°C", c),
            `${bare(val(res, "Q_W"), "W", c)}${sp ? `\n${bandCell(sp.Q_min_W, sp.Q_max_W, "W", c)}` : ""}`,
            spreadCell(s), bare(ins?.T_si_C, "°C", c), ins ? `${factorCell(ins.f_Rsi)} / ${factorCell(ins.f_Rsi_min)}` : "–", insideCell(s), check,
          ].map((x) => pdfText(String(x))),
        ];
      }),
      didParseCell: (data) => {
        if (data.section !== "body") return;
        const s = r.surfaces[data.row.index];
        if (data.column.index === 9 && s?.spread?.sensitive) data.cell.styles.fontStyle = "bold";
        if (data.column.index === 12 && s?.inside && (s.inside.mould_risk || s.inside.condensation_risk)) {
          data.cell.styles.fontStyle = "bold";
          data.cell.styles.textColor = [170, 30, 30];
        }
      },
    });
    w.afterTable();
    yield;
  }
  w.paragraph(
    "h_o and Q: the chosen method, with the band (least to greatest) over the three exterior methods beneath. Method-sensitive: the band of Q as a share of the chosen Q, YES above 10 % and 1 W/m² (section 7, Spread between methods). T_si and f_Rsi: the inside face against the zone air (ISO 13788); f_Rsi,min is the factor needed against mould (surface RH 80 %).",
    7.5,
    MUTED,
  );
}

/** Section 6, one table per design case; yields after each. */
export function* ductTables(w: Writer, input: ReportInput, results: ScheduleResults[]): Generator<void, void> {
  const c = input.convert;
  const zones = new Map(input.schedule.zones.map((z) => [z.id, z.name]));
  w.heading("6  Duct runs");
  for (const r of results) {
    caseTitle(w, input, r);
    autoTable(w.doc, {
      ...TABLE,
      startY: w.y,
      head: [["Row", "Zone served", head("Length", "m", c), head("Flow", "m³/s", c), head("Leaving air", "°C", c), head("Heat to the air, + warms", "W", c), head("Lowest T_s", "°C", c), head("Dew point", "°C", c), "Condensation", head("Least insulation", "m", c), "Check"]],
      body: r.duct_runs.map((s, i) => {
        const row = input.schedule.ductRuns[i];
        const res = s.result as { ok: boolean } & Record<string, unknown>;
        const tmin = res.ok ? Math.min(res.T_surface_entering_C as number, res.T_surface_leaving_C as number) : null;
        const tmi = res.ok ? (res.min_insulation_thickness_m as number | null) : null;
        return [
          row.label, zones.get(row.zone_id) ?? "", cell(row.length_m, "m", c), cell(row.flow_m3_s, "m³/s", c),
          cell(val(res, "T_leaving_C"), "°C", c), cell(val(res, "Q_W"), "W", c), cell(tmin, "°C", c), cell(val(res, "T_dp_C"), "°C", c),
          res.ok ? (res.condensation ? "YES" : "no") : "error", res.ok ? (tmi === null ? `> ${cell(MAX_INSULATION_M, "m", c)}` : cell(tmi, "m", c)) : "–",
          input.checks?.[row.id] ?? "unchecked",
        ].map((x) => pdfText(String(x)));
      }),
      columnStyles: NUMERIC([2, 3, 4, 5, 6, 7, 9]),
    });
    w.afterTable();
    yield;
  }
}

export function warningsList(w: Writer, input: ReportInput, results: ScheduleResults[]): number {
  w.heading("8  Warnings");
  const rows: string[][] = [];
  for (const r of results) {
    const dc = input.designCases.find((d) => d.id === r.design_case_id)?.name ?? "";
    const add = (label: string, warnings: CalcWarning[]) => {
      for (const x of warnings) rows.push([label, dc, plainWord(x.code), plainText(x.message)].map(pdfText));
    };
    r.surfaces.forEach((s, i) => s.result.ok && add(input.schedule.surfaces[i].label, s.result.warnings));
    r.duct_runs.forEach((s, i) => s.result.ok && add(input.schedule.ductRuns[i].label, s.result.warnings));
    rows.push(...insideRiskRows(input, r, dc));
  }
  if (rows.length === 0) {
    w.paragraph("No correlation was used outside its published range, every balance converged, and no inside surface is at risk of mould or condensation.", 9);
    return 0;
  }
  w.paragraph(`${rows.length} warnings. Each is an extrapolation, a non-converged balance or an inside surface at risk of mould or condensation (ISO 13788), to be reviewed before the results are relied on.`, 8.5, MUTED);
  autoTable(w.doc, { ...TABLE, startY: w.y, head: [["Row", "Case", "Kind", "Message"]], columnStyles: { 3: { cellWidth: 110 } }, body: rows });
  w.afterTable();
  return rows.length;
}

/**
 * Appendix: the working of every row in every design case, two columns of compact lines. A
 * generator: it yields the number of workings written after every `every` of them, so a caller
 * can report progress (and let other work run) while a large appendix is written.
 */
export function* workingsAppendix(
  w: Writer,
  input: ReportInput,
  items: { label: string; dc: DesignCase; working: Working }[],
  every = 25,
  refs: ReadonlyMap<string, string> = new Map(),
): Generator<number, void> {
  w.newPage();
  w.heading("Appendix A  Workings");
  w.paragraph("Each row's derivation for each design case, in calculation order, as the engine computed it (inputs are in sections 5 and 6, the spread between methods in sections 5 and 7).", 8, MUTED);
  const doc = w.doc;
  const colW = (PAGE.w - 2 * PAGE.margin - 6) / 2;
  const lh = 2.55;
  // About 1.1 mm per character at 6.3 pt: shorter lines need no measuring to fit the column.
  const safeChars = Math.floor(colW / 1.25);
  const firstPage = doc.getNumberOfPages();
  const top = w.y;
  let col = 0;
  // Lines of one style are printed together in one text() call: far fewer calls on large reports.
  let run: string[] = [];
  let runStyle = "";
  let runY = w.y;
  const flush = () => {
    if (run.length === 0) return;
    const [font, color] = runStyle.split("|");
    doc.setFont(FONT, font).setTextColor(Number(color));
    doc.text(run, PAGE.margin + col * (colW + 6), runY + 2, { lineHeightFactor: lh / (6.3 * 0.3528) });
    run = [];
  };
  const line = (text: string, bold = false, color = INK) => {
    if (w.y + lh > w.bottom) {
      flush();
      if (col === 0) col = 1;
      else {
        doc.addPage("a4", "portrait");
        col = 0;
      }
      w.y = col === 1 && doc.getNumberOfPages() === firstPage ? top : PAGE.margin;
    }
    const style = `${bold ? "bold" : "normal"}|${color}`;
    if (style !== runStyle || run.length === 0) {
      flush();
      runStyle = style;
      runY = w.y;
    }
    run.push(text);
    w.y += lh;
  };
  const wrapped = (text: string) => {
    if (text.length <= safeChars) line(text);
    else for (const part of doc.splitTextToSize(text, colW) as string[]) line(part);
  };
  doc.setFontSize(6.3);
  let written = 0;
  for (const it of items) {
    if (w.y + lh * 6 > w.bottom) w.y = w.bottom; // start a block at the top of the next column
    line(pdfText(`${it.label} — ${it.dc.name}`), true, ACCENT[0]);
    let section = "";
    for (const l of it.working.lines) {
      // Inputs are in sections 5 and 6, and each row's spread between methods in sections 5 and 7.
      if (l.section === "Inputs" || l.section === "Spread between methods") continue;
      if (l.section !== section) {
        section = l.section;
        line(pdfText(section), true, MUTED);
      }
      wrapped(pdfText(appendixLine(l, input, refs)));
    }
    w.y += lh * 0.6;
    if (run.length > 0) {
      flush();
      runY = w.y;
    }
    if (++written % every === 0) yield written;
  }
  flush();
}

/** One line of a working in the appendix: symbol, value in the project's units, how it follows, [M#]. */
function appendixLine(l: Working["lines"][number], input: ReportInput, refs: ReadonlyMap<string, string>): string {
  const v =
    typeof l.value === "number"
      ? withUnit(l.value, l.unit, input.convert)
      : `${typeof l.value === "string" ? plainWord(l.value) : l.value === null ? "–" : l.value ? "yes" : "no"}${l.unit ? ` ${l.unit}` : ""}`;
  const ref = l.method === undefined ? "" : ` [${refs.get(l.method) ?? plainWord(l.method)}]`;
  return `${l.symbol} = ${v}${l.note ? `   ${plainText(l.note)}` : ""}${ref}`;
}
