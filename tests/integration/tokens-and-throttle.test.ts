import { describe, expect, it } from "vitest";
import { POST as authPost } from "@/app/api/auth/[...nextauth]/route";
import { DELETE as revokeRoute } from "@/app/api/v1/tokens/[id]/route";
import { GET as listTokensRoute, POST as createTokenRoute } from "@/app/api/v1/tokens/route";
import { GET as me } from "@/app/api/v1/me/route";
import { SIGN_IN_LIMIT } from "@/lib/server/auth/sign-in-throttle";
import { verifyCredentials } from "@/lib/server/auth/verify-credentials";
import { bearerFor, createTeam, TEST_PASSWORD } from "../support/factories";
import { call } from "../support/http";

describe("personal API tokens", () => {
  it("work as Bearer tokens and stop working once revoked", async () => {
    const { owner } = await createTeam();
    const bootstrap = await bearerFor(owner);
    const created = await call(createTokenRoute, { token: bootstrap, json: { name: "Spreadsheet sync" } });
    expect(created.status).toBe(201);
    const { id, token } = created.data as { id: string; token: string };
    expect(token).toMatch(/^rw_/);

    expect((await call(me, { token })).status).toBe(200);
    const listed = await call(listTokensRoute, { token });
    expect(JSON.stringify(listed.data)).not.toContain(token); // shown once, never listed
    expect(JSON.stringify(listed.data)).not.toMatch(/token_?hash/i);

    expect((await call(revokeRoute, { token: bootstrap, method: "DELETE", params: { id } })).status).toBe(204);
    const after = await call(me, { token });
    expect(after.status).toBe(401);
    expect(after.data.error?.code).toBe("unauthorized");
  });

  it("answers 401 without identity and for an unknown token", async () => {
    expect((await call(me)).status).toBe(401);
    expect((await call(me, { token: "rw_not-a-real-token" })).status).toBe(401);
  });

  it("does not let one person revoke another person's token", async () => {
    const a = await createTeam();
    const b = await createTeam();
    const theirs = await call(createTokenRoute, { token: await bearerFor(b.owner), json: { name: "theirs" } });
    const res = await call(revokeRoute, { token: await bearerFor(a.owner), method: "DELETE", params: { id: theirs.data.id as string } });
    expect(res.status).toBe(404);
    expect((await call(me, { token: theirs.data.token as string })).status).toBe(200);
  });
});

describe("sign-in throttling", () => {
  const headers = (ip: string) => new Headers({ "x-forwarded-for": ip });

  function credentialsCallback(email: string, ip: string) {
    return call(authPost, {
      method: "POST",
      path: "/api/auth/callback/credentials",
      rawBody: new URLSearchParams({ email, password: "wrong", csrfToken: "x" }).toString(),
      headers: { "content-type": "application/x-www-form-urlencoded", "x-forwarded-for": ip },
    });
  }

  it(`answers 429 with Retry-After after ${SIGN_IN_LIMIT} failures for one e-mail and address`, async () => {
    const { ownerEmail } = await createTeam();
    for (let i = 0; i < SIGN_IN_LIMIT; i++) {
      expect(await verifyCredentials({ email: ownerEmail, password: "wrong password" }, headers("203.0.113.9"))).toBeNull();
    }
    const res = await credentialsCallback(ownerEmail, "203.0.113.9");
    expect(res.status).toBe(429);
    const retryAfter = Number(res.headers.get("retry-after"));
    expect(retryAfter).toBeGreaterThan(0);
    expect(retryAfter).toBeLessThanOrEqual(15 * 60);
    // Even the right password is refused while throttled…
    expect(await verifyCredentials({ email: ownerEmail, password: TEST_PASSWORD }, headers("203.0.113.9"))).toBeNull();
    // …but another address is not affected.
    expect(await verifyCredentials({ email: ownerEmail, password: TEST_PASSWORD }, headers("198.51.100.7"))).not.toBeNull();
  });

  it("resets the count after a successful sign-in", async () => {
    const { ownerEmail } = await createTeam();
    for (let i = 0; i < SIGN_IN_LIMIT - 1; i++) {
      await verifyCredentials({ email: ownerEmail, password: "wrong password" }, headers("192.0.2.1"));
    }
    expect(await verifyCredentials({ email: ownerEmail, password: TEST_PASSWORD }, headers("192.0.2.1"))).not.toBeNull();
    for (let i = 0; i < SIGN_IN_LIMIT - 1; i++) {
      await verifyCredentials({ email: ownerEmail, password: "wrong password" }, headers("192.0.2.1"));
    }
    expect(await verifyCredentials({ email: ownerEmail, password: TEST_PASSWORD }, headers("192.0.2.1"))).not.toBeNull();
  });
});
