import "server-only";
import type { TCheckSheet } from "@/checking/check-machine";
import type { TAcceptRows } from "@/schemas/checking";
import type { Actor } from "@/server/auth/actor";
import { checkRefusal } from "@/server/checking/check-rules";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { currentInputs, rowInputColumns } from "@/server/repositories/accepted-inputs";
import { SHEET_NOUN, type RowCheck, type ScheduleRowRef } from "@/server/repositories/row-checks";
import { recordAudit } from "./record-audit";

// Rows per statement: well below PostgreSQL's 65,535 bind parameters.
const CHUNK = 1000;

/**
 * A checker accepts several rows at once (those listed in the check view, after confirming the
 * filter and their number), each at the version they read; each row's check and history record
 * that it was accepted in bulk. All or nothing: one row that may not be accepted — changed since, already accepted,
 * last edited by this checker — refuses the lot, naming every such row.
 */
export async function acceptRows(actor: Actor, projectId: string, input: TAcceptRows): Promise<{ accepted: number }> {
  if (actor.userId === null) throw new AppError("forbidden", "Rows are checked by a person: sign in to accept them (API tokens cannot)");
  const userId = actor.userId;
  // A fixed order of locks, so two checkers accepting overlapping lists cannot deadlock.
  const rows = [...input.rows].sort((a, b) => (a.sheet + a.id < b.sheet + b.id ? -1 : 1));
  return db().transaction(async (trx) => {
    // Set-based: the rows and their checks are read and locked a sheet at a time (in id order,
    // as the sort above), not one query per row, so accepting a whole sheet stays a few statements.
    const found = new Map<string, ScheduleRowRef & Record<string, unknown>>();
    const checks = new Map<string, RowCheck>();
    for (const sheet of [...new Set(rows.map((r) => r.sheet))]) {
      const ids = rows.filter((r) => r.sheet === sheet).map((r) => r.id);
      for (let i = 0; i < ids.length; i += CHUNK) {
        const part = ids.slice(i, i + CHUNK);
        // Every input column: what each row is computed from is kept with its acceptance.
        const stored = await trx(sheet).where({ firm_id: actor.firm.id, project_id: projectId }).whereIn("id", part).orderBy("id").forUpdate().select<(ScheduleRowRef & Record<string, unknown>)[]>(rowInputColumns(sheet));
        for (const row of stored) found.set(`${sheet}:${row.id}`, row);
        const held = await trx("row_checks").where({ project_id: projectId, sheet }).whereIn("row_id", part).orderBy("row_id").forUpdate().select<RowCheck[]>("*");
        for (const check of held) checks.set(`${sheet}:${check.row_id}`, check);
      }
    }
    const refusals: { field: string; message: string }[] = [];
    const ok: { sheet: TCheckSheet; id: string; label: string; version: number; state: string }[] = [];
    for (const r of rows) {
      const row = found.get(`${r.sheet}:${r.id}`);
      if (!row) throw new AppError("not_found", `No ${SHEET_NOUN[r.sheet]} with that id in this project`);
      const check = checks.get(`${r.sheet}:${r.id}`) ?? null;
      const refusal = checkRefusal(r.sheet, row, check, userId, "accept", r.row_version);
      if (refusal) refusals.push({ field: `${r.sheet}.${r.id}`, message: `${row.label}: ${refusal.message}` });
      else ok.push({ sheet: r.sheet, id: r.id, label: row.label, version: row.version, state: check?.state ?? "unchecked" });
    }
    if (refusals.length > 0) throw new AppError("conflict", `${refusals.length} of ${rows.length} rows cannot be accepted; none was`, refusals);
    const at = new Date().toISOString();
    const inputs = await currentInputs(trx, actor.firm.id, projectId, ok.map((r) => ({ sheet: r.sheet, row: found.get(`${r.sheet}:${r.id}`)! })));
    for (let i = 0; i < ok.length; i += CHUNK) {
      await trx("row_checks")
        .insert(
          ok.slice(i, i + CHUNK).map((r) => ({
            firm_id: actor.firm.id, project_id: projectId, sheet: r.sheet, row_id: r.id, state: "accepted", checked_by: userId, checked_at: at, checked_row_version: r.version,
            accepted_at: at, accepted_by: userId, accepted_row_version: r.version, accepted_in_bulk: true, accepted_inputs: inputs.get(`${r.sheet}:${r.id}`)!,
          })),
        )
        .onConflict(["project_id", "sheet", "row_id"])
        .merge({
          state: "accepted",
          checked_by: userId,
          checked_at: at,
          checked_row_version: trx.raw("excluded.checked_row_version"),
          accepted_at: at,
          accepted_by: userId,
          accepted_row_version: trx.raw("excluded.accepted_row_version"),
          accepted_in_bulk: true,
          accepted_inputs: trx.raw("excluded.accepted_inputs"),
          version: trx.raw("row_checks.version + 1"),
          updated_at: trx.fn.now(),
        });
    }
    // Each row's history says it was accepted in bulk, with the filter and the number confirmed.
    const bulk = { rows: ok.length, filter: input.filter };
    await recordAudit(
      trx,
      actor,
      ok.map((r) => ({ projectId, entity: "row_check", entityId: r.id, action: "accept", before: { sheet: r.sheet, label: r.label, state: r.state }, after: { sheet: r.sheet, label: r.label, state: "accepted", row_version: r.version, bulk } })),
    );
    return { accepted: ok.length };
  });
}
