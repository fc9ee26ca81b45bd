"use client";

import { useMemo, useRef, useState, type CSSProperties } from "react";
import type { TSheet } from "@/schemas/schedule";
import { RESULT_COLUMNS } from "@/schedule/result-columns";
import { SHEET_TITLES } from "@/schedule/sheet-columns";
import { visibleColumns } from "@/schedule/column-sets";
import { ColumnSetPicker } from "@/components/grid/column-set-picker";
import { ImportPanel } from "@/components/grid/import-panel";
import { passesRowFilter, type RowFilter } from "@/components/grid/grid-context";
import { RowFilterBar } from "@/components/grid/row-filter-bar";
import { ScheduleGrid } from "@/components/grid/schedule-grid";
import { useSheetEditing } from "@/components/grid/use-sheet-editing";
import { CollapsibleTotals } from "@/components/schedule/collapsible-totals";
import { Notices } from "@/components/schedule/notices";
import { useProject, useSchedule } from "@/components/schedule/schedule-context";
import { UnitsSwitch } from "@/components/schedule/units-switch";
import { useScheduleResults } from "@/components/schedule/use-schedule-results";
import { useFillHeight } from "@/components/schedule/use-fill-height";
import { usePreferences } from "@/components/schedule/use-preferences";
import { ZoneTotalsPanel } from "@/components/schedule/zone-totals-panel";
import { needsSetup, ProjectSetup } from "./project-setup";
import { ScheduleToolbar } from "./schedule-toolbar";
import { formatCount } from "@/units/format";

