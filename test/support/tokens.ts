import { createHash, randomBytes } from "node:crypto";
import { testDb } from "./db";

type Role = "admin" | "consultant" | "checker" | "viewer";

/**
 * Inserts an API token for a demo firm the way the app stores one (SHA-256 of the secret) and
 * returns the secret. `state` makes it revoked or expired for the refusal cases.
 */
export async function makeToken(firmSlug: string, role: Role, state: "active" | "revoked" | "expired" = "active"): Promise<string> {
  const secret = `fst_${randomBytes(32).toString("base64url")}`;
  const firm = await testDb()("firms").where({ slug: firmSlug }).first("id");
  if (!firm) throw new Error(`No firm ${firmSlug}: is the demo seed loaded?`);
  const day = 86_400_000;
  await testDb()("api_tokens").insert({
    firm_id: firm.id,
    name: `test ${role} ${state}`,
    role,
    token_hash: createHash("sha256").update(secret).digest("hex"),
    prefix: secret.slice(0, 10),
    expires_at: new Date(Date.now() + (state === "expired" ? -day : 30 * day)),
    revoked_at: state === "revoked" ? new Date() : null,
  });
  return secret;
}

export const bearer = (secret: string) => ({ authorization: `Bearer ${secret}` });
