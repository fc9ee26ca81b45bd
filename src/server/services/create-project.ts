import "server-only";
import type { TProject, TProjectCreate } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { isUniqueViolation } from "@/server/db/unique-violation";
import { AppError } from "@/server/http/app-error";
import { PROJECT_COLUMNS } from "./list-projects";

/** Creates a project in the current firm; references are unique within a firm. */
export async function createProject(actor: Actor, input: TProjectCreate): Promise<TProject> {
  try {
    const [project] = await db()("projects").insert({ firm_id: actor.firm.id, name: input.name, reference: input.reference }).returning([...PROJECT_COLUMNS]);
    return project;
  } catch (error) {
    if (isUniqueViolation(error)) {
      throw new AppError("conflict", `Reference ${input.reference} is already used by another project of this firm`, [{ field: "reference", message: "Already used" }]);
    }
    throw error;
  }
}
