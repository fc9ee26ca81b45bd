/**
 * Two issued revisions side by side: rows added, removed and changed (which inputs, and how each
 * row's heat flow moved in every design case), changes to design cases, zones and build-ups, and
 * the change in every zone total. Reads only the frozen snapshots, so the answer never drifts.
 */
import type { ScheduleResults } from "@/calc/index";
import { canonicalJson } from "./canonical-json";
import type { TCheckSheet } from "./check-machine";
import type { RevisionSnapshot } from "./snapshot";

export interface FieldChange {
  field: string;
  before: unknown;
  after: unknown;
}
export interface RowRef {
  sheet: TCheckSheet;
  id: string;
  label: string;
}
export interface RowFlowChange {
  design_case_id: string;
  design_case: string;
  before_W: number | null;
  after_W: number | null;
}
export interface RowChange extends RowRef {
  /** Inputs of the row itself that differ; empty when only what it depends on changed. */
  fields: FieldChange[];
  /** Heat flow Q per design case, where it differs. */
  flows: RowFlowChange[];
}
export interface SettingChange {
  entity: "design_cases" | "zones" | "buildups";
  id: string;
  name: string;
  change: "added" | "removed" | "changed";
  fields: FieldChange[];
}
export interface ZoneTotal {
  loss_W: number;
  gain_W: number;
}
export interface ZoneTotalChange {
  design_case_id: string;
  design_case: string;
  zone_id: string;
  zone: string;
  before: ZoneTotal | null;
  after: ZoneTotal | null;
  loss_delta_W: number;
  gain_delta_W: number;
}
export interface RevisionComparison {
  rows: { added: RowRef[]; removed: RowRef[]; changed: RowChange[] };
  settings: SettingChange[];
  zones: ZoneTotalChange[];
}

// Bookkeeping columns: a new version or another place in the grid is not an engineering change.
const IGNORED = new Set(["id", "version", "position"]);

const same = (a: unknown, b: unknown) => canonicalJson(a ?? null) === canonicalJson(b ?? null);

/** Fields that differ between two versions of one item, in the order of the later one's keys. */
export function fieldChanges(before: Record<string, unknown>, after: Record<string, unknown>): FieldChange[] {
  const keys = [...new Set([...Object.keys(after), ...Object.keys(before)])].filter((k) => !IGNORED.has(k));
  return keys.filter((k) => !same(before[k], after[k])).map((field) => ({ field, before: before[field] ?? null, after: after[field] ?? null }));
}

function flowOf(results: ScheduleResults | undefined, sheet: TCheckSheet, id: string): number | null {
  const r = results?.[sheet].find((x) => x.row_id === id)?.result;
  return r?.ok && typeof r.Q_W === "number" ? r.Q_W : null;
}

const byId = <T extends { id: string }>(items: readonly T[]) => new Map(items.map((i) => [i.id, i]));

function caseNames(a: RevisionSnapshot, b: RevisionSnapshot): Map<string, string> {
  return new Map([...a.design_cases, ...b.design_cases].map((d) => [d.id, d.name]));
}

function compareRows(a: RevisionSnapshot, b: RevisionSnapshot, sheet: TCheckSheet, out: RevisionComparison["rows"]): void {
  const before = byId<{ id: string; label: string }>(a[sheet]);
  const after = byId<{ id: string; label: string }>(b[sheet]);
  const names = caseNames(a, b);
  const resultsA = new Map(a.results.map((r) => [r.design_case_id, r]));
  const resultsB = new Map(b.results.map((r) => [r.design_case_id, r]));
  const caseIds = [...new Set([...resultsB.keys(), ...resultsA.keys()])];
  for (const [id, row] of after) {
    const old = before.get(id);
    if (!old) {
      out.added.push({ sheet, id, label: row.label });
      continue;
    }
    const fields = fieldChanges(old as unknown as Record<string, unknown>, row as unknown as Record<string, unknown>);
    const flows: RowFlowChange[] = [];
    for (const caseId of caseIds) {
      const q0 = flowOf(resultsA.get(caseId), sheet, id);
      const q1 = flowOf(resultsB.get(caseId), sheet, id);
      // The engine is deterministic: the same inputs give the same bits, so any difference is real.
      if (q0 !== q1) flows.push({ design_case_id: caseId, design_case: names.get(caseId) ?? caseId, before_W: q0, after_W: q1 });
    }
    if (fields.length > 0 || flows.length > 0) out.changed.push({ sheet, id, label: row.label, fields, flows });
  }
  for (const [id, row] of before) if (!after.has(id)) out.removed.push({ sheet, id, label: row.label });
}

function compareSettings(a: RevisionSnapshot, b: RevisionSnapshot): SettingChange[] {
  const out: SettingChange[] = [];
  for (const entity of ["design_cases", "zones", "buildups"] as const) {
    const before = byId<{ id: string; name: string }>(a[entity]);
    const after = byId<{ id: string; name: string }>(b[entity]);
    for (const [id, item] of after) {
      const old = before.get(id);
      if (!old) out.push({ entity, id, name: item.name, change: "added", fields: [] });
      else {
        const fields = fieldChanges(old as unknown as Record<string, unknown>, item as unknown as Record<string, unknown>);
        if (fields.length > 0) out.push({ entity, id, name: item.name, change: "changed", fields });
      }
    }
    for (const [id, item] of before) if (!after.has(id)) out.push({ entity, id, name: item.name, change: "removed", fields: [] });
  }
  return out;
}

function compareZones(a: RevisionSnapshot, b: RevisionSnapshot): ZoneTotalChange[] {
  const names = caseNames(a, b);
  const zoneNames = new Map([...a.zones, ...b.zones].map((z) => [z.id, z.name]));
  const totals = (s: RevisionSnapshot) => {
    const m = new Map<string, ZoneTotal>();
    for (const r of s.results) for (const z of r.zones) m.set(`${r.design_case_id} ${z.zone_id}`, { loss_W: z.loss_W, gain_W: z.gain_W });
    return m;
  };
  const ta = totals(a);
  const tb = totals(b);
  const out: ZoneTotalChange[] = [];
  // In the later revision's order of design cases and zones, then whatever it no longer has.
  const caseOrder = [...new Set([...b.design_cases.map((d) => d.id), ...a.design_cases.map((d) => d.id)])];
  const zoneOrder = [...new Set([...b.zones.map((z) => z.id), ...a.zones.map((z) => z.id)])];
  for (const caseId of caseOrder) {
    for (const zoneId of zoneOrder) {
      const key = `${caseId} ${zoneId}`;
      const before = ta.get(key) ?? null;
      const after = tb.get(key) ?? null;
      if (before === null && after === null) continue;
      out.push({
        design_case_id: caseId,
        design_case: names.get(caseId) ?? caseId,
        zone_id: zoneId,
        zone: zoneNames.get(zoneId) ?? zoneId,
        before,
        after,
        loss_delta_W: (after?.loss_W ?? 0) - (before?.loss_W ?? 0),
        gain_delta_W: (after?.gain_W ?? 0) - (before?.gain_W ?? 0),
      });
    }
  }
  return out;
}

/** What changed from revision `a` (earlier) to revision `b` (later). */
export function compareRevisions(a: RevisionSnapshot, b: RevisionSnapshot): RevisionComparison {
  const rows: RevisionComparison["rows"] = { added: [], removed: [], changed: [] };
  compareRows(a, b, "surfaces", rows);
  compareRows(a, b, "duct_runs", rows);
  return { rows, settings: compareSettings(a, b), zones: compareZones(a, b) };
}
