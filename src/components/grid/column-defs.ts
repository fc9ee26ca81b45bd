/**
 * AG Grid column definitions for a sheet, built from the shared column list (inputs, in the
 * person's units, with typed editors) and the result list (computed in the browser), plus a
 * notes column for warnings and errors.
 */
import type { CellClassRules, ColDef, ICellRendererComp, ICellRendererParams, ValueFormatterParams, ValueGetterParams } from "ag-grid-community";
import { workingPath } from "@/checking/paths";
import { labelOf } from "@/schemas/schedule-fields";
import type { TSchedule, TSheet } from "@/schemas/schedule";
import { RESULT_COLUMNS, resultHeader, resultValue, rowProblem, type ResultColumn } from "@/schedule/result-columns";
import { SHEET_COLUMNS, columnHeader, type SheetColumn } from "@/schedule/sheet-columns";
import { decimals, formatShown } from "@/units/format";
import { toDisplay, type UnitSystem } from "@/units/units";
import type { Row } from "@/components/schedule/schedule-cache";
import { TOTALS_ID, cellKey, type GridContext } from "./grid-context";

type P = ValueGetterParams<Row, unknown> & { context: GridContext };
type F = ValueFormatterParams<Row, unknown> & { context: GridContext };

/**
 * A column wide enough for the longest word of its title on one line beside the filter button
 * (≈ 6.6 px a letter in the 12 px heading, 42 px of padding and button): a word the browser
 * cannot hyphenate would otherwise break mid-letter ("Absorpt|ance").
 */
export function fitTitle(title: string, base: number): number {
  const longest = Math.max(...title.split(/\s+/).map((w) => w.length));
  return Math.max(base, Math.ceil(longest * 6.6 + 42));
}

const isTotals = (p: { node?: { rowPinned?: string | null } | null; data?: Row }) => p.data?.id === TOTALS_ID;
/** A number cell's text with `d` decimals; a total of a thousand or more is shown whole (its decimals would not fit the column and mean nothing at that size). */
const numberShown = (p: { data?: Row }, v: number, d: number) => formatShown(v, isTotals(p) && Math.abs(v) >= 1000 ? 0 : d);

/** The value a row inherits when an override is blank (the build-up's absorptance or emissivity). */
function inherited(col: SheetColumn, row: Row, ctx: GridContext): number | null {
  if (ctx.sheet !== "surfaces" || (col.field !== "absorptance" && col.field !== "emissivity")) return null;
  const b = ctx.buildups.get(row.buildup_id as string);
  return b ? (b[col.field] as number) : null;
}

