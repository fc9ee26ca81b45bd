// Runs inside the upload worker thread (upload-worker.ts) as well as in tests. It deliberately does
// not import "server-only": that guard's default export throws in a plain Node worker, and this
// file never reaches a browser bundle (only src/server code imports it).
import ExcelJS from "exceljs";
import Papa from "papaparse";
import type { TSheet } from "@/schemas/schedule";
import { unescapeCsvText } from "@/schedule/csv-formulae";
import { MAX_TEXT_CELL_CHARS } from "@/schedule/parse-cells";
import { SHEET_TITLES, headerKey, matchHeaders } from "@/schedule/sheet-columns";
import { UPLOAD_LIMITS, UploadError } from "./upload-limits";
import { checkInflatedSizes } from "./xlsx-archive";

export type UploadFormat = "csv" | "xlsx";
export type Table = unknown[][];
export type Tables = Partial<Record<TSheet, Table>>;

/** CSV or XLSX, from the query, the content type, or the file's first bytes (XLSX is a zip). */
export function detectFormat(bytes: Uint8Array, contentType: string | null, asked?: UploadFormat): UploadFormat {
  if (asked) return asked;
  if (contentType?.includes("spreadsheetml")) return "xlsx";
  if (bytes[0] === 0x50 && bytes[1] === 0x4b) return "xlsx";
  return "csv";
}

const isBlank = (v: unknown) => v === null || v === undefined || (typeof v === "string" && v.trim() === "");

/**
 * Builds a sheet's table column by column, keeping only the columns whose heading matches a
 * column of the sheet (a file may carry any number of others: their cells are never copied).
 * The heading row comes out as the matched headings, then the ignored ones, so parseSheet finds
 * the same matches and names the same ignored columns; every later row holds the matched cells
 * only. Cells are cut just past the longest length parseCell accepts (it then refuses them), and
 * the text kept in all is bounded, so what leaves the worker is small whatever came in.
 */
export class TableBuilder {
  readonly keep: number[];
  private readonly table: Table;
  private chars = 0;

  constructor(
    private readonly sheetTitle: string,
    headings: readonly unknown[],
    sheet: TSheet,
  ) {
    if (headings.length > UPLOAD_LIMITS.maxColumns) throw tooManyColumns(sheetTitle, headings.length);
    const texts = headings.map((h) => (isBlank(h) ? "" : this.cut(String(h))));
    const { columns } = matchHeaders(texts, sheet);
    this.keep = columns.flatMap((m, i) => (m ? [i] : []));
    const ignored = texts.filter((t, i) => !columns[i] && t.trim() !== "");
    this.table = [[...this.keep.map((i) => texts[i]), ...ignored]];
  }

  private cut(text: string): string {
    const kept = text.length > MAX_TEXT_CELL_CHARS ? text.slice(0, MAX_TEXT_CELL_CHARS + 1) : text;
    this.chars += kept.length;
    if (this.chars > UPLOAD_LIMITS.maxTextChars) {
      throw new UploadError("payload_too_large", `${this.sheetTitle}: the file's cells hold more than ${UPLOAD_LIMITS.maxTextChars.toLocaleString("en")} characters of text, more than an import reads`);
    }
    return kept;
  }

  /** Row `index` of the table (the heading is 0), its cells read by column index. */
  addRow(index: number, cellAt: (col: number) => unknown): void {
    if (index > UPLOAD_LIMITS.maxRows) {
      throw new UploadError("payload_too_large", `${this.sheetTitle}: more than ${UPLOAD_LIMITS.maxRows.toLocaleString("en")} rows; import at most that many at a time`, [
        { row: index + 1, column: "", field: "file", message: `At most ${UPLOAD_LIMITS.maxRows} rows below the heading` },
      ]);
    }
    this.table[index] = this.keep.map((i) => {
      const v = cellAt(i);
      return typeof v === "string" ? this.cut(v) : v;
    });
  }

  result(): Table {
    return Array.from(this.table, (r) => r ?? []);
  }
}

function tooManyColumns(sheetTitle: string, count: number, row = 1): UploadError {
  return new UploadError("payload_too_large", `${sheetTitle}: row ${row} reaches column ${count}; an import reads at most ${UPLOAD_LIMITS.maxColumns} columns`, [
    { row, column: "", field: "file", message: `More than ${UPLOAD_LIMITS.maxColumns} columns` },
  ]);
}

