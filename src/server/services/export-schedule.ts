import "server-only";
import ExcelJS from "exceljs";
import Papa from "papaparse";
import { ENGINEERING_CAUTION } from "@/components/engineering-caution";
import type { ScheduleResults } from "@/calc/index";
import { labelOf } from "@/schemas/schedule-fields";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import { CSV_ESCAPE_FORMULAE } from "@/schedule/csv-formulae";
import { resultsFor } from "@/schedule/engine-schedule";
import { RESULT_COLUMNS, resultHeader, resultValue } from "@/schedule/result-columns";
import { SHEET_COLUMNS, SHEET_TITLES, columnHeader, flagLabel, type SheetColumn } from "@/schedule/sheet-columns";
import type { Actor } from "@/server/auth/actor";
import { AppError } from "@/server/http/app-error";
import { toDisplay, type UnitSystem } from "@/units/units";
import { getScheduleOrThrow } from "./get-schedule";

export interface ExportOptions {
  format: "csv" | "xlsx";
  /** One sheet (required for CSV); XLSX without it holds both. */
  sheet?: TSheet;
  /** Headings only, for filling in. */
  template: boolean;
  /** A design case whose results are appended (ignored by the importer). */
  caseId?: string;
}

export interface ExportFile {
  filename: string;
  contentType: string;
  body: Uint8Array<ArrayBuffer>;
}

type Cell = string | number | null;

function inputCell(col: SheetColumn, row: Record<string, unknown>, system: UnitSystem, names: Map<string, string>): Cell {
  const v = row[col.field];
  if (v === null || v === undefined) return null;
  switch (col.kind) {
    case "number":
      // Ten significant figures: exact enough to round-trip, without 0.30000000000000004 noise.
      return Number(toDisplay(col.spec!.quantity, v as number, system).toPrecision(10));
    case "zone":
    case "buildup":
      return names.get(v as string) ?? String(v);
    case "choice":
      return labelOf(col.options!, v as string);
    case "flag":
      return flagLabel(v);
    default:
      return String(v);
  }
}

function sheetTable(s: TSchedule, sheet: TSheet, template: boolean, results: ScheduleResults | null, caseName: string): Cell[][] {
  const system = s.project.unit_system;
  const cols = SHEET_COLUMNS[sheet];
  const extra = results ? RESULT_COLUMNS[sheet] : [];
  const header: Cell[] = [...cols.map((c) => columnHeader(c, system)), ...extra.map((c) => `${resultHeader(c, system)} — ${caseName}`)];
  if (template) return [header];
  const names = new Map([...s.zones, ...s.buildups].map((n) => [n.id, n.name]));
  const rows = sheet === "surfaces" ? s.surfaces : s.duct_runs;
  const byId = new Map((results ? (sheet === "surfaces" ? results.surfaces : results.duct_runs) : []).map((r) => [r.row_id, r.result]));
  const body = rows.map((row) => [
    ...cols.map((c) => inputCell(c, row as unknown as Record<string, unknown>, system, names)),
    ...extra.map((c) => {
      const v = resultValue(c, byId.get(row.id), system);
      return typeof v === "number" ? Number(v.toPrecision(6)) : v;
    }),
  ]);
  return [header, ...body];
}

function readMe(ws: ExcelJS.Worksheet, s: TSchedule): void {
  const system = s.project.unit_system;
  ws.columns = [{ width: 28 }, { width: 90 }];
  const lines: [string, string][] = [
    ["Project", `${s.project.reference} — ${s.project.name}`],
    ["Units", system === "SI" ? "SI: headings name each column's unit" : "IP: headings name each column's unit"],
    ["Importing", "Columns are matched by heading (name and unit, SI or IP). Blank cells in optional columns mean what the column says; extra columns are ignored."],
    ["Zones", s.zones.map((z) => z.name).join("; ") || "none yet"],
    ["Build-ups", s.buildups.map((b) => b.name).join("; ") || "none yet"],
  ];
  for (const sheet of ["surfaces", "duct_runs"] as const) {
    for (const c of SHEET_COLUMNS[sheet]) {
      const blank = c.blankValue === undefined ? "" : `; blank = ${typeof c.blankValue === "boolean" ? flagLabel(c.blankValue) : labelOf(c.options!, c.blankValue)}`;
      const allowed = c.options ? `one of: ${c.options.map((o) => o.label).join(", ")}${blank}` : c.spec?.blank ? `blank = ${c.spec.blank}` : c.optional ? `blank = ${c.blankLabel}` : "required";
      lines.push([`${SHEET_TITLES[sheet]}: ${columnHeader(c, system)}`, allowed]);
    }
  }
  lines.push(["Caution", ENGINEERING_CAUTION]);
  for (const l of lines) ws.addRow(l);
  ws.getColumn(1).font = { bold: true };
}

/** The schedule (or an empty template) as CSV or XLSX, in the project's unit system. */
export async function exportSchedule(actor: Actor, projectId: string, opts: ExportOptions): Promise<ExportFile> {
  const s = await getScheduleOrThrow(actor, projectId);
  const dc = opts.caseId ? s.design_cases.find((d) => d.id === opts.caseId) : undefined;
  if (opts.caseId && !dc) throw new AppError("not_found", "No design case with that id in this project");
  const results = dc && !opts.template ? resultsFor(s, dc) : null;
  const base = `${s.project.reference}-${opts.template ? "template" : "schedule"}`.replace(/[^A-Za-z0-9._-]+/g, "-");
  if (opts.format === "csv") {
    if (!opts.sheet) throw new AppError("invalid_input", "Say which sheet to export as CSV", [{ field: "query.sheet", message: "sheet must be surfaces or duct_runs for a CSV" }]);
    // Text that a spreadsheet would run as a formula gets a leading quote (see csv-formulae.ts).
    const csv = Papa.unparse(sheetTable(s, opts.sheet, opts.template, results, dc?.name ?? ""), { escapeFormulae: CSV_ESCAPE_FORMULAE });
    // The byte-order mark lets spreadsheet programs read m², ° and · as UTF-8.
    return { filename: `${base}-${opts.sheet}.csv`, contentType: "text/csv; charset=utf-8", body: new TextEncoder().encode(`\uFEFF${csv}\r\n`) };
  }
  const wb = new ExcelJS.Workbook();
  wb.creator = "Filmsheet";
  for (const sheet of opts.sheet ? [opts.sheet] : (["surfaces", "duct_runs"] as const)) {
    const ws = wb.addWorksheet(SHEET_TITLES[sheet], { views: [{ state: "frozen", ySplit: 1 }] });
    ws.addRows(sheetTable(s, sheet, opts.template, results, dc?.name ?? ""));
    ws.getRow(1).font = { bold: true };
    ws.columns.forEach((c) => (c.width = 16));
  }
  readMe(wb.addWorksheet("Read me"), s);
  const body = new Uint8Array(await wb.xlsx.writeBuffer());
  return { filename: `${base}.xlsx`, contentType: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", body };
}
