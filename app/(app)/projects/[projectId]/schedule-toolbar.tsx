"use client";

import { useState, type ReactNode } from "react";
import type { TDesignCase, TSheet } from "@/schemas/schedule";
import { SHEETS } from "@/schemas/schedule-fields";
import { SHEET_TITLES } from "@/schedule/sheet-columns";
import type { useSheetEditing } from "@/components/grid/use-sheet-editing";
import { useProject } from "@/components/schedule/schedule-context";
import { ExportMenu } from "./export-menu";
import { formatCount } from "@/units/format";

const button = "rounded-chip border border-line bg-surface px-3 py-1.5 text-small font-medium hover:bg-sunken disabled:opacity-50 disabled:hover:bg-surface";

/** Sheet tabs, design case and units, and the row actions, import and export of the schedule page. */
export function ScheduleToolbar(props: {
  sheet: TSheet;
  onSheet: (s: TSheet) => void;
  counts: Record<TSheet, number>;
  cases: TDesignCase[];
  caseId: string;
  onCase: (id: string) => void;
  units: ReactNode;
  canEdit: boolean;
  selected: string[];
  editing: ReturnType<typeof useSheetEditing>;
  onImport: () => void;
}) {
  const { projectId } = useProject();
  const [confirming, setConfirming] = useState(false);
  const n = props.selected.length;
  const exportUrl = (format: string, extra = "") => `/api/projects/${projectId}/export?format=${format}${extra}`;
  return (
    <div className="flex flex-wrap items-end justify-between gap-3">
      <div className="flex flex-wrap items-end gap-3">
        <div role="tablist" aria-label="Sheets" className="inline-flex rounded-chip border border-line bg-sunken p-0.5">
          {SHEETS.map((s) => (
            <button
              key={s}
              role="tab"
              type="button"
              aria-selected={props.sheet === s}
              onClick={() => props.onSheet(s)}
              className="rounded-[0.3rem] px-3 py-1.5 text-small font-semibold text-muted aria-selected:bg-surface aria-selected:text-ink aria-selected:shadow-panel"
            >
              {SHEET_TITLES[s]} <span className="font-normal text-muted">{formatCount(props.counts[s])}</span>
            </button>
          ))}
        </div>
        <label className="grid gap-0.5 text-micro font-medium uppercase text-muted">
          Design case
          <select value={props.caseId} onChange={(e) => props.onCase(e.target.value)} className="rounded-chip border border-line bg-canvas px-2 py-1.5 text-small normal-case text-ink">
            {props.cases.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name} ({c.kind})
              </option>
            ))}
          </select>
        </label>
        {props.units}
      </div>
      <div className="flex flex-wrap items-center gap-2">
        {props.canEdit ? (
          <>
            <button type="button" className={button} disabled={!props.editing.undoLabel} title={props.editing.undoLabel ? `Undo ${props.editing.undoLabel} (Ctrl+Z)` : "Nothing to undo"} aria-label={props.editing.undoLabel ? `Undo ${props.editing.undoLabel}` : "Undo"} onClick={props.editing.undo}>
              ↶ Undo
            </button>
            <button type="button" className={button} disabled={!props.editing.redoLabel} title={props.editing.redoLabel ? `Redo ${props.editing.redoLabel} (Ctrl+Y)` : "Nothing to redo"} aria-label={props.editing.redoLabel ? `Redo ${props.editing.redoLabel}` : "Redo"} onClick={props.editing.redo}>
              ↷ Redo
            </button>
            <button type="button" className={button} onClick={props.editing.addRow}>
              Add row
            </button>
            <button type="button" className={button} disabled={n === 0} onClick={() => props.editing.duplicate(props.selected)}>
              Duplicate{n ? ` ${n}` : ""}
            </button>
            {confirming && n > 0 ? (
              <span className="inline-flex items-center gap-1 rounded-chip border border-danger/40 bg-danger/10 px-2 py-1 text-small text-danger">
                Delete {n} {n === 1 ? "row" : "rows"}?
                <button type="button" className="rounded-chip bg-danger px-2 py-0.5 font-semibold text-accent-ink" onClick={() => (props.editing.remove(props.selected), setConfirming(false))}>
                  Delete
                </button>
                <button type="button" className="px-1 underline" onClick={() => setConfirming(false)}>
                  Keep
                </button>
              </span>
            ) : (
              <button type="button" className={button} disabled={n === 0} onClick={() => setConfirming(true)}>
                Delete{n ? ` ${n}` : ""}
              </button>
            )}
            <button type="button" className={button} onClick={props.onImport}>
              Import…
            </button>
          </>
        ) : null}
        <ExportMenu
          buttonClass={button}
          items={[
            { label: `${SHEET_TITLES[props.sheet]} as CSV (with results)`, href: exportUrl("csv", `&sheet=${props.sheet}&case=${props.caseId}`) },
            { label: "Whole schedule as XLSX (with results)", href: exportUrl("xlsx", `&case=${props.caseId}`) },
            { label: `${SHEET_TITLES[props.sheet]} template (CSV)`, href: exportUrl("csv", `&sheet=${props.sheet}&template=1`) },
            { label: "Template workbook (XLSX)", href: exportUrl("xlsx", "&template=1") },
          ]}
        />
      </div>
    </div>
  );
}
