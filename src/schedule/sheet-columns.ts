/**
 * The editable columns of the two sheets, in order: the grid, the import (headers matched by
 * name and unit), the export and the template all read this list.
 */
import {
  DUCT_RUN_NUMBERS,
  EXPOSED_TO_LABEL,
  EXPOSURE_OPTIONS,
  IN_SERVED_ZONE_LABEL,
  LOCATION_OPTIONS,
  METHOD_OPTIONS,
  SHAPE_OPTIONS,
  SURFACE_NUMBERS,
  YES_NO_OPTIONS,
  unitSuffix,
  type NumberSpec,
  type Option,
} from "@/schemas/schedule-fields";
import type { TSheet } from "@/schemas/schedule";
import { unitLabel, type UnitSystem } from "@/units/units";

/** "flag": a yes/no input, stored as a boolean, written Yes/No (options are YES_NO_OPTIONS). */
export type ColumnKind = "text" | "number" | "zone" | "buildup" | "choice" | "flag";

export interface SheetColumn {
  field: string;
  /** The heading without its unit. */
  title: string;
  kind: ColumnKind;
  spec?: NumberSpec;
  options?: readonly Option[];
  /** Blank allowed (a number with a blank meaning, or a choice that inherits). */
  optional: boolean;
  /** What a blank choice means. */
  blankLabel?: string;
  /**
   * What a blank cell stores, for choices and flags that are never blank (v2 inputs): a file or
   * a paste from before the column existed reads as the default rather than failing.
   */
  blankValue?: string | boolean;
}

const num = (field: string, spec: NumberSpec): SheetColumn => ({ field, title: spec.label, kind: "number", spec, optional: spec.blank !== undefined });

export const SURFACE_COLUMNS: readonly SheetColumn[] = [
  { field: "label", title: "Label", kind: "text", optional: false },
  { field: "zone_id", title: "Zone", kind: "zone", optional: false },
  { field: "buildup_id", title: "Build-up", kind: "buildup", optional: false },
  { field: "exposed_to", title: EXPOSED_TO_LABEL, kind: "choice", options: EXPOSURE_OPTIONS, optional: true, blankValue: "outside_air" },
  ...(["area_m2", "tilt_deg", "azimuth_deg", "height_m", "length_m", "panel_height_m"] as const).map((f) => num(f, SURFACE_NUMBERS[f])),
  { field: "method", title: "Method", kind: "choice", options: METHOD_OPTIONS, optional: true, blankLabel: "Project default" },
  num("absorptance", SURFACE_NUMBERS.absorptance),
  num("emissivity", SURFACE_NUMBERS.emissivity),
];

export const DUCT_RUN_COLUMNS: readonly SheetColumn[] = [
  { field: "label", title: "Label", kind: "text", optional: false },
  { field: "zone_id", title: "Zone", kind: "zone", optional: false },
  { field: "shape", title: "Shape", kind: "choice", options: SHAPE_OPTIONS, optional: false },
  ...(["diameter_m", "width_m", "height_m", "length_m", "flow_m3_s", "T_entering_heating_C", "T_entering_cooling_C"] as const).map((f) => num(f, DUCT_RUN_NUMBERS[f])),
  { field: "location", title: "Location", kind: "choice", options: LOCATION_OPTIONS, optional: false },
  { field: "in_served_zone", title: IN_SERVED_ZONE_LABEL, kind: "flag", options: YES_NO_OPTIONS, optional: true, blankValue: false },
  ...(
    ["T_surround_C", "T_surround_cooling_C", "RH_surround_pct", "elevation_m", "insulation_thickness_m", "insulation_k_W_mK", "jacket_emissivity", "jacket_absorptance", "margin_K"] as const
  ).map((f) => num(f, DUCT_RUN_NUMBERS[f])),
];

export const SHEET_COLUMNS: Record<TSheet, readonly SheetColumn[]> = { surfaces: SURFACE_COLUMNS, duct_runs: DUCT_RUN_COLUMNS };
export const SHEET_TITLES: Record<TSheet, string> = { surfaces: "Surfaces", duct_runs: "Duct runs" };

/** A flag's stored value as written in cells and files ("Yes"/"No"). */
export const flagLabel = (v: unknown) => (v === true ? "Yes" : "No");

/** "Area (m²)", "Label", "Absorptance": the heading in a unit system. */
export function columnHeader(col: SheetColumn, system: UnitSystem): string {
  if (col.kind !== "number") return col.title;
  const unit = unitLabel(col.spec!.quantity, system);
  return unit === "" ? col.title : `${col.title} (${unit})`;
}

/** A value with its unit for messages and cells, e.g. "12.5 m²". */
export function withUnit(col: SheetColumn, shown: string, system: UnitSystem): string {
  return col.kind === "number" ? `${shown}${unitSuffix(col.spec!.quantity, system)}` : shown;
}

/** Headings compared without case, spaces, punctuation or superscripts ("Area (m²)" ≡ "area_m2"). */
export function headerKey(text: string): string {
  return text.normalize("NFKD").replaceAll("²", "2").replaceAll("³", "3").toLowerCase().replace(/[^a-z0-9]/g, "");
}

/** The units a column of a file is in: a unit system, or "stored" (SI as stored, e.g. diameter_m in metres). */
export type ColumnUnits = UnitSystem | "stored";

export interface HeaderMatch {
  /** For each column of the file: the sheet column and the units its heading names, or null. */
  columns: ({ col: SheetColumn; system: ColumnUnits } | null)[];
  missing: SheetColumn[];
  ignored: string[];
}

/** Matches a file's headings to a sheet's columns by title and unit, in either unit system. */
export function matchHeaders(headers: readonly string[], sheet: TSheet): HeaderMatch {
  const keys = new Map<string, { col: SheetColumn; system: ColumnUnits }>();
  for (const col of SHEET_COLUMNS[sheet]) {
    // The field name itself (area_m2, diameter_m) means the stored SI unit; the headings name theirs.
    keys.set(headerKey(col.field), { col, system: "stored" });
    for (const system of ["SI", "IP"] as const) keys.set(headerKey(columnHeader(col, system)), { col, system });
  }
  const columns = headers.map((h) => keys.get(headerKey(h)) ?? null);
  const found = new Set(columns.filter((c) => c !== null).map((c) => c!.col.field));
  return {
    columns,
    missing: SHEET_COLUMNS[sheet].filter((c) => !c.optional && !found.has(c.field)),
    ignored: headers.filter((h, i) => columns[i] === null && h.trim() !== ""),
  };
}
