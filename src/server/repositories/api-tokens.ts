import "server-only";
import type { TRole } from "@/schemas/roles";

export interface TApiToken {
  id: string;
  name: string;
  role: TRole;
  prefix: string;
  created_at: Date;
  expires_at: Date;
  last_used_at: Date | null;
  revoked_at: Date | null;
  status: "active" | "expired" | "revoked";
  /** Who made it: null for a token whose maker's account is gone (or older tokens made by a token). */
  created_by: { id: number; name: string | null; email: string } | null;
}

/** Every column a token list may show; never token_hash. */
export const API_TOKEN_COLUMNS = ["id", "name", "role", "prefix", "created_at", "expires_at", "last_used_at", "revoked_at"] as const;

/** A person as a token list shows its maker, built in SQL from the joined users row `u`. */
export const TOKEN_MAKER_SQL = "CASE WHEN u.id IS NULL THEN NULL ELSE json_build_object('id', u.id, 'name', u.name, 'email', u.email) END AS created_by";
