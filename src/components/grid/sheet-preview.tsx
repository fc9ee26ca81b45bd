"use client";

import type { ColDef } from "ag-grid-community";
import type { Row } from "@/components/schedule/schedule-cache";
import type { GridContext } from "./grid-context";

/** Rows the preview draws: more than the tallest window shows above the fold. */
export const PREVIEW_ROWS = 40;

type Cell = { text: string; className: string; numeric: boolean };

/**
 * The text and classes of one cell as the grid shows it: the column's value getter (or field),
 * its pick-list labels, its formatter and its class rules, given what the grid gives them.
 */
export function previewCell(def: ColDef<Row>, row: Row, context: GridContext): Cell {
  const base = { data: row, context, colDef: def, node: null, column: null, api: null };
  let value: unknown = typeof def.valueGetter === "function" ? def.valueGetter(base as never) : def.field ? row[def.field as string] : undefined;
  const refData = def.refData as Record<string, string> | undefined;
  let text: string;
  if (def.colId === "working") text = "Working ›";
  else if (typeof def.valueFormatter === "function") text = def.valueFormatter({ ...base, value } as never) ?? "";
  else if (refData && typeof value === "string") text = refData[value] ?? value;
  else text = value === null || value === undefined ? "" : String(value);
  if (refData && typeof value === "string" && typeof def.valueFormatter !== "function") value = refData[value] ?? value;
  const classes: string[] = [];
  for (const [name, rule] of Object.entries(def.cellClassRules ?? {})) {
    if (typeof rule === "function" && rule({ ...base, value } as never)) classes.push(name);
  }
  const numeric = def.type === "numericColumn";
  return { text, className: classes.join(" "), numeric };
}

/**
 * The sheet's first screen of rows, drawn by the server with the page, in the grid's place and
 * look, until the grid has made and painted its own (a 5,000-row sheet's grid is ready ≈ 1–1.5 s
 * after the page arrives; this is on screen with the page). The same columns, widths, values and
 * cell classes as the grid, from the same column definitions. Its text is in `data-v` attributes
 * shown by CSS (schedule-grid.css), and the whole is aria-hidden: it is a picture of the grid for
 * the moment before it is ready, which assistive technology, find-in-page and scripts looking for
 * a row's text should not meet twice.
 */
export function SheetPreview({ columns, rows, context, selection }: { columns: ColDef<Row>[]; rows: Row[]; context: GridContext; selection: boolean }) {
  const shown = columns.filter((c) => !c.hide);
  // The grid puts its left-pinned columns first (the label), then the rest in their order.
  const ordered = [...shown.filter((c) => c.pinned === "left"), ...shown.filter((c) => c.pinned !== "left")];
  const width = (selection ? 48 : 0) + ordered.reduce((sum, c) => sum + (c.width ?? 200), 0);
  return (
    <div className="fs-sheet-preview" aria-hidden="true" data-rows={Math.min(rows.length, PREVIEW_ROWS)}>
      <table style={{ width }}>
        <colgroup>
          {selection ? <col style={{ width: 48 }} /> : null}
          {ordered.map((c) => (
            <col key={c.colId} style={{ width: c.width ?? 200 }} />
          ))}
        </colgroup>
        <thead>
          <tr>
            {selection ? <th data-box="" /> : null}
            {ordered.map((c) => (
              <th
                key={c.colId}
                className={typeof c.headerClass === "string" ? c.headerClass : undefined}
                data-num={c.type === "numericColumn" ? "" : undefined}
                data-pinned={c.pinned === "left" ? "" : undefined}
                data-v={c.headerName ?? ""}
              />
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.slice(0, PREVIEW_ROWS).map((row) => (
            <tr key={row.id} data-preview-row="">
              {selection ? <td data-box="" /> : null}
              {ordered.map((c) => {
                const cell = previewCell(c, row, context);
                return (
                  <td
                    key={c.colId}
                    className={cell.className || undefined}
                    data-num={cell.numeric ? "" : undefined}
                    data-pinned={c.pinned === "left" ? "" : undefined}
                    data-v={cell.text}
                  />
                );
              })}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
