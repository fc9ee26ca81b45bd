import "server-only";
import type { TProject } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";

export const PROJECT_COLUMNS = ["id", "name", "reference", "altitude_m", "terrain", "wind_law", "unit_system", "default_method", "created_at", "updated_at", "version"] as const;

/** The current firm's projects, most recently changed first. */
export async function listProjects(actor: Actor): Promise<TProject[]> {
  return db()("projects").where({ firm_id: actor.firm.id }).orderBy("updated_at", "desc").select([...PROJECT_COLUMNS]);
}
