import "server-only";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import type { TRevisionSummary } from "./issue-revision";
import { getProjectOrThrow } from "./get-project";

/** A project's issued revisions, latest first (without their snapshots). */
export async function listRevisions(actor: Actor, projectId: string): Promise<TRevisionSummary[]> {
  await getProjectOrThrow(actor, projectId);
  const rows = await db()("revisions")
    .where({ firm_id: actor.firm.id, project_id: projectId })
    .orderBy("sequence", "desc")
    .select("id", "letter", "sequence", "issued_by_name", "issued_at", "note", db().raw("jsonb_array_length(snapshot->'checks') AS rows"));
  return rows.map((r) => ({ ...r, issued_at: new Date(r.issued_at).toISOString(), rows: Number(r.rows) }));
}
