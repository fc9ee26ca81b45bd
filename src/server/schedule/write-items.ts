import "server-only";
import type { Knex } from "knex";
import type { Actor } from "@/server/auth/actor";
import { isUniqueViolation } from "@/server/db/unique-violation";
import { AppError } from "@/server/http/app-error";
import { attachLayers } from "@/server/repositories/schedule";
import { assertPlanAllows, rowsBeforeChange } from "@/server/services/assert-plan-allows";
import { checkChanges, type CheckedChange, type ItemChange, type RowConflict, type RowProblem } from "./check-changes";
import { ENTITIES, readColumns, type EntityName } from "./entities";
import { noteScheduleChanges, type ScheduleChange } from "@/server/services/note-schedule-changes";

export interface WriteResult {
  created: { sheet: EntityName; row: Record<string, unknown> }[];
  updated: { sheet: EntityName; row: Record<string, unknown> }[];
  deleted: { sheet: EntityName; id: string }[];
}

// PostgreSQL takes at most 65,535 bind parameters a statement; 500 rows × ~20 columns stays well below.
const INSERT_CHUNK = 500;

const plural = (n: number, one: string, many = `${one}s`) => `${n} ${n === 1 ? one : many}`;

export function refuseProblems(problems: RowProblem[]): never {
  const rows = new Set(problems.map((p) => p.row)).size;
  throw new AppError("invalid_input", `${plural(problems.length, "problem")} in ${plural(rows, "row")}; nothing was saved`, problems);
}

function refuseConflicts(conflicts: RowConflict[]): never {
  throw new AppError("conflict", `${plural(conflicts.length, "row")} changed since you read ${conflicts.length === 1 ? "it" : "them"}; nothing was saved`, conflicts);
}

export async function countRows(trx: Knex.Transaction | Knex, projectId: string): Promise<number> {
  const { rows } = await trx.raw<{ rows: { n: string }[] }>("select (select count(*) from surfaces where project_id = ?) + (select count(*) from duct_runs where project_id = ?) as n", [projectId, projectId]);
  return Number(rows[0]!.n);
}

/** The columns a table stores for a parsed row (layers live in their own table). */
function columnsOf(parsed: Record<string, unknown>, name: EntityName): Record<string, unknown> {
  const { layers: _l, ...cols } = parsed;
  if (name === "design_cases") cols.solar_W_m2 = JSON.stringify(cols.solar_W_m2);
  return cols;
}

async function writeLayers(trx: Knex.Transaction | Knex, firmId: string, buildupId: string, layers: unknown): Promise<void> {
  await trx("buildup_layers").where({ buildup_id: buildupId }).del();
  const list = layers as { material: string; thickness_m: number; k_W_mK: number }[];
  if (list.length > 0) await trx("buildup_layers").insert(list.map((l, i) => ({ ...l, buildup_id: buildupId, firm_id: firmId, position: i })));
}

/** Refuses to delete zones or build-ups that rows still use, naming how many. */
async function assertUnused(trx: Knex.Transaction | Knex, deletes: CheckedChange[]): Promise<void> {
  const conflicts: RowConflict[] = [];
  for (const d of deletes) {
    for (const use of ENTITIES[d.entity].usedBy) {
      const [{ n }] = await trx(use.table).where(use.field, d.id).count({ n: "*" });
      if (Number(n) > 0) {
        const name = String(d.current?.name ?? d.id);
        conflicts.push({ row: d.row, sheet: d.entity, id: d.id as string, field: "id", message: `${name} is used by ${plural(Number(n), use.noun.replace(/s$/, ""), use.noun)}; move or delete them first`, current: d.current ?? null });
      }
    }
  }
  if (conflicts.length) refuseConflicts(conflicts);
}

async function insertAll(trx: Knex.Transaction | Knex, actor: Actor, projectId: string, name: EntityName, creates: CheckedChange[]): Promise<Record<string, unknown>[]> {
  const e = ENTITIES[name];
  let next = 0;
  if (e.positioned) {
    const [{ max }] = await trx(e.table).where({ project_id: projectId }).max({ max: "position" });
    next = (max ?? -1) + 1;
  }
  const records = creates.map((c) => ({
    ...columnsOf(c.parsed as Record<string, unknown>, name),
    ...(c.id === undefined ? {} : { id: c.id }),
    ...(e.positioned ? { position: next++ } : {}),
    firm_id: actor.firm.id,
    project_id: projectId,
  }));
  const out: Record<string, unknown>[] = [];
  for (let i = 0; i < records.length; i += INSERT_CHUNK) {
    out.push(...(await trx(e.table).insert(records.slice(i, i + INSERT_CHUNK)).returning(readColumns(e))));
  }
  if (name === "buildups") {
    for (const [i, row] of out.entries()) await writeLayers(trx, actor.firm.id, row.id as string, creates[i]!.parsed!.layers);
    return attachLayers(trx, out);
  }
  return out;
}

