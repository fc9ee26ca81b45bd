/**
 * Changes to a row's inputs since it was accepted, in words for the checker: each field by its
 * heading in the sheets and forms, each value in the project's units with its unit, choices by
 * their labels, zones and build-ups by name. No column name reaches the page.
 */
import {
  BUILDUP_NUMBERS,
  CASE_KIND_OPTIONS,
  DESIGN_CASE_NUMBERS,
  LAYER_NUMBERS,
  METHOD_OPTIONS,
  PROJECT_NUMBERS,
  SOLAR_SPEC,
  TERRAIN_OPTIONS,
  UNIT_OPTIONS,
  WIND_LAW_OPTIONS,
  ZONE_NUMBERS,
  labelOf,
  unitSuffix,
  type NumberSpec,
  type Option,
} from "@/schemas/schedule-fields";
import { SHEET_COLUMNS } from "@/schedule/sheet-columns";
import { formatQuantity } from "@/units/format";
import type { UnitSystem } from "@/units/units";
import type { InputChange, InputScope } from "./accepted-inputs";
import type { TCheckSheet } from "./check-machine";
import { fieldChanges, type FieldChange } from "./compare-revisions";

export interface ShownChange {
  /** "This surface", "Zone Office", "Design case Winter peak", "Site". */
  heading: string;
  /** "added" / "removed" for a whole design case; otherwise the fields that changed. */
  note?: string;
  fields: { label: string; before: string; after: string }[];
}

type FieldRule = { label: string; spec?: NumberSpec; options?: readonly Option[]; blank?: string; flag?: boolean };

const numbersOf = (specs: Record<string, NumberSpec>): Record<string, FieldRule> => Object.fromEntries(Object.entries(specs).map(([f, spec]) => [f, { label: spec.label, spec }]));

function rowRules(sheet: TCheckSheet): Record<string, FieldRule> {
  return Object.fromEntries(
    SHEET_COLUMNS[sheet].map((c) => [c.field, { label: c.title, spec: c.spec, options: c.options, blank: c.blankLabel, flag: c.kind === "flag" }]),
  );
}

const RULES: Record<Exclude<InputScope, "row">, Record<string, FieldRule>> = {
  zone: { name: { label: "Name" }, ...numbersOf(ZONE_NUMBERS) },
  buildup: { name: { label: "Name" }, ...numbersOf(BUILDUP_NUMBERS) },
  design_case: { name: { label: "Name" }, kind: { label: "Kind", options: CASE_KIND_OPTIONS }, ...numbersOf(DESIGN_CASE_NUMBERS) },
  site: { ...numbersOf(PROJECT_NUMBERS), terrain: { label: "Terrain", options: TERRAIN_OPTIONS }, wind_law: { label: "Wind law", options: WIND_LAW_OPTIONS }, default_method: { label: "Exterior method", options: METHOD_OPTIONS } },
};

const SOLAR_NAMES: Record<string, string> = { N: "north", NE: "north-east", E: "east", SE: "south-east", S: "south", SW: "south-west", W: "west", NW: "north-west", horizontal: "horizontal" };

export interface DescribeContext {
  sheet: TCheckSheet;
  system: UnitSystem;
  /** Names by id, for a row moved to another zone or build-up (deleted ones read "a removed …"). */
  zones: ReadonlyMap<string, string>;
  buildups: ReadonlyMap<string, string>;
}

function shown(rule: FieldRule | undefined, v: unknown, system: UnitSystem): string {
  if (rule?.flag) return v === true ? "Yes" : "No";
  if (v === null || v === undefined) return rule?.blank ?? (rule?.spec?.blank ? `blank (${rule.spec.blank})` : "blank");
  if (rule?.options && typeof v === "string") return labelOf(rule.options, v);
  if (rule?.spec && typeof v === "number") return `${formatQuantity(rule.spec.quantity, v, system, rule.spec.digits)}${unitSuffix(rule.spec.quantity, system)}`;
  return typeof v === "object" ? "(changed)" : String(v);
}

type Layer = { material?: string; thickness_m?: number; k_W_mK?: number };

