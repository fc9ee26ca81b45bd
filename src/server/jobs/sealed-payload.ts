import "server-only";
import { createCipheriv, createDecipheriv, hkdfSync, randomBytes } from "node:crypto";
import { env } from "@/server/env";

// Outside production AUTH_SECRET may be unset (production requires it): a fixed development key
// then keeps queued jobs readable across restarts.
const DEV_SECRET = "filmsheet-development-only-job-payload-key";

let key: { secret: string; key: Buffer } | undefined;

/** AES-256-GCM key for job payloads, derived from AUTH_SECRET (HKDF-SHA256, its own label). */
function payloadKey(): Buffer {
  const secret = env().AUTH_SECRET ?? DEV_SECRET;
  if (key?.secret !== secret) key = { secret, key: Buffer.from(hkdfSync("sha256", secret, "filmsheet", "job-payload-v1", 32)) };
  return key.key;
}

/**
 * Seals what a job carries (an e-mail's sign-in link, reset link or invitation link) so that the
 * jobs table — queued, retried or failed for good — never holds a live secret in clear: only
 * the app, with AUTH_SECRET, can open it. Base64url of IV (12) | tag (16) | ciphertext.
 */
export function seal(value: unknown): string {
  const iv = randomBytes(12);
  const cipher = createCipheriv("aes-256-gcm", payloadKey(), iv);
  const body = Buffer.concat([cipher.update(JSON.stringify(value), "utf8"), cipher.final()]);
  return Buffer.concat([iv, cipher.getAuthTag(), body]).toString("base64url");
}

/** A payload sealed with another AUTH_SECRET (or altered): no retry will ever open it. */
export class UnopenablePayload extends Error {
  constructor() {
    super("the job's payload was sealed with another AUTH_SECRET (or altered) and cannot be opened");
    this.name = "UnopenablePayload";
  }
}

/** Opens what `seal` made; throws UnopenablePayload when it was sealed with another key or changed. */
export function unseal(sealed: string): unknown {
  const raw = Buffer.from(sealed, "base64url");
  let text: string;
  try {
    const decipher = createDecipheriv("aes-256-gcm", payloadKey(), raw.subarray(0, 12));
    decipher.setAuthTag(raw.subarray(12, 28));
    text = Buffer.concat([decipher.update(raw.subarray(28)), decipher.final()]).toString("utf8");
  } catch {
    throw new UnopenablePayload();
  }
  return JSON.parse(text);
}
