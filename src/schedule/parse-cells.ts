/**
 * From text (a pasted block, a CSV or XLSX cell) to a stored value: numbers in the column's units
 * converted to SI, zones and build-ups by name, choices by value or label. The grid's paste and
 * the server's import share this, so both accept and refuse the same things.
 */
import { fromDisplay } from "@/units/units";
import { columnHeader, matchHeaders, type ColumnUnits, type SheetColumn } from "./sheet-columns";
import type { TSheet } from "@/schemas/schedule";

export interface Named {
  id: string;
  name: string;
}
export interface Lookups {
  zones: readonly Named[];
  buildups: readonly Named[];
}

export type CellResult = { ok: true; value: unknown } | { ok: false; message: string };

// A plain decimal number, optionally signed, with an optional exponent; no thousands separators.
// Written so that no two parts can match the same digits (the old `\d+\.?\d*` could split a run of
// digits in n ways, and a long digit run ending in a letter took quadratic time): linear time.
const NUMBER = /^[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:e[+-]?\d+)?$/i;

/**
 * The longest cell read, in characters, before any parsing. A number has no business being longer
 * than 64 (17 significant digits, a sign, a point and an exponent fit many times over); text
 * (labels, names, choices) is stored at 120 characters at most, so 2,000 leaves room for stray
 * spaces while keeping a hostile file from handing every parser megabytes per cell.
 */
export const MAX_NUMBER_CELL_CHARS = 64;
export const MAX_TEXT_CELL_CHARS = 2000;

/** Whether `text` is a plain decimal number the importer accepts (linear time on any input). */
export function isPlainNumber(text: string): boolean {
  return NUMBER.test(text);
}

const FLAG_TRUE = new Set(["yes", "y", "true", "1"]);
const FLAG_FALSE = new Set(["no", "n", "false", "0"]);

const isBlank = (raw: unknown) => raw === null || raw === undefined || (typeof raw === "string" && raw.trim() === "");

function findNamed(list: readonly Named[], text: string): Named | undefined {
  const key = text.trim().toLowerCase();
  return list.find((n) => n.name.trim().toLowerCase() === key) ?? list.find((n) => n.id === text.trim());
}

/** One cell's value for its column, or why it cannot be read. */
export function parseCell(col: SheetColumn, raw: unknown, units: ColumnUnits, lookups: Lookups): CellResult {
  const system = units === "stored" ? "SI" : units;
  const header = columnHeader(col, system);
  if (isBlank(raw)) {
    if (col.kind === "text") return { ok: true, value: "" };
    return { ok: true, value: col.blankValue ?? null };
  }
  const limit = col.kind === "number" ? MAX_NUMBER_CELL_CHARS : MAX_TEXT_CELL_CHARS;
  // Checked on the raw length, before trimming or matching, so a huge cell costs nothing more.
  if (typeof raw === "string" && raw.length > limit) {
    return { ok: false, message: `${header}: the cell is longer than ${limit} characters, the most a ${col.kind === "number" ? "number" : "cell of this column"} may have` };
  }
  const text = typeof raw === "string" ? raw.trim() : String(raw);
  switch (col.kind) {
    case "text":
      return { ok: true, value: text };
    case "number": {
      const n = typeof raw === "number" ? raw : isPlainNumber(text) ? Number(text) : Number.NaN;
      if (!Number.isFinite(n)) return { ok: false, message: `${header}: "${text}" is not a number` };
      return { ok: true, value: units === "stored" ? n : fromDisplay(col.spec!.quantity, n, units) };
    }
    case "zone":
    case "buildup": {
      const list = col.kind === "zone" ? lookups.zones : lookups.buildups;
      const found = findNamed(list, text);
      if (found) return { ok: true, value: found.id };
      const noun = col.kind === "zone" ? "zone" : "build-up";
      return { ok: false, message: `No ${noun} named "${text}" in this project (there are: ${list.map((n) => n.name).join(", ") || "none"})` };
    }
    case "choice": {
      const key = text.toLowerCase();
      const found = col.options!.find((o) => o.value.toLowerCase() === key || o.label.toLowerCase() === key);
      if (found) return { ok: true, value: found.value };
      if (col.blankLabel && key === col.blankLabel.toLowerCase()) return { ok: true, value: null };
      return { ok: false, message: `${header} must be one of: ${col.options!.map((o) => o.label).join(", ")}` };
    }
    case "flag": {
      // A spreadsheet's TRUE/FALSE cell arrives as a boolean; typed text in the usual spellings.
      if (typeof raw === "boolean") return { ok: true, value: raw };
      const key = text.toLowerCase();
      if (FLAG_TRUE.has(key)) return { ok: true, value: true };
      if (FLAG_FALSE.has(key)) return { ok: true, value: false };
      return { ok: false, message: `${header} must be Yes or No` };
    }
  }
}

export interface CellProblem {
  sheet: TSheet;
  /** Row of the file, the heading being row 1. */
  row: number;
  column: string;
  field: string;
  message: string;
}

export interface ParsedSheet {
  rows: { row: number; values: Record<string, unknown> }[];
  problems: CellProblem[];
  ignored: string[];
}

/** A whole table (heading row first) read into row values; blank rows are skipped. */
export function parseSheet(table: readonly (readonly unknown[])[], sheet: TSheet, lookups: Lookups): ParsedSheet {
  const headers = (table[0] ?? []).map((h) => (isBlank(h) ? "" : String(h)));
  const match = matchHeaders(headers, sheet);
  const problems: CellProblem[] = match.missing.map((c) => ({ sheet, row: 1, column: c.title, field: c.field, message: `The file has no "${c.title}" column` }));
  const rows: ParsedSheet["rows"] = [];
  for (let r = 1; r < table.length; r++) {
    const cells = table[r]!;
    if (cells.every(isBlank)) continue;
    const values: Record<string, unknown> = {};
    match.columns.forEach((m, i) => {
      if (!m) return;
      const parsed = parseCell(m.col, cells[i], m.system, lookups);
      if (parsed.ok) values[m.col.field] = parsed.value;
      else problems.push({ sheet, row: r + 1, column: headers[i]!, field: m.col.field, message: parsed.message });
    });
    rows.push({ row: r + 1, values });
  }
  return { rows, problems, ignored: match.ignored };
}
