"use client";

import type { RowFilter } from "./grid-context";
import { formatCount } from "@/units/format";

const OPTIONS: { value: RowFilter; label: string; hint: string }[] = [
  { value: "all", label: "All rows", hint: "Every row of the sheet" },
  { value: "method_sensitive", label: "Method-sensitive rows only", hint: "Rows whose exterior method choice moves Q by more than 10 % in this design case" },
  { value: "inside_risk", label: "Inside-surface risk only", hint: "Rows at risk of mould or surface condensation on the inside face in this design case (ISO 13788)" },
];

/**
 * Quick filters above the surfaces sheet: where the choice of exterior method matters in the
 * chosen case, and where the inside face is at risk. Toggle buttons, one pressed at a time.
 */
export function RowFilterBar({ value, onChange, counts, shown, total }: { value: RowFilter; onChange: (f: RowFilter) => void; counts: Record<RowFilter, number>; shown: number | null; total: number }) {
  return (
    <div className="mb-2 flex flex-wrap items-center gap-2" role="group" aria-label="Quick filters">
      {OPTIONS.map((o) => (
        <button
          key={o.value}
          type="button"
          aria-pressed={value === o.value}
          title={o.hint}
          onClick={() => onChange(o.value)}
          className="rounded-chip border border-line bg-surface px-2.5 py-1 text-small font-medium text-muted hover:bg-sunken aria-pressed:border-accent aria-pressed:bg-accent-soft aria-pressed:text-ink"
        >
          {o.label} <span className="tabular-nums text-micro">{formatCount(counts[o.value])}</span>
        </button>
      ))}
      <span className="text-micro text-muted" role="status">
        {value === "all" || shown === null ? "" : `Showing ${formatCount(shown)} of ${formatCount(total)} rows`}
      </span>
    </div>
  );
}
