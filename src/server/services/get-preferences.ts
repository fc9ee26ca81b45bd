import "server-only";
import type { Knex } from "knex";
import { DEFAULT_PREFERENCES, type TPreferences } from "@/schemas/preferences";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";

export const PREFERENCE_COLUMNS = ["unit_system", "zone_totals_collapsed", "active_column_sets", "column_sets", "version"] as const;

/** One person's stored view settings in a firm, or the defaults (version 0) when they have none. */
export async function readPreferences(q: Knex | Knex.Transaction, userId: number, firmId: string, forUpdate = false): Promise<TPreferences> {
  const query = q("user_preferences").where({ user_id: userId, firm_id: firmId });
  const row = await (forUpdate ? query.forUpdate() : query).first([...PREFERENCE_COLUMNS]);
  return row ? (row as TPreferences) : { ...DEFAULT_PREFERENCES };
}

/** The signed-in person's view settings; an API token is nobody's view, so it reads the defaults. */
export async function getPreferences(actor: Actor): Promise<TPreferences> {
  if (actor.userId === null) return { ...DEFAULT_PREFERENCES };
  return readPreferences(db(), actor.userId, actor.firm.id);
}
