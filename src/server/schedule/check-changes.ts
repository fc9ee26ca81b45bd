import "server-only";
import type { Knex } from "knex";
import { z } from "zod";
import { withBlanks } from "@/schemas/schedule";
import { loadItems } from "@/server/repositories/schedule";
import { ENTITIES, type EntityName } from "./entities";

export interface ItemChange {
  op: "create" | "update" | "delete";
  entity: EntityName;
  /** Update and delete; on create an optional id made by the client (so it can show the row at once). */
  id?: string;
  version?: number;
  values?: Record<string, unknown>;
  /** 1-based number of the change (or of the file row, for an import) that messages name. */
  row: number;
}

/** A value that breaks a rule: which row, which field, why. */
export interface RowProblem {
  row: number;
  sheet: EntityName;
  id?: string;
  field: string;
  message: string;
}

/** A write based on a stale read: the row as it stands now (null when someone deleted it). */
export interface RowConflict extends RowProblem {
  current: Record<string, unknown> | null;
}

export interface CheckedChange extends ItemChange {
  /** The whole row after the change, parsed (create and update). */
  parsed?: Record<string, unknown>;
  current?: Record<string, unknown>;
}

const zId = z.uuid();

/** zod issues as row problems; unknown keys become one problem each, named by the key. */
function issuesToProblems(error: z.ZodError, base: Omit<RowProblem, "field" | "message">, noun: string): RowProblem[] {
  return error.issues.flatMap((i) =>
    i.code === "unrecognized_keys"
      ? i.keys.map((k) => ({ ...base, field: k, message: `${k} is not a field of a ${noun}` }))
      : [{ ...base, field: i.path.join(".") || "values", message: i.message }],
  );
}

/**
 * Reads the rows the changes touch (locked for the rest of the transaction), checks versions,
 * merges each update into its stored row and checks the whole row, and checks that zones and
 * build-ups named exist in this project. Returns the checked changes and everything wrong.
 */
export async function checkChanges(
  trx: Knex.Transaction | Knex,
  firmId: string,
  projectId: string,
  changes: ItemChange[],
): Promise<{ checked: CheckedChange[]; problems: RowProblem[]; conflicts: RowConflict[] }> {
  const problems: RowProblem[] = [];
  const conflicts: RowConflict[] = [];
  const current = new Map<string, Record<string, unknown>>();
  for (const name of new Set(changes.filter((c) => c.op !== "create").map((c) => c.entity))) {
    const ids = changes.filter((c) => c.entity === name && c.op !== "create").map((c) => c.id as string);
    const lock = (trx as Knex.Transaction).isTransaction === true;
    for (const row of await loadItems(trx, name, firmId, projectId, { ids, lock })) current.set(row.id as string, row);
  }
  // Only the zones and build-ups the changes name are looked up (an edit of an area names none).
  const named = new Map<string, Set<string>>();
  for (const c of changes) {
    for (const ref of ENTITIES[c.entity].references) {
      const v = c.values?.[ref.field];
      if (typeof v === "string" && zId.safeParse(v).success) named.set(ref.table, (named.get(ref.table) ?? new Set()).add(v));
    }
  }
  const refIds = new Map<string, Set<string>>();
  for (const [table, ids] of named) {
    const rows = await trx(table).where({ firm_id: firmId, project_id: projectId }).whereIn("id", [...ids]).select("id");
    refIds.set(table, new Set(rows.map((r) => r.id)));
  }

  const seen = new Set<string>();
  const checked: CheckedChange[] = [];
  for (const change of changes) {
    const e = ENTITIES[change.entity];
    const base = { row: change.row, sheet: change.entity, ...(change.id === undefined ? {} : { id: change.id }) };
    if (change.id !== undefined) {
      if (!zId.safeParse(change.id).success) {
        problems.push({ ...base, field: "id", message: "id must be a UUID" });
        continue;
      }
      if (seen.has(change.id)) {
        problems.push({ ...base, field: "id", message: `The same ${e.noun} appears more than once in one set of changes` });
        continue;
      }
      seen.add(change.id);
    }
    let merged: Record<string, unknown>;
    if (change.op === "create") {
      if (change.id !== undefined && current.has(change.id)) problems.push({ ...base, field: "id", message: `A ${e.noun} with this id already exists` });
      merged = withBlanks(e.numbers, change.values ?? {}, e.blanks, e.defaults);
    } else {
      const stored = current.get(change.id as string);
      if (!stored || stored.version !== change.version) {
        const message = stored ? `This ${e.noun} was changed by someone else (now version ${stored.version}); nothing was saved` : `This ${e.noun} no longer exists`;
        conflicts.push({ ...base, id: change.id as string, field: "version", message, current: stored ?? null });
        continue;
      }
      if (change.op === "delete") {
        checked.push({ ...change, current: stored });
        continue;
      }
      const { id: _i, version: _v, position: _p, ...values } = stored;
      merged = { ...values, ...(change.values ?? {}) };
    }
    const parsed = e.schema.safeParse(merged);
    if (!parsed.success) problems.push(...issuesToProblems(parsed.error, base, e.noun));
    // References are checked even when other fields failed, so one answer lists every problem.
    for (const ref of e.references) {
      const value = change.values?.[ref.field];
      if (typeof value === "string" && zId.safeParse(value).success && !refIds.get(ref.table)?.has(value)) {
        problems.push({ ...base, field: ref.field, message: `${ref.noun} ${value} is not in this project` });
      }
    }
    if (!parsed.success) continue;
    checked.push({ ...change, parsed: parsed.data, current: current.get(change.id as string) });
  }
  return { checked, problems, conflicts };
}
