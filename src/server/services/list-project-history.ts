import "server-only";
import type { THistoryEntry } from "@/checking/history-entry";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { getProjectOrThrow } from "./get-project";

export type HistoryEntry = THistoryEntry;

/**
 * A project's audit trail, newest first, a page at a time (`before` = the last id of the previous
 * page). With `entityId`, one thing's history: a row's edits, check moves and comments together.
 */
export async function listProjectHistory(actor: Actor, projectId: string, opts: { entityId?: string; before?: number; limit?: number } = {}): Promise<{ entries: HistoryEntry[]; next_before: number | null }> {
  await getProjectOrThrow(actor, projectId);
  const limit = opts.limit ?? 50;
  let query = db()("audit_log").where({ firm_id: actor.firm.id, project_id: projectId });
  if (opts.entityId !== undefined) query = query.andWhere({ entity_id: opts.entityId });
  if (opts.before !== undefined) query = query.andWhere("id", "<", opts.before);
  const rows = await query.orderBy("id", "desc").limit(limit + 1).select("id", "at", "actor_name", "entity", "entity_id", "action", "before", "after");
  const entries = rows.slice(0, limit).map((r) => ({ ...r, id: Number(r.id), at: new Date(r.at).toISOString() }));
  return { entries, next_before: rows.length > limit ? entries.at(-1)!.id : null };
}
