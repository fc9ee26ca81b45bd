/**
 * Fills and clears of a range of cells, planned like a paste: every touched row checked whole in
 * the person's units, and either one set of updates for a single bulk request or the list of what
 * is wrong (then nothing is sent, so nothing is half-saved). Computed columns in a range are left
 * alone; they cannot be written.
 */
import type { TSheet } from "@/schemas/schedule";
import { parseCell, type Lookups } from "@/schedule/parse-cells";
import { SHEET_COLUMNS, columnHeader, type SheetColumn } from "@/schedule/sheet-columns";
import type { UnitSystem } from "@/units/units";
import type { Row } from "@/components/schedule/schedule-cache";
import type { BulkOp } from "@/components/schedule/use-schedule-writes";
import { completeChange, rowProblems } from "./cell-edits";
import type { Bounds, CellPos } from "./cell-range";

export interface RangeProblem {
  /** The row's label ("" when the problem is the column's, whatever the row). */
  row: string;
  column: string;
  message: string;
}

export interface RangePlan {
  ops: BulkOp[];
  problems: RangeProblem[];
  /** Cells whose value changes. */
  cells: number;
}

interface SheetArgs {
  sheet: TSheet;
  /** Rows and column ids in display order: a range's positions index these. */
  rows: readonly Row[];
  columnIds: readonly string[];
  system: UnitSystem;
}

const columnOf = (sheet: TSheet, id: string | undefined) => SHEET_COLUMNS[sheet].find((c) => c.field === id);
const same = (a: unknown, b: unknown) => a === b || (typeof a === "number" && typeof b === "number" && Math.abs(a - b) <= 1e-12 * Math.max(1, Math.abs(a)));

/** Changed values by row → checked update ops, or the problems of each row. */
function finish(args: SheetArgs, changes: Map<number, Record<string, unknown>>, problems: RangeProblem[]): RangePlan {
  const { sheet, rows, system } = args;
  const ops: BulkOp[] = [];
  let cells = 0;
  for (const [index, values] of [...changes].sort((a, b) => a[0] - b[0])) {
    const row = rows[index]!;
    const changed = Object.fromEntries(Object.entries(values).filter(([f, v]) => !same(row[f], v)));
    if (Object.keys(changed).length === 0) continue;
    const complete = completeChange(sheet, row, changed);
    const before = rowProblems(sheet, row, system);
    for (const [field, message] of rowProblems(sheet, { ...row, ...complete }, system)) {
      if (before.get(field) === message) continue;
      const col = columnOf(sheet, field);
      problems.push({ row: String(row.label ?? ""), column: col ? columnHeader(col, system) : field, message });
    }
    cells += Object.keys(changed).length;
    ops.push({ op: "update", sheet, id: row.id, values: complete });
  }
  return problems.length ? { ops: [], problems, cells: 0 } : { ops, problems, cells };
}

/**
 * Writes each target cell with its source cell's value. Within one column the stored value is
 * copied as it is (no rounding through the display); across columns (fill right) the source is
 * read as the text it shows, in the person's units, like a pasted cell.
 */
export function planFill(
  args: SheetArgs & {
    pairs: readonly { target: CellPos; source: CellPos }[];
    lookups: Lookups;
    /** The text a cell shows, for fills across columns. */
    textOf: (row: number, colId: string) => string;
  },
): RangePlan {
  const { sheet, rows, columnIds, system } = args;
  const changes = new Map<number, Record<string, unknown>>();
  const problems: RangeProblem[] = [];
  const told = new Set<string>();
  for (const { target, source } of args.pairs) {
    const row = rows[target.row];
    const col = columnOf(sheet, columnIds[target.col]);
    if (!row || !col || !rows[source.row]) continue;
    const sourceId = columnIds[source.col]!;
    let value: unknown;
    if (sourceId === col.field) value = rows[source.row]![col.field];
    else {
      const parsed = parseCell(col, args.textOf(source.row, sourceId), system, args.lookups);
      if (!parsed.ok) {
        const header = columnHeader(col, system);
        const key = `${target.row}:${col.field}`;
        if (!told.has(key)) problems.push({ row: String(row.label ?? ""), column: header, message: withoutHeader(parsed.message, header) });
        told.add(key);
        continue;
      }
      value = parsed.value;
    }
    changes.set(target.row, { ...changes.get(target.row), [col.field]: value });
  }
  return finish(args, changes, problems);
}

/** What a cleared cell stores, or null when the column may not be blank. */
export function clearedValue(col: SheetColumn): { value: unknown } | null {
  if (col.kind === "number") return col.spec!.blank !== undefined ? { value: null } : null;
  if (col.kind === "choice" && col.blankLabel) return { value: null };
  if ((col.kind === "choice" || col.kind === "flag") && col.blankValue !== undefined) return { value: col.blankValue };
  return null;
}

/**
 * Delete over a range: fields with a blank meaning are blanked (an override goes back to
 * inheriting, a v2 choice to its default); a range that includes a required column is refused
 * whole, naming each such column once.
 */
export function planClear(args: SheetArgs & { bounds: Bounds }): RangePlan {
  const { sheet, rows, columnIds, system, bounds } = args;
  const problems: RangeProblem[] = [];
  const values: Record<string, unknown> = {};
  for (let c = bounds.left; c <= bounds.right; c++) {
    const col = columnOf(sheet, columnIds[c]);
    if (!col) continue;
    const cleared = clearedValue(col);
    if (cleared) values[col.field] = cleared.value;
    else problems.push({ row: "", column: columnHeader(col, system), message: `${columnHeader(col, system)} is required and cannot be blank` });
  }
  if (problems.length) return { ops: [], problems, cells: 0 };
  const changes = new Map<number, Record<string, unknown>>();
  for (let r = bounds.top; r <= bounds.bottom && r < rows.length; r++) if (Object.keys(values).length) changes.set(r, values);
  return finish(args, changes, problems);
}

/** A parser's message without the heading it starts with, when the caller names the column itself. */
export function withoutHeader(message: string, header: string): string {
  return message.startsWith(`${header}: `) ? message.slice(header.length + 2) : message;
}

/** One line of a refusal notice: "RR south wall 1 · Area (m²): is not a number". */
export const problemLine = (p: RangeProblem) => (p.row ? `${p.row} · ${p.column}: ${p.message}` : p.message);
