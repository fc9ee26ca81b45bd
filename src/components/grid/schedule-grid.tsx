"use client";

import type {
  CellEditRequestEvent,
  ColDef,
  FilterChangedEvent,
  SelectionChangedEvent,
  GetRowIdParams,
  RowSelectionOptions,
  GridOptions,
  GridApi,
  GridReadyEvent,
  IRowNode,
} from "ag-grid-community";
import { useCallback, useEffect, useMemo, useRef, useState, type ClipboardEvent } from "react";
import type { RowOutcome } from "@/schedule/result-columns";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import type { UnitSystem } from "@/units/units";
import type { Row } from "@/components/schedule/schedule-cache";
import { sheetColumnDefs } from "./column-defs";
import { selectColumn } from "./select-column";
import { TOTALS_ID, passesRowFilter, type GridContext, type RowFilter } from "./grid-context";
import { RangeStatus } from "./range-status";
import { SheetPreview } from "./sheet-preview";
import { afterNextPaint } from "@/components/schedule/use-after-paint";
import { loadRowSchemas } from "./cell-edits";
import { useSheetHabits, type HabitWrites } from "./use-sheet-habits";
import "./schedule-grid.css";
import { formatCount } from "@/units/format";

// AG Grid itself (its code, the parts the sheet uses, the theme) is a chunk of its own, asked for
// as soon as this module loads in the browser and evaluated when it arrives: its ≈ 1 MB of code is
// compiled and run in a task of its own, not inside the page's hydration, and the grid is made
// when both are done (the server-drawn preview shows the first rows meanwhile).
type GridRuntime = typeof import("./ag-grid-runtime");
let runtime: Promise<GridRuntime> | null = null;
const loadGrid = () => (runtime ??= import("./ag-grid-runtime"));
if (typeof window !== "undefined") void loadGrid();

// Options given as constants: an object made in render is a changed option to the grid, which
// then rebuilds every column (≈ 10 ms on a 5,000-row sheet) on each edit.
const DEFAULT_COL_DEF: ColDef<Row> = { sortable: true, filter: true, resizable: true, wrapHeaderText: true, autoHeaderHeight: true };
// Rows are selected with the sheet's own checkbox column (select-column.ts), not AG Grid's.
const ROW_SELECTION: RowSelectionOptions<Row> = { mode: "multiRow", checkboxes: false, headerCheckbox: false, enableClickSelection: false };
const rowId = (p: GetRowIdParams<Row>) => p.data.id;

/** Rows a big sheet is first made with (more than a tall screen shows). */
const FIRST_SCREEN_ROWS = 60;
/** How many rows of a big sheet the grid is given per task after its first screen. */
const ROWS_PER_STEP = 1000;

/**
 * Rows a big sheet draws beyond the top and bottom of the view (AG Grid's default, kept for
 * sheets up to ALL_COLUMNS_ROWS, is 10). Each scrolled frame makes the rows coming into view and
 * the buffer's worth ahead of them; the grid draws rows that scroll into view within the same
 * frame anyway, so on a big sheet a buffer buys nothing a person sees and costs every frame of a
 * fast scroll (bench:browser's floor, AG Grid alone: ≈ 30 frames/s with 10 rows of buffer, ≈ 37
 * with none; the 5,000-row sheet went from ≈ 20 to ≈ 30–40).
 */
const BIG_SHEET_ROW_BUFFER = 0;

/** Sheets up to this many rows draw every column; bigger ones only those in view. */
export const ALL_COLUMNS_ROWS = 400;

export interface PasteRequest {
  text: string;
  rows: Row[];
  startRow: number;
  columnIds: string[];
  startColumn: string;
}

export interface ScheduleGridProps {
  sheet: TSheet;
  schedule: TSchedule;
  results: Map<string, RowOutcome>;
  /** Quick filter above the grid; "all" when absent. */
  rowFilter?: RowFilter;
  /** Rows shown after every filter, on each change. */
  onShown?: (n: number) => void;
  totals: Record<string, number>;
  system: UnitSystem;
  canEdit: boolean;
  cellErrors: Map<string, string>;
  onEdit: (row: Row, field: string, shown: unknown) => void;
  onPaste: (p: PasteRequest) => void;
  onSelection: (ids: string[]) => void;
  onReady?: (api: GridApi<Row>) => void;
  /** The design case shown: the working links open on it. */
  caseId?: string;
  /** Fills, clears, undo and redo of the range selection (use-sheet-habits). */
  habits?: HabitWrites;
  /** The column set's column ids; every column when absent. */
  visibleColumns?: ReadonlySet<string>;
}

