import "server-only";
import type { TCheckSheet } from "@/checking/check-machine";
import type { TAcceptRows } from "@/schemas/checking";
import type { Actor } from "@/server/auth/actor";
import { checkRefusal } from "@/server/checking/check-rules";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { findCheck, findRowOrThrow, saveCheck } from "@/server/repositories/row-checks";
import { recordAudit } from "./record-audit";

/**
 * A checker accepts several rows at once (those listed in the check view), each at the version
 * they read. All or nothing: one row that may not be accepted — changed since, already accepted,
 * last edited by this checker — refuses the lot, naming every such row.
 */
export async function acceptRows(actor: Actor, projectId: string, input: TAcceptRows): Promise<{ accepted: number }> {
  if (actor.userId === null) throw new AppError("forbidden", "Rows are checked by a person: sign in to accept them (API tokens cannot)");
  const userId = actor.userId;
  // A fixed order of locks, so two checkers accepting overlapping lists cannot deadlock.
  const rows = [...input.rows].sort((a, b) => (a.sheet + a.id < b.sheet + b.id ? -1 : 1));
  return db().transaction(async (trx) => {
    const refusals: { field: string; message: string }[] = [];
    const ok: { sheet: TCheckSheet; id: string; label: string; version: number; state: string }[] = [];
    for (const r of rows) {
      const row = await findRowOrThrow(trx, actor.firm.id, projectId, r.sheet, r.id, true);
      const check = await findCheck(trx, projectId, r.sheet, r.id, true);
      const refusal = checkRefusal(r.sheet, row, check, userId, "accept", r.row_version);
      if (refusal) refusals.push({ field: `${r.sheet}.${r.id}`, message: `${row.label}: ${refusal.message}` });
      else ok.push({ sheet: r.sheet, id: r.id, label: row.label, version: row.version, state: check?.state ?? "unchecked" });
    }
    if (refusals.length > 0) throw new AppError("conflict", `${refusals.length} of ${rows.length} rows cannot be accepted; none was`, refusals);
    const at = new Date().toISOString();
    for (const r of ok) await saveCheck(trx, { firmId: actor.firm.id, projectId, sheet: r.sheet, rowId: r.id }, { state: "accepted", checked_by: userId, checked_at: at, checked_row_version: r.version });
    await recordAudit(
      trx,
      actor,
      ok.map((r) => ({ projectId, entity: "row_check", entityId: r.id, action: "accept", before: { sheet: r.sheet, label: r.label, state: r.state }, after: { sheet: r.sheet, label: r.label, state: "accepted", row_version: r.version } })),
    );
    return { accepted: ok.length };
  });
}
