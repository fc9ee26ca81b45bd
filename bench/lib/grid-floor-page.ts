// The floor pages of bench:browser, bundled by esbuild (grid-floor.ts) and served to Chromium
// without the app: what this machine's browser pays for the sheet's first rows and its fast
// scrolling before any of Filmsheet's own code runs. `#grid`: AG Grid alone — the app's own
// runtime module (ag-grid-runtime.ts: the same modules and theme) as a script of its own, made in
// the app's steps, each a task of its own (evaluate AG Grid; make the grid empty; give it the
// first screen of rows; after those are painted, every row) — with the same columns as the
// benchmark's column set (the app's own checkbox column, label pinned left, zone, build-up, area,
// four results, notes, working) and 5,000 rows of plain values: no React, no results, nothing else.
// `#dom`: no grid library at all — a virtual list drawn by hand (absolutely placed rows of the
// same cells, made as they scroll into view), the least a browser does to show the same sheet.
import type { ColDef } from "ag-grid-community";
import type * as GridRuntime from "../../src/components/grid/ag-grid-runtime";
import { selectColumn } from "../../src/components/grid/select-column";

declare global {
  interface Window {
    /** AG Grid's runtime, set by its own script (grid-floor.ts builds it). */
    FloorGrid?: typeof GridRuntime;
  }
}

const ROWS = 5000;
const ZONES = ["Hall", "Offices north", "Offices south", "Plant deck"];
const BUILDUPS = ["Rainscreen wall", "Flat roof", "Spandrel"];
type FloorRow = { id: string; label: string; zone: string; buildup: string; area: number; h_o: number; U: number; Ts: number; Q: number; notes: string };
const rows: FloorRow[] = Array.from({ length: ROWS }, (_, i) => ({
  id: `r${i}`,
  label: `Panel ${i + 1}`,
  zone: ZONES[i % 4]!,
  buildup: BUILDUPS[i % 3]!,
  area: 2 + ((i * 37) % 580) / 10,
  h_o: 10 + ((i * 13) % 360) / 10,
  U: 0.13 + ((i * 7) % 300) / 1000,
  Ts: -9 + ((i * 11) % 40) / 10,
  Q: 30 + ((i * 29) % 320),
  notes: i % 3 === 0 ? "1 warning" : "",
}));
const COLUMNS: { key: keyof FloorRow | "working"; title: string; width: number; digits?: number }[] = [
  { key: "zone", title: "Zone", width: 128 },
  { key: "buildup", title: "Build-up", width: 168 },
  { key: "area", title: "Area (m²)", width: 92, digits: 2 },
  { key: "h_o", title: "h_o (W/(m²·K))", width: 92, digits: 2 },
  { key: "U", title: "U (W/(m²·K))", width: 92, digits: 3 },
  { key: "Ts", title: "Surface temperature (°C)", width: 100, digits: 1 },
  { key: "Q", title: "Heat loss (W)", width: 92, digits: 0 },
  { key: "notes", title: "Notes", width: 130 },
  { key: "working", title: "Working", width: 96 },
];
const text = (r: FloorRow, c: (typeof COLUMNS)[number]) => (c.key === "working" ? "Working ›" : c.digits === undefined ? String(r[c.key as keyof FloorRow]) : (r[c.key as keyof FloorRow] as number).toFixed(c.digits));

const host = document.getElementById("floor")!;
if (location.hash === "#dom") drawByHand();
else {
  const script = document.createElement("script");
  script.src = "/grid.js";
  script.onload = () => setTimeout(makeGrid);
  document.head.appendChild(script);
}

function makeGrid() {
  const { createGrid, gridTheme } = window.FloorGrid!;
  const grid = createGrid<FloorRow>(host, {
    theme: gridTheme,
    rowData: [],
    getRowId: (p) => p.data.id,
    columnDefs: [
      // The app's own selection column (plain checkboxes), as on a sheet the person may edit.
      selectColumn as unknown as ColDef<FloorRow>,
      { field: "label", headerName: "Label", pinned: "left", width: 176 },
      ...COLUMNS.map((c) => ({ colId: c.key, headerName: c.title, width: c.width, valueGetter: (p: { data?: FloorRow }) => (p.data ? text(p.data, c) : ""), type: c.digits === undefined ? undefined : "numericColumn" })),
    ],
    defaultColDef: { sortable: true, filter: true, resizable: true, wrapHeaderText: true, autoHeaderHeight: true },
    rowSelection: { mode: "multiRow", checkboxes: false, headerCheckbox: false, enableClickSelection: false },
    animateRows: false,
    // As the app's big sheets (BIG_SHEET_ROW_BUFFER in schedule-grid.tsx).
    rowBuffer: 0,
  });
  setTimeout(() => {
    grid.setGridOption("rowData", rows.slice(0, 60));
    requestAnimationFrame(() => setTimeout(() => grid.setGridOption("rowData", rows)));
  });
}

function drawByHand() {
  const ROW_H = 32;
  host.innerHTML = `<div class="floor-viewport" style="height:100%;overflow:auto;position:relative;font:13px ui-sans-serif,system-ui,sans-serif"><div class="floor-rows" style="position:relative;height:${ROWS * ROW_H}px"></div></div>`;
  const viewport = host.firstElementChild as HTMLElement;
  const body = viewport.firstElementChild as HTMLElement;
  const shown = new Map<number, HTMLElement>();
  const widths = [48, 176, ...COLUMNS.map((c) => c.width)];
  const draw = () => {
    const first = Math.max(0, Math.floor(viewport.scrollTop / ROW_H) - 5);
    const last = Math.min(ROWS - 1, Math.ceil((viewport.scrollTop + viewport.clientHeight) / ROW_H) + 5);
    for (const [i, el] of shown) if (i < first || i > last) (el.remove(), shown.delete(i));
    for (let i = first; i <= last; i++) {
      if (shown.has(i)) continue;
      const r = rows[i]!;
      const el = document.createElement("div");
      el.className = "floor-row";
      el.setAttribute("role", "row");
      el.style.cssText = `position:absolute;left:0;right:0;height:${ROW_H}px;transform:translateY(${i * ROW_H}px);display:flex;border-bottom:1px solid #ddd;background:${i % 2 ? "#f6f6f4" : "#fff"}`;
      const cells = ["", r.label, ...COLUMNS.map((c) => text(r, c))];
      cells.forEach((t, k) => {
        const cell = document.createElement("div");
        cell.setAttribute("role", "gridcell");
        cell.style.cssText = `flex:0 0 ${widths[k]}px;padding:0 12px;line-height:${ROW_H}px;overflow:hidden;white-space:nowrap;text-overflow:ellipsis`;
        if (k === 0) cell.innerHTML = '<input type="checkbox" tabindex="-1" aria-label="Select row">';
        else cell.textContent = t;
        el.appendChild(cell);
      });
      body.appendChild(el);
      shown.set(i, el);
    }
  };
  viewport.addEventListener("scroll", draw, { passive: true });
  draw();
}
