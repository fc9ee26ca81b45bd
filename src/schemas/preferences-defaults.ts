// A person's view settings' shape and defaults, without zod: the schedule page reads these while
// it starts, and zod's schemas (preferences.ts) are needed only to check a change.
import type { TSheet } from "./schedule-fields";
import type { UnitSystem } from "@/units/units";
import type { ColumnSet } from "@/schedule/column-sets";

/** A person's own view settings (per firm): nothing here changes a project. */
export interface TPreferences {
  /** null: each project's own units (its setting on "Site and units"). */
  unit_system: UnitSystem | null;
  zone_totals_collapsed: boolean;
  /** Per sheet: "inputs", "results", "everything" or the id of one of the person's sets. */
  active_column_sets: Partial<Record<TSheet, string>>;
  column_sets: ColumnSet[];
  version: number;
}

export const DEFAULT_PREFERENCES: TPreferences = { unit_system: null, zone_totals_collapsed: false, active_column_sets: {}, column_sets: [], version: 0 };

export const MAX_COLUMN_SETS = 40;
