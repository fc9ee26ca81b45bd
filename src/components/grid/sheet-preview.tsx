"use client";

import type { ColDef } from "ag-grid-community";
import type { Row } from "@/components/schedule/schedule-cache";
import { WORKING_LINK_TEXT } from "./column-defs";
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
  const value: unknown = typeof def.valueGetter === "function" ? def.valueGetter(base as never) : def.field ? row[def.field as string] : undefined;
  const refData = def.refData as Record<string, string> | undefined;
  const text =
    def.colId === "working"
      ? WORKING_LINK_TEXT
      : typeof def.valueFormatter === "function"
        ? (def.valueFormatter({ ...base, value } as never) ?? "")
        : value === null || value === undefined
          ? ""
          : (refData?.[String(value)] ?? String(value));
  // Class rules see the value as the grid gives it (pick-list labels are display only).
  const className = Object.entries(def.cellClassRules ?? {})
    .filter(([, rule]) => typeof rule === "function" && rule({ ...base, value } as never))
    .map(([name]) => name)
    .join(" ");
  return { text, className, numeric: def.type === "numericColumn" };
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
/** `selectionWidth`: the checkbox column's width, 0 when the sheet has none. */
export function SheetPreview({ columns, rows, context, selectionWidth }: { columns: ColDef<Row>[]; rows: Row[]; context: GridContext; selectionWidth: number }) {
  const selection = selectionWidth > 0;
  const shown = columns.filter((c) => !c.hide);
  // The grid puts its left-pinned columns first (the label), then the rest in their order.
  const ordered = [...shown.filter((c) => c.pinned === "left"), ...shown.filter((c) => c.pinned !== "left")];
  const width = selectionWidth + ordered.reduce((sum, c) => sum + (c.width ?? 200), 0);
  return (
    <div className="fs-sheet-preview" aria-hidden="true" data-rows={Math.min(rows.length, PREVIEW_ROWS)}>
      <table style={{ width }}>
        <colgroup>
          {selection ? <col style={{ width: selectionWidth }} /> : null}
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
