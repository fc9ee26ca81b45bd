import "server-only";
import type { TRole } from "@/schemas/roles";
import { AppError } from "@/server/http/app-error";
import { hasAnyRole, type Actor } from "./actor";
import { resolveTokenActor } from "./resolve-token-actor";

export type AuthMode = "required" | "optional" | "public";

/** The bearer secret of an `Authorization: Bearer …` header, if any. */
export function bearerSecret(headers: Headers | null): string | null {
  const value = headers?.get("authorization");
  if (!value) return null;
  const match = /^Bearer\s+(\S+)\s*$/i.exec(value);
  if (!match) throw new AppError("unauthenticated", "Authorization header must be `Bearer <token>`");
  return match[1]!;
}

/**
 * The one place that decides who may go on: shared by route() and action(). 401 when nobody is
 * signed in (or the token is bad), 403 for a member without the required role. Firm scoping
 * follows from actor.firm: services filter by it, so other firms' ids are simply not found.
 */
export async function requireActor(headers: Headers | null, mode: AuthMode, roles?: readonly TRole[]): Promise<Actor | null> {
  if (mode === "public") return null;
  const secret = bearerSecret(headers);
  let actor: Actor | null;
  if (secret !== null) {
    actor = await resolveTokenActor(secret);
  } else {
    // Loaded on first use: public routes (and unit tests of route()) never touch Auth.js.
    const { resolveSessionActor } = await import("./resolve-session-actor");
    const resolved = await resolveSessionActor();
    if (resolved && !resolved.actor && mode === "required") {
      throw new AppError("forbidden", "You are not a member of any firm: ask a firm admin for an invitation");
    }
    actor = resolved?.actor ?? null;
  }
  if (!actor) {
    if (mode === "optional") return null;
    throw new AppError("unauthenticated", "Sign in, or send an API token as `Authorization: Bearer …`");
  }
  if (roles && roles.length > 0 && !hasAnyRole(actor, roles)) {
    throw new AppError("forbidden", `This needs the ${roles.join(" or ")} role; you have ${actor.roles.join(", ")}`);
  }
  return actor;
}
