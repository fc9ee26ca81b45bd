import "server-only";
import type { Knex } from "knex";
import type { RevisionSnapshot, SnapshotCheck, SnapshotComment } from "@/checking/snapshot";
import { loadSchedule } from "./schedule";
import { userNames, type RowCheck } from "./row-checks";

const iso = (t: string | Date | null) => (t === null ? null : new Date(t).toISOString());

/**
 * Everything a revision freezes except the results: the schedule as stored, each row's check
 * state (rows never checked are listed as unchecked) and every comment thread. Null when the firm
 * has no such project.
 */
export async function loadSnapshotInputs(q: Knex | Knex.Transaction, firmId: string, projectId: string): Promise<Omit<RevisionSnapshot, "format" | "results"> | null> {
  const s = await loadSchedule(q, firmId, projectId);
  if (!s) return null;
  const stored: RowCheck[] = await q("row_checks").where({ firm_id: firmId, project_id: projectId }).select();
  const comments: (SnapshotComment & { created_at: string | Date })[] = await q("row_comments")
    .where({ firm_id: firmId, project_id: projectId })
    .orderBy("id")
    .select("sheet", "row_id", "author_name", "kind", "body", "created_at");
  const names = await userNames(q, stored.flatMap((c) => [c.checked_by, c.last_edited_by]));
  const byKey = new Map(stored.map((c) => [`${c.sheet} ${c.row_id}`, c]));
  const checks: SnapshotCheck[] = [...s.surfaces.map((r) => ["surfaces", r.id] as const), ...s.duct_runs.map((r) => ["duct_runs", r.id] as const)].map(([sheet, id]) => {
    const c = byKey.get(`${sheet} ${id}`);
    return { sheet, row_id: id, state: c?.state ?? "unchecked", checked_by_name: c?.checked_by == null ? null : (names.get(c.checked_by) ?? null), checked_at: iso(c?.checked_at ?? null) };
  });
  const rows = new Set(checks.map((c) => `${c.sheet} ${c.row_id}`));
  const p = s.project;
  return {
    project: { id: p.id, name: p.name, reference: p.reference, altitude_m: p.altitude_m, terrain: p.terrain, wind_law: p.wind_law, unit_system: p.unit_system, default_method: p.default_method },
    design_cases: s.design_cases,
    zones: s.zones,
    buildups: s.buildups,
    surfaces: s.surfaces,
    duct_runs: s.duct_runs,
    checks,
    authors: [...new Set(stored.map((c) => (c.last_edited_by === null ? undefined : names.get(c.last_edited_by))).filter((n): n is string => n !== undefined))].sort(),
    // Threads of rows deleted since are history, not part of what is issued.
    comments: comments.filter((c) => rows.has(`${c.sheet} ${c.row_id}`)).map((c) => ({ ...c, created_at: iso(c.created_at)! })),
  };
}
