import "server-only";
import { createHmac, randomBytes, timingSafeEqual } from "node:crypto";
import { env } from "@/lib/env";

export type LinkPurpose = "approve" | "unsubscribe";

export interface LinkClaims {
  purpose: LinkPurpose;
  /** What the link acts on: a promotion id, or "address|kind" for unsubscribe. */
  subject: string;
  /** Expiry, seconds since the epoch. */
  exp: number;
  /** Random per link: single-use links record it once used. */
  nonce: string;
}

function signature(body: string): Buffer {
  return createHmac("sha256", env().AUTH_SECRET).update(`rungwise-mail-link.${body}`).digest();
}

/** A link token: base64url(claims) "." base64url(HMAC-SHA256 with AUTH_SECRET). */
export function signLink(purpose: LinkPurpose, subject: string, ttlSeconds: number, now = new Date()): string {
  const claims: LinkClaims = {
    purpose,
    subject,
    exp: Math.floor(now.getTime() / 1000) + ttlSeconds,
    nonce: randomBytes(12).toString("base64url"),
  };
  const body = Buffer.from(JSON.stringify(claims)).toString("base64url");
  return `${body}.${signature(body).toString("base64url")}`;
}

/** The claims of an untampered, unexpired token for this purpose; null otherwise. */
export function verifyLink(token: string, purpose: LinkPurpose, now = new Date()): LinkClaims | null {
  const [body, sig, extra] = token.split(".");
  if (!body || !sig || extra !== undefined) return null;
  // Compare the text, not decoded bytes: base64url's last character carries spare bits, so two
  // different strings can decode to the same bytes and a tampered token would still verify.
  const presented = Buffer.from(sig);
  const expected = Buffer.from(signature(body).toString("base64url"));
  if (presented.length !== expected.length || !timingSafeEqual(presented, expected)) return null;
  let claims: LinkClaims;
  try {
    claims = JSON.parse(Buffer.from(body, "base64url").toString("utf8")) as LinkClaims;
  } catch {
    return null;
  }
  if (claims.purpose !== purpose || typeof claims.subject !== "string" || typeof claims.exp !== "number") return null;
  if (claims.exp * 1000 <= now.getTime()) return null;
  return claims;
}
