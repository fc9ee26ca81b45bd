import "server-only";
import { db } from "@/server/db/knex";

/** How long a browser stays signed in; the JWT cookie and its session row share it. */
export const SESSION_MAX_AGE_SECONDS = 30 * 24 * 3600;

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** A well-formed session id, or null: ids come from a cookie and reach SQL only when they parse. */
export function sessionIdOf(value: unknown): string | null {
  return typeof value === "string" && UUID.test(value) ? value : null;
}

/**
 * Records a new signed-in browser. The session cookie is a JWT (Credentials sign-in needs one),
 * which the server cannot take back: its row can be revoked, and a cookie whose row is revoked,
 * expired or missing is no longer accepted (resolveSessionActor).
 */
export async function openUserSession(userId: number): Promise<string> {
  const [row] = await db()("user_sessions")
    .insert({ user_id: userId, expires_at: new Date(Date.now() + SESSION_MAX_AGE_SECONDS * 1000) })
    .returning<{ id: string }[]>("id");
  return row!.id;
}

/** Ends one session (signing out): the cookie, wherever it has been copied, stops working. */
export async function revokeUserSession(sessionId: unknown): Promise<void> {
  const id = sessionIdOf(sessionId);
  if (id === null) return;
  await db()("user_sessions").where({ id }).whereNull("revoked_at").update({ revoked_at: db().fn.now() });
}

/** Ends every session of a person, or every one but `keep`; returns how many were ended. */
export async function revokeUserSessions(userId: number, keep: string | null = null): Promise<number> {
  const q = db()("user_sessions").where({ user_id: userId }).whereNull("revoked_at").andWhere("expires_at", ">", db().fn.now());
  if (keep !== null) q.whereNot({ id: keep });
  return q.update({ revoked_at: db().fn.now() });
}
