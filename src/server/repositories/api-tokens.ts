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
}

/** Every column a token list may show; never token_hash. */
export const API_TOKEN_COLUMNS = ["id", "name", "role", "prefix", "created_at", "expires_at", "last_used_at", "revoked_at"] as const;
