import "server-only";
import type { TRole } from "@/schemas/roles";

/** Who is acting, for which firm and with which roles: resolved once per request or action. */
export interface Actor {
  via: "session" | "token";
  /** The signed-in person; null for an API token. */
  userId: number | null;
  name: string | null;
  email: string | null;
  firm: { id: string; name: string };
  roles: TRole[];
  /** Every firm this person belongs to (the current one included), for the switcher. */
  firms: { id: string; name: string }[];
  tokenId: string | null;
}

/** The cookie that remembers which of several firms a person is working in. */
export const CURRENT_FIRM_COOKIE = "filmsheet-firm";

export function hasAnyRole(actor: Actor, roles: readonly TRole[]): boolean {
  return roles.some((r) => actor.roles.includes(r));
}
