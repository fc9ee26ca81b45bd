import "server-only";
import type { Knex } from "knex";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { loadItems } from "@/server/repositories/schedule";
import { ENTITIES, type EntityName } from "@/server/schedule/entities";

/** One item of one project of this firm; anything else (another firm's included) is not found. */
export async function getScheduleItemOrThrow(actor: Actor, projectId: string, name: EntityName, id: string, q: Knex | Knex.Transaction = db()): Promise<Record<string, unknown>> {
  const [row] = await loadItems(q, name, actor.firm.id, projectId, { ids: [id] });
  if (!row) throw new AppError("not_found", `No ${ENTITIES[name].noun} with that id in this project`);
  return row;
}
