import "server-only";
import { cookies } from "next/headers";
import type { TRole } from "@/schemas/roles";
import { db } from "@/server/db/knex";
import { CURRENT_FIRM_COOKIE, type Actor } from "./actor";
import { auth } from "./auth";
import { sessionIdOf } from "./user-sessions";

export type SessionUser = { id: number; name: string | null; email: string };

/**
 * The signed-in person from the session cookie, and their memberships read fresh from the
 * database. `actor` is null when they belong to no firm (e.g. removed from their only one).
 * Sessions issued before a password reset, or whose row was revoked, are no longer accepted.
 */
export async function resolveSessionActor(): Promise<{ user: SessionUser; actor: Actor | null; sessionId: string } | null> {
  const session = (await auth()) as { user?: { id?: string }; authAt?: number; sid?: unknown } | null;
  const id = Number(session?.user?.id);
  if (!session || !Number.isInteger(id) || id <= 0) return null;
  // A cookie without a live session row (signed out, signed out everywhere, expired, or issued
  // before session rows existed) is refused: one query, with the person's own row.
  const sid = sessionIdOf(session.sid);
  if (sid === null) return null;
  const user = await db()("users as u")
    .join("user_sessions as s", "s.user_id", "u.id")
    .where({ "u.id": id, "s.id": sid })
    .whereNull("s.revoked_at")
    .andWhere("s.expires_at", ">", db().fn.now())
    .first<{ id: number; name: string | null; email: string; valid_after: number | null } | undefined>(
      "u.id",
      "u.name",
      "u.email",
      db().raw("extract(epoch FROM u.sessions_valid_after)::float8 AS valid_after"),
    );
  if (!user) return null;
  if (user.valid_after !== null && (session.authAt ?? 0) < Math.floor(user.valid_after)) return null;

  const rows = await db()("memberships as m")
    .join("firms as f", "f.id", "m.firm_id")
    .where("m.user_id", id)
    .groupBy("f.id", "f.name")
    .orderBy("f.name")
    .select<{ id: string; name: string; roles: TRole[] }[]>("f.id", "f.name", db().raw("array_agg(m.role::text ORDER BY m.role) AS roles"));
  const sessionUser = { id: user.id, name: user.name, email: user.email };
  if (rows.length === 0) return { user: sessionUser, actor: null, sessionId: sid };
  const chosen = (await cookies()).get(CURRENT_FIRM_COOKIE)?.value;
  const current = rows.find((r) => r.id === chosen) ?? rows[0]!;
  return {
    user: sessionUser,
    sessionId: sid,
    actor: {
      via: "session",
      userId: user.id,
      name: user.name,
      email: user.email,
      firm: { id: current.id, name: current.name },
      roles: current.roles,
      firms: rows.map((r) => ({ id: r.id, name: r.name })),
      tokenId: null,
    },
  };
}
