import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import {
  ZCompletedUpload,
  ZCreateComment,
  ZCreateFormCheck,
  ZCreateUpload,
  ZFormCheck,
  ZFormCheckComment,
  ZFormCheckDetail,
  ZFormCheckListQuery,
  ZUpload,
} from "@/lib/validation/form-checks";
import { defineOperation, pageOf, zIdParam } from "../define";

/** Uploads (presigned PUT to object storage) and form checks with time-pinned comments. */
export function registerFormCheckPaths(registry: OpenAPIRegistry): void {
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/uploads",
    tag: "Form checks",
    summary:
      "Start an upload: answers a presigned PUT URL (valid 15 minutes) and the headers to send with it. " +
      "Type, size and the athlete's storage quota are checked here and again on completion.",
    body: ZCreateUpload,
    ok: { status: 201, schema: ZUpload },
    errors: [404, 413],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/uploads/{id}/complete",
    tag: "Form checks",
    summary:
      "Confirm an upload after the PUT: the stored size and leading bytes must match what was announced, " +
      "else the file is removed (413/422). Completing twice is 409.",
    params: zIdParam,
    ok: { status: 200, schema: ZCompletedUpload },
    errors: [404, 409, 413, 422],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/form-checks",
    tag: "Form checks",
    summary: "Form checks, newest first: the team's for staff (filter by athlete), an athlete's own",
    query: ZFormCheckListQuery,
    ok: { status: 200, schema: pageOf(ZFormCheck) },
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/form-checks",
    tag: "Form checks",
    summary: "Create a form check from a completed upload, optionally for a rung or a log",
    body: ZCreateFormCheck,
    ok: { status: 201, schema: ZFormCheckDetail },
    errors: [404, 409, 413],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/form-checks/{id}",
    tag: "Form checks",
    summary: "One form check with its comments and a signed URL to the file (valid 5 minutes)",
    params: zIdParam,
    ok: { status: 200, schema: ZFormCheckDetail },
    errors: [404],
  });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/form-checks/{id}",
    tag: "Form checks",
    summary: "Delete a form check; its file is removed from storage (retried until done)",
    params: zIdParam,
    ok: { status: 204, description: "Deleted" },
    errors: [404],
  });
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/form-checks/{id}/comments",
    tag: "Form checks",
    summary: "Pin a coach's comment to a moment of the video (seconds from the start)",
    params: zIdParam,
    body: ZCreateComment,
    ok: { status: 201, schema: ZFormCheckComment },
    errors: [404],
  });
}
