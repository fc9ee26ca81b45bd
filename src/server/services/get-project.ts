import "server-only";
import type { TProject } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { PROJECT_COLUMNS } from "./list-projects";

/** One project of the current firm; another firm's project is not found, exactly like a missing one. */
export async function getProjectOrThrow(actor: Actor, projectId: string): Promise<TProject> {
  const project = await db()("projects").where({ id: projectId, firm_id: actor.firm.id }).first([...PROJECT_COLUMNS]);
  if (!project) throw new AppError("not_found", "No project with that id in this firm");
  return project;
}
