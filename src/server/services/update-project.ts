import "server-only";
import type { TProject, TProjectUpdate } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { isUniqueViolation } from "@/server/db/unique-violation";
import { AppError } from "@/server/http/app-error";
import { PROJECT_COLUMNS } from "./list-projects";
import { noteScheduleChanges } from "./note-schedule-changes";

/** Changes a project's name, reference, site, units or default method at the version read. */
export async function updateProject(actor: Actor, projectId: string, input: TProjectUpdate): Promise<TProject> {
  const { version, ...values } = input;
  try {
    return await db().transaction(async (trx) => {
      const current = await trx("projects").where({ id: projectId, firm_id: actor.firm.id }).forUpdate().first([...PROJECT_COLUMNS]);
      if (!current) throw new AppError("not_found", "No project with that id in this firm");
      if (current.version !== version) {
        throw new AppError("conflict", `This project was changed by someone else (now version ${current.version}); nothing was saved`, [{ row: 1, sheet: "projects", id: projectId, field: "version", message: "Stale version", current }]);
      }
      const [row] = await trx("projects")
        .where({ id: projectId })
        .update({ ...values, version: trx.raw("version + 1"), updated_at: trx.fn.now() })
        .returning([...PROJECT_COLUMNS]);
      await noteScheduleChanges(trx, actor, projectId, [{ entity: "project", op: "update", id: projectId, before: current, after: row }]);
      return row;
    });
  } catch (error) {
    if (isUniqueViolation(error)) throw new AppError("invalid_input", `Reference ${values.reference} is already used by another project of this firm`, [{ field: "reference", message: "Already used" }]);
    throw error;
  }
}
