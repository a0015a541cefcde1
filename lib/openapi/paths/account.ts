import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ZCreateToken, ZSignUp } from "@/lib/validation/auth";
import { ZInviteCoach } from "@/lib/validation/auth";
import { defineOperation, pageOf, zIdParam } from "../define";

const ZMe = z.object({
  id: z.uuid(),
  email: z.string(),
  name: z.string(),
  role: z.enum(["owner", "coach", "athlete"]),
  teamId: z.uuid(),
  athleteId: z.uuid().nullable(),
  timeZone: z.string(),
});

const ZToken = z.object({
  id: z.uuid(),
  name: z.string(),
  prefix: z.string(),
  lastUsedAt: z.string().nullable(),
  createdAt: z.string(),
});

const ZInvite = z.object({ id: z.uuid(), email: z.string(), role: z.enum(["coach", "athlete"]), expiresAt: z.string() });

export function registerAccountPaths(registry: OpenAPIRegistry) {
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/openapi.json",
    tag: "Meta",
    summary: "This document",
    authenticated: false,
    ok: { status: 200, description: "OpenAPI 3.1 document" },
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/signup",
    tag: "Account",
    summary: "Create a team and its owner",
    body: ZSignUp,
    authenticated: false,
    ok: { status: 201, schema: z.object({ userId: z.uuid(), teamId: z.uuid() }) },
    errors: [409],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/me",
    tag: "Account",
    summary: "Who the caller is",
    ok: { status: 200, schema: ZMe },
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/tokens",
    tag: "Account",
    summary: "The caller's live API tokens",
    ok: { status: 200, schema: pageOf(ZToken) },
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/tokens",
    tag: "Account",
    summary: "Create a personal API token (the token is shown once)",
    body: ZCreateToken,
    ok: { status: 201, schema: ZToken.omit({ lastUsedAt: true }).extend({ token: z.string() }) },
  });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/tokens/{id}",
    tag: "Account",
    summary: "Revoke a token",
    params: zIdParam,
    ok: { status: 204, description: "Revoked" },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/invites",
    tag: "Account",
    summary: "Invite a coach to the team (owner)",
    body: ZInviteCoach,
    ok: { status: 201, schema: ZInvite },
    errors: [409],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/team/staff",
    tag: "Account",
    summary: "The team's owner and coaches (for primary-coach pickers)",
    ok: { status: 200, schema: pageOf(z.object({ id: z.uuid(), name: z.string(), role: z.enum(["owner", "coach"]) })) },
  });
}

export { ZInvite, ZMe };
