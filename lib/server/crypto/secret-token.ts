import "server-only";
import { createHash, randomBytes, timingSafeEqual } from "node:crypto";

/**
 * Long random tokens (API tokens, invite and reset links). Only their SHA-256 is stored: the token has
 * 256 bits of entropy, so a fast hash is enough and keeps per-request look-ups cheap.
 */
export function newSecretToken(prefix: string): string {
  return `${prefix}_${randomBytes(32).toString("base64url")}`;
}

export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** Constant-time comparison of a presented token against a stored hash. */
export function tokenMatches(token: string, storedHash: string): boolean {
  const presented = Buffer.from(hashToken(token), "hex");
  const stored = Buffer.from(storedHash, "hex");
  return presented.length === stored.length && timingSafeEqual(presented, stored);
}
