import "server-only";
import type { TProject, TProjectCreate } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { isUniqueViolation } from "@/server/db/unique-violation";
import { AppError } from "@/server/http/app-error";
import { assertPlanAllows } from "./assert-plan-allows";
import { PROJECT_COLUMNS } from "./list-projects";
import { recordAudit } from "./record-audit";

/** Creates a project in the current firm; references are unique within a firm. */
export async function createProject(actor: Actor, input: TProjectCreate): Promise<TProject> {
  try {
    return await db().transaction(async (trx) => {
      // The free plan holds one project; counted under the plan check's lock.
      const projects = async () => Number((await trx("projects").where({ firm_id: actor.firm.id }).count({ n: "*" }))[0]!.n) + 1;
      await assertPlanAllows(trx, actor.firm.id, { projects });
      const [project] = await trx("projects").insert({ ...input, firm_id: actor.firm.id }).returning([...PROJECT_COLUMNS]);
      await recordAudit(trx, actor, [{ projectId: project.id, entity: "project", entityId: project.id, action: "create", after: project }]);
      return project;
    });
  } catch (error) {
    if (isUniqueViolation(error)) {
      throw new AppError("conflict", `Reference ${input.reference} is already used by another project of this firm`, [{ field: "reference", message: "Already used" }]);
    }
    throw error;
  }
}
