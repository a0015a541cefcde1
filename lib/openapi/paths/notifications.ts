import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ZDigestPreview, ZDigestRunQuery, ZNotificationPreferences } from "@/lib/validation/notifications";
import { defineOperation } from "../define";

export function registerNotificationPaths(registry: OpenAPIRegistry): void {
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/digests/preview",
    tag: "Notifications",
    summary: "The caller's digest (staff) or weekly summary (athletes) for an ISO week, as HTML; sends nothing",
    body: ZDigestPreview,
    ok: { status: 200, schema: z.string(), contentType: "text/html", description: "The e-mail's HTML" },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/digests/run",
    tag: "Notifications",
    summary: "Queue the week's digests for the team now (each person still gets at most one per week)",
    query: ZDigestRunQuery,
    ok: { status: 202, schema: z.object({ enqueued: z.number().int() }) },
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/notification-preferences",
    tag: "Notifications",
    summary: "Which mail the caller gets",
    ok: { status: 200, schema: ZNotificationPreferences },
  });
  defineOperation(registry, {
    method: "put",
    path: "/api/v1/notification-preferences",
    tag: "Notifications",
    summary: "Choose which mail the caller gets and when the weekly digest arrives (team time)",
    body: ZNotificationPreferences,
    ok: { status: 200, schema: ZNotificationPreferences },
  });
}