// Sheets whose columns are all plain scalars, so jsonb_populate_recordset gives them their types.
const SET_BASED: ReadonlySet<EntityName> = new Set<EntityName>(["surfaces", "duct_runs"]);

/**
 * Updates many rows of one sheet in one statement per 500 rows, each row guarded by the version
 * it was read at: the new values travel as one JSON array that PostgreSQL turns into rows of the
 * table's own type. A row that no longer has its version (changed meanwhile) refuses the whole
 * change with 409, naming every such row with its current state.
 */
async function updateAll(trx: Knex.Transaction, actor: Actor, name: EntityName, updates: CheckedChange[]): Promise<Map<string, Record<string, unknown>>> {
  const e = ENTITIES[name];
  const out = new Map<string, Record<string, unknown>>();
  const values = updates.map((u) => ({ ...columnsOf(u.parsed as Record<string, unknown>, name), id: u.id, version: u.current!.version }));
  // Every update carries the whole merged row, so one column list serves them all.
  const columns = [...new Set(values.flatMap((v) => Object.keys(v)))].filter((c) => c !== "id" && c !== "version");
  const ident = (c: string) => `"${c.replaceAll('"', '""')}"`;
  const returning = readColumns(e).map((c) => `t.${ident(c)}`).join(", ");
  const sql = `UPDATE ${ident(e.table)} AS t SET (${[...columns.map(ident), "version", "updated_at"].join(", ")}) = (${[...columns.map((c) => `v.${ident(c)}`), "t.version + 1", "now()"].join(", ")})
    FROM jsonb_populate_recordset(NULL::${ident(e.table)}, ?::jsonb) AS v
    WHERE t.id = v.id AND t.version = v.version AND t.firm_id = ? RETURNING ${returning}`;
  for (let i = 0; i < values.length; i += INSERT_CHUNK) {
    const { rows } = await trx.raw(sql, [JSON.stringify(values.slice(i, i + INSERT_CHUNK)), actor.firm.id]);
    for (const row of rows as Record<string, unknown>[]) out.set(row.id as string, row);
  }
  const stale = updates.filter((u) => !out.has(u.id as string));
  if (stale.length) {
    const now = await trx(e.table).whereIn("id", stale.map((u) => u.id as string)).where({ firm_id: actor.firm.id }).select(readColumns(e));
    const byId = new Map(now.map((r: Record<string, unknown>) => [r.id as string, r]));
    refuseConflicts(stale.map((u) => ({ row: u.row, sheet: u.entity, id: u.id as string, field: "version", message: `This ${e.noun} was changed by someone else meanwhile; nothing was saved`, current: byId.get(u.id as string) ?? null })));
  }
  return out;
}

/**
 * Applies creates, updates and deletes of one project's items in the caller's transaction, all
 * or nothing (a lone update of one row may be checked outside one; its write then opens its own):
 * every change is checked first (stale versions → 409 naming each row with its
 * current state; bad values → 422 naming row and field), and only a clean set is written.
 */
export async function writeItems(
  trx: Knex.Transaction | Knex,
  actor: Actor,
  projectId: string,
  changes: ItemChange[],
  // rowsBefore: the project's rows before a change its caller began in the transaction (a replace
  // import's deletes), from rowsBeforeChange; otherwise counted here before this change's writes.
  opts: { missing?: "conflict" | "not_found"; rowsBefore?: number | null } = {},
): Promise<WriteResult> {
  const { checked, problems, conflicts } = await checkChanges(trx, actor.firm.id, projectId, changes);
  // A single-item route names one row by its URL: a row that is not there (or is another
  // firm's) is 404 there; in a bulk change it is a conflict (someone deleted it meanwhile).
  const gone = conflicts.find((c) => c.current === null);
  if (gone && opts.missing === "not_found") throw new AppError("not_found", `No ${ENTITIES[gone.sheet].noun} with that id in this project`);
  if (conflicts.length) refuseConflicts(conflicts);
  if (problems.length) refuseProblems(problems);
  // A lone edit is checked outside a transaction (no lock: its UPDATE is guarded by the version
  // read), but the write, its audit row and its check reset still commit together or not at all.
  const write = (w: Knex.Transaction) => writeChecked(w, actor, projectId, changes, checked, opts.rowsBefore);
  return (trx as Knex.Transaction).isTransaction === true ? write(trx as Knex.Transaction) : (trx as Knex).transaction(write);
}