/** A CSV of one sheet; blank lines are skipped (row numbers count the lines kept). */
export function readCsv(bytes: Uint8Array, sheet: TSheet): Table {
  // A byte-order mark from a spreadsheet's "CSV UTF-8" export would otherwise stick to the first heading.
  const text = new TextDecoder("utf-8").decode(bytes).replace(/^\uFEFF/, "");
  const title = SHEET_TITLES[sheet];
  let builder: TableBuilder | null = null;
  let index = 0;
  let failure: unknown = null;
  Papa.parse<string[]>(text, {
    skipEmptyLines: "greedy",
    // Row by row, so a file is never held as one table of every cell; stops at the first refusal.
    step: (results, parser) => {
      try {
        const fatal = results.errors.find((e) => e.type === "Quotes");
        if (fatal) throw new UploadError("invalid_input", "The CSV could not be read", [{ row: index + 1, column: "", field: "file", message: fatal.message }]);
        const cells = results.data;
        if (cells.length > UPLOAD_LIMITS.maxColumns) throw tooManyColumns(title, cells.length, index + 1);
        const unescaped = (i: number) => (typeof cells[i] === "string" ? unescapeCsvText(cells[i]!) : cells[i]);
        if (!builder) builder = new TableBuilder(title, cells.map((_, i) => unescaped(i)), sheet);
        else builder.addRow(index, unescaped);
        index++;
      } catch (error) {
        failure = error;
        parser.abort();
      }
    },
  });
  if (failure) throw failure;
  return builder ? (builder as TableBuilder).result() : [];
}

/** A cell as plain data: formulas give their result, rich text its characters, dates ISO text. */
function cellValue(v: ExcelJS.CellValue): unknown {
  if (v === null || v === undefined) return null;
  if (v instanceof Date) return v.toISOString();
  if (typeof v !== "object") return v;
  if ("result" in v) return cellValue(v.result as ExcelJS.CellValue);
  if ("richText" in v) return v.richText.map((t) => t.text).join("");
  if ("text" in v) return v.text;
  if ("error" in v) return String(v.error);
  return null;
}

// Rows and cells are looked up by number (findRow, findCell), never walked with eachRow: a row
// with one cell in column XFD would otherwise cost 16,384 steps, and 20,000 such rows billions.
function worksheetTable(ws: ExcelJS.Worksheet, sheet: TSheet): Table {
  const title = ws.name;
  if (ws.rowCount > UPLOAD_LIMITS.maxRows + 1) {
    throw new UploadError("payload_too_large", `${title}: the worksheet reaches row ${ws.rowCount}; an import reads at most ${UPLOAD_LIMITS.maxRows.toLocaleString("en")} rows below the heading`, [
      { row: ws.rowCount, column: "", field: "file", message: `At most ${UPLOAD_LIMITS.maxRows} rows below the heading` },
    ]);
  }
  const head = ws.findRow(1);
  if (head && head.cellCount > UPLOAD_LIMITS.maxColumns) throw tooManyColumns(title, head.cellCount);
  const headings = head ? Array.from({ length: head.cellCount }, (_, i) => cellValue(head.findCell(i + 1)?.value ?? null)) : [];
  const builder = new TableBuilder(title, headings, sheet);
  for (let n = 2; n <= ws.rowCount; n++) {
    const row = ws.findRow(n);
    if (!row) continue;
    if (row.cellCount > UPLOAD_LIMITS.maxColumns) throw tooManyColumns(title, row.cellCount, n);
    builder.addRow(n - 1, (i) => cellValue(row.findCell(i + 1)?.value ?? null));
  }
  return builder.result();
}

/**
 * The sheets of a workbook, by worksheet name ("Surfaces", "Duct runs"); a workbook with neither
 * name is read as `sheet` from its first worksheet. The archive's sizes and dimensions have been
 * checked before (xlsx-archive.ts); this runs in the worker, whose memory and time are capped.
 */
export async function readXlsx(bytes: Uint8Array, sheet?: TSheet): Promise<Tables> {
  checkInflatedSizes(bytes);
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch {
    throw new UploadError("invalid_input", "The file is not an XLSX workbook that can be read", [{ row: 0, column: "", field: "file", message: "Not a readable XLSX file" }]);
  }
  const out: Tables = {};
  for (const name of ["surfaces", "duct_runs"] as const) {
    if (sheet && sheet !== name) continue;
    const ws = wb.worksheets.find((w) => headerKey(w.name) === headerKey(SHEET_TITLES[name]));
    if (ws) out[name] = worksheetTable(ws, name);
  }
  if (Object.keys(out).length === 0 && sheet && wb.worksheets[0]) out[sheet] = worksheetTable(wb.worksheets[0], sheet);
  return out;
}

export interface ReadUploadInput {
  bytes: Uint8Array;
  format: UploadFormat;
  sheet?: TSheet;
}

/** What the worker runs: the file's tables, matched columns only. */
export async function readUpload(input: ReadUploadInput): Promise<Tables> {
  if (input.format === "csv") return input.sheet ? { [input.sheet]: readCsv(input.bytes, input.sheet) } : {};
  return readXlsx(input.bytes, input.sheet);
}
