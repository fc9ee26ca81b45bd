import "server-only";
import ExcelJS from "exceljs";
import Papa from "papaparse";
import { ENGINEERING_CAUTION } from "@/components/engineering-caution";
import { caseRowsOf, exclusionsSentence, scheduleBreakdowns, type ScheduleResults } from "@/calc/index";
import { labelOf } from "@/schemas/schedule-fields";
import type { TDesignCase, TSchedule, TSheet } from "@/schemas/schedule";
import { BREAKDOWNS_SHEET, breakdownsTable } from "@/schedule/breakdowns-table";
import { CSV_ESCAPE_FORMULAE } from "@/schedule/csv-formulae";
import { engineDesignCase, engineSchedule, resultsFor } from "@/schedule/engine-schedule";
import { RESULT_COLUMNS, resultBand, resultHeader, resultValue, rowProblem, type ResultColumn, type RowOutcome } from "@/schedule/result-columns";
import { SHEET_COLUMNS, SHEET_TITLES, columnHeader, flagLabel, type SheetColumn } from "@/schedule/sheet-columns";
import type { Actor } from "@/server/auth/actor";
import { AppError } from "@/server/http/app-error";
import { toDisplay, unitLabel, type UnitSystem } from "@/units/units";
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

/** A band is two numeric columns in a file (least and greatest), so a spreadsheet can compute with them. */
function exportHeaders(c: ResultColumn, system: UnitSystem): string[] {
  if (!c.band) return [resultHeader(c, system)];
  return [resultHeader({ ...c, title: `${c.title}, least` }, system), resultHeader({ ...c, title: `${c.title}, greatest` }, system)];
}

function exportCells(c: ResultColumn, r: RowOutcome | undefined, system: UnitSystem): Cell[] {
  const round = (v: number | string | null) => (typeof v === "number" ? Number(v.toPrecision(6)) : v);
  if (!c.band) return [round(resultValue(c, r, system))];
  const b = resultBand(c, r, system);
  return b === null ? [null, null] : [round(b[0]), round(b[1])];
}

function sheetTable(s: TSchedule, sheet: TSheet, template: boolean, results: ScheduleResults | null, caseName: string): Cell[][] {
  const system = s.project.unit_system;
  const cols = SHEET_COLUMNS[sheet];
  const extra = results ? RESULT_COLUMNS[sheet] : [];
  const header: Cell[] = [...cols.map((c) => columnHeader(c, system)), ...extra.flatMap((c) => exportHeaders(c, system).map((h) => `${h} — ${caseName}`))];
  if (results) header.push(`Notes — ${caseName}`);
  if (template) return [header];
  const names = new Map([...s.zones, ...s.buildups].map((n) => [n.id, n.name]));
  const rows = sheet === "surfaces" ? s.surfaces : s.duct_runs;
  const byId = new Map((results ? (sheet === "surfaces" ? results.surfaces : results.duct_runs) : []).map((r) => [r.row_id, r]));
  const body = rows.map((row) => {
    const r = byId.get(row.id);
    const cells: Cell[] = [...cols.map((c) => inputCell(c, row as unknown as Record<string, unknown>, system, names)), ...extra.flatMap((c) => exportCells(c, r, system))];
    if (results) cells.push(rowProblem(r)?.text ?? (r?.result.ok ? r.result.warnings.map((w) => w.message).join("; ") || null : null));
    return cells;
  });
  return [header, ...body];
}

/** The zone totals of the case: fabric and distribution apart, ducts inside their zone for reference, and what every total leaves out. */
function zoneTotalsTable(s: TSchedule, results: ScheduleResults, caseName: string): Cell[][] {
  const system = s.project.unit_system;
  const W = (v: number) => Number(toDisplay("power", v, system).toPrecision(6));
  const Wm2 = (v: number | null) => (v === null ? null : Number(toDisplay("heat_flux", v, system).toPrecision(6)));
  const p = unitLabel("power", system);
  const f = unitLabel("heat_flux", system);
  const header: Cell[] = [
    `Zone — ${caseName}`, `Fabric loss (${p})`, `Fabric gain (${p})`, `Distribution loss (${p})`, `Distribution gain (${p})`,
    `Heat loss (${p})`, `Heat gain (${p})`, `Heat loss per floor area (${f})`, `Heat gain per floor area (${f})`,
    `Ducts inside the zone they serve, heat to the zone (${p}): for reference, not in the totals`,
  ];
  const body = results.zones.map((z) => [
    z.name, W(z.surfaces_loss_W), W(z.surfaces_gain_W), W(z.ducts_loss_W), W(z.ducts_gain_W), W(z.loss_W), W(z.gain_W), Wm2(z.loss_W_m2), Wm2(z.gain_W_m2), W(z.ducts_in_zone_W),
  ]);
  return [header, ...body, [], [exclusionsSentence()], ["Distribution: duct runs crossing unconditioned or outdoor space. Surfaces over ground are not computed (ISO 13370) and not in the totals."], [ENGINEERING_CAUTION]];
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
  lines.push(["Totals", exclusionsSentence()]);
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
  const body = await scheduleWorkbook(s, opts, results === null ? undefined : dc, results);
  return { filename: `${base}.xlsx`, contentType: "application/vnd.openxmlformats-officedocument.spreadsheetml.sheet", body };
}

/**
 * The XLSX of a schedule already read: the sheets (or templates), and with a design case its
 * zone totals and the breakdowns by orientation, element and build-up of every case.
 */
export async function scheduleWorkbook(s: TSchedule, opts: Pick<ExportOptions, "sheet" | "template">, dc?: TDesignCase, known?: ScheduleResults | null): Promise<Uint8Array<ArrayBuffer>> {
  const results = dc && !opts.template ? (known ?? resultsFor(s, dc)) : null;
  const wb = new ExcelJS.Workbook();
  wb.creator = "Filmsheet";
  for (const sheet of opts.sheet ? [opts.sheet] : (["surfaces", "duct_runs"] as const)) {
    const ws = wb.addWorksheet(SHEET_TITLES[sheet], { views: [{ state: "frozen", ySplit: 1 }] });
    ws.addRows(sheetTable(s, sheet, opts.template, results, dc?.name ?? ""));
    ws.getRow(1).font = { bold: true };
    ws.columns.forEach((c) => (c.width = 16));
  }
  if (results && dc) {
    const ws = wb.addWorksheet("Zone totals", { views: [{ state: "frozen", ySplit: 1 }] });
    ws.addRows(zoneTotalsTable(s, results, dc.name));
    ws.getRow(1).font = { bold: true };
    ws.columns.forEach((c, i) => (c.width = i === 0 ? 28 : 18));
    // Every case, for the breakdowns side by side and each zone's peak case; the exported one is not computed twice.
    const perCase = s.design_cases.map((d) => caseRowsOf(d.id === dc.id ? results : resultsFor(s, d)));
    const b = scheduleBreakdowns(engineSchedule(s), s.design_cases.map(engineDesignCase), perCase);
    const bs = wb.addWorksheet(BREAKDOWNS_SHEET);
    bs.addRows(breakdownsTable(b, dc.id, s.project.unit_system));
    bs.columns.forEach((c, i) => (c.width = i === 0 ? 30 : 18));
  }
  readMe(wb.addWorksheet("Read me"), s);
  return new Uint8Array(await wb.xlsx.writeBuffer());
}
