import type { RowOutcome } from "@/schedule/result-columns";
import type { TBuildup, TSheet } from "@/schemas/schedule";
import type { UnitSystem } from "@/units/units";

/**
 * What the grid's value getters read besides the row: one mutable object handed to AG Grid as
 * its `context`, updated in place and followed by refreshCells, so a recalculation repaints only
 * the cells whose values changed.
 */
export interface GridContext {
  projectId: string;
  sheet: TSheet;
  system: UnitSystem;
  canEdit: boolean;
  results: Map<string, RowOutcome>;
  /** Rows shown: all, only those whose method choice moves Q > 10 %, or only those at inside-surface risk. */
  rowFilter: RowFilter;
  buildups: Map<string, TBuildup>;
  /** `${rowId}:${field}` → why the last edit of that cell was refused. */
  cellErrors: Map<string, string>;
  /** Sums for the pinned totals row, by column id (SI). */
  totals: Record<string, number>;
  rowCount: number;
  /** The design case shown, so a row's working opens on it. */
  caseId?: string;
}

export type RowFilter = "all" | "method_sensitive" | "inside_risk";

/** Whether a row passes the quick filter above the grid (surface rows in the chosen design case). */
export function passesRowFilter(filter: RowFilter, r: RowOutcome | undefined): boolean {
  if (filter === "all") return true;
  if (filter === "method_sensitive") return r?.spread?.sensitive === true;
  return r?.inside !== undefined && (r.inside.mould_risk || r.inside.condensation_risk);
}

export const cellKey = (rowId: string, field: string) => `${rowId}:${field}`;
export const TOTALS_ID = "__totals";
