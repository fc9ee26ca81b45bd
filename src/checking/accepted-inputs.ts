/**
 * What a row's results were computed from when a checker accepted it, kept with its check so that,
 * once the row is back to unchecked, the checker is told what changed since (before → after)
 * rather than reading the whole working again. A row's results depend on its own inputs, its zone,
 * its build-up (surfaces), every design case and the project's site: all of them are kept.
 */
import { canonicalJson } from "./canonical-json";
import type { TCheckSheet } from "./check-machine";
import { fieldChanges, type FieldChange } from "./compare-revisions";

type Item = Record<string, unknown>;

export interface AcceptedInputs {
  format: 1;
  row: Item;
  zone: Item | null;
  /** Surfaces only; null for duct runs. */
  buildup: Item | null;
  design_cases: Item[];
  site: Item;
}

/** The project's fields that move results (its name, reference and units do not). */
export const SITE_FIELDS = ["altitude_m", "terrain", "wind_law", "default_method"] as const;

// Bookkeeping: where a row sits, its version, when it was written, are not inputs.
const BOOKKEEPING = ["version", "position", "created_at", "updated_at", "firm_id", "project_id"];
const strip = (item: Item): Item => Object.fromEntries(Object.entries(item).filter(([k]) => !BOOKKEEPING.includes(k)));

export interface InputSources {
  project: Item;
  zones: readonly Item[];
  buildups: readonly Item[];
  design_cases: readonly Item[];
}

/** The inputs a row's results depend on now, in the form kept at acceptance. */
export function rowInputs(sheet: TCheckSheet, row: Item, from: InputSources): AcceptedInputs {
  const zone = from.zones.find((z) => z.id === row.zone_id) ?? null;
  const buildup = sheet === "surfaces" ? (from.buildups.find((b) => b.id === row.buildup_id) ?? null) : null;
  return {
    format: 1,
    row: strip(row),
    zone: zone && strip(zone),
    buildup: buildup && strip(buildup),
    design_cases: from.design_cases.map(strip),
    site: Object.fromEntries(SITE_FIELDS.map((f) => [f, from.project[f] ?? null])),
  };
}

export type InputScope = "row" | "zone" | "buildup" | "design_case" | "site";

export interface InputChange {
  scope: InputScope;
  /** The zone's, build-up's or design case's name; the row's label for the row itself. */
  name: string;
  change: "changed" | "added" | "removed";
  fields: FieldChange[];
}

const nameOf = (i: Item | null | undefined) => String(i?.name ?? i?.label ?? "");

/**
 * Fields that differ, among those both sides hold: an input added to Filmsheet after the row was
 * accepted was not there to change (and inputs kept by the first migration may hold extra columns).
 */
function changed(before: Item, after: Item): FieldChange[] {
  const keys = Object.keys(after).filter((k) => k in before);
  const pick = (i: Item) => Object.fromEntries(keys.map((k) => [k, i[k]]));
  return fieldChanges(pick(before), pick(after));
}

/**
 * What differs between the inputs kept at acceptance and those of now, most direct first: the row,
 * its zone and build-up, the design cases, the site. A zone or build-up the row was moved away
 * from is the row's change (zone: A → B), not a comparison of two different zones.
 */
export function inputChanges(before: AcceptedInputs, after: AcceptedInputs): InputChange[] {
  const out: InputChange[] = [];
  const rowFields = changed(before.row, after.row);
  if (rowFields.length > 0) out.push({ scope: "row", name: nameOf(after.row), change: "changed", fields: rowFields });
  for (const scope of ["zone", "buildup"] as const) {
    const a = before[scope];
    const b = after[scope];
    if (a && b && a.id === b.id) {
      const fields = changed(a, b);
      if (fields.length > 0) out.push({ scope, name: nameOf(b), change: "changed", fields });
    }
  }
  const cases = new Map(before.design_cases.map((d) => [d.id, d]));
  for (const d of after.design_cases) {
    const old = cases.get(d.id);
    if (!old) out.push({ scope: "design_case", name: nameOf(d), change: "added", fields: [] });
    else {
      const fields = changed(old, d);
      if (fields.length > 0) out.push({ scope: "design_case", name: nameOf(d), change: "changed", fields });
    }
  }
  const now = new Set(after.design_cases.map((d) => d.id));
  for (const d of before.design_cases) if (!now.has(d.id)) out.push({ scope: "design_case", name: nameOf(d), change: "removed", fields: [] });
  const site = changed(before.site, after.site);
  if (site.length > 0) out.push({ scope: "site", name: "", change: "changed", fields: site });
  return out;
}

/** True when nothing the row depends on differs (a reset that was undone, say). */
export const sameInputs = (a: AcceptedInputs, b: AcceptedInputs) => canonicalJson(a) === canonicalJson(b);
