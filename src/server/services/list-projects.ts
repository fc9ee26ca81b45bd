import "server-only";
import type { TProject } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";

export const PROJECT_COLUMNS = ["id", "name", "reference", "altitude_m", "terrain", "wind_law", "unit_system", "default_method", "created_at", "updated_at", "version", "archived_at"] as const;

/**
 * The current firm's projects in use, most recently changed first; with `archived`, its archived
 * projects instead (kept read-only for their issued revisions).
 */
export async function listProjects(actor: Actor, opts: { archived?: boolean } = {}): Promise<TProject[]> {
  const q = db()("projects").where({ firm_id: actor.firm.id });
  (opts.archived ? q.whereNotNull("archived_at") : q.whereNull("archived_at")).orderBy("updated_at", "desc");
  return q.select([...PROJECT_COLUMNS]);
}
