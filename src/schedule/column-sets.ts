/**
 * Column sets: which of a sheet's columns the grid shows. Three are built in (inputs, results,
 * everything); a person adds their own, stored with their preferences. The label is in every set
 * (it is the one column pinned at the left, so a row is always known by name).
 */
import type { TSheet } from "@/schemas/schedule";
import { RESULT_COLUMNS } from "./result-columns";
import { SHEET_COLUMNS } from "./sheet-columns";

export const BUILT_IN_SETS = ["inputs", "results", "everything"] as const;
export type BuiltInSet = (typeof BUILT_IN_SETS)[number];
export const BUILT_IN_TITLES: Record<BuiltInSet, string> = { inputs: "Inputs", results: "Results", everything: "Everything" };
/** A person who has not chosen sees every column. */
export const DEFAULT_SET: BuiltInSet = "everything";

export interface ColumnSet {
  id: string;
  name: string;
  sheet: TSheet;
  columns: string[];
}

export interface GridColumn {
  id: string;
  title: string;
  group: "input" | "result" | "other";
}

/** Every column the grid can show for a sheet, in grid order, with its heading without unit. */
export function gridColumns(sheet: TSheet): GridColumn[] {
  return [
    ...SHEET_COLUMNS[sheet].map((c) => ({ id: c.field, title: c.title, group: "input" as const })),
    ...RESULT_COLUMNS[sheet].map((c) => ({ id: `r:${c.key}`, title: c.title, group: "result" as const })),
    { id: "notes", title: "Notes", group: "other" },
    { id: "working", title: "Working", group: "other" },
  ];
}

export const columnIds = (sheet: TSheet) => gridColumns(sheet).map((c) => c.id);

// The inputs that say which row a result belongs to and how big it is.
const IDENTITY: Record<TSheet, readonly string[]> = { surfaces: ["zone_id", "buildup_id", "area_m2"], duct_runs: ["zone_id", "shape", "length_m"] };

/** The columns a built-in set shows, in grid order. */
export function builtInColumns(sheet: TSheet, set: BuiltInSet): string[] {
  const all = gridColumns(sheet);
  if (set === "everything") return all.map((c) => c.id);
  // Inputs keep the heat flow in view: an edit's effect shows beside it.
  if (set === "inputs") return all.filter((c) => c.group === "input" || c.id === "r:Q_W" || c.id === "notes").map((c) => c.id);
  return all.filter((c) => c.id === "label" || IDENTITY[sheet].includes(c.id) || c.group !== "input").map((c) => c.id);
}

export const isBuiltInSet = (id: string): id is BuiltInSet => (BUILT_IN_SETS as readonly string[]).includes(id);

/** The columns shown for the active set id: a built-in, one of the person's own, or the default when the id is unknown. */
export function visibleColumns(sheet: TSheet, active: string | undefined, own: readonly ColumnSet[]): Set<string> {
  const mine = own.find((s) => s.id === active && s.sheet === sheet);
  const ids = mine ? mine.columns : builtInColumns(sheet, active && isBuiltInSet(active) ? active : DEFAULT_SET);
  return new Set(["label", ...ids]);
}
