import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ZCreateLog, ZLogDto, ZLogsQuery, ZLogWithVerdicts, ZToday, ZTodayQuery, ZUpdateLog } from "@/lib/validation/logs";
import { defineOperation, pageOf, zIdParam } from "../define";

const zIdempotencyHeader = z.object({
  "idempotency-key": z.string().min(8).max(200).meta({
    description:
      "A fresh random id per write (e.g. a UUID), kept with the write until it is confirmed. A retry with the same key and body answers the first response; the same key with another body, or while the first is still running, is 409. Keys are kept at least 24 h, per caller.",
  }),
});

export function registerLogPaths(registry: OpenAPIRegistry): void {
  defineOperation(registry, {
    method: "post",
    path: "/api/v1/logs",
    tag: "Logs",
    summary:
      "Log training (an athlete for themselves; staff for an athlete of their team). Entries of one rung on one date form one session, however many posts they came in. `verdicts` has one item per ladder whose current rung (as of the write) the log names; entries on other rungs of a placed ladder (warm-ups, a phone syncing after a move) are kept but judge nothing. Body at most 64 kB.",
    headers: zIdempotencyHeader,
    body: ZCreateLog,
    ok: { status: 201, schema: ZLogWithVerdicts, description: "Created (a replay answers the original status and body)" },
    errors: [404, 409, 413],
  });
  defineOperation(registry, {
    method: "patch",
    path: "/api/v1/logs/{id}",
    tag: "Logs",
    summary: "Change a log's minutes, session RPE, or its entries' sets, pain and note (within 7 days of the date it records; audited)",
    params: zIdParam,
    body: ZUpdateLog,
    ok: { status: 200, schema: ZLogWithVerdicts },
    errors: [404, 409, 413],
  });
  defineOperation(registry, {
    method: "delete",
    path: "/api/v1/logs/{id}",
    tag: "Logs",
    summary: "Delete a log (soft; within 7 days of the date it records; audited)",
    params: zIdParam,
    ok: { status: 204, description: "Deleted" },
    errors: [404, 409],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/logs",
    tag: "Logs",
    summary: "An athlete's logs with their entries, newest first (from/to are inclusive dates)",
    params: zIdParam,
    query: ZLogsQuery,
    ok: { status: 200, schema: pageOf(ZLogDto) },
    errors: [404],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/today",
    tag: "Logs",
    summary: "An athlete's day: planned blocks with their current rungs, standards in plain words, and what is logged (date defaults to today in the team's zone)",
    params: zIdParam,
    query: ZTodayQuery,
    ok: { status: 200, schema: ZToday },
    errors: [404],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/me/today",
    tag: "Logs",
    summary: "The signed-in athlete's day (see /api/v1/athletes/{id}/today)",
    query: ZTodayQuery,
    ok: { status: 200, schema: ZToday },
    errors: [404],
  });
}
