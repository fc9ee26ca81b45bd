import "server-only";
import type { TProject } from "@/schemas/project";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { PROJECT_COLUMNS } from "./list-projects";
import { recordAudit } from "./record-audit";

/**
 * Archives a project (`archived: true`) or brings it back (`false`), at the version the caller
 * read (admins). An archived project keeps everything — schedule, checks, issued revisions and
 * their reports — but is read-only and listed apart; this is what replaces deleting a project
 * that has issued revisions.
 */
export async function setProjectArchived(actor: Actor, projectId: string, version: number, archived: boolean): Promise<TProject> {
  return db().transaction(async (trx) => {
    const current = await trx("projects").where({ id: projectId, firm_id: actor.firm.id }).forUpdate().first([...PROJECT_COLUMNS]);
    if (!current) throw new AppError("not_found", "No project with that id in this firm");
    if (current.version !== version) {
      throw new AppError("conflict", `This project was changed by someone else (now version ${current.version}); nothing was changed`, [{ row: 1, sheet: "projects", id: projectId, field: "version", message: "Stale version", current }]);
    }
    if ((current.archived_at !== null) === archived) throw new AppError("conflict", archived ? "This project is archived already" : "This project is not archived", [{ field: "archived", message: archived ? "Already archived" : "Not archived" }]);
    const [row] = await trx("projects")
      .where({ id: projectId })
      .update({ archived_at: archived ? trx.fn.now() : null, archived_by: archived ? actor.userId : null, version: trx.raw("version + 1"), updated_at: trx.fn.now() })
      .returning([...PROJECT_COLUMNS]);
    await recordAudit(trx, actor, [{ projectId, entity: "project", entityId: projectId, action: archived ? "archive" : "unarchive", before: { archived_at: current.archived_at }, after: { archived_at: row.archived_at } }]);
    return row;
  });
}
