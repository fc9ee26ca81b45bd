import type { CalcResult } from "@/calc/index";
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
  results: Map<string, CalcResult>;
  buildups: Map<string, TBuildup>;
  /** `${rowId}:${field}` → why the last edit of that cell was refused. */
  cellErrors: Map<string, string>;
  /** Sums for the pinned totals row, by column id (SI). */
  totals: Record<string, number>;
  rowCount: number;
}

export const cellKey = (rowId: string, field: string) => `${rowId}:${field}`;
export const TOTALS_ID = "__totals";
