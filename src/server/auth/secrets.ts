import "server-only";
import { createHash, randomBytes } from "node:crypto";

/** A fresh random secret for a link or a token: 32 bytes as 43 base64url characters. */
export function newSecret(): string {
  return randomBytes(32).toString("base64url");
}

/**
 * SHA-256 of a secret, hex. Link and token secrets carry 256 random bits, so a fast hash is
 * enough: nobody can guess one from its hash (passwords, which people choose, use bcrypt).
 */
export function hashSecret(secret: string): string {
  return createHash("sha256").update(secret, "utf8").digest("hex");
}