function inputColumn(col: SheetColumn, s: TSchedule, system: UnitSystem): ColDef<Row> {
  const header = columnHeader(col, system);
  const base: ColDef<Row> = {
    colId: col.field,
    headerName: header,
    headerTooltip: col.kind === "number" && col.spec!.blank ? `${header}; blank = ${col.spec!.blank}` : header,
    editable: (p) => (p.context as GridContext).canEdit && !isTotals(p),
    cellClassRules: {
      "fs-cell-error": (p) => !!p.data && (p.context as GridContext).cellErrors.has(cellKey(p.data.id, col.field)),
      "fs-inherited": (p) => !isTotals(p) && p.value == null,
    },
    tooltipValueGetter: (p) => (p.data ? (p.context as GridContext).cellErrors.get(cellKey(p.data.id, col.field)) : undefined),
  };
  switch (col.kind) {
    case "text":
      return { ...base, field: col.field as never, width: 176, pinned: "left", filter: "agTextColumnFilter", cellEditor: "agTextCellEditor" };
    case "number": {
      const q = col.spec!.quantity;
      const d = decimals(q, col.spec!.digits, system);
      return {
        ...base,
        type: "numericColumn",
        // Narrow: the headings wrap onto two lines, and a laptop then shows inputs and results together.
        width: fitTitle(col.title, 92),
        filter: "agNumberColumnFilter",
        cellEditor: "agNumberCellEditor",
        cellEditorParams: { showStepperButtons: false },
        valueGetter: (p: P) => {
          if (isTotals(p)) return col.field === "area_m2" || col.field === "length_m" ? toDisplay(q, p.context.totals[col.field] ?? 0, system) : null;
          const v = p.data?.[col.field] as number | null | undefined;
          return v === null || v === undefined ? null : toDisplay(q, v, system);
        },
        valueFormatter: (p: F) => {
          if (p.value === null || p.value === undefined) {
            if (!p.data || isTotals(p)) return "";
            const from = inherited(col, p.data, p.context);
            if (from !== null) return formatShown(from, d);
            // A section size the shape does not use is a dash; other blanks say what they mean.
            const blank = col.spec!.blank;
            return blank === undefined ? "" : blank.startsWith("not ") ? "—" : `(${blank})`;
          }
          return numberShown(p, p.value as number, d);
        },
      };
    }
    case "zone":
    case "buildup": {
      const list = col.kind === "zone" ? s.zones : s.buildups;
      const refData = Object.fromEntries(list.map((z) => [z.id, z.name]));
      return { ...base, field: col.field as never, width: col.kind === "zone" ? 128 : 168, refData, filter: "agTextColumnFilter", cellEditor: "agSelectCellEditor", cellEditorParams: { values: list.map((z) => z.id) } };
    }
    case "choice": {
      const blank = col.blankLabel ? `${col.blankLabel} (${labelOf(col.options!, s.project.default_method)})` : undefined;
      const refData = { ...(blank ? { "": blank } : {}), ...Object.fromEntries(col.options!.map((o) => [o.value, o.label])) };
      return {
        ...base,
        width: 150,
        refData,
        filter: "agTextColumnFilter",
        valueGetter: (p: P) => (isTotals(p) ? null : ((p.data?.[col.field] as string | null) ?? (blank ? "" : null))),
        cellEditor: "agSelectCellEditor",
        cellEditorParams: { values: Object.keys(refData) },
      };
    }
    case "flag": {
      // Shown and picked as Yes/No; the stored boolean goes through "yes"/"no" (storedValue).
      const refData = Object.fromEntries(col.options!.map((o) => [o.value, o.label]));
      return {
        ...base,
        width: 120,
        refData,
        filter: "agTextColumnFilter",
        valueGetter: (p: P) => (isTotals(p) || !p.data ? null : p.data[col.field] === true ? "yes" : "no"),
        cellEditor: "agSelectCellEditor",
        cellEditorParams: { values: Object.keys(refData) },
      };
    }
  }
}

// The two sheets' heat flows have opposite signs: each heading says which way is positive.
const Q_SIGN: Record<string, string> = {
  "Heat loss": "Heat loss through the surface: positive out of the zone, negative a gain",
  "Heat to the air": "Heat to the air in the duct: positive when the air warms along the run, negative when it cools (the zone's loss)",
};

function resultColumn(c: ResultColumn, system: UnitSystem): ColDef<Row> {
  const d = c.quantity ? decimals(c.quantity, c.digits ?? 1, system) : (c.digits ?? 0);
  const numeric = !c.band && (c.quantity !== undefined || c.digits !== undefined);
  return {
    colId: `r:${c.key}`,
    headerName: resultHeader(c, system),
    headerTooltip: c.key === "Q_W" ? Q_SIGN[c.title] ?? resultHeader(c, system) : resultHeader(c, system),
    headerClass: "fs-computed-header",
    editable: false,
    width: c.width ?? fitTitle(c.title, c.quantity ? 92 : 112),
    type: numeric || c.band ? "numericColumn" : undefined,
    filter: numeric ? "agNumberColumnFilter" : "agTextColumnFilter",
    valueGetter: (p: P) => {
      if (isTotals(p)) return c.total ? toDisplay(c.quantity!, p.context.totals[c.key] ?? 0, system) : null;
      return p.data ? resultValue(c, p.context.results.get(p.data.id), system) : null;
    },
    valueFormatter: (p: F) => (typeof p.value === "number" ? numberShown(p, p.value, d) : p.value === null || p.value === undefined ? (isTotals(p) ? "" : "—") : String(p.value)),
    cellClass: "fs-computed",
    cellClassRules: RESULT_CLASS_RULES[c.key],
  };
}

/**
 * The result columns whose cells are marked by their value; each column has only its own rules
 * (a rule is run and its class set on every cell the grid draws, ≈ 20 rows a frame when scrolling).
 */
