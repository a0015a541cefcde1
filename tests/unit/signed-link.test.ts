import { describe, expect, it } from "vitest";
import { signLink, verifyLink } from "@/lib/server/mail/signed-link";

// Pure unit run: the environment check wants a database URL even though nothing connects.
process.env.DATABASE_URL ??= "postgres://unused@127.0.0.1:1/unused";

describe("signed mail links", () => {
  it("round-trips claims for the right purpose until they expire", () => {
    const now = new Date("2026-12-01T10:00:00Z");
    const token = signLink("approve", "p1|u1", 7 * 86_400, now);
    expect(verifyLink(token, "approve", now)).toMatchObject({ purpose: "approve", subject: "p1|u1" });
    expect(verifyLink(token, "unsubscribe", now)).toBeNull();
    expect(verifyLink(token, "approve", new Date("2026-12-08T09:59:59Z"))).not.toBeNull();
    expect(verifyLink(token, "approve", new Date("2026-12-08T10:00:00Z"))).toBeNull();
  });

  it("refuses any change to the claims or the signature", () => {
    const now = new Date("2026-12-01T10:00:00Z");
    const token = signLink("unsubscribe", "a@example.test|digest|t1", 3600, now);
    const [body, sig] = token.split(".") as [string, string];
    const claims = JSON.parse(Buffer.from(body, "base64url").toString()) as Record<string, unknown>;
    const forgedBody = Buffer.from(JSON.stringify({ ...claims, subject: "b@example.test|digest|t1" })).toString("base64url");
    expect(verifyLink(`${forgedBody}.${sig}`, "unsubscribe", now)).toBeNull();
    expect(verifyLink(`${body}.${sig.slice(0, -2)}xx`, "unsubscribe", now)).toBeNull();
    expect(verifyLink(`${body}`, "unsubscribe", now)).toBeNull();
    expect(verifyLink("", "unsubscribe", now)).toBeNull();
  });
});