/** A build-up's layers, compared one by one (a layer added or removed is one line). */
function layerLines(before: Layer[], after: Layer[], system: UnitSystem): ShownChange["fields"] {
  const out: ShownChange["fields"] = [];
  const layer = (l: Layer | undefined) =>
    l === undefined ? "none" : `${l.material ?? ""}, ${shown({ label: "", spec: LAYER_NUMBERS.thickness_m }, l.thickness_m, system)}, k ${shown({ label: "", spec: LAYER_NUMBERS.k_W_mK }, l.k_W_mK, system)}`;
  for (let i = 0; i < Math.max(before.length, after.length); i++) {
    const a = layer(before[i]);
    const b = layer(after[i]);
    if (a !== b) out.push({ label: `Layer ${i + 1}`, before: a, after: b });
  }
  return out;
}

function solarLines(before: Record<string, number>, after: Record<string, number>, system: UnitSystem): ShownChange["fields"] {
  const keys = Object.keys(SOLAR_NAMES).filter((k) => (before?.[k] ?? 0) !== (after?.[k] ?? 0));
  const rule: FieldRule = { label: "", spec: SOLAR_SPEC };
  return keys.map((k) => ({ label: `${SOLAR_SPEC.label}, ${SOLAR_NAMES[k]}`, before: shown(rule, before?.[k] ?? 0, system), after: shown(rule, after?.[k] ?? 0, system) }));
}

const NOUN: Record<TCheckSheet, string> = { surfaces: "This surface", duct_runs: "This duct run" };

function describeFields(rules: Record<string, FieldRule>, changes: readonly FieldChange[], ctx: Omit<DescribeContext, "sheet">): ShownChange["fields"] {
  return changes.flatMap((f) => {
    if (f.field === "layers") return layerLines((f.before ?? []) as Layer[], (f.after ?? []) as Layer[], ctx.system);
    if (f.field === "solar_W_m2") return solarLines((f.before ?? {}) as Record<string, number>, (f.after ?? {}) as Record<string, number>, ctx.system);
    if (f.field === "zone_id" || f.field === "buildup_id") {
      const names = f.field === "zone_id" ? ctx.zones : ctx.buildups;
      const what = f.field === "zone_id" ? "zone" : "build-up";
      const name = (id: unknown) => names.get(String(id)) ?? (names.size === 0 ? `another ${what}` : `a removed ${what}`);
      return [{ label: f.field === "zone_id" ? "Zone" : "Build-up", before: name(f.before), after: name(f.after) }];
    }
    const rule = rules[f.field];
    // A field with no heading is bookkeeping the person never sees: say nothing rather than its name.
    if (rule === undefined) return [];
    return [{ label: rule.label, before: shown(rule, f.before, ctx.system), after: shown(rule, f.after, ctx.system) }];
  });
}

/** The changes since acceptance as headed groups of "label: before → after". */
export function describeInputChanges(changes: readonly InputChange[], ctx: DescribeContext): ShownChange[] {
  return changes.map((c) => {
    const heading =
      c.scope === "row" ? NOUN[ctx.sheet] : c.scope === "zone" ? `Zone ${c.name}` : c.scope === "buildup" ? `Build-up ${c.name}` : c.scope === "design_case" ? `Design case ${c.name}` : "Site";
    if (c.change !== "changed") return { heading, note: c.change === "added" ? "added since the row was accepted" : "removed since the row was accepted", fields: [] };
    return { heading, fields: describeFields(c.scope === "row" ? rowRules(ctx.sheet) : RULES[c.scope], c.fields, ctx) };
  });
}

const PROJECT_RULES: Record<string, FieldRule> = { ...RULES.site, name: { label: "Name" }, reference: { label: "Reference" }, unit_system: { label: "Units", options: UNIT_OPTIONS } };

/**
 * One audited change of a schedule item (a history entry's before and after) as "Label: before →
 * after" lines in SI, for the history panels; null for items it does not know (said as before).
 */
export function describeItemChange(entity: string, before: Record<string, unknown>, after: Record<string, unknown>): string[] | null {
  const rules =
    entity === "surfaces" || entity === "duct_runs"
      ? rowRules(entity)
      : entity === "zones"
        ? RULES.zone
        : entity === "buildups"
          ? RULES.buildup
          : entity === "design_cases"
            ? RULES.design_case
            : entity === "project"
              ? PROJECT_RULES
              : null;
  if (rules === null) return null;
  const fields = fieldChanges(before, after).filter((f) => f.field !== "updated_at");
  return describeFields(rules, fields, { system: "SI", zones: new Map(), buildups: new Map() }).map((f) => `${f.label}: ${f.before} → ${f.after}`);
}
