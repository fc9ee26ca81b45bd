import "server-only";
import ExcelJS from "exceljs";
import Papa from "papaparse";
import type { TSheet } from "@/schemas/schedule";
import { AppError } from "@/server/http/app-error";
import { SHEET_TITLES } from "@/schedule/sheet-columns";
import { headerKey } from "@/schedule/sheet-columns";

export type UploadFormat = "csv" | "xlsx";
export type Table = unknown[][];

/** CSV or XLSX, from the query, the content type, or the file's first bytes (XLSX is a zip). */
export function detectFormat(bytes: Uint8Array, contentType: string | null, asked?: UploadFormat): UploadFormat {
  if (asked) return asked;
  if (contentType?.includes("spreadsheetml")) return "xlsx";
  if (bytes[0] === 0x50 && bytes[1] === 0x4b) return "xlsx";
  return "csv";
}

export function readCsv(bytes: Uint8Array): Table {
  // A byte-order mark from a spreadsheet's "CSV UTF-8" export would otherwise stick to the first heading.
  const text = new TextDecoder("utf-8").decode(bytes).replace(/^\uFEFF/, "");
  const parsed = Papa.parse<string[]>(text, { skipEmptyLines: "greedy" });
  const fatal = parsed.errors.find((e) => e.type === "Quotes");
  if (fatal) throw new AppError("invalid_input", "The CSV could not be read", [{ row: (fatal.row ?? 0) + 1, column: "", field: "file", message: fatal.message }]);
  return parsed.data;
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

function worksheetTable(ws: ExcelJS.Worksheet): Table {
  const table: Table = [];
  ws.eachRow({ includeEmpty: true }, (row, n) => {
    const values = (row.values as ExcelJS.CellValue[]).slice(1).map(cellValue);
    table[n - 1] = values;
  });
  return Array.from(table, (r) => r ?? []);
}

/**
 * The sheets of a workbook, by worksheet name ("Surfaces", "Duct runs"); a workbook with neither
 * name is read as `sheet` from its first worksheet.
 */
export async function readXlsx(bytes: Uint8Array, sheet?: TSheet): Promise<Partial<Record<TSheet, Table>>> {
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.load(bytes as unknown as ArrayBuffer);
  } catch {
    throw new AppError("invalid_input", "The file is not an XLSX workbook that can be read", [{ row: 0, column: "", field: "file", message: "Not a readable XLSX file" }]);
  }
  const out: Partial<Record<TSheet, Table>> = {};
  for (const name of ["surfaces", "duct_runs"] as const) {
    if (sheet && sheet !== name) continue;
    const ws = wb.worksheets.find((w) => headerKey(w.name) === headerKey(SHEET_TITLES[name]));
    if (ws) out[name] = worksheetTable(ws);
  }
  if (Object.keys(out).length === 0 && sheet && wb.worksheets[0]) out[sheet] = worksheetTable(wb.worksheets[0]);
  return out;
}
