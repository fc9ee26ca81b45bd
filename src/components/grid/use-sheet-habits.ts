"use client";

import type { GridApi, IRowNode } from "ag-grid-community";
import { useCallback, useEffect, useId, useRef, useState, type RefObject } from "react";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import type { UnitSystem } from "@/units/units";
import type { Row } from "@/components/schedule/schedule-cache";
import { boundsOf, colCount, extendRange, fillExtension, fillSource, isSingle, onFillHandle, rangeCss, rowCount, singleCell, tiledSources, type Bounds, type CellPos, type CellRange, type Direction } from "./cell-range";
import { copyText, toTsv } from "./range-copy";
import { planClear, planFill, type RangePlan } from "./range-edits";
import type { PasteRequest } from "./schedule-grid";
import { SELECT_COLUMN } from "./select-column";

/** What the spreadsheet habits write through (useSheetEditing). */
export interface HabitWrites {
  /** `plan` is called when the fill or clear can be checked (at once, once the checks are loaded). */
  applyRange: (plan: () => RangePlan, label: string, refused: string) => void;
  undo: () => void;
  redo: () => void;
}

const ARROWS: Record<string, Direction> = { ArrowUp: "up", ArrowDown: "down", ArrowLeft: "left", ArrowRight: "right" };
const HEADINGS_KEY = "filmsheet:copy-headings";

/** Whether a key press belongs to a form field (its own undo, its own arrows). */
const inField = (t: EventTarget | null) => t instanceof HTMLElement && (t.isContentEditable || /^(INPUT|TEXTAREA|SELECT)$/.test(t.tagName));

/**
 * Spreadsheet habits on the community grid: a range selected with Shift+arrows, a drag or
 * Shift+click, drawn by a generated stylesheet; fill down / right (Ctrl+D / Ctrl+R, or the fill
 * handle at the range's corner), copy out as tab-separated text (Ctrl+C; Ctrl+Shift+C or the
 * "with headings" choice adds the headings), Delete to clear, Ctrl+Z / Ctrl+Y to undo and redo.
 * The handlers are native listeners on the grid's wrapper (capture phase, so they run before the
 * grid's own keyboard handling) and on the document (copy; undo outside the grid, e.g. after a
 * toolbar button).
 */