/**
 * One sheet of the schedule in AG Grid (community): typed editors in the person's units, computed
 * columns read from the browser's recalculation, a pinned totals row, sorting, filtering,
 * keyboard navigation, row selection — and paste of a tab-separated block, read here because the
 * community grid has no clipboard module.
 */
export function ScheduleGrid(props: ScheduleGridProps) {
  const { sheet, schedule, results, totals, system, canEdit, cellErrors } = props;
  const rowFilter = props.rowFilter ?? "all";
  const [api, setApi] = useState<GridApi<Row> | null>(null);
  // Until the grid has painted its first rows, the server-drawn preview stands in its place.
  const [drawn, setDrawn] = useState(false);
  const wrapper = useRef<HTMLDivElement>(null);
  const host = useRef<HTMLDivElement>(null);
  const rows = (sheet === "surfaces" ? schedule.surfaces : schedule.duct_runs) as unknown as Row[];
  const context = useRef<GridContext>({ projectId: schedule.project.id, sheet, system, canEdit, results, rowFilter, cellErrors, totals, rowCount: rows.length, buildups: new Map() }).current;
  Object.assign(context, { projectId: schedule.project.id, sheet, system, canEdit, results, rowFilter, cellErrors, totals, rowCount: rows.length, buildups: new Map(schedule.buildups.map((b) => [b.id, b])), caseId: props.caseId });

  const { zones, buildups, project } = schedule;
  const visible = props.visibleColumns;
  const dataColumns = useMemo(
    () => sheetColumnDefs(sheet, { ...schedule, zones, buildups, project } as TSchedule, system, visible),
    // Rebuilt when the pick-lists, the default method, the units or the column set change, not on every edit.
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [sheet, zones, buildups, project.default_method, system, visible],
  );
  const columnDefs = useMemo(() => (canEdit ? [selectColumn, ...dataColumns] : dataColumns), [canEdit, dataColumns]);
  const pinned = useMemo(() => [{ id: TOTALS_ID, label: `Total of ${formatCount(rows.length)} ${rows.length === 1 ? "row" : "rows"}` } as unknown as Row], [rows.length]);

  // A sheet of up to ALL_COLUMNS_ROWS rows draws every column, so the browser's find-in-page
  // reaches every cell; a bigger one draws only the columns in view (and a few beside them), which
  // keeps scrolling smooth. Decided when the grid is made (the grid reads the option once).
  const [allColumns] = useState(() => rows.length <= ALL_COLUMNS_ROWS);

  const habits = useSheetHabits({ api, wrapper, sheet, schedule, system, canEdit, writes: props.habits });

  // Units, errors or the case change what every cell shows; these are rare.
  useEffect(() => {
    api?.refreshCells();
  }, [api, cellErrors, system, props.caseId]);
  // An edit changes a few rows' results: repaint those rows and the totals row, not the whole grid.
  const shownResults = useRef(results);
  useEffect(() => {
    if (!api) return;
    const before = shownResults.current;
    shownResults.current = results;
    if (before === results) return;
    const nodes = changedRowNodes(api, before, results);
    if (nodes === "all") api.refreshCells();
    else if (nodes.length) api.refreshCells({ rowNodes: nodes });
  }, [api, results]);
  useEffect(() => {
    const total = api?.getPinnedBottomRow(0);
    if (total) api!.refreshCells({ rowNodes: [total] });
  }, [api, totals]);

  // Printing the page prints every row: the grid renders all of them (no virtual scrolling) for print.
  useEffect(() => {
    if (!api) return;
    const before = () => api.setGridOption("domLayout", "print");
    const after = () => api.setGridOption("domLayout", "normal");
    window.addEventListener("beforeprint", before);
    window.addEventListener("afterprint", after);
    return () => {
      window.removeEventListener("beforeprint", before);
      window.removeEventListener("afterprint", after);
    };
  }, [api]);

  // The quick filter reads the results of the chosen case: run it again when either changes (with
  // no filter on, an edit need not filter and redraw every row).
  const filtered = useRef<RowFilter | null>(null);
  useEffect(() => {
    if (!api) return;
    const was = filtered.current;
    filtered.current = rowFilter;
    if (rowFilter === "all" && was === "all") return;
    api.onFilterChanged();
    props.onShown?.(api.getDisplayedRowCount());
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [api, rowFilter, results]);

  const onGridReady = useCallback((e: GridReadyEvent<Row>) => {
    setApi(e.api);
    props.onReady?.(e.api);
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, []);

  // Stable callbacks reading the context object, which is updated in place on every render.
  const isFilterPresent = useCallback(() => context.rowFilter !== "all", [context]);
  const doesFilterPass = useCallback((node: IRowNode<Row>) => !node.data || passesRowFilter(context.rowFilter, context.results.get(node.data.id)), [context]);

  // Handlers that stay the same function from render to render (each reads the latest props): a
  // new function is a changed option to the grid.
  const latest = useRef(props);
  latest.current = props;
  const onCellEditRequest = useCallback((e: CellEditRequestEvent<Row>) => latest.current.onEdit(e.data, e.colDef.colId ?? "", e.newValue), []);
  const onSelectionChanged = useCallback((e: SelectionChangedEvent<Row>) => latest.current.onSelection(e.api.getSelectedRows().map((r) => r.id)), []);
  const onFilterChanged = useCallback((e: FilterChangedEvent<Row>) => latest.current.onShown?.(e.api.getDisplayedRowCount()), []);

  // The grid is AG Grid's own (createGrid), not its React wrapper: the wrapper draws every row and
  // cell as React components, which on a big sheet doubles the work of each scrolled frame and of
  // the first rows. The options below are given once; those that change are set on the grid.
  // A big sheet is made with no columns and no rows, then given its columns, its first screen of
  // rows and, after those are painted, the rest (the steps are in the effect below).
  const latestRows = useRef(rows);
  latestRows.current = rows;
  // The rows the grid holds (the first screen of a big sheet, until it is given the rest).
  const held = useRef<Row[] | null>(null);
  const options = useRef<GridOptions<Row>>(null);
  options.current ??= {
    rowData: rows.length > FIRST_SCREEN_ROWS * 4 ? [] : rows,
    columnDefs,
    context,
    getRowId: rowId,
    readOnlyEdit: true,
    onCellEditRequest,
    pinnedBottomRowData: pinned,
    defaultColDef: DEFAULT_COL_DEF,
    rowSelection: canEdit ? ROW_SELECTION : undefined,
    onSelectionChanged,
    singleClickEdit: false,
    stopEditingWhenCellsLoseFocus: true,
    enterNavigatesVerticallyAfterEdit: true,
    tooltipShowDelay: 250,
    enableBrowserTooltips: !allColumns,
    onGridReady,
    onFirstDataRendered: () => setDrawn(true),
    isExternalFilterPresent: isFilterPresent,
    doesExternalFilterPass: doesFilterPass,
    onFilterChanged,
    animateRows: false,
    suppressColumnVirtualisation: allColumns,
    rowBuffer: allColumns ? undefined : BIG_SHEET_ROW_BUFFER,
  };
  // While a big sheet is being given its rows in steps, edits wait for the last step (which takes
  // the newest rows).
  const staging = useRef(false);
  const latestColumns = useRef(columnDefs);
  latestColumns.current = columnDefs;
  useEffect(() => {
    let made: GridApi<Row> | null = null;
    let cancelled = false;
    const nextTask = () => new Promise((resolve) => setTimeout(resolve));
    // Each step is a task of its own, none of them long: evaluating AG Grid's chunk; making the
    // grid (its beans, theme and layout); its columns and header (with the grid's making, ≈ 0.25 s
    // in one task on a slow laptop); drawing the first screen of rows; and — after those are
    // painted — the rest of the rows, ROWS_PER_STEP at a time (making 5,000 row nodes at once is
    // ≈ 0.1 s the first rows need not wait for).
    void loadGrid().then(async ({ createGrid, gridTheme }) => {
      await nextTask();
      if (cancelled || !host.current) return;
      const first = options.current!.rowData as Row[];
      staging.current = first !== latestRows.current;
      const grid = createGrid<Row>(host.current, { ...options.current!, columnDefs: staging.current ? [] : options.current!.columnDefs, theme: gridTheme });
      made = grid;
      held.current = first;
      // The checks of an edit (zod and the row schemas) load once the grid has all its rows.
      const checksAfter = () => void afterNextPaint().then(() => loadRowSchemas().catch(() => {}));
      if (!staging.current) return checksAfter();
      await nextTask();
      if (cancelled) return;
      grid.setGridOption("columnDefs", latestColumns.current);
      await nextTask();
      if (cancelled) return;
      const all = latestRows.current;
      held.current = all.slice(0, FIRST_SCREEN_ROWS);
      grid.setGridOption("rowData", held.current);
      await afterNextPaint();
      for (let from = FIRST_SCREEN_ROWS; from < all.length; from += ROWS_PER_STEP) {
        if (cancelled) return;
        grid.applyTransaction({ add: all.slice(from, from + ROWS_PER_STEP) });
        await nextTask();
      }
      if (cancelled) return;
      // Rows edited while the steps ran (the edits waited for the last step).
      if (latestRows.current !== all) grid.setGridOption("rowData", latestRows.current);
      held.current = latestRows.current;
      staging.current = false;
      checksAfter();
    });
    return () => {
      cancelled = true;
      made?.destroy();
      setApi(null);
    };
  }, []);
  // An edit changes a few rows of the sheet: those go to their row nodes (setData) when no sort or
  // filter has to be run again, else to the grid as a transaction; only a change of the rows'
  // number or order gives it them all (comparing 5,000 rows by id is ≈ 20 ms). A transaction also
  // re-runs the row model, and with it the header checkbox's walk over every row (≈ 20 ms on
  // 5,000): an edit in an unsorted, unfiltered sheet needs neither.
  useEffect(() => {
    if (!api || staging.current || held.current === null || held.current === rows) return;
    const changed = changedRows(held.current, rows);
    if (changed && !api.isAnyFilterPresent() && !api.getColumnState().some((c) => c.sort)) {
      for (const r of changed) {
        const node = api.getRowNode(r.id);
        if (node) node.setData(r);
        else api.applyTransaction({ update: [r] });
      }
    } else if (changed) api.applyTransaction({ update: changed });
    else api.setGridOption("rowData", rows);
    held.current = rows;
  }, [api, rows]);
  useGridOption(api, "columnDefs", columnDefs);
  useGridOption(api, "pinnedBottomRowData", pinned);
  useGridOption(api, "rowSelection", canEdit ? ROW_SELECTION : undefined);

  const onPaste = (e: ClipboardEvent<HTMLDivElement>) => {
    if (!api || !canEdit || api.getEditingCells().length > 0) return;
    const focused = api.getFocusedCell();
    const text = e.clipboardData.getData("text/plain");
    if (!focused || focused.rowPinned || !text) return;
    e.preventDefault();
    props.onPaste(habits.pasteAt(text, { row: focused.rowIndex, column: focused.column.getColId() }));
  };

  return (
    <>
    <div ref={wrapper} className="fs-grid relative min-h-[18rem] min-w-0 flex-1 print:h-auto" onPaste={onPaste} data-sheet={sheet} {...habits.scopeProps}>
      <style>{habits.css}</style>
      <div ref={host} className="h-full w-full" />
      {!drawn && rows.length > 0 ? <SheetPreview columns={dataColumns} rows={rows} context={context} selectionWidth={canEdit ? selectColumn.width! : 0} /> : null}
    </div>
    <RangeStatus size={habits.size} headings={habits.headings} onHeadings={habits.setHeadings} canEdit={canEdit} />
    </>
  );
}

/** Sets a grid option when its value changes after the grid was made with it. */
function useGridOption<K extends keyof GridOptions<Row>>(api: GridApi<Row> | null, key: K, value: GridOptions<Row>[K]): void {
  const given = useRef(value);
  useEffect(() => {
    if (!api || given.current === value) return;
    given.current = value;
    api.setGridOption(key as never, value as never);
  }, [api, key, value]);
}

/** The rows that are new objects when both lists hold the same ids in the same order (at most 200), else null. */
function changedRows(before: Row[], after: Row[]): Row[] | null {
  if (before.length !== after.length) return null;
  const changed: Row[] = [];
  for (let i = 0; i < after.length; i++) {
    if (before[i] === after[i]) continue;
    if (before[i]!.id !== after[i]!.id || changed.length === 200) return null;
    changed.push(after[i]!);
  }
  return changed;
}

/** Row nodes whose results object changed, or "all" when so many did that one whole refresh is cheaper. */
function changedRowNodes(api: GridApi<Row>, before: Map<string, RowOutcome>, after: Map<string, RowOutcome>): IRowNode<Row>[] | "all" {
  const nodes: IRowNode<Row>[] = [];
  for (const [id, r] of after) {
    if (before.get(id) === r) continue;
    if (nodes.length >= 200) return "all";
    const node = api.getRowNode(id);
    if (node) nodes.push(node);
  }
  return nodes;
}
