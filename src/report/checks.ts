/** The schedule's checks in the report: the spread between exterior methods and the inside-surface risks. */
import { autoTable } from "jspdf-autotable";
import { METHOD_SENSITIVE_SHARE, methodName, type ExteriorMethod, type RowResult, type ScheduleResults } from "@/calc/index";
import { formatNumber } from "@/units/notation";
import { cell, head, withUnit, type UnitFormatter } from "./format";
import { ACCENT, INK, MUTED, PAGE, Writer } from "./layout";
import { plainWord } from "./plain-words";
import { pdfText } from "./pdf-text";
import { FONT } from "./report-font";
import type { ReportInput } from "./types";

const TABLE = {
  styles: { font: FONT, fontSize: 7, cellPadding: 1, textColor: INK, lineColor: 220, lineWidth: 0.1 },
  headStyles: { fillColor: ACCENT, textColor: 255, fontStyle: "bold" as const },
  margin: { left: PAGE.margin, right: PAGE.margin, bottom: PAGE.margin + PAGE.footer },
  theme: "grid" as const,
};

/** The mark of a method-sensitive row in the surface tables and this list. */
export const SENSITIVE_MARK = "YES";

/** "YES 23 %" for a method-sensitive row, "no 4 %" otherwise; "–" without a spread. */
export function spreadCell(r: RowResult): string {
  const s = r.spread;
  if (s === undefined) return "–";
  const pct = s.Q_spread_ratio === null ? "" : ` ${Math.round(s.Q_spread_ratio * 100)} %`;
  return `${s.sensitive ? SENSITIVE_MARK : "no"}${pct}`;
}

/** A value converted to the report's units by its quantity's rule, without the unit (the column heading names it). */
export const bare = cell;

/** A band "least to greatest" in the report's units, without the unit. */
export function bandCell(min: number, max: number, unit: string, c?: UnitFormatter): string {
  return `${cell(min, unit, c)} to ${cell(max, unit, c)}`;
}

/** A temperature factor f_Rsi (dimensionless, ISO 13788 gives it to two decimals); "–" when ΔT < 1 K. */
export function factorCell(v: number | null | undefined, decimals = 2): string {
  return formatNumber(v, "", { decimals });
}

/** The inside-surface verdict in a table cell. */
export function insideCell(r: RowResult): string {
  const i = r.inside;
  if (i === undefined) return "–";
  return i.condensation_risk ? "CONDENSATION" : i.mould_risk ? "MOULD" : "ok";
}

/** The method-sensitive surface rows of every case, with the h_o and Q of each method. */
export function spreadSection(w: Writer, input: ReportInput, results: ScheduleResults[], section: string): void {
  const c = input.convert;
  const zones = new Map(input.schedule.zones.map((z) => [z.id, z.name]));
  w.heading(`${section}  Spread between methods`);
  w.paragraph(
    `Every surface is also computed by the two exterior methods it does not use (boundary layer, ISO 6946, McAdams). A row is method-sensitive (${SENSITIVE_MARK} in section 5) when the three give heat flows more than ${METHOD_SENSITIVE_SHARE * 100} % of the chosen one apart: there the film coefficient, and the choice of method, matter.`,
    8.5,
    MUTED,
  );
  for (const r of results) {
    const dc = input.designCases.find((d) => d.id === r.design_case_id);
    const rows = r.surfaces.map((s, i) => ({ s, row: input.schedule.surfaces[i] })).filter(({ s }) => s.spread?.sensitive === true);
    w.need(12);
    w.doc.setFont(FONT, "bold").setFontSize(9.5).text(pdfText(dc?.name ?? r.design_case_id), PAGE.margin, w.y + 3);
    w.y += 5;
    if (rows.length === 0) {
      w.paragraph(`No method-sensitive rows in this case: the method choice moves no row's Q by more than ${METHOD_SENSITIVE_SHARE * 100} %.`, 8.5);
      continue;
    }
    const by = (s: RowResult, m: ExteriorMethod) => s.spread!.by_method[m];
    autoTable(w.doc, {
      ...TABLE,
      startY: w.y,
      columnStyles: { ...Object.fromEntries([3, 4, 5, 6, 7, 8].map((i) => [i, { halign: "right" as const }])), 9: { cellWidth: 17 } },
      head: [[
        "Row", "Zone", "Chosen", head("h_o boundary layer", "W/m²K", c), head("h_o ISO 6946", "W/m²K", c), head("h_o McAdams", "W/m²K", c),
        head("Heat loss boundary layer", "W", c), head("Heat loss ISO 6946", "W", c), head("Heat loss McAdams", "W", c), "Spread",
      ].map(pdfText)],
      body: rows.map(({ s, row }) => {
        return [
          row.label, zones.get(row.zone_id) ?? "", methodName(row.method ?? input.schedule.site.method),
          cell(by(s, "boundary_layer").h_o_W_m2K, "W/m²K", c), cell(by(s, "iso6946").h_o_W_m2K, "W/m²K", c), cell(by(s, "mcadams").h_o_W_m2K, "W/m²K", c),
          cell(by(s, "boundary_layer").Q_W, "W", c), cell(by(s, "iso6946").Q_W, "W", c), cell(by(s, "mcadams").Q_W, "W", c), spreadCell(s),
        ].map((x) => pdfText(String(x)));
      }),
    });
    w.afterTable(4);
  }
}

/** Inside-surface risks of a case as warning rows: label, case, kind (in words), message. */
export function insideRiskRows(input: ReportInput, r: ScheduleResults, caseName: string): string[][] {
  const c = input.convert;
  const out: string[][] = [];
  r.surfaces.forEach((s, i) => {
    const x = s.inside;
    if (x === undefined || !(x.mould_risk || x.condensation_risk)) return;
    const code = x.condensation_risk ? "inside_condensation_risk" : "inside_mould_risk";
    const what = x.condensation_risk
      ? `inside surface at ${withUnit(x.T_si_C, "°C", c)}, below the zone air's dew point ${withUnit(x.T_dp_inside_C, "°C", c)}: surface condensation and mould`
      : `inside surface at ${withUnit(x.T_si_C, "°C", c)}, below ${withUnit(x.T_si_min_C, "°C", c)} (surface RH 80 %): mould can grow`;
    const factor = x.f_Rsi === null || x.f_Rsi_min === null ? "" : `; f_Rsi ${factorCell(x.f_Rsi, 3)} < f_Rsi,min ${factorCell(x.f_Rsi_min, 3)} (ISO 13788)`;
    out.push([input.schedule.surfaces[i].label, caseName, plainWord(code), `${what}${factor}`].map(pdfText));
  });
  return out;
}
