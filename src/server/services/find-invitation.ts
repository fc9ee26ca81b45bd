import "server-only";
import type { TRole } from "@/schemas/roles";
import { hashSecret } from "@/server/auth/secrets";
import { db } from "@/server/db/knex";

export type InvitationStatus = "open" | "expired" | "revoked" | "accepted";
export interface TInvitationView {
  firmName: string;
  email: string;
  roles: TRole[];
  status: InvitationStatus;
  expiresAt: Date;
  accountExists: boolean;
}

/** What the invitation page shows for a link: firm, address, roles and whether it still works. */
export async function findInvitation(secret: string): Promise<TInvitationView | null> {
  const row = await db()("invitations as i")
    .join("firms as f", "f.id", "i.firm_id")
    .where("i.token_hash", hashSecret(secret))
    .first("f.name as firm_name", "i.email", "i.roles", "i.expires_at", "i.accepted_at", "i.revoked_at");
  if (!row) return null;
  const status: InvitationStatus = row.accepted_at ? "accepted" : row.revoked_at ? "revoked" : new Date(row.expires_at) <= new Date() ? "expired" : "open";
  const accountExists = (await db()("users").where({ email: row.email }).first("id")) !== undefined;
  return { firmName: row.firm_name, email: row.email, roles: row.roles, status, expiresAt: new Date(row.expires_at), accountExists };
}
