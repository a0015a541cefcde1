import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { hashPassword, verifyPassword } from "@/lib/server/crypto/password";
import { hashToken, newSecretToken, tokenMatches } from "@/lib/server/crypto/secret-token";

describe("password hashing", () => {
  it("stores a salted bcrypt hash that verifies only the right password", async () => {
    const hash = await hashPassword("a long enough password", 4);
    expect(hash).toMatch(/^\$2[aby]\$04\$/); // bcrypt modular crypt format with the chosen cost
    expect(hash).not.toContain("a long enough password");
    expect(await verifyPassword("a long enough password", hash)).toBe(true);
    expect(await verifyPassword("a long enough passwore", hash)).toBe(false);
  });

  it("salts: the same password hashes differently each time", async () => {
    expect(await hashPassword("same password here", 4)).not.toBe(await hashPassword("same password here", 4));
  });
});

describe("token hashing", () => {
  it("hashes tokens with SHA-256 (checked against node:crypto as the reference)", () => {
    const token = newSecretToken("rw");
    expect(hashToken(token)).toBe(createHash("sha256").update(token).digest("hex"));
    // FIPS 180-4 test vector: SHA-256("abc")
    expect(hashToken("abc")).toBe("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
  });

  it("makes long, prefixed, unique tokens", () => {
    const a = newSecretToken("rw");
    const b = newSecretToken("rw");
    expect(a).toMatch(/^rw_[A-Za-z0-9_-]{43}$/); // 32 random bytes in base64url
    expect(a).not.toBe(b);
  });

  it("matches only the token it was made from", () => {
    const token = newSecretToken("rw");
    expect(tokenMatches(token, hashToken(token))).toBe(true);
    expect(tokenMatches(`${token}x`, hashToken(token))).toBe(false);
    expect(tokenMatches(token, "00")).toBe(false);
  });
});