/** The schedule: two sheets in the grid, recalculated in the browser for the chosen design case, with zone totals beside. */
export function ScheduleView({ initialSheet = "surfaces", initialCase }: { initialSheet?: TSheet; initialCase?: string } = {}) {
  const schedule = useSchedule();
  const { canEdit, system } = useProject();
  const [sheet, setSheet] = useState<TSheet>(initialSheet);
  const [caseId, setCaseId] = useState(
    () => (schedule.design_cases.find((d) => d.id === initialCase) ?? schedule.design_cases.find((d) => d.kind === "heating") ?? schedule.design_cases[0])?.id ?? null,
  );
  const [selected, setSelected] = useState<string[]>([]);
  const [importing, setImporting] = useState(false);
  const [rowFilter, setRowFilter] = useState<RowFilter>("all");
  const [shown, setShown] = useState<number | null>(null);
  const editing = useSheetEditing(sheet, schedule);
  const { prefs, update: updatePrefs } = usePreferences();
  const ownSets = prefs.column_sets;
  const activeSet = prefs.active_column_sets[sheet];
  const visible = useMemo(() => visibleColumns(sheet, activeSet, ownSets), [sheet, activeSet, ownSets]);
  // The sheet fills the window below the toolbar (the main area's bottom padding stays).
  const sheetRef = useRef<HTMLDivElement>(null);
  const fillHeight = useFillHeight(sheetRef, 16);
  const dc = schedule.design_cases.find((d) => d.id === caseId) ?? schedule.design_cases[0];

  // An edit recalculates the rows it touched and their zones here; whole recalculations run in a worker.
  const { results, byRow, pending, resultsOf } = useScheduleResults(schedule, dc);
  const filterCounts = useMemo(() => {
    const rows = results?.surfaces ?? [];
    const count = (f: RowFilter) => rows.filter((r) => passesRowFilter(f, r)).length;
    return { all: rows.length, method_sensitive: count("method_sensitive"), inside_risk: count("inside_risk") };
  }, [results]);
  const totals = useMemo(() => {
    const rows = sheet === "surfaces" ? schedule.surfaces : schedule.duct_runs;
    const t: Record<string, number> = { area_m2: 0, length_m: 0 };
    for (const r of rows) {
      t.area_m2! += (r as { area_m2?: number }).area_m2 ?? 0;
      t.length_m! += r.length_m;
    }
    for (const c of RESULT_COLUMNS[sheet].filter((c) => c.total)) {
      t[c.key] = rows.reduce((sum, r) => {
        const res = byRow.get(r.id)?.result;
        return sum + (res?.ok ? ((res as Record<string, unknown>)[c.key] as number) : 0);
      }, 0);
    }
    return t;
  }, [schedule, sheet, byRow]);

  // A project without a design case (or with nothing yet for a row to name) is set up first.
  // Results may still be on their way from the worker: the grid shows the rows meanwhile.
  if (!dc || needsSetup(schedule)) return <ProjectSetup />;

  return (
    <div className="fs-schedule-page grid gap-3">
      <ScheduleToolbar
        sheet={sheet}
        onSheet={(s) => {
          setSheet(s);
          setSelected([]);
        }}
        counts={{ surfaces: schedule.surfaces.length, duct_runs: schedule.duct_runs.length }}
        cases={schedule.design_cases}
        caseId={dc.id}
        onCase={setCaseId}
        units={<UnitsSwitch />}
        canEdit={canEdit}
        selected={selected}
        editing={editing}
        onImport={() => setImporting((v) => !v)}
      />
      <Notices />
      {importing && canEdit ? <ImportPanel sheet={sheet} onClose={() => setImporting(false)} /> : null}
      {/* The totals sit beside the grid on wide screens (≥ 1536 px) and below it on a laptop; either way they fold to a strip. */}
      <div ref={sheetRef} className="flex flex-col gap-3 2xl:flex-row" style={{ "--fs-fill-h": fillHeight ? `${fillHeight}px` : "34rem" } as CSSProperties}>
        <section aria-label={`${SHEET_TITLES[sheet]} sheet`} aria-busy={pending} className="fs-sheet flex h-[var(--fs-fill-h)] min-w-0 shrink-0 flex-col print:h-auto 2xl:flex-1 2xl:shrink">
          <div className="mb-2 flex flex-wrap items-start justify-between gap-x-4 gap-y-2">
            {sheet === "surfaces" ? <RowFilterBar value={rowFilter} onChange={setRowFilter} counts={filterCounts} shown={shown} total={schedule.surfaces.length} /> : <span />}
            <ColumnSetPicker sheet={sheet} />
          </div>
          {/* The grid takes what is left of the height; the range line under it keeps its own. */}
          <div className="flex min-h-0 flex-1 flex-col">
            <ScheduleGrid
              key={sheet}
              sheet={sheet}
              schedule={schedule}
              results={byRow}
              rowFilter={sheet === "surfaces" ? rowFilter : "all"}
              onShown={setShown}
              totals={totals}
              system={system}
              canEdit={canEdit}
              cellErrors={editing.cellErrors}
              onEdit={editing.onEdit}
              onPaste={editing.onPaste}
              habits={editing}
              onSelection={setSelected}
              caseId={dc.id}
              visibleColumns={visible}
            />
          </div>
          <details className="mt-1 text-micro text-muted">
            <summary className="cursor-pointer select-none">How the sheet works</summary>
            <p className="mt-1 max-w-[80rem]">
              {canEdit ? "Double-click or press Enter to edit; arrows and Tab move; paste a block copied from a spreadsheet onto the focused cell. " : ""}
              Shaded columns are computed for the chosen design case; blank overrides show the build-up&apos;s value in italics. Pick the columns shown under Columns (your sets are kept for you).
              {sheet === "surfaces" ? " The bands give h_o and Q by the three exterior methods (boundary layer, ISO 6946, McAdams); a row is method-sensitive when they move Q by more than 10 %. T_si and f_Rsi check the inside face against the zone air (ISO 13788)." : ""}
            </p>
          </details>
        </section>
        <CollapsibleTotals collapsed={prefs.zone_totals_collapsed} onToggle={(collapsed) => updatePrefs({ zone_totals_collapsed: collapsed })}>
          {results ? (
            <ZoneTotalsPanel schedule={schedule} results={results} resultsOf={resultsOf} />
          ) : (
            <p role="status" className="rounded-panel border border-line bg-surface p-4 text-small text-muted">
              Calculating {formatCount(schedule.surfaces.length + schedule.duct_runs.length)} rows for {dc.name}…
            </p>
          )}
        </CollapsibleTotals>
      </div>
    </div>
  );
}
