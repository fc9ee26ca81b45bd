import "server-only";
import { withInputDefaults, type RevisionSnapshot } from "@/checking/snapshot";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import type { TRevisionSummary } from "./issue-revision";

export type TRevision = TRevisionSummary & { snapshot: RevisionSnapshot };

/** One issued revision with its frozen snapshot, or 404. */
export async function getRevisionOrThrow(actor: Actor, projectId: string, letter: string): Promise<TRevision> {
  const row = await db()("revisions")
    .where({ firm_id: actor.firm.id, project_id: projectId, letter })
    .first("id", "letter", "sequence", "issued_by_name", "issued_at", "note", "snapshot");
  if (!row) throw new AppError("not_found", `No revision ${letter} of this project`);
  const snapshot = withInputDefaults(row.snapshot as RevisionSnapshot);
  return { ...row, snapshot, issued_at: new Date(row.issued_at).toISOString(), rows: snapshot.checks.length };
}