export function useSheetHabits(args: {
  api: GridApi<Row> | null;
  wrapper: RefObject<HTMLDivElement | null>;
  sheet: TSheet;
  schedule: Pick<TSchedule, "zones" | "buildups">;
  system: UnitSystem;
  canEdit: boolean;
  writes?: HabitWrites;
}) {
  const scope = useId();
  const [range, setRangeState] = useState<CellRange | null>(null);
  const [preview, setPreview] = useState<Bounds | null>(null);
  const [headings, setHeadingsState] = useState(false);
  // Event handlers are attached once; they read the latest of everything through this ref.
  const live = useRef({ ...args, range, headings, drag: null as null | "select" | "fill", preview: null as Bounds | null });
  Object.assign(live.current, args, { range, headings });

  useEffect(() => setHeadingsState(localStorage.getItem(HEADINGS_KEY) === "1"), []);
  const setHeadings = (on: boolean) => {
    setHeadingsState(on);
    localStorage.setItem(HEADINGS_KEY, on ? "1" : "0");
  };
  const setRange = (r: CellRange | null) => {
    live.current.range = r;
    setRangeState(r);
  };

  const columnIds = useCallback(() => live.current.api?.getAllDisplayedColumns().map((c) => c.getColId()).filter((id) => id !== SELECT_COLUMN) ?? [], []);
  const displayedRows = () => {
    const out: Row[] = [];
    live.current.api?.forEachNodeAfterFilterAndSort((n) => n.data && out.push(n.data));
    return out;
  };
  /** The range clamped to the rows and columns shown now (rows may have gone since it was drawn). */
  const currentBounds = (): Bounds | null => {
    const { api, range: r } = live.current;
    if (!api || !r) return null;
    const b = boundsOf(r);
    const rows = api.getDisplayedRowCount();
    const cols = columnIds().length;
    if (rows === 0 || cols === 0 || b.top >= rows || b.left >= cols) return null;
    return { ...b, bottom: Math.min(b.bottom, rows - 1), right: Math.min(b.right, cols - 1) };
  };

  const cellText = (node: IRowNode<Row> | undefined, colId: string) => {
    const api = live.current.api;
    if (!api || !node) return "";
    return copyText(api.getCellValue({ rowNode: node, colKey: colId }), api.getCellValue({ rowNode: node, colKey: colId, useFormatter: true }) as string | null);
  };

  /** The range as tab-separated text in the person's units, headings first when asked. */
  const rangeText = (withHeadings: boolean): string | null => {
    const api = live.current.api;
    const b = currentBounds();
    if (!api || !b) return null;
    const ids = columnIds().slice(b.left, b.right + 1);
    const cells: string[][] = [];
    for (let r = b.top; r <= b.bottom; r++) {
      const node = api.getDisplayedRowAtIndex(r);
      cells.push(ids.map((id) => cellText(node, id)));
    }
    const heads = ids.map((id) => api.getColumn(id)?.getColDef().headerName ?? id);
    return toTsv(cells, withHeadings ? heads : undefined);
  };

  const fill = (pairs: { target: CellPos; source: CellPos }[], label: string) => {
    const { api, writes, sheet, system, schedule } = live.current;
    if (!api || !writes || pairs.length === 0) return;
    const plan = () => planFill({ sheet, rows: displayedRows(), columnIds: columnIds(), system, pairs, lookups: schedule, textOf: (row, colId) => cellText(api.getDisplayedRowAtIndex(row), colId) });
    writes.applyRange(plan, label, "Nothing filled");
  };

  /** Ctrl+D / Ctrl+R: the range's first row (column) into the rest; a single row (column) takes the one above (to the left). */
  const fillKey = (direction: "down" | "right") => {
    const b = currentBounds();
    if (!b) return;
    const one = direction === "down" ? rowCount(b) === 1 : colCount(b) === 1;
    if (one && (direction === "down" ? b.top === 0 : b.left === 0)) return;
    const source = one ? (direction === "down" ? { ...b, top: b.top - 1, bottom: b.top - 1 } : { ...b, left: b.left - 1, right: b.left - 1 }) : fillSource(b, direction);
    fill(tiledSources(source, b), direction === "down" ? "Fill down" : "Fill right");
  };

  const clear = () => {
    const { writes, sheet, system } = live.current;
    const b = currentBounds();
    if (!writes || !b) return;
    writes.applyRange(() => planClear({ sheet, rows: displayedRows(), columnIds: columnIds(), system, bounds: b }), "Clear", "Nothing cleared");
  };

  useEffect(() => {
    const el = args.wrapper.current;
    const api = args.api;
    if (!el || !api) return;
    const L = live.current;
    const cellEl = (t: EventTarget | null) => (t instanceof Element ? t.closest(".ag-cell") : null);
    const cellAt = (t: EventTarget | null): CellPos | null => {
      const cell = cellEl(t);
      const rowEl = cell?.closest(".ag-row");
      if (!cell || !rowEl || rowEl.closest(".ag-floating-bottom, .ag-floating-top")) return null;
      const row = Number(rowEl.getAttribute("row-index"));
      const col = columnIds().indexOf(cell.getAttribute("col-id") ?? "");
      return Number.isInteger(row) && col >= 0 ? { row, col } : null;
    };
    const editing = () => api.getEditingCells().length > 0;

    // A Shift+click or a fill drag is ours: the grid must not see its click and move its focus
    // (and if it focuses the clicked cell anyway, the range it just drew stays).
    let swallowClick = false;
    let keepRange = false;
    const onClick = (e: MouseEvent) => {
      if (!swallowClick) return;
      swallowClick = false;
      e.stopPropagation();
    };
    const onPointerDown = (e: PointerEvent) => {
      if (e.shiftKey && L.range && cellAt(e.target)) e.stopPropagation();
    };
    const onMouseDown = (e: MouseEvent) => {
      swallowClick = false;
      keepRange = false;
      if (e.button !== 0 || editing()) return;
      const at = cellAt(e.target);
      if (!at) return;
      const b = currentBounds();
      const cell = cellEl(e.target)!;
      if (L.canEdit && b && at.row === b.bottom && at.col === b.right && onFillHandle(cell.getBoundingClientRect(), e.clientX, e.clientY)) {
        L.drag = "fill";
        swallowClick = true;
        e.preventDefault();
        e.stopPropagation();
        return;
      }
      if (e.shiftKey && L.range) {
        // Extend from the anchor; the grid must not move its focus to the clicked cell.
        setRange({ anchor: L.range.anchor, focus: at });
        swallowClick = true;
        keepRange = true;
        e.preventDefault();
        e.stopPropagation();
        return;
      }
      setRange(singleCell(at));
      L.drag = "select";
    };
    const onMouseOver = (e: MouseEvent) => {
      if (!L.drag) return;
      const at = cellAt(e.target);
      if (!at) return;
      if (L.drag === "select" && L.range && (L.range.focus.row !== at.row || L.range.focus.col !== at.col)) setRange({ anchor: L.range.anchor, focus: at });
      if (L.drag === "fill") {
        const b = currentBounds();
        const ext = b ? fillExtension(b, at) : null;
        L.preview = ext?.bounds ?? null;
        setPreview(L.preview);
      }
    };
    const onMouseUp = () => {
      const b = currentBounds();
      if (L.drag === "fill" && L.preview && b) {
        const target = L.preview;
        const down = target.bottom > b.bottom;
        fill(tiledSources(b, target), down ? "Fill down" : "Fill right");
        setRange({ anchor: { row: target.top, col: target.left }, focus: { row: target.bottom, col: target.right } });
      }
      L.drag = null;
      L.preview = null;
      setPreview(null);
    };

    const onKeyDown = (e: KeyboardEvent) => {
      keepRange = false;
      if (editing() || inField(e.target)) return;
      const mod = e.ctrlKey || e.metaKey;
      const key = e.key.toLowerCase();
      const dir = ARROWS[e.key];
      const stop = () => {
        e.preventDefault();
        e.stopPropagation();
      };
      if (dir && e.shiftKey && !e.altKey) {
        const focused = api.getFocusedCell();
        const start = L.range ?? (focused && !focused.rowPinned ? singleCell({ row: focused.rowIndex, col: columnIds().indexOf(focused.column.getColId()) }) : null);
        if (!start || start.anchor.col < 0) return;
        const next = extendRange(start, dir, { rows: api.getDisplayedRowCount(), cols: columnIds().length }, mod);
        setRange(next);
        api.ensureIndexVisible(next.focus.row);
        api.ensureColumnVisible(columnIds()[next.focus.col]!);
        return stop();
      }
      if (mod && !e.altKey && !e.shiftKey && (key === "d" || key === "r") && L.canEdit) {
        fillKey(key === "d" ? "down" : "right");
        return stop();
      }
      if ((e.key === "Delete" || (e.key === "Backspace" && L.range && !isSingle(boundsOf(L.range)))) && L.canEdit) {
        clear();
        return stop();
      }
      if (mod && e.shiftKey && key === "c") {
        // No copy event comes with Shift: write through the asynchronous clipboard.
        const text = rangeText(true);
        if (text !== null) void navigator.clipboard?.writeText(text);
        return stop();
      }
      if (e.key === "Escape" && L.range && !isSingle(boundsOf(L.range))) setRange(singleCell(L.range.anchor));
    };

    const onCopy = (e: ClipboardEvent) => {
      if (!el.contains(document.activeElement) || editing() || !e.clipboardData) return;
      const text = rangeText(L.headings);
      if (text === null) return;
      e.clipboardData.setData("text/plain", text);
      e.preventDefault();
    };

    // Undo and redo anywhere on the page but in a form field or a cell being edited (their own undo).
    const onDocKeyDown = (e: KeyboardEvent) => {
      if (!(e.ctrlKey || e.metaKey) || e.altKey || inField(e.target) || editing() || !L.writes || !L.canEdit) return;
      const key = e.key.toLowerCase();
      if (key === "z" && !e.shiftKey) L.writes.undo();
      else if (key === "y" || (key === "z" && e.shiftKey)) L.writes.redo();
      else return;
      e.preventDefault();
    };

    const onFocused = (e: { rowIndex: number | null; rowPinned?: string | null; column?: unknown }) => {
      if (keepRange) {
        keepRange = false;
        return;
      }
      if (e.rowIndex === null || e.rowPinned || !e.column || L.drag) return;
      const col = columnIds().indexOf((e.column as { getColId: () => string }).getColId());
      if (col < 0) return;
      const r = L.range;
      // Shift+arrow keeps the anchor focused; any other move starts a new range at the focused cell.
      if (r && r.anchor.row === e.rowIndex && r.anchor.col === col) return;
      setRange(singleCell({ row: e.rowIndex, col }));
    };

    el.addEventListener("pointerdown", onPointerDown, true);
    el.addEventListener("mousedown", onMouseDown, true);
    el.addEventListener("mouseover", onMouseOver);
    el.addEventListener("click", onClick, true);
    el.addEventListener("keydown", onKeyDown, true);
    window.addEventListener("mouseup", onMouseUp);
    document.addEventListener("copy", onCopy);
    document.addEventListener("keydown", onDocKeyDown);
    api.addEventListener("cellFocused", onFocused as never);
    return () => {
      el.removeEventListener("pointerdown", onPointerDown, true);
      el.removeEventListener("mousedown", onMouseDown, true);
      el.removeEventListener("mouseover", onMouseOver);
      el.removeEventListener("click", onClick, true);
      el.removeEventListener("keydown", onKeyDown, true);
      window.removeEventListener("mouseup", onMouseUp);
      document.removeEventListener("copy", onCopy);
      document.removeEventListener("keydown", onDocKeyDown);
      if (!api.isDestroyed()) api.removeEventListener("cellFocused", onFocused as never);
    };
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [args.api, args.wrapper]);

  /**
   * The paste of `text` at the focused cell, over the rows and columns shown (the selection column
   * left out). A paste onto a range lands at its top-left; one copied cell fills the whole range.
   */
  const pasteAt = (text: string, focused: { row: number; column: string }): PasteRequest => {
    const p: PasteRequest = { text, rows: displayedRows(), startRow: focused.row, columnIds: columnIds(), startColumn: focused.column };
    const b = currentBounds();
    if (!b || isSingle(b)) return p;
    const cell = text.replace(/\r?\n$/, "");
    const one = !/[\t\n]/.test(cell);
    const filled = one ? Array.from({ length: rowCount(b) }, () => Array(colCount(b)).fill(cell).join("\t")).join("\n") : text;
    return { ...p, text: filled, startRow: b.top, startColumn: p.columnIds[b.left] ?? p.startColumn };
  };

  const b = range ? boundsOf(range) : null;
  return {
    /** Spread on the grid's wrapper element. */
    scopeProps: { "data-range-scope": scope },
    css: rangeCss(scope, b, range ? columnIds() : [], preview),
    size: b ? { rows: rowCount(b), cols: colCount(b) } : null,
    headings,
    setHeadings,
    pasteAt,
  };
}
