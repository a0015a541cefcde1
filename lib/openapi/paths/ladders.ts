import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ZLadderDocument } from "@/lib/validation/ladder-document";
import {
  ZCreateLadder,
  ZDuplicateLadder,
  ZLadder,
  ZLadderListQuery,
  ZLadderPatch,
  ZLadderSummary,
  ZPlacement,
  ZPosition,
  ZRung,
  ZRungInput,
  ZRungOrder,
  ZRungPatch,
} from "@/lib/validation/ladders";
import { defineOperation, pageOf, zIdParam } from "../define";

const TAG = "Ladders";
const zPlacementParams = z.object({ id: z.uuid(), ladderId: z.uuid() });
const ZImportResult = z.object({
  ladder: ZLadder,
  warnings: z.array(z.object({ path: z.string(), message: z.string() })).describe("Prerequisites dropped and other notes"),
});

/** Ladder, rung, standard and position operations. */
export function registerLadderPaths(registry: OpenAPIRegistry): void {
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/ladders",
    tag: TAG,
    summary: "The team's ladders by name; filter by search text, promotion mode, archived",
    query: ZLadderListQuery,
    ok: { status: 200, schema: pageOf(ZLadderSummary) },
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/ladders",
    tag: TAG,
    summary: "Create a ladder with its rungs, standards and prerequisites in one transaction",
    body: ZCreateLadder,
    ok: { status: 201, schema: ZLadder },
    errors: [413],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/ladders/{id}",
    tag: TAG,
    summary: "One ladder with its live rungs in order (archived ladders answer with archived: true)",
    params: zIdParam,
    ok: { status: 200, schema: ZLadder },
    errors: [404],
  });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/ladders/{id}",
    tag: TAG,
    summary: "Change a ladder's name, target skill, notes or promotion mode; archive or restore it",
    params: zIdParam,
    body: ZLadderPatch,
    ok: { status: 200, schema: ZLadder },
    errors: [404],
  });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/ladders/{id}",
    tag: TAG,
    summary: "Archive a ladder (never deleted: athletes keep their place; PATCH archived: false restores)",
    params: zIdParam,
    ok: { status: 204, description: "Archived" },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/ladders/{id}/duplicate",
    tag: TAG,
    summary: "Copy a ladder with its live rungs, standards and prerequisites",
    params: zIdParam,
    body: ZDuplicateLadder,
    ok: { status: 201, schema: ZLadder },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/ladders/{id}/rungs",
    tag: TAG,
    summary: "Add a rung (with its standard) at the hard end of a ladder",
    params: zIdParam,
    body: ZRungInput,
    ok: { status: 201, schema: ZRung },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "put",
    path: "/api/v1/ladders/{id}/rungs/order",
    tag: TAG,
    summary: "Reorder a ladder's live rungs; rungIds must be exactly those rungs. Athletes stay on the same rung.",
    params: zIdParam,
    body: ZRungOrder,
    ok: { status: 200, schema: ZLadder },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/ladders/{id}/export",
    tag: TAG,
    summary: "Export a ladder as a rungwise.ladder document (schema: docs/ladder-document.schema.json)",
    params: zIdParam,
    ok: { status: 200, schema: ZLadderDocument },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/ladders/import",
    tag: TAG,
    summary: "Import a rungwise.ladder document as a new ladder; outside prerequisites not found by name are dropped with a warning",
    body: ZLadderDocument,
    ok: { status: 201, schema: ZImportResult },
    errors: [413],
  });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/rungs/{id}",
    tag: TAG,
    summary: "Change a rung, its whole standard or its whole prerequisite list",
    params: zIdParam,
    body: ZRungPatch,
    ok: { status: 200, schema: ZRung },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/rungs/{id}",
    tag: TAG,
    summary:
      "Remove a rung: archived (kept, negative position) when athletes, logs, promotions or moves refer to it, deleted otherwise; 204 either way",
    params: zIdParam,
    ok: { status: 204, description: "Archived or deleted" },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/positions",
    tag: TAG,
    summary: "The rung an athlete stands on for each ladder (athletes may read their own)",
    params: zIdParam,
    ok: { status: 200, schema: pageOf(ZPosition) },
    errors: [404],
  });
  defineOperation(registry, {
    method: "put",
    path: "/api/v1/athletes/{id}/positions/{ladderId}",
    tag: TAG,
    summary: "Place an athlete on a rung of a ladder; since (default today, team time zone) is when the rung's evidence counts from",
    params: zPlacementParams,
    body: ZPlacement,
    ok: { status: 200, schema: ZPosition },
    errors: [404],
  });
}
