import "server-only";
import type { Knex } from "knex";
import type { AcceptedInputs } from "@/checking/accepted-inputs";
import type { TCheckSheet, TCheckState } from "@/checking/check-machine";
import type { Actor } from "@/server/auth/actor";
import { AppError } from "@/server/http/app-error";

type Q = Knex | Knex.Transaction;

export interface ScheduleRowRef {
  id: string;
  label: string;
  version: number;
  zone_id: string;
  position: number;
}

export interface RowCheck {
  id: string;
  sheet: TCheckSheet;
  row_id: string;
  state: TCheckState;
  checked_by: number | null;
  checked_at: string | null;
  checked_row_version: number | null;
  last_edited_by: number | null;
  last_edited_at: string | null;
  /** The last acceptance, kept when the row goes back to unchecked (migration 20261214120000). */
  accepted_at: string | null;
  accepted_by: number | null;
  accepted_row_version: number | null;
  accepted_in_bulk: boolean;
  /** What the row's results were computed from when accepted (src/checking/accepted-inputs.ts). */
  accepted_inputs: AcceptedInputs | null;
  version: number;
}

export const SHEET_NOUN: Record<TCheckSheet, string> = { surfaces: "surface", duct_runs: "duct run" };

/** One surface or duct run of a project of this firm (locked when asked), or 404. */
export async function findRowOrThrow(q: Q, firmId: string, projectId: string, sheet: TCheckSheet, rowId: string, lock = false): Promise<ScheduleRowRef> {
  let query = q(sheet).where({ id: rowId, firm_id: firmId, project_id: projectId }).first<ScheduleRowRef | undefined>("id", "label", "version", "zone_id", "position");
  if (lock) query = query.forUpdate();
  const row = await query;
  if (!row) throw new AppError("not_found", `No ${SHEET_NOUN[sheet]} with that id in this project`);
  return row;
}

/** The stored check of a row; rows never checked nor edited since checking began have none (unchecked). */
export async function findCheck(q: Q, projectId: string, sheet: TCheckSheet, rowId: string, lock = false): Promise<RowCheck | null> {
  let query = q("row_checks").where({ project_id: projectId, sheet, row_id: rowId }).first<RowCheck | undefined>();
  if (lock) query = query.forUpdate();
  return (await query) ?? null;
}

/** Creates or changes a row's check, bumping its version. */
export async function saveCheck(trx: Knex.Transaction, key: { firmId: string; projectId: string; sheet: TCheckSheet; rowId: string }, patch: Partial<Omit<RowCheck, "id" | "version">>): Promise<RowCheck> {
  const [row] = await trx("row_checks")
    .insert({ firm_id: key.firmId, project_id: key.projectId, sheet: key.sheet, row_id: key.rowId, ...patch })
    .onConflict(["project_id", "sheet", "row_id"])
    .merge({ ...patch, version: trx.raw("row_checks.version + 1"), updated_at: trx.fn.now() })
    .returning("*");
  return row;
}

/**
 * The person behind a change: the signed-in member, or for an API token the member who made it
 * (so scripted edits still stop their author from checking the rows).
 */
export async function editorId(q: Q, actor: Actor): Promise<number | null> {
  if (actor.userId !== null) return actor.userId;
  if (actor.tokenId === null) return null;
  const token = await q("api_tokens").where({ id: actor.tokenId }).first<{ created_by: number | null } | undefined>("created_by");
  return token?.created_by ?? null;
}

/** Names of members by id, for threads and lists. */
export async function userNames(q: Q, ids: (number | null)[]): Promise<Map<number, string>> {
  const wanted = [...new Set(ids.filter((i): i is number => i !== null))];
  if (wanted.length === 0) return new Map();
  const rows = await q("users").whereIn("id", wanted).select<{ id: number; name: string | null; email: string }[]>("id", "name", "email");
  return new Map(rows.map((u) => [u.id, u.name ?? u.email]));
}

export interface CheckCounts {
  rows: number;
  unchecked: number;
  accepted: number;
  queried: number;
}

/** Rows of a project by check state; a row with no stored check counts as unchecked. */
export async function checkCounts(q: Q, firmId: string, projectId: string): Promise<CheckCounts> {
  const { rows } = await q.raw<{ rows: { state: TCheckState; n: string }[] }>(
    `SELECT coalesce(c.state, 'unchecked') AS state, count(*) AS n
       FROM (SELECT 'surfaces' AS sheet, id FROM surfaces WHERE firm_id = :firmId AND project_id = :projectId
             UNION ALL
             SELECT 'duct_runs', id FROM duct_runs WHERE firm_id = :firmId AND project_id = :projectId) r
       LEFT JOIN row_checks c ON c.project_id = :projectId AND c.sheet = r.sheet AND c.row_id = r.id
      GROUP BY 1`,
    { firmId, projectId },
  );
  const counts: CheckCounts = { rows: 0, unchecked: 0, accepted: 0, queried: 0 };
  for (const r of rows) {
    counts[r.state] = Number(r.n);
    counts.rows += Number(r.n);
  }
  return counts;
}

/** Every stored check state of a project by row id (rows without one are unchecked). */
export async function checkStatesOf(q: Q, firmId: string, projectId: string): Promise<Record<string, TCheckState>> {
  const rows = await q("row_checks").where({ firm_id: firmId, project_id: projectId }).select<{ row_id: string; state: TCheckState }[]>("row_id", "state");
  return Object.fromEntries(rows.map((r) => [r.row_id, r.state]));
}
