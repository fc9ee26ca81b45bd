import "server-only";
import { isBuiltInSet } from "@/schedule/column-sets";
import { SHEETS } from "@/schemas/schedule";
import type { TPreferences, TPreferencesUpdate } from "@/schemas/preferences";
import type { Actor } from "@/server/auth/actor";
import { db } from "@/server/db/knex";
import { AppError } from "@/server/http/app-error";
import { PREFERENCE_COLUMNS, readPreferences } from "./get-preferences";

/**
 * Changes the signed-in person's own view settings (units, folded totals, column sets). Only
 * their row is written: no project, no audit entry, no row check — viewing is not editing.
 * An active set that names a set that is not there is refused; deleting the active set falls
 * back to the default.
 */
export async function updatePreferences(actor: Actor, input: TPreferencesUpdate): Promise<TPreferences> {
  if (actor.userId === null) throw new AppError("forbidden", "View settings belong to a person: sign in to change them");
  const userId = actor.userId;
  const { version, ...changes } = input;
  return db().transaction(async (trx) => {
    const current = await readPreferences(trx, userId, actor.firm.id, true);
    if (version !== undefined && version !== current.version) {
      throw new AppError("conflict", `Your settings were changed elsewhere (now version ${current.version}); nothing was saved`, [{ field: "version", message: "Stale version" }]);
    }
    const next: TPreferences = { ...current, ...changes, active_column_sets: { ...current.active_column_sets, ...changes.active_column_sets } } as TPreferences;
    for (const sheet of SHEETS) {
      const active = next.active_column_sets[sheet];
      if (active === undefined || isBuiltInSet(active) || next.column_sets.some((s) => s.id === active && s.sheet === sheet)) continue;
      // Named in this request: the caller asked for a set that is not theirs.
      if (changes.active_column_sets?.[sheet] !== undefined) {
        throw new AppError("invalid_input", `No column set ${active} on the ${sheet} sheet`, [{ field: `body.active_column_sets.${sheet}`, message: "Unknown column set" }]);
      }
      delete next.active_column_sets[sheet];
    }
    const values = {
      unit_system: next.unit_system,
      zone_totals_collapsed: next.zone_totals_collapsed,
      active_column_sets: JSON.stringify(next.active_column_sets),
      column_sets: JSON.stringify(next.column_sets),
    };
    const [row] = await trx("user_preferences")
      .insert({ user_id: userId, firm_id: actor.firm.id, ...values, version: 1 })
      .onConflict(["user_id", "firm_id"])
      .merge({ ...values, version: trx.raw("user_preferences.version + 1"), updated_at: trx.fn.now() })
      .returning([...PREFERENCE_COLUMNS]);
    return row as TPreferences;
  });
}
