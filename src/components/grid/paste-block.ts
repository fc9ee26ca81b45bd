/**
 * A block pasted from a spreadsheet (tab-separated text) onto the grid, starting at the focused
 * cell: each cell read like an imported one (units, names, choices), each touched row checked
 * whole, and either one set of changes for a single bulk request or the list of what is wrong.
 * Lines beyond the last row become new rows, copied from the last one and then filled in.
 */
import type { TSheet } from "@/schemas/schedule";
import { parseCell, type Lookups } from "@/schedule/parse-cells";
import { SHEET_COLUMNS, columnHeader } from "@/schedule/sheet-columns";
import type { UnitSystem } from "@/units/units";
import type { Row } from "@/components/schedule/schedule-cache";
import type { BulkOp } from "@/components/schedule/use-schedule-writes";
import { completeChange, rowProblems } from "./cell-edits";
import { withoutHeader } from "./range-edits";

export interface PasteProblem {
  /** 1-based line of the pasted block. */
  line: number;
  row: string;
  column: string;
  message: string;
}

/** Tab-separated lines; a trailing newline (spreadsheets add one) is not an empty last line. */
export function readBlock(text: string): string[][] {
  const lines = text.replace(/\r\n?/g, "\n").replace(/\n$/, "").split("\n");
  return lines.map((l) => l.split("\t"));
}

export interface PastePlan {
  ops: BulkOp[];
  problems: PasteProblem[];
}

export function planPaste(args: {
  sheet: TSheet;
  text: string;
  /** Rows in display order (sorted and filtered as shown), and the index pasted at. */
  rows: readonly Row[];
  startRow: number;
  /** Column ids in display order, and the one pasted at. */
  columnIds: readonly string[];
  startColumn: string;
  system: UnitSystem;
  lookups: Lookups;
  newId: () => string;
}): PastePlan {
  const { sheet, rows, system } = args;
  const block = readBlock(args.text);
  const first = args.columnIds.indexOf(args.startColumn);
  const problems: PasteProblem[] = [];
  const ops: BulkOp[] = [];
  const template = rows[rows.length - 1];
  block.forEach((cells, i) => {
    const target = rows[args.startRow + i];
    const base: Row | undefined = target ?? (template ? { ...template, id: args.newId(), version: 0, position: Number.MAX_SAFE_INTEGER } : undefined);
    if (!base) {
      problems.push({ line: i + 1, row: "", column: "", message: "The sheet has no row to copy a new one from; add a row first" });
      return;
    }
    const values: Record<string, unknown> = {};
    cells.forEach((text, j) => {
      const colId = args.columnIds[first + j];
      const col = SHEET_COLUMNS[sheet].find((c) => c.field === colId);
      const where = { line: i + 1, row: String(base.label ?? "") };
      if (!col) {
        problems.push({ ...where, column: colId ?? `column ${first + j + 1}`, message: colId ? "This column is computed and cannot be pasted into" : "The block is wider than the sheet" });
        return;
      }
      const parsed = parseCell(col, text, system, args.lookups);
      if (parsed.ok) values[col.field] = parsed.value;
      // parseCell's messages start with the heading (an import names no column otherwise); the line names it already.
      else problems.push({ ...where, column: columnHeader(col, system), message: withoutHeader(parsed.message, columnHeader(col, system)) });
    });
    const complete = completeChange(sheet, base, values);
    for (const [field, message] of rowProblems(sheet, { ...base, ...complete }, system)) {
      const col = SHEET_COLUMNS[sheet].find((c) => c.field === field);
      problems.push({ line: i + 1, row: String(base.label ?? ""), column: col ? columnHeader(col, system) : field, message });
    }
    if (target) ops.push({ op: "update", sheet, id: target.id, values: complete });
    else ops.push({ op: "create", sheet, row: { ...base, ...complete } as Row });
  });
  return problems.length ? { ops: [], problems } : { ops, problems };
}
