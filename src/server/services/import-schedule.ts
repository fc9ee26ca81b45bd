import "server-only";
import type { TSheet } from "@/schemas/schedule";
import { parseSheet, type CellProblem } from "@/schedule/parse-cells";
import { SHEET_COLUMNS, SHEET_TITLES, columnHeader } from "@/schedule/sheet-columns";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { loadSchedule } from "@/server/repositories/schedule";
import type { ItemChange, RowProblem } from "@/server/schedule/check-changes";
import { ENTITIES, readColumns } from "@/server/schedule/entities";
import { detectFormat, type Table, type UploadFormat } from "@/server/schedule/read-upload";
import { readUploadInWorker } from "@/server/schedule/read-upload-in-worker";
import { countRows, writeItems } from "@/server/schedule/write-items";
import { rowsBeforeChange } from "./assert-plan-allows";
import { noteScheduleChanges } from "./note-schedule-changes";

export interface ImportOptions {
  bytes: Uint8Array;
  contentType: string | null;
  format?: UploadFormat;
  /** Which sheet a CSV holds (required for CSV); for XLSX, limits the import to that worksheet. */
  sheet?: TSheet;
  /** append: add the file's rows; replace: the file's rows take the place of the sheet's. */
  mode: "append" | "replace";
}

export interface ImportSummary {
  imported: Partial<Record<TSheet, number>>;
  replaced: Partial<Record<TSheet, number>>;
  ignored_columns: Partial<Record<TSheet, string[]>>;
}

// A report longer than this is cut (with a count of the rest): nobody reads ten thousand lines.
const REPORT_LIMIT = 1000;

/**
 * Imports a CSV or XLSX schedule in one transaction. Every row is read and checked; one bad
 * cell anywhere saves nothing and answers 422 with the row, column and message of every problem.
 */
export async function importSchedule(actor: Actor, projectId: string, opts: ImportOptions): Promise<ImportSummary> {
  const format = detectFormat(opts.bytes, opts.contentType, opts.format);
  if (format === "csv" && !opts.sheet) throw new AppError("invalid_input", "Say which sheet the CSV holds", [{ field: "query.sheet", message: "sheet must be surfaces or duct_runs for a CSV" }]);
  // Read in a worker thread with capped memory and time (a hostile file cannot stall the server).
  const tables: Partial<Record<TSheet, Table>> = await readUploadInWorker({ bytes: opts.bytes, format, sheet: opts.sheet });
  if (format === "xlsx") {
    if (Object.keys(tables).length === 0) throw new AppError("invalid_input", 'The workbook has no worksheet named "Surfaces" or "Duct runs"', [{ field: "file", message: "No Surfaces or Duct runs worksheet" }]);
  }

  return db().transaction(async (trx) => {
    const schedule = await loadSchedule(trx, actor.firm.id, projectId);
    if (!schedule) throw new AppError("not_found", "No project with that id in this firm");
    const lookups = { zones: schedule.zones, buildups: schedule.buildups };
    const system = schedule.project.unit_system;
    const summary: ImportSummary = { imported: {}, replaced: {}, ignored_columns: {} };
    const problems: CellProblem[] = [];
    const changes: ItemChange[] = [];
    const headers = new Map<string, string>();
    // Counted before a replace deletes the sheet: the free plan refuses growth past its limit,
    // not a sheet imported back in place of itself.
    const rowsBefore = await rowsBeforeChange(trx, actor.firm.id, () => countRows(trx, projectId));

    for (const [sheet, table] of Object.entries(tables) as [TSheet, Table][]) {
      const parsed = parseSheet(table, sheet, lookups);
      problems.push(...parsed.problems);
      if (parsed.ignored.length) summary.ignored_columns[sheet] = parsed.ignored;
      const bad = new Set(parsed.problems.map((p) => p.row));
      for (const { row, values } of parsed.rows) if (!bad.has(row)) changes.push({ op: "create", entity: sheet, row, values });
      summary.imported[sheet] = parsed.rows.length;
      for (const col of SHEET_COLUMNS[sheet]) headers.set(`${sheet}:${col.field}`, columnHeader(col, system));
      if (opts.mode === "replace") {
        const gone = await trx(ENTITIES[sheet].table).where({ firm_id: actor.firm.id, project_id: projectId }).del().returning(readColumns(ENTITIES[sheet]));
        summary.replaced[sheet] = gone.length;
        await noteScheduleChanges(trx, actor, projectId, gone.map((row) => ({ entity: sheet, op: "delete" as const, id: row.id as string, before: row, after: null })));
      }
    }

    // A missing column would make every row "required": name the column once instead.
    const headingProblems = problems.filter((p) => p.row === 1);
    if (headingProblems.length) throw new AppError("invalid_input", "The file lacks columns the schedule needs; nothing was imported", headingProblems);
    try {
      await writeItems(trx, actor, projectId, changes, { rowsBefore });
    } catch (error) {
      if (!(error instanceof AppError && error.code === "invalid_input")) throw error;
      for (const p of error.details as RowProblem[]) {
        const sheet = p.sheet as TSheet;
        problems.push({ sheet, row: p.row, column: headers.get(`${sheet}:${p.field}`) ?? p.field, field: p.field, message: p.message });
      }
    }
    if (problems.length > 0) {
      problems.sort((a, b) => (a.sheet === b.sheet ? a.row - b.row : a.sheet.localeCompare(b.sheet)));
      const rows = new Set(problems.map((p) => `${p.sheet}:${p.row}`)).size;
      const where = Object.keys(tables).map((s) => SHEET_TITLES[s as TSheet]).join(" and ");
      const report = problems.length > REPORT_LIMIT ? [...problems.slice(0, REPORT_LIMIT), { sheet: problems[0]!.sheet, row: 0, column: "", field: "", message: `… and ${problems.length - REPORT_LIMIT} more problems` }] : problems;
      // Throwing rolls the transaction back: a replace deletes nothing, no row is added.
      throw new AppError("invalid_input", `${problems.length} ${problems.length === 1 ? "problem" : "problems"} in ${rows} ${rows === 1 ? "row" : "rows"} of ${where}; nothing was imported`, report);
    }
    return summary;
  });
}
