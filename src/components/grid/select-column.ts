/**
 * The sheet's row-selection column: a plain checkbox in each row and one in the heading that
 * selects (or clears) every row shown. AG Grid's own selection checkbox is a component of seven
 * elements and a bean per row; a sheet that scrolls 20 new rows a frame made one a row at every
 * frame. Measured on the bench's floor page (AG Grid alone, 5,000 rows, scrolling 600 px a frame,
 * four runs each): 28–31 frames/s with AG Grid's checkbox, 31–41 with this one, 34–42 with none.
 * Selection itself stays AG Grid's (rowSelection, multiRow): these draw and change it.
 */
import type { ColDef, GridApi, ICellRendererComp, ICellRendererParams, IHeaderComp, IHeaderParams, IRowNode } from "ag-grid-community";
import type { Row } from "@/components/schedule/schedule-cache";
import { TOTALS_ID } from "./grid-context";

/** The selection column's id (left out of ranges, copies and pastes). */
export const SELECT_COLUMN = "select";

/** The row last ticked or cleared in each grid: Shift+click sets every row from there to here. */
const lastPicked = new WeakMap<GridApi<Row>, number>();

function box(label: string): HTMLInputElement {
  const input = document.createElement("input");
  input.type = "checkbox";
  input.className = "fs-select";
  input.tabIndex = -1;
  input.setAttribute("aria-label", label);
  return input;
}

/** A row's checkbox: follows the row's selection, and changes it (Shift+click: a run of rows). */
export class RowCheckbox implements ICellRendererComp<Row> {
  private gui = document.createElement("span");
  private input: HTMLInputElement | null = null;
  private node: IRowNode<Row> | null = null;
  private api: GridApi<Row> | null = null;
  private readonly follow = () => {
    if (this.input && this.node) this.input.checked = !!this.node.isSelected();
  };

  init(p: ICellRendererParams<Row>): void {
    this.refresh(p);
  }

  getGui(): HTMLElement {
    return this.gui;
  }

  refresh(p: ICellRendererParams<Row>): boolean {
    this.release();
    if (!p.data || p.data.id === TOTALS_ID || p.node.rowPinned) {
      this.gui.replaceChildren();
      return true;
    }
    if (!this.input) {
      this.input = box("");
      this.input.addEventListener("click", this.onClick);
    }
    if (this.input.parentNode !== this.gui) this.gui.append(this.input);
    this.input.setAttribute("aria-label", `Select ${String(p.data.label)}`);
    this.node = p.node;
    this.api = p.api;
    this.node.addEventListener("rowSelected", this.follow);
    this.follow();
    return true;
  }

  private readonly onClick = (e: MouseEvent) => {
    const { node, api, input } = this;
    if (!node || !api || !input) return;
    const to = input.checked;
    const here = node.rowIndex ?? 0;
    const from = lastPicked.get(api);
    lastPicked.set(api, here);
    if (!e.shiftKey || from === undefined || from === here) return void node.setSelected(to, false, "checkboxSelected");
    const nodes: IRowNode<Row>[] = [];
    for (let i = Math.min(from, here); i <= Math.max(from, here); i++) {
      const n = api.getDisplayedRowAtIndex(i);
      if (n && !n.rowPinned) nodes.push(n);
    }
    api.setNodesSelected({ nodes, newValue: to, source: "checkboxSelected" });
  };

  private release(): void {
    this.node?.removeEventListener("rowSelected", this.follow);
    this.node = null;
  }

  destroy(): void {
    this.release();
    this.input?.removeEventListener("click", this.onClick);
  }
}

/** The heading's checkbox: ticked when every row shown is selected, part-ticked when some are. */
export class SelectAllHeader implements IHeaderComp {
  private gui = document.createElement("div");
  private input = box("Select every row shown");
  private api: GridApi<Row> | null = null;
  private readonly follow = () => {
    const api = this.api;
    if (!api) return;
    // Most changes of the rows (each edit's, each step of a big sheet's loading) come with nothing
    // selected: no walk over every row then.
    if (api.getSelectedNodes().length === 0) {
      this.input.checked = false;
      this.input.indeterminate = false;
      return;
    }
    let shown = 0;
    let picked = 0;
    api.forEachNodeAfterFilter((n) => {
      if (!n.data) return;
      shown++;
      if (n.isSelected()) picked++;
    });
    this.input.checked = shown > 0 && picked === shown;
    this.input.indeterminate = picked > 0 && picked < shown;
  };

  init(p: IHeaderParams<Row>): void {
    this.gui.className = "fs-select-header";
    this.gui.append(this.input);
    this.api = p.api;
    this.input.addEventListener("click", this.onClick);
    p.api.addEventListener("selectionChanged", this.follow);
    p.api.addEventListener("modelUpdated", this.follow);
    this.follow();
  }

  getGui(): HTMLElement {
    return this.gui;
  }

  refresh(): boolean {
    this.follow();
    return true;
  }

  private readonly onClick = () => {
    if (!this.api) return;
    if (this.input.checked) this.api.selectAll("filtered", "uiSelectAllFiltered");
    else this.api.deselectAll("filtered", "uiSelectAllFiltered");
  };

  destroy(): void {
    this.input.removeEventListener("click", this.onClick);
    if (this.api && !this.api.isDestroyed()) {
      this.api.removeEventListener("selectionChanged", this.follow);
      this.api.removeEventListener("modelUpdated", this.follow);
    }
  }
}

/** The selection column, pinned at the far left of a sheet the person may edit. */
export const selectColumn: ColDef<Row> = {
  colId: SELECT_COLUMN,
  headerName: "Select",
  headerComponent: SelectAllHeader,
  cellRenderer: RowCheckbox,
  cellClass: "fs-select-cell",
  pinned: "left",
  lockPosition: "left",
  width: 48,
  resizable: false,
  sortable: false,
  filter: false,
  editable: false,
  suppressMovable: true,
  suppressHeaderMenuButton: true,
  valueGetter: () => null,
};