const RESULT_CLASS_RULES: Record<string, CellClassRules<Row>> = {
  Q_W: {
    "fs-gain": (p) => typeof p.value === "number" && ((p.context as GridContext).sheet === "surfaces" ? p.value < 0 : p.value > 0),
    "fs-loss": (p) => typeof p.value === "number" && ((p.context as GridContext).sheet === "surfaces" ? p.value > 0 : p.value < 0),
  },
  condensation: { "fs-risk": (p) => p.value === "risk" },
  inside_risk: { "fs-risk": (p) => typeof p.value === "string" && p.value !== "none" },
  method_sensitive: { "fs-sensitive": (p) => typeof p.value === "string" && p.value.startsWith("yes") },
};

/** Warnings and errors of the row's calculation, counted in the cell and listed in its tooltip. */
const notesColumn: ColDef<Row> = {
  colId: "notes",
  headerName: "Notes",
  editable: false,
  sortable: true,
  width: 136,
  valueGetter: (p: P) => {
    if (!p.data || isTotals(p)) return null;
    const r = p.context.results.get(p.data.id);
    if (!r) return null;
    const problem = rowProblem(r);
    if (problem) return problem.text;
    const n = r.result.ok ? r.result.warnings.length : 0;
    return n ? `${n} warning${n > 1 ? "s" : ""}` : null;
  },
  tooltipValueGetter: (p) => {
    const r = p.data ? (p.context as GridContext).results.get(p.data.id) : undefined;
    if (!r) return undefined;
    return r.result.ok ? r.result.warnings.map((w) => w.message).join("\n") || undefined : r.result.error.message;
  },
  cellClassRules: {
    "fs-note-error": (p) => typeof p.value === "string" && p.value.startsWith("error"),
    "fs-note-muted": (p) => typeof p.value === "string" && p.value.startsWith("Not computed"),
    "fs-note-warn": (p) => typeof p.value === "string" && /warnings?$/.test(p.value),
  },
};

/**
 * A link to the row's working and check, on its own page: a plain DOM cell renderer (a class with
 * getGui), which the grid creates without a React root per cell — thousands are made while a big
 * sheet scrolls.
 */
/** The Working column's link text (also drawn by the server's preview of the sheet). */
export const WORKING_LINK_TEXT = "Working ›";

export class WorkingLinkRenderer implements ICellRendererComp<Row> {
  private gui: HTMLElement = document.createElement("span");

  init(p: ICellRendererParams<Row> & { context: GridContext }): void {
    this.refresh(p);
  }

  getGui(): HTMLElement {
    return this.gui;
  }

  refresh(p: ICellRendererParams<Row> & { context: GridContext }): boolean {
    if (!p.data || isTotals(p)) {
      this.gui.replaceChildren();
      return true;
    }
    let a = this.gui.firstElementChild as HTMLAnchorElement | null;
    if (!a) {
      a = document.createElement("a");
      a.className = "fs-working-link";
      a.textContent = WORKING_LINK_TEXT;
      this.gui.append(a);
    }
    a.href = workingPath(p.context.projectId, p.context.sheet, p.data.id, p.context.caseId);
    a.setAttribute("aria-label", `Working of ${String(p.data.label)}`);
    return true;
  }
}

const workingColumn: ColDef<Row> = {
  colId: "working",
  headerName: "Working",
  editable: false,
  sortable: false,
  filter: false,
  width: 96,
  cellRenderer: WorkingLinkRenderer,
};

/**
 * Only the label is pinned (at the left): on a laptop every pinned column narrows the part that
 * scrolls, and the column sets keep the columns a person needs side by side instead.
 * `visible`: the column set's ids; every column when absent.
 */
export function sheetColumnDefs(sheet: TSheet, s: TSchedule, system: UnitSystem, visible?: ReadonlySet<string>): ColDef<Row>[] {
  const all = [...SHEET_COLUMNS[sheet].map((c) => inputColumn(c, s, system)), ...RESULT_COLUMNS[sheet].map((c) => resultColumn(c, system)), notesColumn, workingColumn];
  return visible ? all.map((c) => ({ ...c, hide: !visible.has(c.colId!) })) : all;
}
