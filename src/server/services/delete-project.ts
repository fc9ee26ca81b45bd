import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { recordAudit } from "./record-audit";

/**
 * Deletes a project and its whole schedule, at the version the caller read (admins only, by the
 * route). A project with an issued revision is never deleted: what was sent out, and its report,
 * must stay on record, so the answer is 409 "archive it instead" (the database refuses it too).
 */
export async function deleteProject(actor: Actor, projectId: string, version: number): Promise<{ deleted: string }> {
  return db().transaction(async (trx) => {
    const current = await trx("projects").where({ id: projectId, firm_id: actor.firm.id }).forUpdate().first("id", "version", "name", "reference");
    if (!current) throw new AppError("not_found", "No project with that id in this firm");
    if (current.version !== version) throw new AppError("conflict", `This project was changed by someone else (now version ${current.version}); nothing was deleted`, [{ row: 1, sheet: "projects", id: projectId, field: "version", message: "Stale version", current }]);
    const [{ n }] = await trx("revisions").where({ project_id: projectId }).count({ n: "*" });
    if (Number(n) > 0) {
      throw new AppError("conflict", `This project has ${Number(n) === 1 ? "an issued revision" : `${n} issued revisions`}, which are kept for good: archive it instead (nothing was deleted)`, [{ field: "revisions", message: "Issued revisions are kept; archive instead", current }]);
    }
    await trx("projects").where({ id: projectId }).del();
    // The audit trail keeps no foreign key to projects, so this record outlives the project.
    await recordAudit(trx, actor, [{ projectId, entity: "project", entityId: projectId, action: "delete", before: current }]);
    return { deleted: projectId };
  });
}
