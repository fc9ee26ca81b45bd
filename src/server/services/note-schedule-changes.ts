import "server-only";
import type { Knex } from "knex";
import { fieldChanges } from "@/checking/compare-revisions";
import type { TCheckSheet } from "@/checking/check-machine";
import type { Actor } from "@/server/auth/actor";
import { editorId } from "@/server/repositories/row-checks";
import { resetChecks } from "@/server/repositories/reset-checks";
import { recordAudit } from "./record-audit";

/** One saved change to a project's data, as the schedule's writers see it. */
export interface ScheduleChange {
  /** The table: "project", "design_cases", "zones", "buildups", "surfaces", "duct_runs". */
  entity: string;
  op: "create" | "update" | "delete";
  id: string;
  before: Record<string, unknown> | null;
  after: Record<string, unknown> | null;
}

const SHEETS = new Set<string>(["surfaces", "duct_runs"]);
// A project's site changes every row's results; its name, reference or units do not.
const SITE_FIELDS = new Set(["altitude_m", "terrain", "wind_law", "default_method"]);

async function projectRowIds(trx: Knex.Transaction, projectId: string, sheet: TCheckSheet, where: Record<string, string> = {}): Promise<string[]> {
  return (await trx(sheet).where({ project_id: projectId, ...where }).pluck("id")) as string[];
}

/**
 * The checking side of every write to a project's data, called by the writer inside its own
 * transaction: an audit row for each change (before and after), and every row whose results the
 * change can move goes back to unchecked — the row itself, the surfaces of a changed build-up, the
 * rows of a changed zone, every row for a design case or a site change. Only a row edited itself
 * gets the writer as its last editor (who may then not check it); a project-level change leaves
 * each row's last editor as it was, so whoever made it may still check rows they never edited. A
 * change that leaves every value as it was (a reorder, a no-op save) keeps checks.
 */
// Ids per statement: far below PostgreSQL's 65,535 bind parameters.
const ID_CHUNK = 10_000;

export async function noteScheduleChanges(trx: Knex.Transaction, actor: Actor, projectId: string, changes: readonly ScheduleChange[]): Promise<void> {
  if (changes.length === 0) return;
  await recordAudit(trx, actor, changes.map((c) => ({ projectId, entity: c.entity, entityId: c.id, action: c.op, before: c.before ?? undefined, after: c.after ?? undefined })));

  const editor = await editorId(trx, actor);
  const direct: Record<TCheckSheet, string[]> = { surfaces: [], duct_runs: [] };
  const indirect: { sheet: TCheckSheet; where?: Record<string, string>; reason: string }[] = [];
  const deleted: Record<TCheckSheet, string[]> = { surfaces: [], duct_runs: [] };
  for (const c of changes) {
    const changed = c.op !== "update" || fieldChanges(c.before ?? {}, c.after ?? {}).length > 0;
    if (!changed) continue;
    if (SHEETS.has(c.entity)) {
      const sheet = c.entity as TCheckSheet;
      if (c.op === "delete") deleted[sheet].push(c.id);
      else direct[sheet].push(c.id);
    } else if (c.entity === "buildups" && c.op === "update") {
      indirect.push({ sheet: "surfaces", where: { buildup_id: c.id }, reason: `build-up ${String(c.after?.name ?? c.id)} changed` });
    } else if (c.entity === "zones" && c.op === "update") {
      const reason = `zone ${String(c.after?.name ?? c.id)} changed`;
      indirect.push({ sheet: "surfaces", where: { zone_id: c.id }, reason }, { sheet: "duct_runs", where: { zone_id: c.id }, reason });
    } else if (c.entity === "design_cases") {
      const reason = `design case ${String((c.after ?? c.before)?.name ?? c.id)} ${c.op === "create" ? "added" : c.op === "delete" ? "deleted" : "changed"}`;
      indirect.push({ sheet: "surfaces", reason }, { sheet: "duct_runs", reason });
    } else if (c.entity === "project" && fieldChanges(c.before ?? {}, c.after ?? {}).some((f) => SITE_FIELDS.has(f.field))) {
      indirect.push({ sheet: "surfaces", reason: "site changed" }, { sheet: "duct_runs", reason: "site changed" });
    }
  }
  for (const sheet of ["surfaces", "duct_runs"] as const) {
    // One statement per sheet, however many rows (a replace-import deletes a whole sheet).
    for (let i = 0; i < deleted[sheet].length; i += ID_CHUNK) {
      await trx("row_checks").where({ project_id: projectId, sheet }).whereIn("row_id", deleted[sheet].slice(i, i + ID_CHUNK)).delete();
    }
    if (direct[sheet].length > 0) await resetChecks(trx, actor, projectId, sheet, direct[sheet], editor, `${sheet === "surfaces" ? "surface" : "duct run"} changed`);
  }
  for (const i of indirect) await resetChecks(trx, actor, projectId, i.sheet, await projectRowIds(trx, projectId, i.sheet, i.where), "keep", i.reason);
}
