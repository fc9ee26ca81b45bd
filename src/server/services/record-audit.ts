import "server-only";
import type { Knex } from "knex";
import type { Actor } from "@/server/auth/actor";
import { noteTransactionId, XACT_ID_COLUMN } from "@/server/db/write-ledger";
import { AppError } from "@/server/http/app-error";

/** One change to a project's data: which thing, what was done, and its state before and after. */
export interface AuditEntry {
  projectId: string | null;
  /** The table (or concept) changed: "surfaces", "project", "row_check", "revision" … */
  entity: string;
  entityId: string;
  /** "create", "update", "delete", "accept", "query", "answer", "issue", "request_check" … */
  action: string;
  before?: unknown;
  after?: unknown;
}

// 9 columns a row: 1,000 rows stay far below PostgreSQL's 65,535 bind parameters.
const CHUNK = 1000;

/** How the history names whoever acted: the person, or the API token for scripted changes. */
export function actorName(actor: Actor): string {
  if (actor.via === "token") return `API token (${actor.roles.join(", ")})`;
  return actor.name ?? actor.email ?? `user ${actor.userId}`;
}

// What may still happen to an archived project: bringing it back (and archiving, which sets it).
const ON_ARCHIVED = new Set(["archive", "unarchive"]);

/**
 * Refuses every change to an archived project. Every writer of project data records its change
 * here in its own transaction, so this one check makes archived projects read-only for all of
 * them: the refusal (409) rolls the change back with its record.
 */
async function assertNotArchived(trx: Knex.Transaction, firmId: string, entries: readonly AuditEntry[]): Promise<void> {
  const ids = [...new Set(entries.filter((e) => e.projectId !== null && !ON_ARCHIVED.has(e.action)).map((e) => e.projectId as string))];
  if (ids.length === 0) return;
  const archived = await trx("projects").where({ firm_id: firmId }).whereIn("id", ids).whereNotNull("archived_at").first("reference");
  if (archived) {
    throw new AppError("conflict", `Project ${archived.reference} is archived, so it is read-only; an admin can bring it back from the archived projects`, [{ field: "archived", message: "Archived projects are read-only" }]);
  }
}

/**
 * Writes audit rows in the caller's transaction, so the record and the change commit together or
 * not at all. The table is append-only (a trigger refuses UPDATE and DELETE). A change to an
 * archived project is refused here (409).
 */
export async function recordAudit(trx: Knex.Transaction, actor: Actor, entries: readonly AuditEntry[]): Promise<void> {
  await assertNotArchived(trx, actor.firm.id, entries);
  const who = { firm_id: actor.firm.id, actor_user_id: actor.userId, actor_token_id: actor.tokenId, actor_name: actorName(actor) };
  const rows = entries.map((e) => ({
    ...who,
    project_id: e.projectId,
    entity: e.entity,
    entity_id: e.entityId,
    action: e.action,
    // jsonb columns: serialised here so arrays and nested objects arrive as JSON, not as SQL arrays.
    before: e.before === undefined ? null : JSON.stringify(e.before),
    after: e.after === undefined ? null : JSON.stringify(e.after),
  }));
  for (let i = 0; i < rows.length; i += CHUNK) {
    // The first statement also names the transaction, so a request that loses its connection
    // while committing can learn afterwards whether it committed (write-ledger.ts).
    if (i === 0) noteTransactionId(await trx("audit_log").insert(rows.slice(i, i + CHUNK)).returning(trx.raw(XACT_ID_COLUMN)));
    else await trx("audit_log").insert(rows.slice(i, i + CHUNK));
  }
}
