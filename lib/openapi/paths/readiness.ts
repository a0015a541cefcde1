import type { OpenAPIRegistry } from "@asteasolutions/zod-to-openapi";
import { z } from "zod";
import { ZLoad, ZLoadQuery } from "@/lib/validation/load";
import { ZProgress } from "@/lib/validation/progress";
import { READINESS_CSV_COLUMNS, ZReadinessPage, ZReadinessQuery } from "@/lib/validation/readiness";
import { defineOperation, zIdParam } from "../define";

export function registerReadinessPaths(registry: OpenAPIRegistry): void {
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/readiness",
    tag: "Review",
    summary:
      "The weekly readiness table: one row per athlete of the team with a cell per ladder they are placed on. " +
      "Sorted and filtered on the server; a week that ISO 8601 does not have (e.g. 2025-W53) is 422. " +
      `With format=csv or Accept: text/csv, an attachment with one line per athlete × ladder and the header ${READINESS_CSV_COLUMNS.join(",")}.`,
    query: ZReadinessQuery,
    headers: z.object({ accept: z.string().optional().meta({ description: "text/csv for the CSV export" }) }),
    ok: { status: 200, schema: ZReadinessPage, description: "A page of rows (JSON), or the CSV export (text/csv)" },
    errors: [422],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/progress",
    tag: "Review",
    summary:
      "An athlete's progress per ladder: current rung, the path (date each rung was reached), session bests against the " +
      "standard, pain notes, a straight-line forecast (an estimate, never a promise) and the audit of moves",
    params: zIdParam,
    ok: { status: 200, schema: ZProgress },
    errors: [404],
  });
  defineOperation(registry, {
    method: "get",
    path: "/api/v1/athletes/{id}/load",
    tag: "Review",
    summary:
      "Descriptive training load (no injury prediction): session load = session RPE × minutes (Foster et al. 2001), " +
      "daily and weekly load, weekly monotony and strain with the population SD (Foster 1998; monotony null when the SD is 0), " +
      "rolling 7/28-day acute:chronic ratios (Hulin et al. 2014) and EWMA ratios (Williams et al. 2017), " +
      "shown only after `minDaysOfHistory` days of logged history",
    params: zIdParam,
    query: ZLoadQuery,
    ok: { status: 200, schema: ZLoad },
    errors: [404],
  });
}