/** Writes changes that passed every check, with their audit rows and check resets, in `trx`. */
async function writeChecked(trx: Knex.Transaction, actor: Actor, projectId: string, changes: ItemChange[], checked: CheckedChange[], rowsBefore?: number | null): Promise<WriteResult> {
  const result: WriteResult = { created: [], updated: [], deleted: [] };
  const addsRows = checked.some((c) => c.op === "create" && (c.entity === "surfaces" || c.entity === "duct_runs"));
  // The free plan refuses growth past its row limit, not a change that keeps the count (a batch
  // that deletes as many rows as it adds), so the count before this change's writes is kept.
  if (addsRows && rowsBefore === undefined) rowsBefore = await rowsBeforeChange(trx, actor.firm.id, () => countRows(trx, projectId));
  // For the audit trail and the check states, written in this same transaction.
  const noted: ScheduleChange[] = [];
  const deletes = checked.filter((c) => c.op === "delete");
  await assertUnused(trx, deletes);
  for (const name of new Set(deletes.map((d) => d.entity))) {
    const ids = deletes.filter((d) => d.entity === name).map((d) => d.id as string);
    const gone = await trx(ENTITIES[name].table)
      .where({ firm_id: actor.firm.id, project_id: projectId })
      .where((q) => deletes.filter((d) => d.entity === name).forEach((d) => q.orWhere({ id: d.id, version: d.current!.version })))
      .del();
    if (gone !== ids.length) refuseConflicts(deletes.filter((d) => d.entity === name).map((d) => ({ row: d.row, sheet: name, id: d.id as string, field: "version", message: "Changed or deleted by someone else meanwhile; nothing was saved", current: null })));
    result.deleted.push(...ids.map((id) => ({ sheet: name, id })));
  }
  for (const d of deletes) noted.push({ entity: d.entity, op: "delete", id: d.id as string, before: d.current ?? null, after: null });

  const creates = checked.filter((c) => c.op === "create");
  try {
    for (const name of new Set(creates.map((c) => c.entity))) {
      const rows = await insertAll(trx, actor, projectId, name, creates.filter((c) => c.entity === name));
      result.created.push(...rows.map((row) => ({ sheet: name, row })));
      noted.push(...rows.map((row) => ({ entity: name, op: "create" as const, id: row.id as string, before: null, after: row })));
    }
    // The free plan's row limit, counted after the inserts (and deletes) of this transaction:
    // a refusal (402) rolls all of it back.
    if (addsRows) await assertPlanAllows(trx, actor.firm.id, { rows: () => countRows(trx, projectId), rowsBefore });
    // Every design case multiplies the work of each result and report: the free plan caps them too.
    if (creates.some((c) => c.entity === "design_cases")) {
      await assertPlanAllows(trx, actor.firm.id, { designCases: async () => Number((await trx("design_cases").where({ project_id: projectId }).count({ n: "*" }))[0]!.n) });
    }
    const updates = checked.filter((c) => c.op === "update");
    // Many rows of a sheet (a bulk edit, a paste) are updated by one statement per sheet.
    const setBased = updates.filter((u) => SET_BASED.has(u.entity) && updates.filter((o) => o.entity === u.entity).length > 1 && updates.filter((o) => o.id === u.id).length === 1);
    for (const name of new Set(setBased.map((u) => u.entity))) {
      const group = setBased.filter((u) => u.entity === name);
      const rows = await updateAll(trx, actor, name, group);
      for (const u of group) {
        const after = rows.get(u.id as string)!;
        result.updated.push({ sheet: u.entity, row: after });
        noted.push({ entity: u.entity, op: "update", id: u.id as string, before: u.current ?? null, after });
      }
    }
    for (const u of updates.filter((c) => !setBased.includes(c))) {
      const e = ENTITIES[u.entity];
      // Guarded by the version read: outside a transaction (a single-row edit) a write that
      // lands between the read and this update makes it match nothing, and the caller gets 409.
      const [row] = await trx(e.table)
        .where({ id: u.id, firm_id: actor.firm.id, version: u.current!.version })
        .update({ ...columnsOf(u.parsed as Record<string, unknown>, u.entity), version: trx.raw("version + 1"), updated_at: trx.fn.now() })
        .returning(readColumns(e));
      if (!row) {
        const [now] = await trx(e.table).where({ id: u.id, firm_id: actor.firm.id }).select(readColumns(e));
        refuseConflicts([{ row: u.row, sheet: u.entity, id: u.id as string, field: "version", message: `This ${e.noun} was changed by someone else meanwhile; nothing was saved`, current: now ?? null }]);
      }
      if (u.entity === "buildups" && u.values?.layers !== undefined) await writeLayers(trx, actor.firm.id, u.id as string, u.parsed!.layers);
      const after = u.entity === "buildups" ? (await attachLayers(trx, [row]))[0]! : row;
      result.updated.push({ sheet: u.entity, row: after });
      noted.push({ entity: u.entity, op: "update", id: u.id as string, before: u.current ?? null, after });
    }
  } catch (error) {
    if (isUniqueViolation(error)) {
      const e = ENTITIES[changes[0]!.entity];
      refuseProblems([{ row: changes[0]!.row, sheet: e.table, field: "name", message: `Another ${e.noun} of this project already has that name` }]);
    }
    throw error;
  }
  await noteScheduleChanges(trx, actor, projectId, noted);
  return result;
}
