import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { ZAthlete, ZAthleteListQuery, ZCreateAthlete, ZUpdateAthlete } from "@/lib/validation/athletes";
import { defineOperation, pageOf, zIdParam } from "../define";
import { ZInvite } from "./account";

export function registerAthletePaths(registry: OpenAPIRegistry) {
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes",
    tag: "Athletes",
    summary: "Athletes the caller may see (the whole team for staff, their own record for an athlete)",
    query: ZAthleteListQuery,
    ok: { status: 200, schema: pageOf(ZAthlete) },
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/athletes",
    tag: "Athletes",
    summary: "Create an athlete record, optionally e-mailing an invite",
    body: ZCreateAthlete,
    ok: { status: 201, schema: ZAthlete },
    errors: [409],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}",
    tag: "Athletes",
    summary: "One athlete",
    params: zIdParam,
    ok: { status: 200, schema: ZAthlete },
    errors: [404],
  });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/athletes/{id}",
    tag: "Athletes",
    summary: "Change an athlete record",
    params: zIdParam,
    body: ZUpdateAthlete,
    ok: { status: 200, schema: ZAthlete },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/athletes/{id}/invite",
    tag: "Athletes",
    summary: "E-mail (again) a sign-up link to an athlete without an account",
    params: zIdParam,
    ok: { status: 201, schema: ZInvite },
    errors: [404, 409, 422],
  });
}
